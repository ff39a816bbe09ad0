// iCalendar (RFC 5545) files and feeds, built with ical-generator. Times are written on the
// club's wall clock with a TZID and the zone's VTIMEZONE (from the IANA database through
// timezones-ical-library), so an event keeps its wall-clock time across a daylight-saving
// change; DTSTAMP and LAST-MODIFIED are UTC, as §3.8.7 asks.
import ical, { ICalEventStatus } from "ical-generator";
import { Temporal } from "temporal-polyfill";
import { tzlib_get_ical_block } from "timezones-ical-library";

export interface CalendarEvent {
  /** Stable across edits, so a calendar updates the event instead of adding another (§3.8.4.7). */
  uid: string;
  /** Goes up on every change (§3.8.7.4). */
  sequence: number;
  startsAt: Date;
  endsAt: Date;
  summary: string;
  description: string;
  location: string;
  url: string;
  cancelled: boolean;
  /** The last change: DTSTAMP (no METHOD, §3.8.7.2) and LAST-MODIFIED. */
  updatedAt: Date;
}

export interface CalendarInput {
  name: string;
  timeZone: string;
  events: CalendarEvent[];
  /** For subscribed feeds: how often a calendar should look again. */
  refreshMinutes?: number;
}

function vtimezone(timeZone: string): string | null {
  const [block] = tzlib_get_ical_block(timeZone);
  return block || null;
}

function onWallClock(instant: Date, timeZone: string) {
  return Temporal.Instant.fromEpochMilliseconds(instant.getTime()).toZonedDateTimeISO(timeZone);
}

export function buildCalendar(input: CalendarInput): string {
  const calendar = ical({
    name: input.name,
    prodId: { company: "Guyline", product: "Guyline", language: "EN" },
    // The generator adds one VTIMEZONE per zone the events use; the calendar itself names no
    // zone so that DTSTAMP and LAST-MODIFIED stay in UTC.
    timezone: { name: null, generator: vtimezone },
    ...(input.refreshMinutes ? { ttl: input.refreshMinutes * 60 } : {}),
  });
  for (const event of input.events) {
    calendar.createEvent({
      id: event.uid,
      sequence: event.sequence,
      timezone: input.timeZone,
      start: onWallClock(event.startsAt, input.timeZone),
      end: onWallClock(event.endsAt, input.timeZone),
      summary: event.summary,
      description: event.description,
      location: event.location,
      url: event.url,
      status: event.cancelled ? ICalEventStatus.CANCELLED : ICalEventStatus.CONFIRMED,
      stamp: event.updatedAt,
      lastModified: event.updatedAt,
    });
  }
  return calendar.toString();
}

/** A file name for a download: letters, digits and dashes only. */
export function icsFileName(title: string): string {
  const slug = title.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "").slice(0, 60);
  return `${slug || "event"}.ics`;
}
