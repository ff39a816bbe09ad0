// E-mail from the lending desk: a booking approved or declined, a waitlist offer, a return
// receipt, and the reminders of the day (due back tomorrow, overdue every day until it is back).
// The lending service calls these inside its transactions and reads through them, so a message
// exists exactly when the step that caused it commits.
import { and, eq, gte, lt } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { gearConditionLabels } from "@/lib/gear/kinds";
import { clubDaysSince, type ReminderWindow } from "@/lib/mail/reminder-clock";
import type { Executor, Transaction } from "@/server/db";
import { gearBookings, gearItems, users } from "@/server/db/schema";
import { enqueueMail } from "@/server/mail/outbox";
import type { ReminderSource } from "@/server/mail/reminders";
import type { OfferNotice } from "@/server/services/lending";
import type { BookingStepInput } from "@/validations/lending";

/** Where each message sends the borrower: the lending desk, at the booking. */
const deskPath = (bookingId: string) => `/lending#booking-${bookingId}`;

const receivers = alias(users, "receivers");

function selectLoans(executor: Executor) {
  return executor
    .select({ booking: gearBookings, itemName: gearItems.name, itemLabelCode: gearItems.labelCode, location: gearItems.location, receivedBy: receivers.name })
    .from(gearBookings)
    .innerJoin(gearItems, eq(gearItems.id, gearBookings.itemId))
    .leftJoin(receivers, eq(receivers.id, gearBookings.returnRecordedBy));
}

type LoanRow = Awaited<ReturnType<typeof selectLoans>>[number];

const itemTitle = (row: Pick<LoanRow, "itemLabelCode" | "itemName">) => `${row.itemLabelCode} ${row.itemName}`;

function bookingData(row: LoanRow) {
  return { itemName: itemTitle(row), from: row.booking.startsAt.toISOString(), until: row.booking.endsAt.toISOString(), path: deskPath(row.booking.id) };
}

/**
 * Tells the borrower that their booking is approved: by a steward, or at once because the item
 * was free. Not when they approved it themselves (a keeper booking gear for their own station).
 */
export async function tellBookingApproved(tx: Transaction, bookingId: string): Promise<void> {
  const [row] = await selectLoans(tx).where(eq(gearBookings.id, bookingId));
  if (row.booking.state !== "approved" || row.booking.decidedBy === row.booking.borrowerId) return;
  await enqueueMail(tx, {
    template: "bookingApproved",
    to: { userId: row.booking.borrowerId },
    key: `booking-approved:${bookingId}`,
    data: { ...bookingData(row), pickup: row.location },
  });
}

/** The message a step of a booking sends the borrower, if any: approved, declined (with the reason), the return receipt. */
export async function tellBookingStep(tx: Transaction, bookingId: string, action: BookingStepInput["action"]): Promise<void> {
  if (action === "approve") return tellBookingApproved(tx, bookingId);
  if (action !== "decline" && action !== "return") return;
  const [row] = await selectLoans(tx).where(eq(gearBookings.id, bookingId));
  const to = { userId: row.booking.borrowerId };
  if (action === "decline") {
    await enqueueMail(tx, { template: "bookingDeclined", to, key: `booking-declined:${bookingId}`, data: { ...bookingData(row), reason: row.booking.declineReason } });
    return;
  }
  const { returnedAt, returnCondition, damageNotes } = row.booking;
  await enqueueMail(tx, {
    template: "returnReceipt",
    to,
    key: `return-receipt:${bookingId}`,
    data: {
      itemName: itemTitle(row),
      returnedAt: returnedAt!.toISOString(),
      receivedBy: row.receivedBy ?? "the lending desk",
      condition: gearConditionLabels[returnCondition!],
      notes: damageNotes,
      path: deskPath(bookingId),
    },
  });
}

/** Tells each person on a waitlist that the item came free for them, and until when it is held. */
export async function tellOffers(tx: Transaction, offers: OfferNotice[]): Promise<void> {
  for (const offer of offers) {
    await enqueueMail(tx, {
      template: "waitlistOffer",
      to: { userId: offer.userId },
      key: `waitlist-offer:${offer.waitlistId}`,
      data: { itemName: `${offer.itemLabelCode} ${offer.itemName}`, from: offer.startsAt, until: offer.endsAt, expiresAt: offer.expiresAt, path: "/lending" },
    });
  }
}

/** The day before a loan is due back: one reminder per loan and due date. */
export const loanDueReminders: ReminderSource = {
  name: "loans due tomorrow",
  async enqueue(tx: Transaction, window: ReminderWindow): Promise<number> {
    const rows = await selectLoans(tx).where(and(eq(gearBookings.state, "out"), gte(gearBookings.endsAt, window.from), lt(gearBookings.endsAt, window.to)));
    let queued = 0;
    for (const row of rows) {
      const outcome = await enqueueMail(tx, {
        template: "itemDueTomorrow",
        to: { userId: row.booking.borrowerId },
        key: `item-due:${row.booking.id}:${window.date}`,
        data: { items: [{ name: itemTitle(row), dueAt: row.booking.endsAt.toISOString() }], path: deskPath(row.booking.id) },
      });
      if (outcome === "queued") queued += 1;
    }
    return queued;
  },
};

/**
 * Every day until it is back, from the day after it was due: one message per loan and club date,
 * so a sweep that runs many times a day sends it once that day.
 */
export const loanOverdueReminders: ReminderSource = {
  name: "overdue loans",
  async enqueue(tx: Transaction, window: ReminderWindow, now: Date): Promise<number> {
    const rows = await selectLoans(tx).where(and(eq(gearBookings.state, "out"), lt(gearBookings.endsAt, now)));
    let queued = 0;
    for (const row of rows) {
      const daysOverdue = clubDaysSince(row.booking.endsAt, window.today, window.timeZone);
      if (daysOverdue < 1) continue;
      const outcome = await enqueueMail(tx, {
        template: "itemOverdue",
        to: { userId: row.booking.borrowerId },
        key: `item-overdue:${row.booking.id}:${window.today}`,
        data: { itemName: itemTitle(row), dueAt: row.booking.endsAt.toISOString(), daysOverdue, path: deskPath(row.booking.id) },
      });
      if (outcome === "queued") queued += 1;
    }
    return queued;
  },
};
