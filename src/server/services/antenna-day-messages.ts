// E-mail about antenna days and shifts, the day's calendar file, and the shift reminders of the
// day before. Everything here runs inside the caller's transaction and reads through it (never a
// second pool connection), so a message exists exactly when the change that caused it commits.
import { and, eq, gte, isNotNull, lt, type SQL } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { appUrl } from "@/env";
import { dayChanges, dayNotice, descriptionExcerpt, type DayFacts } from "@/lib/antenna-days/day-notices";
import { antennaDayEvent } from "@/lib/calendar/events";
import { buildCalendar, icsFileName } from "@/lib/calendar/ics";
import type { ReminderWindow } from "@/lib/mail/reminder-clock";
import type { Executor, Transaction } from "@/server/db";
import { antennaDays, clubSettings, shifts, shiftSignups, sites, stationSlots, users, type AntennaDayRow, type OutboxAttachment } from "@/server/db/schema";
import { enqueueMail } from "@/server/mail/outbox";
import type { ReminderSource } from "@/server/mail/reminders";

const dayPath = (dayId: string) => `/antenna-days/${dayId}`;

const safetyLeads = alias(users, "safety_leads");

export interface DaySnapshot {
  day: AntennaDayRow;
  facts: DayFacts;
}

/** The day with the names members read (site, safety lead), through the caller's executor. */
export async function daySnapshot(executor: Executor, dayId: string): Promise<DaySnapshot> {
  const [row] = await executor
    .select({ day: antennaDays, siteName: sites.name, safetyLeadName: safetyLeads.name })
    .from(antennaDays)
    .innerJoin(sites, eq(sites.id, antennaDays.siteId))
    .innerJoin(safetyLeads, eq(safetyLeads.id, antennaDays.safetyLeadId))
    .where(eq(antennaDays.id, dayId));
  const { day, siteName, safetyLeadName } = row;
  return {
    day,
    facts: { title: day.title, startsAt: day.startsAt, endsAt: day.endsAt, siteName, meetingPoint: day.meetingPoint, description: day.description, safetyLeadName },
  };
}

/** The day as an iCalendar file; STATUS:CANCELLED once it is cancelled. */
export async function dayIcsFile(executor: Executor, { day, facts }: DaySnapshot): Promise<OutboxAttachment> {
  const [club] = await executor.select({ timeZone: clubSettings.timeZone }).from(clubSettings);
  const event = antennaDayEvent(
    {
      id: day.id,
      name: day.title,
      startsAt: day.startsAt,
      endsAt: day.endsAt,
      siteName: facts.siteName,
      summary: descriptionExcerpt(day.description),
      cancelled: day.status === "cancelled",
      sequence: day.sequence,
      updatedAt: day.updatedAt,
    },
    appUrl(),
  );
  return {
    filename: icsFileName(day.title),
    contentType: "text/calendar; charset=utf-8",
    content: buildCalendar({ name: day.title, timeZone: club.timeZone, events: [event] }),
  };
}

/** Everyone who may see a published day: every confirmed account. */
async function confirmedPeople(tx: Transaction): Promise<string[]> {
  const rows = await tx.select({ id: users.id }).from(users).where(isNotNull(users.confirmedAt));
  return rows.map((row) => row.id);
}

/**
 * Tells the club about a change of a day: published, changed while published (when something
 * members see changed), or cancelled (always sent, whatever a member's choices). Each message
 * carries the day's .ics, so a calendar that took the first one updates instead of duplicating.
 */
export async function tellDayChange(tx: Transaction, before: DaySnapshot, options: { timeZone: string; cancelReason: string | null }): Promise<void> {
  const after = await daySnapshot(tx, before.day.id);
  const notice = dayNotice(before.day.status, after.day.status);
  if (!notice) return;
  const changes = notice === "changed" ? dayChanges(before.facts, after.facts, options.timeZone) : [];
  if (notice === "changed" && changes.length === 0) return;

  const { day, facts } = after;
  const base = {
    name: day.title,
    startsAt: day.startsAt.toISOString(),
    endsAt: day.endsAt.toISOString(),
    siteName: facts.siteName,
    meetingPoint: day.meetingPoint || null,
    path: dayPath(day.id),
  };
  const attachments = [await dayIcsFile(tx, after)];
  for (const userId of await confirmedPeople(tx)) {
    const to = { userId };
    if (notice === "published") {
      await enqueueMail(tx, { template: "antennaDayPublished", to, key: `antenna-day-published:${day.id}:${userId}`, data: { ...base, summary: descriptionExcerpt(day.description) }, attachments });
    } else if (notice === "changed") {
      await enqueueMail(tx, { template: "antennaDayChanged", to, key: `antenna-day-changed:${day.id}:${day.sequence}:${userId}`, data: { ...base, changes }, attachments });
    } else {
      await enqueueMail(tx, { template: "antennaDayCancelled", to, key: `antenna-day-cancelled:${day.id}:${userId}`, data: { ...base, reason: options.cancelReason }, attachments });
    }
  }
}

function selectSignUps(executor: Executor) {
  return executor
    .select({
      signUpId: shiftSignups.id,
      personId: shiftSignups.personId,
      shiftId: shifts.id,
      slotId: stationSlots.id,
      startsAt: shifts.startsAt,
      endsAt: shifts.endsAt,
      stationName: stationSlots.name,
      bands: stationSlots.bands,
      dayId: antennaDays.id,
      dayName: antennaDays.title,
      siteName: sites.name,
    })
    .from(shiftSignups)
    .innerJoin(shifts, eq(shifts.id, shiftSignups.shiftId))
    .innerJoin(stationSlots, eq(stationSlots.id, shifts.slotId))
    .innerJoin(antennaDays, eq(antennaDays.id, stationSlots.dayId))
    .innerJoin(sites, eq(sites.id, antennaDays.siteId));
}

type SignUpFacts = Awaited<ReturnType<typeof selectSignUps>>[number];

function shiftData(row: SignUpFacts) {
  return {
    dayName: row.dayName,
    stationName: row.stationName,
    bands: row.bands,
    startsAt: row.startsAt.toISOString(),
    endsAt: row.endsAt.toISOString(),
    siteName: row.siteName,
    path: `${dayPath(row.dayId)}#slot-${row.slotId}`,
  };
}

/**
 * Tells each person whose sign-up a coordinator is about to remove (a shift or a slot deleted,
 * or one person taken off a shift). Call it before the delete, in the same transaction: the
 * rows are read now and the messages commit with the delete.
 */
export async function tellSignUpsRemoved(tx: Transaction, which: SQL): Promise<void> {
  for (const row of await selectSignUps(tx).where(which)) {
    await enqueueMail(tx, { template: "shiftRemoved", to: { userId: row.personId }, key: `shift-signup-removed:${row.signUpId}`, data: shiftData(row) });
  }
}

/** A reminder the day before to everyone signed up for a shift of a published day. */
export const shiftReminders: ReminderSource = {
  name: "shifts",
  async enqueue(tx: Transaction, window: ReminderWindow): Promise<number> {
    const rows = await selectSignUps(tx).where(and(eq(antennaDays.status, "published"), gte(shifts.startsAt, window.from), lt(shifts.startsAt, window.to)));
    let queued = 0;
    for (const row of rows) {
      const outcome = await enqueueMail(tx, {
        template: "shiftReminder",
        to: { userId: row.personId },
        key: `shift-reminder:${row.shiftId}:${row.personId}:${window.date}`,
        data: shiftData(row),
      });
      if (outcome === "queued") queued += 1;
    }
    return queued;
  },
};
