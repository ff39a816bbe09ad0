// Reminders the day before: each source looks at tomorrow on the club's calendar and puts its
// reminders in the outbox with keys unique per thing and person, so however often the sweep
// runs, each reminder is sent once. Daily reminders (an overdue loan) key on today's date.
import { reminderWindow, type ReminderWindow } from "@/lib/mail/reminder-clock";
import { db, type Transaction } from "@/server/db";
import { getClubSettings } from "@/server/services/accounts";
import { shiftReminders } from "@/server/services/antenna-day-messages";
import { buildSessionReminders } from "@/server/services/build-sessions";
import { loanDueReminders, loanOverdueReminders } from "@/server/services/lending-messages";

export interface ReminderSource {
  name: string;
  /** Enqueues the reminders due for the window; returns how many it newly queued. */
  enqueue(tx: Transaction, window: ReminderWindow, now: Date): Promise<number>;
}

export const reminderSources: ReminderSource[] = [buildSessionReminders, shiftReminders, loanDueReminders, loanOverdueReminders];

export async function runReminderSweep(now: Date = new Date()): Promise<{ window: ReminderWindow | null; queued: number }> {
  const { timeZone } = await getClubSettings();
  const window = reminderWindow(now, timeZone);
  if (!window) return { window, queued: 0 };
  let queued = 0;
  for (const source of reminderSources) {
    queued += await db().transaction((tx) => source.enqueue(tx, window, now));
  }
  return { window, queued };
}
