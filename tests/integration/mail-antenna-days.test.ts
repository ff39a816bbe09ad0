// E-mail about antenna days and shifts, end to end: the services put the messages in the outbox
// in their own transaction, the real delivery code sends them over SMTP to the local mail server,
// and mailparser and ical.js (independent of Guyline) read what arrived.
import ICAL from "ical.js";
import { Temporal } from "temporal-polyfill";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { serverEnv } from "@/env";
import { startCaptureServer, type CaptureServer } from "@/server/mail/capture-server";
import { runReminderSweep } from "@/server/mail/reminders";
import { updateDay } from "@/server/services/antenna-days";
import { setMailChoices } from "@/server/services/mail-preferences";
import { cancelSignUp, createShift, deleteShift, signUp } from "@/server/services/shifts";
import { createSlot, deleteSlot } from "@/server/services/station-slots";
import { dipoleSlot, newDay } from "./antenna-day-helpers";
import { clubNoonInDays, createPerson } from "./helpers";
import { deliverNow, outboxFor, parseCalendar, resolvesToRoute, smtpPort } from "./mail-helpers";

let capture: CaptureServer;
beforeAll(async () => {
  capture = await startCaptureServer(smtpPort);
});
afterAll(async () => {
  await capture.close();
});

const allOn = { "antenna-days": true, shifts: true, "build-sessions": true, lending: true };
const appUrl = () => serverEnv().NEXTAUTH_URL.replace(/\/$/, "");

/** The club's date `days` from today (Europe/London), "2026-07-01". */
const clubDate = (days: number) => Temporal.Now.plainDateISO("Europe/London").add({ days }).toString();

function icsOf(mail: { attachments: { contentType: string; content: Buffer }[] }) {
  const files = mail.attachments.filter((attachment) => attachment.contentType === "text/calendar");
  expect(files).toHaveLength(1);
  return parseCalendar(files[0].content.toString("utf8"));
}

describe("an antenna day's messages", () => {
  it("publishing sends each confirmed member one message with a valid .ics, and nobody else", async () => {
    const coordinator = await createPerson("coordinator");
    const [member, newcomer, unconfirmed] = await Promise.all([
      createPerson("member", { name: "Ada Test" }),
      createPerson("newcomer"),
      createPerson("newcomer", { confirmed: false }),
    ]);
    const day = await newDay(coordinator);
    const published = await updateDay(coordinator, day.id, { status: "published" });

    const rows = await outboxFor([coordinator.id, member.id, newcomer.id, unconfirmed.id], "antennaDayPublished");
    expect(rows.map((row) => row.userId).sort()).toEqual([coordinator.id, member.id, newcomer.id].sort());
    // Publishing again changes nothing and sends nothing more.
    expect((await updateDay(coordinator, day.id, { status: "published" })).sequence).toBe(published.sequence);
    expect(await outboxFor([member.id], "antennaDayPublished")).toHaveLength(1);

    const mails = await deliverNow(rows.map((row) => row.id));
    expect(mails).toHaveLength(3);
    const mail = mails.find((candidate) => candidate.envelopeTo[0] === member.email)!;
    expect(mail.subject).toBe("New antenna day: Test antenna day");
    expect(mail.text).toContain("Hello Ada Test,");
    expect(typeof mail.html === "string" && mail.html.includes("Hello Ada Test,")).toBe(true);
    expect(mail.text).toContain("Meeting point: The gate");
    expect(mail.text).toContain(`${appUrl()}/antenna-days/${day.id}`);
    expect(resolvesToRoute(`/antenna-days/${day.id}`)).toBe(true);

    const calendar = icsOf(mail);
    // Source: RFC 5545 §3.7.3 (PRODID) and §3.7.4 (VERSION:2.0) are required.
    expect(calendar.getFirstPropertyValue("version")).toBe("2.0");
    expect(calendar.getFirstPropertyValue("prodid")).toBeTruthy();
    const vevent = calendar.getFirstSubcomponent("vevent")!;
    // Source: RFC 5545 §3.8.4.7 (UID: globally unique and persistent).
    expect(vevent.getFirstPropertyValue("uid")).toBe(`antenna-day-${day.id}@guyline`);
    // Source: RFC 5545 §3.8.7.2 (DTSTAMP is a UTC DATE-TIME).
    expect((vevent.getFirstPropertyValue("dtstamp") as ICAL.Time).zone?.tzid).toBe("UTC");
    // Source: RFC 5545 §3.2.19 (a TZID parameter names a VTIMEZONE in the same object) and §3.6.5.
    expect(vevent.getFirstProperty("dtstart")!.getParameter("tzid")).toBe("Europe/London");
    expect(calendar.getAllSubcomponents("vtimezone").map((zone) => zone.getFirstPropertyValue("tzid"))).toEqual(["Europe/London"]);
    // Source: RFC 5545 §3.3.5 (DATE-TIME with a TZID is local time in that zone): 09:00 on the club's clock.
    expect((vevent.getFirstPropertyValue("dtstart") as ICAL.Time).toString()).toBe("2031-06-14T09:00:00");
    // Source: RFC 5545 §3.8.7.4 (SEQUENCE) and §3.8.1.11 (STATUS).
    expect(vevent.getFirstPropertyValue("sequence")).toBe(published.sequence);
    expect(vevent.getFirstPropertyValue("status")).toBe("CONFIRMED");
  });

  it("a change to a published day tells members what changed with a newer .ics; a member's choice is respected", async () => {
    const coordinator = await createPerson("coordinator");
    const [member, quiet] = await Promise.all([createPerson("member"), createPerson("member")]);
    await setMailChoices(quiet, { ...allOn, "antenna-days": false });
    const day = await newDay(coordinator);
    // Changes to a draft tell nobody.
    await updateDay(coordinator, day.id, { meetingPoint: "The car park" });
    await updateDay(coordinator, day.id, { status: "published" });
    expect(await outboxFor([member.id], "antennaDayChanged")).toHaveLength(0);

    const changed = await updateDay(coordinator, day.id, { startsAtLocal: "2031-06-14T10:00", meetingPoint: "The north gate" });
    const [toMember] = await outboxFor([member.id], "antennaDayChanged");
    expect(toMember.textBody).toContain("New time: Sat, 14 Jun 2031, 10:00–17:00 (was Sat, 14 Jun 2031, 09:00–17:00)");
    expect(toMember.textBody).toContain("New meeting point: The north gate");
    // Who turned antenna-day mail off gets neither the announcement nor the change.
    expect((await outboxFor([quiet.id])).filter((row) => row.template.startsWith("antennaDay")).map((row) => row.status)).toEqual(["skipped", "skipped"]);

    const [mail] = await deliverNow([toMember.id]);
    expect(mail.subject).toBe("Changed: Test antenna day");
    const vevent = icsOf(mail).getFirstSubcomponent("vevent")!;
    // Source: RFC 5545 §3.8.7.4 (SEQUENCE is incremented each time the event is revised).
    expect(vevent.getFirstPropertyValue("sequence")).toBe(changed.sequence);
    expect(changed.sequence).toBeGreaterThan(2);
    expect((vevent.getFirstPropertyValue("dtstart") as ICAL.Time).toString()).toBe("2031-06-14T10:00:00");
  });

  it("cancelling tells everyone, also those who turned antenna-day mail off, with STATUS:CANCELLED", async () => {
    const coordinator = await createPerson("coordinator");
    const [member, quiet] = await Promise.all([createPerson("member"), createPerson("newcomer")]);
    await setMailChoices(quiet, { ...allOn, "antenna-days": false });
    const draft = await newDay(coordinator);
    await updateDay(coordinator, draft.id, { status: "cancelled" });
    // A draft nobody saw is cancelled quietly.
    expect((await outboxFor([member.id])).filter((row) => row.template.startsWith("antennaDay"))).toHaveLength(0);

    const day = await newDay(coordinator);
    await updateDay(coordinator, day.id, { status: "published" });
    const cancelled = await updateDay(coordinator, day.id, { status: "cancelled", cancelReason: "Gale warning for the whole weekend" });
    const rows = await outboxFor([member.id, quiet.id], "antennaDayCancelled");
    expect(rows.map((row) => [row.userId, row.status]).sort()).toEqual(
      [
        [member.id, "pending"],
        [quiet.id, "pending"],
      ].sort(),
    );
    // Always sent: no unsubscribe link, and the footer says why.
    expect(rows[0].headers).toEqual({});

    const mails = await deliverNow(rows.map((row) => row.id));
    const mail = mails.find((candidate) => candidate.envelopeTo[0] === quiet.email)!;
    expect(mail.subject).toBe("Cancelled: Test antenna day");
    expect(mail.text).toContain("Do not travel to the site");
    expect(mail.text).toContain("The coordinator's note: Gale warning for the whole weekend");
    expect(mail.text).toContain("Guyline sends this message whatever your e-mail choices");
    const vevent = icsOf(mail).getFirstSubcomponent("vevent")!;
    // Source: RFC 5545 §3.8.1.11 (STATUS:CANCELLED for a VEVENT), §3.8.4.7 (the same UID), §3.8.7.4 (SEQUENCE).
    expect(vevent.getFirstPropertyValue("status")).toBe("CANCELLED");
    expect(vevent.getFirstPropertyValue("uid")).toBe(`antenna-day-${day.id}@guyline`);
    expect(vevent.getFirstPropertyValue("sequence")).toBe(cancelled.sequence);
  });
});

describe("shift messages", () => {
  async function dayWithShift(inDays: number) {
    const coordinator = await createPerson("coordinator");
    const date = clubDate(inDays);
    const day = await newDay(coordinator, { date });
    const slot = await createSlot(coordinator, day.id, dipoleSlot("Twenty", 50, 60));
    const shift = await createShift(coordinator, slot.id, { startsAtLocal: `${date}T10:00`, endsAtLocal: `${date}T12:00`, capacity: 4 });
    await updateDay(coordinator, day.id, { status: "published" });
    return { coordinator, day, slot, shift };
  }

  it("reminds each person of their shift the day before, once however often the sweep runs", async () => {
    const { shift } = await dayWithShift(20);
    const operator = await createPerson("member", { name: "Omar Operator" });
    await signUp(operator, shift.id);

    // The day before, at noon and again an hour later on the club's clock.
    expect((await runReminderSweep(clubNoonInDays(19))).queued).toBeGreaterThanOrEqual(1);
    expect((await runReminderSweep(new Date(clubNoonInDays(19).getTime() + 3_600_000))).queued).toBe(0);
    const rows = await outboxFor([operator.id], "shiftReminder");
    expect(rows).toHaveLength(1);

    const [mail] = await deliverNow(rows.map((row) => row.id));
    expect(mail.subject).toBe("Tomorrow: your shift at Twenty");
    expect(mail.text).toContain("Hello Omar Operator,");
    expect(mail.text).toMatch(/When:\s+\S+, \d+ \w+ \d{4}, 10:00–12:00 \(Europe\/London time\)/);
    expect(mail.text).toContain("Masts near power lines kill");
    expect(resolvesToRoute(new URL(mail.text!.match(/https?:\/\/\S+\/antenna-days\/\S+/)![0]).pathname)).toBe(true);
  });

  it("tells a person when a coordinator removes their shift, whatever their choices, and not when they cancel it themselves", async () => {
    const { coordinator, day, shift } = await dayWithShift(25);
    const [kept, taken, self] = await Promise.all([createPerson("member"), createPerson("member"), createPerson("member")]);
    await setMailChoices(taken, { ...allOn, shifts: false });
    await Promise.all([signUp(kept, shift.id), signUp(taken, shift.id), signUp(self, shift.id)]);

    await cancelSignUp(self, shift.id);
    expect(await outboxFor([self.id], "shiftRemoved")).toHaveLength(0);
    await cancelSignUp(coordinator, shift.id, taken.id);
    const [takenOff] = await outboxFor([taken.id], "shiftRemoved");
    expect(takenOff.status).toBe("pending");

    await deleteShift(coordinator, shift.id);
    expect((await outboxFor([kept.id], "shiftRemoved")).map((row) => row.status)).toEqual(["pending"]);

    // Deleting a slot removes its shifts, and the people on them hear of it.
    const other = await createSlot(coordinator, day.id, dipoleSlot("Forty", 120, 60));
    const date = clubDate(25);
    const later = await createShift(coordinator, other.id, { startsAtLocal: `${date}T13:00`, endsAtLocal: `${date}T15:00`, capacity: 2 });
    await signUp(kept, later.id);
    await deleteSlot(coordinator, other.id);
    expect(await outboxFor([kept.id], "shiftRemoved")).toHaveLength(2);

    const [mail] = await deliverNow([takenOff.id]);
    expect(mail.subject).toBe("Shift removed: Twenty, Test antenna day");
    expect(mail.text).toContain("A coordinator removed your shift at Test antenna day.");
    expect(mail.headers.has("list-unsubscribe")).toBe(false);
  });
});
