// When reminders go out: for everything that happens tomorrow on the club's calendar, from
// 09:00 club time today (common practice: a reminder the day before, at an hour when people
// read mail). The sweep runs often; unique idempotency keys make each reminder go once, and a
// sweep that runs late (the worker was down at 09:00) still sends the day's reminders. Reminders
// repeated daily (an overdue loan) key on today's club date, so each goes once a day.
import { Temporal } from "temporal-polyfill";

export const REMINDER_HOUR = 9;

export interface ReminderWindow {
  /** Tomorrow's date on the club's calendar, "2026-06-13". */
  date: string;
  /** Today's date on the club's calendar, "2026-06-12": the key of reminders sent once a day. */
  today: string;
  /** The club's time zone, in which both dates are reckoned. */
  timeZone: string;
  /** The first instant of that date in the club's time zone. */
  from: Date;
  /** The first instant of the day after (a day can be 23 or 25 hours long). */
  to: Date;
}

/** Tomorrow's window once it is REMINDER_HOUR or later in the club's time zone; null before. */
export function reminderWindow(now: Date, timeZone: string): ReminderWindow | null {
  const local = Temporal.Instant.fromEpochMilliseconds(now.getTime()).toZonedDateTimeISO(timeZone);
  if (local.hour < REMINDER_HOUR) return null;
  const tomorrow = local.toPlainDate().add({ days: 1 });
  const from = tomorrow.toZonedDateTime({ timeZone });
  const to = tomorrow.add({ days: 1 }).toZonedDateTime({ timeZone });
  return {
    date: tomorrow.toString(),
    today: local.toPlainDate().toString(),
    timeZone,
    from: new Date(from.epochMilliseconds),
    to: new Date(to.epochMilliseconds),
  };
}

/** Whole days on the club's calendar from the date of `instant` to `today` (0 on the same date). */
export function clubDaysSince(instant: Date, today: string, timeZone: string): number {
  const date = Temporal.Instant.fromEpochMilliseconds(instant.getTime()).toZonedDateTimeISO(timeZone).toPlainDate();
  return date.until(Temporal.PlainDate.from(today), { largestUnit: "days" }).days;
}

