// E-mail from the lending desk, end to end: the lending service puts each message in the outbox
// in the transaction of the step that caused it, the reminder sweep adds the daily ones, the real
// delivery code sends them over SMTP to the local mail server, and mailparser reads them.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startCaptureServer, type CaptureServer } from "@/server/mail/capture-server";
import { runReminderSweep } from "@/server/mail/reminders";
import { setMailChoices } from "@/server/services/mail-preferences";
import { bookForStation, joinWaitlist, requestBooking, stepBooking } from "@/server/services/lending";
import { createSlot } from "@/server/services/station-slots";
import { dipoleSlot, newDay } from "./antenna-day-helpers";
import { addAnalyser, addCoaxRun, clubTime, testSteward } from "./gear-helpers";
import { clubNoonInDays, createPerson, wallTimeInDays } from "./helpers";
import { deliverNow, outboxFor, smtpPort } from "./mail-helpers";

let capture: CaptureServer;
beforeAll(async () => {
  capture = await startCaptureServer(smtpPort);
});
afterAll(async () => {
  await capture.close();
});

const DAY = 86_400_000;

describe("a booking's answer", () => {
  it("tells the borrower it is approved, with where to pick it up, or declined, with the steward's reason", async () => {
    const item = await addAnalyser({ location: "Club shed, shelf 2" });
    const [first, second] = await Promise.all([createPerson("member", { name: "Fay First" }), createPerson("member")]);
    const steward = await testSteward();
    const { booking: wanted } = await requestBooking(first, { itemId: item.id, startsAt: clubTime(4, 9), endsAt: clubTime(4, 18) });
    const { booking: refused } = await requestBooking(second, { itemId: item.id, startsAt: clubTime(4, 10), endsAt: clubTime(4, 12) });
    // A request that waits for a steward says nothing yet.
    expect(await outboxFor([first.id, second.id])).toHaveLength(0);

    await stepBooking(steward, wanted.id, { action: "approve" });
    await stepBooking(steward, refused.id, { action: "decline", reason: "It goes for calibration that week" });
    const [approved] = await outboxFor([first.id], "bookingApproved");
    const [declined] = await outboxFor([second.id], "bookingDeclined");

    const mails = await deliverNow([approved.id, declined.id]);
    const approval = mails.find((mail) => mail.envelopeTo[0] === first.email)!;
    expect(approval.subject).toBe(`Booked: ${item.labelCode} Test analyser`);
    expect(approval.text).toContain("Hello Fay First,");
    expect(approval.text).toMatch(/Pick up:\s+Club shed, shelf 2\n/);
    expect(approval.text).toMatch(/\/lending#booking-/);
    const decline = mails.find((mail) => mail.envelopeTo[0] === second.email)!;
    expect(decline.subject).toBe(`Not booked: ${item.labelCode} Test analyser`);
    expect(decline.text).toContain("The steward's note: It goes for calibration that week");
  });

  it("confirms a booking approved at once, but not to a keeper who booked gear for their own station", async () => {
    const item = await addCoaxRun();
    const member = await createPerson("member");
    const { outcome } = await requestBooking(member, { itemId: item.id, startsAt: clubTime(3, 9), endsAt: clubTime(3, 17) });
    expect(outcome).toBe("approved");
    expect(await outboxFor([member.id], "bookingApproved")).toHaveLength(1);

    const coordinator = await createPerson("coordinator");
    const day = await newDay(coordinator);
    const slot = await createSlot(coordinator, day.id, dipoleSlot("Kit", 50, 60));
    await bookForStation(coordinator, { itemId: item.id, startsAt: clubTime(8, 8), endsAt: clubTime(8, 18), antennaDayId: day.id, stationSlotId: slot.id });
    expect(await outboxFor([coordinator.id], "bookingApproved")).toHaveLength(0);
    await bookForStation(coordinator, { itemId: item.id, startsAt: clubTime(9, 8), endsAt: clubTime(9, 18), antennaDayId: day.id, borrowerId: member.id });
    expect(await outboxFor([member.id], "bookingApproved")).toHaveLength(2);
  });
});

describe("the waitlist's offer", () => {
  it("tells the next in line that the item is free for them, and until when", async () => {
    const item = await addCoaxRun();
    const [holder, waiting] = await Promise.all([createPerson("member"), createPerson("member")]);
    const { booking } = await requestBooking(holder, { itemId: item.id, startsAt: clubTime(6, 9), endsAt: clubTime(6, 17) });
    await joinWaitlist(waiting, { itemId: item.id, startsAt: clubTime(6, 10), endsAt: clubTime(6, 12) });
    const { offered } = await stepBooking(holder, booking.id, { action: "cancel" });
    expect(offered.map((offer) => offer.userId)).toEqual([waiting.id]);

    const rows = await outboxFor([waiting.id], "waitlistOffer");
    expect(rows).toHaveLength(1);
    const [mail] = await deliverNow([rows[0].id]);
    expect(mail.subject).toBe(`Free for you: ${item.labelCode} Test coax run`);
    expect(mail.text).toMatch(/The item is held for you until \S+, \d+ \w+ \d{4}, \d\d:\d\d\./);
  });
});

describe("the return receipt", () => {
  it("gives the borrower the condition, the notes and who took it back", async () => {
    const item = await addCoaxRun();
    const member = await createPerson("member");
    const steward = await testSteward();
    const { booking } = await requestBooking(member, { itemId: item.id, startsAt: clubTime(0, 0), endsAt: clubTime(2, 12) });
    await stepBooking(steward, booking.id, { action: "hand-out", condition: "good" });
    await stepBooking(steward, booking.id, { action: "return", condition: "worn", damageNotes: "Boot split at one end" });
    const [receipt] = await outboxFor([member.id], "returnReceipt");
    const [mail] = await deliverNow([receipt.id]);
    expect(mail.subject).toBe(`Returned: ${item.labelCode} Test coax run`);
    expect(mail.text).toMatch(/Received by:\s+Test steward\n/);
    expect(mail.text).toMatch(/Condition:\s+Worn\n/);
    expect(mail.text).toMatch(/Notes:\s+Boot split at one end\n/);
  });
});

describe("reminders of loans", () => {
  it("reminds the day before a loan is due back, once", async () => {
    const item = await addCoaxRun();
    const member = await createPerson("member");
    const { booking } = await requestBooking(member, { itemId: item.id, startsAt: wallTimeInDays(0, "00:00"), endsAt: wallTimeInDays(1, "17:00") });
    await stepBooking(await testSteward(), booking.id, { action: "hand-out", condition: "good" });

    expect((await runReminderSweep(clubNoonInDays(0))).queued).toBeGreaterThanOrEqual(1);
    await runReminderSweep(new Date(clubNoonInDays(0).getTime() + 2 * 3_600_000));
    const rows = await outboxFor([member.id], "itemDueTomorrow");
    expect(rows).toHaveLength(1);
    const [mail] = await deliverNow([rows[0].id]);
    expect(mail.subject).toBe(`Due back tomorrow: ${item.labelCode} Test coax run`);
    expect(mail.text).toMatch(/, by \S+, \d+ \w+ \d{4}, 17:00/);
  });

  it("tells the borrower of an overdue loan once a day until it is back, and respects their choice", async () => {
    const item = await addCoaxRun();
    const [late, quiet] = await Promise.all([createPerson("member"), createPerson("member")]);
    await setMailChoices(quiet, { "antenna-days": true, shifts: true, "build-sessions": true, lending: false });
    const steward = await testSteward();
    // Booked six days ago for two days; it was due back three days ago at noon.
    const sixDaysAgo = new Date(Date.now() - 6 * DAY);
    const { booking } = await requestBooking(late, { itemId: item.id, startsAt: wallTimeInDays(-5, "09:00"), endsAt: wallTimeInDays(-3, "12:00") }, sixDaysAgo);
    await stepBooking(steward, booking.id, { action: "hand-out", condition: "good" }, new Date(Date.now() - 5 * DAY));
    const other = await addCoaxRun();
    const { booking: quietLoan } = await requestBooking(quiet, { itemId: other.id, startsAt: wallTimeInDays(-5, "09:00"), endsAt: wallTimeInDays(-3, "12:00") }, sixDaysAgo);
    await stepBooking(steward, quietLoan.id, { action: "hand-out", condition: "good" }, new Date(Date.now() - 5 * DAY));

    // Twice on one club date: one message.
    await runReminderSweep(clubNoonInDays(0));
    await runReminderSweep(new Date(clubNoonInDays(0).getTime() + 5 * 3_600_000));
    expect(await outboxFor([late.id], "itemOverdue")).toHaveLength(1);
    // Who turned lending mail off is not sent it.
    expect((await outboxFor([quiet.id], "itemOverdue")).map((row) => row.status)).toEqual(["skipped"]);
    // The next club date: another.
    await runReminderSweep(clubNoonInDays(1));
    const rows = await outboxFor([late.id], "itemOverdue");
    expect(rows).toHaveLength(2);

    const mails = await deliverNow(rows.map((row) => row.id));
    expect(mails.map((mail) => mail.subject)).toEqual([`Overdue: ${item.labelCode} Test coax run`, `Overdue: ${item.labelCode} Test coax run`]);
    expect(mails.map((mail) => mail.text!.match(/(\d+) days ago/)![1]).sort()).toEqual(["3", "4"]);

    // Back with the steward: no more reminders.
    await stepBooking(steward, booking.id, { action: "return", condition: "good" });
    await runReminderSweep(clubNoonInDays(2));
    expect(await outboxFor([late.id], "itemOverdue")).toHaveLength(2);
  });
});
