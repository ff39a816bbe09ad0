// What members hear when an antenna day changes: which message a change of status sends, and
// what changed, in words. Pure: the service passes the day's facts before and after.
import { formatRangeInZone } from "@/lib/time";
import type { DayStatus } from "./status";

export type DayNotice = "published" | "changed" | "cancelled";

/**
 * The message a change sends: a day that members could not see says nothing; publishing it
 * announces it; a published day that changes or is cancelled tells everyone who saw it.
 */
export function dayNotice(before: DayStatus, after: DayStatus): DayNotice | null {
  if (before === "draft") return after === "published" ? "published" : null;
  if (before !== "published") return null;
  if (after === "cancelled") return "cancelled";
  return after === "published" ? "changed" : null;
}

export interface DayFacts {
  title: string;
  startsAt: Date;
  endsAt: Date;
  siteName: string;
  meetingPoint: string;
  description: string;
  safetyLeadName: string;
}

/** The changes a member should know of, one line each; empty when nothing they see changed. */
export function dayChanges(before: DayFacts, after: DayFacts, timeZone: string): string[] {
  const changes: string[] = [];
  if (before.startsAt.getTime() !== after.startsAt.getTime() || before.endsAt.getTime() !== after.endsAt.getTime()) {
    changes.push(`New time: ${formatRangeInZone(after.startsAt, after.endsAt, timeZone)} (was ${formatRangeInZone(before.startsAt, before.endsAt, timeZone)})`);
  }
  if (before.siteName !== after.siteName) changes.push(`New site: ${after.siteName} (was ${before.siteName})`);
  if (before.meetingPoint !== after.meetingPoint) {
    changes.push(after.meetingPoint ? `New meeting point: ${after.meetingPoint}` : "The meeting point is no longer set: see the day's page.");
  }
  if (before.title !== after.title) changes.push(`New name: ${after.title} (was ${before.title})`);
  if (before.safetyLeadName !== after.safetyLeadName) changes.push(`New safety lead: ${after.safetyLeadName}`);
  if (before.description !== after.description) changes.push("The description changed: see the day's page.");
  return changes;
}

/** The first part of the description for a message or a calendar event: at most `max` characters, cut at a word. */
export function descriptionExcerpt(description: string, max = 400): string | null {
  const text = description.trim();
  if (!text) return null;
  if (text.length <= max) return text;
  const cut = text.slice(0, max);
  return `${cut.slice(0, cut.lastIndexOf(" ") > max / 2 ? cut.lastIndexOf(" ") : max).trimEnd()}…`;
}
