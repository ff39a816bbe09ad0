// The club calendar's sources and the private feed, against the real PostgreSQL: build sessions
// and loan due dates on the calendar; antenna days, shifts and loans in a person's feed, read by
// ical.js and checked against RFC 5545, following edits and cancellations.
import ICAL from "ical.js";
import { describe, expect, it } from "vitest";
import { PublicError } from "@/server/errors";
import { calendarForToken, renewFeed } from "@/server/calendar/feeds";
import { antennaDayIcs, updateDay } from "@/server/services/antenna-days";
import { calendarEntries, calendarKinds } from "@/server/services/calendar";
import { requestBooking, stepBooking } from "@/server/services/lending";
import { createShift, signUp, updateShift } from "@/server/services/shifts";
import { createSlot } from "@/server/services/station-slots";
import { dipoleSlot, newDay } from "./antenna-day-helpers";
import { addAnalyser, addCoaxRun, clubTime, testSteward } from "./gear-helpers";
import { createPerson, scheduleSession } from "./helpers";
import { parseCalendar } from "./mail-helpers";

const DAY = 86_400_000;
const tokenOf = (url: string) => url.split("/").at(-1)!;

describe("the club calendar", () => {
  it("shows build sessions and the person's own loan due dates, each kind with its colour and legend entry", async () => {
    const { id: sessionId } = await scheduleSession({ capacity: 4, inDays: 12, title: "Calendar dipole evening" });
    const item = await addCoaxRun();
    const [member, other] = await Promise.all([createPerson("member"), createPerson("member")]);
    const { booking: mine } = await requestBooking(member, { itemId: item.id, startsAt: clubTime(10, 9), endsAt: clubTime(11, 17) });
    const { booking: theirs } = await requestBooking(other, { itemId: item.id, startsAt: clubTime(13, 9), endsAt: clubTime(13, 17) });

    const range = { from: new Date(Date.now()), to: new Date(Date.now() + 20 * DAY) };
    const entries = await calendarEntries(member, range);
    const session = entries.find((entry) => entry.id === `build-session:${sessionId}`);
    expect(session).toMatchObject({ kind: "build-session", title: "Build session: Calendar dipole evening", href: `/build-sessions/${sessionId}`, allDay: false });
    const loan = entries.find((entry) => entry.id === `loan-due:${mine.id}`);
    expect(loan).toMatchObject({ kind: "loan-due", href: `/lending#booking-${mine.id}`, end: mine.endsAt });
    expect(loan!.title).toMatch(/^Due back: CX-/);
    expect(entries.some((entry) => entry.id === `loan-due:${theirs.id}`)).toBe(false);
    // Sorted by start, as the list view shows them.
    expect(entries.map((entry) => entry.start)).toEqual([...entries.map((entry) => entry.start)].sort());

    const kinds = calendarKinds();
    expect(kinds.map((kind) => kind.kind)).toEqual(["antenna-day", "my-shift", "build-session", "loan-due"]);
    expect(new Set(kinds.map((kind) => kind.colour)).size).toBe(kinds.length);
    expect(new Set(kinds.map((kind) => kind.label)).size).toBe(kinds.length);
  });
});

describe("a person's private feed", () => {
  it("carries their antenna days, shifts and loans; SEQUENCE rises on every edit and cancellations turn CANCELLED", async () => {
    const coordinator = await createPerson("coordinator");
    const member = await createPerson("member");
    const day = await newDay(coordinator);
    const slot = await createSlot(coordinator, day.id, dipoleSlot("Twenty", 50, 60));
    const shift = await createShift(coordinator, slot.id, { startsAtLocal: "2031-06-14T10:00", endsAtLocal: "2031-06-14T12:00", capacity: 2 });
    await updateDay(coordinator, day.id, { status: "published" });
    await signUp(member, shift.id);
    const item = await addCoaxRun();
    const { booking: loan } = await requestBooking(member, { itemId: item.id, startsAt: clubTime(2, 9), endsAt: clubTime(4, 17) });
    const { booking: dropped } = await requestBooking(member, { itemId: item.id, startsAt: clubTime(6, 9), endsAt: clubTime(6, 17) });
    const token = tokenOf(await renewFeed(member));

    const read = async () => {
      const calendar = parseCalendar((await calendarForToken(token))!);
      const byUid = new Map(calendar.getAllSubcomponents("vevent").map((vevent) => [vevent.getFirstPropertyValue("uid") as string, vevent]));
      return { calendar, event: (uid: string) => byUid.get(uid)! };
    };
    const uids = { day: `antenna-day-${day.id}@guyline`, shift: `shift-${shift.id}@guyline`, loan: `loan-${loan.id}@guyline`, dropped: `loan-${dropped.id}@guyline` };
    const sequence = (vevent: ICAL.Component) => Number(vevent.getFirstPropertyValue("sequence"));
    const status = (vevent: ICAL.Component) => vevent.getFirstPropertyValue("status");

    const first = await read();
    for (const uid of Object.values(uids)) expect(first.event(uid), uid).toBeTruthy();
    // Source: RFC 5545 §3.2.19 (TZID names a VTIMEZONE in the same object) and §3.6.5 (VTIMEZONE).
    expect(first.calendar.getAllSubcomponents("vtimezone").map((zone) => zone.getFirstPropertyValue("tzid"))).toEqual(["Europe/London"]);
    expect(first.event(uids.shift).getFirstProperty("dtstart")!.getParameter("tzid")).toBe("Europe/London");
    expect((first.event(uids.shift).getFirstPropertyValue("dtstart") as ICAL.Time).toString()).toBe("2031-06-14T10:00:00");
    // Source: RFC 5545 §3.8.2.2 (DTEND after DTSTART): a loan's event ends at its due time.
    expect((first.event(uids.loan).getFirstPropertyValue("dtend") as ICAL.Time).toJSDate().toISOString()).toBe(loan.endsAt);
    for (const uid of Object.values(uids)) expect(status(first.event(uid)), uid).toBe("CONFIRMED");

    // Source: RFC 5545 §3.8.7.4 (SEQUENCE is incremented each time the event is revised).
    await updateDay(coordinator, day.id, { meetingPoint: "The north gate" });
    const afterDayEdit = await read();
    expect(sequence(afterDayEdit.event(uids.day))).toBe(sequence(first.event(uids.day)) + 1);
    // A shift follows its day: the day's change reaches the shift's event too.
    expect(sequence(afterDayEdit.event(uids.shift))).toBe(sequence(first.event(uids.shift)) + 1);
    await updateShift(coordinator, shift.id, { startsAtLocal: "2031-06-14T10:30", endsAtLocal: "2031-06-14T12:00", capacity: 2 });
    const afterShiftEdit = await read();
    expect(sequence(afterShiftEdit.event(uids.shift))).toBe(sequence(afterDayEdit.event(uids.shift)) + 1);
    expect((afterShiftEdit.event(uids.shift).getFirstPropertyValue("dtstart") as ICAL.Time).toString()).toBe("2031-06-14T10:30:00");
    await stepBooking(await testSteward(), loan.id, { action: "hand-out", condition: "good" });
    const afterHandOut = await read();
    expect(sequence(afterHandOut.event(uids.loan))).toBe(sequence(first.event(uids.loan)) + 1);

    // Source: RFC 5545 §3.8.1.11 (STATUS:CANCELLED), with the same UID (§3.8.4.7) and a higher SEQUENCE.
    await updateDay(coordinator, day.id, { status: "cancelled" });
    await stepBooking(member, dropped.id, { action: "cancel" });
    const last = await read();
    expect(status(last.event(uids.day))).toBe("CANCELLED");
    expect(status(last.event(uids.shift))).toBe("CANCELLED");
    expect(status(last.event(uids.dropped))).toBe("CANCELLED");
    expect(status(last.event(uids.loan))).toBe("CONFIRMED");
    expect(sequence(last.event(uids.day))).toBeGreaterThan(sequence(afterHandOut.event(uids.day)));
    expect(sequence(last.event(uids.shift))).toBeGreaterThan(sequence(afterHandOut.event(uids.shift)));
    expect(sequence(last.event(uids.dropped))).toBeGreaterThan(sequence(first.event(uids.dropped)));
  });

  it("leaves out drafts, other people's shifts and loans, and requests not yet approved", async () => {
    const coordinator = await createPerson("coordinator");
    const [member, other] = await Promise.all([createPerson("member"), createPerson("member")]);
    const draft = await newDay(coordinator);
    const item = await addCoaxRun();
    const { booking: theirs } = await requestBooking(other, { itemId: item.id, startsAt: clubTime(2, 9), endsAt: clubTime(2, 17) });
    const analyser = await addAnalyser();
    const { booking: waiting } = await requestBooking(member, { itemId: analyser.id, startsAt: clubTime(3, 9), endsAt: clubTime(3, 17) });
    expect(waiting.state).toBe("requested");
    const feed = (await calendarForToken(tokenOf(await renewFeed(member))))!;
    expect(feed).not.toContain(`antenna-day-${draft.id}@guyline`);
    expect(feed).not.toContain(`loan-${theirs.id}@guyline`);
    expect(feed).not.toContain(`loan-${waiting.id}@guyline`);
  });
});

describe("an antenna day's .ics download", () => {
  it("is for whoever may see the day: a draft is not found for members", async () => {
    const coordinator = await createPerson("coordinator");
    const member = await createPerson("member");
    const day = await newDay(coordinator);
    const missing = await antennaDayIcs(member, day.id).catch((error: unknown) => error);
    expect(missing).toBeInstanceOf(PublicError);
    expect((missing as PublicError).status).toBe(404);
    expect((await antennaDayIcs(coordinator, day.id)).filename).toBe("test-antenna-day.ics");
    await updateDay(coordinator, day.id, { status: "published" });
    const file = await antennaDayIcs(member, day.id);
    expect(parseCalendar(file.content).getFirstSubcomponent("vevent")!.getFirstPropertyValue("uid")).toBe(`antenna-day-${day.id}@guyline`);
  });
});
