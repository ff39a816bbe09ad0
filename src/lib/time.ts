// Times in the club's time zone. The database stores instants (timestamptz); people enter and
// read wall-clock times in the club's IANA time zone. One way to convert, through Temporal.
import { Temporal } from "temporal-polyfill";

/** "2026-06-13T09:00" in `timeZone` → the instant. Times in a spring-forward gap move forward. */
export function wallTimeToInstant(wallTime: string, timeZone: string): Date {
  const zoned = Temporal.PlainDateTime.from(wallTime).toZonedDateTime(timeZone, { disambiguation: "compatible" });
  return new Date(zoned.epochMilliseconds);
}

/** The instant as "2026-06-13T09:00" on the wall clock of `timeZone` (for form inputs). */
export function instantToWallTime(instant: Date, timeZone: string): string {
  const zoned = Temporal.Instant.fromEpochMilliseconds(instant.getTime()).toZonedDateTimeISO(timeZone);
  return zoned.toPlainDateTime().toString({ smallestUnit: "minute" });
}

/** The calendar date ("2026-06-13") of the instant in `timeZone`. */
export function instantToDate(instant: Date, timeZone: string): string {
  return Temporal.Instant.fromEpochMilliseconds(instant.getTime()).toZonedDateTimeISO(timeZone).toPlainDate().toString();
}

const formats = {
  dateTime: { weekday: "short", day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit" },
  date: { weekday: "short", day: "numeric", month: "short", year: "numeric" },
  time: { hour: "2-digit", minute: "2-digit" },
} satisfies Record<string, Intl.DateTimeFormatOptions>;

/** A readable date or time in the club's time zone, the same on the server and in the browser. */
export function formatInZone(instant: Date | string, timeZone: string, style: keyof typeof formats = "dateTime"): string {
  return new Intl.DateTimeFormat("en-GB", { ...formats[style], timeZone }).format(new Date(instant));
}

/** "13–14 Jun 2026, 09:00–17:00" style range for an event. */
export function formatRangeInZone(start: Date | string, end: Date | string, timeZone: string): string {
  return new Intl.DateTimeFormat("en-GB", { ...formats.dateTime, timeZone }).formatRange(new Date(start), new Date(end));
}
