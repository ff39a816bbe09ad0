import ICAL from "ical.js";
import { describe, expect, it } from "vitest";
import { LOAN_RETURN_MINUTES, antennaDayEvent, buildSessionEvent, loanDueEvent, shiftEvent } from "@/lib/calendar/events";
import { buildCalendar, icsFileName } from "@/lib/calendar/ics";

const base = { title: "Build a 40 m end-fed", place: "Hall", mentorNames: ["Ada"], cancelled: false, sequence: 0, updatedAt: new Date("2026-02-01T10:00:00Z") };

function parse(ics: string) {
  const calendar = new ICAL.Component(ICAL.parse(ics));
  for (const zone of calendar.getAllSubcomponents("vtimezone")) ICAL.TimezoneService.register(zone);
  return calendar;
}

describe("iCalendar files", () => {
  it("keep the wall-clock time on both sides of a daylight-saving change", () => {
    // Source: RFC 5545 §3.3.5 (DATE-TIME with a TZID is local time in that zone) and §3.6.5
    // (VTIMEZONE); IANA Time Zone Database, Europe/London (BST from 29 March 2026, 01:00 UTC).
    const before = buildSessionEvent({ ...base, id: "a", startsAt: new Date("2026-03-21T10:00:00Z"), endsAt: new Date("2026-03-21T13:00:00Z") }, "https://g.example");
    const after = buildSessionEvent({ ...base, id: "b", startsAt: new Date("2026-04-04T09:00:00Z"), endsAt: new Date("2026-04-04T12:00:00Z") }, "https://g.example");
    const across = buildSessionEvent({ ...base, id: "c", startsAt: new Date("2026-03-28T18:00:00Z"), endsAt: new Date("2026-03-29T09:00:00Z") }, "https://g.example");
    const ics = buildCalendar({ name: "Test", timeZone: "Europe/London", events: [before, after, across] });
    const vevents = parse(ics).getAllSubcomponents("vevent");
    expect(vevents.map((vevent) => vevent.getFirstProperty("dtstart")!.getParameter("tzid"))).toEqual(["Europe/London", "Europe/London", "Europe/London"]);
    const events = vevents.map((component) => new ICAL.Event(component));
    expect(events.map((event) => event.startDate.toString())).toEqual(["2026-03-21T10:00:00", "2026-04-04T10:00:00", "2026-03-28T18:00:00"]);
    expect(events.every((event) => event.startDate.zone.tzid === "Europe/London")).toBe(true);
    expect(events.map((event) => event.startDate.toJSDate().toISOString())).toEqual([
      "2026-03-21T10:00:00.000Z",
      "2026-04-04T09:00:00.000Z",
      "2026-03-28T18:00:00.000Z",
    ]);
    // The night of the change has one hour less: 18:00 GMT to 10:00 BST is 15 hours.
    expect(events[2].endDate.toString()).toBe("2026-03-29T10:00:00");
    expect(events[2].endDate.toJSDate().getTime() - events[2].startDate.toJSDate().getTime()).toBe(15 * 3_600_000);
  });

  it("write DTSTAMP in UTC, a stable UID, the SEQUENCE and STATUS", () => {
    // Source: RFC 5545 §3.8.7.2 (DTSTAMP in UTC), §3.8.4.7 (UID), §3.8.7.4 (SEQUENCE), §3.8.1.11 (STATUS).
    const day = antennaDayEvent(
      { id: "d1", name: "Summer day", startsAt: new Date("2026-06-13T08:00:00Z"), endsAt: new Date("2026-06-13T16:00:00Z"), siteName: "Field", summary: null, cancelled: true, sequence: 3, updatedAt: new Date("2026-06-01T12:00:00Z") },
      "https://g.example",
    );
    const ics = buildCalendar({ name: "Test", timeZone: "Europe/London", events: [day] });
    const vevent = parse(ics).getFirstSubcomponent("vevent")!;
    expect(vevent.getFirstPropertyValue("uid")).toBe("antenna-day-d1@guyline");
    expect(vevent.getFirstPropertyValue("sequence")).toBe(3);
    expect(vevent.getFirstPropertyValue("status")).toBe("CANCELLED");
    expect(ics).toMatch(/\r\nDTSTAMP:20260601T120000Z\r\n/);
    expect(ics).toMatch(/\r\nDTSTART;TZID=Europe\/London:20260613T090000\r\n/);
  });

  it("give a shift of a cancelled day STATUS:CANCELLED, its own UID and the sequence it is given", () => {
    // Source: RFC 5545 §3.8.1.11 (STATUS:CANCELLED), §3.8.4.7 (UID), §3.8.7.4 (SEQUENCE).
    const shift = shiftEvent(
      {
        id: "s1",
        dayId: "d1",
        dayName: "Summer day",
        slotId: "t1",
        stationName: "Station 2",
        bands: ["40m"],
        startsAt: new Date("2026-06-13T08:00:00Z"),
        endsAt: new Date("2026-06-13T10:00:00Z"),
        siteName: "Field",
        cancelled: true,
        sequence: 5,
        updatedAt: new Date("2026-06-02T12:00:00Z"),
      },
      "https://g.example",
    );
    const vevent = parse(buildCalendar({ name: "Test", timeZone: "Europe/London", events: [shift] })).getFirstSubcomponent("vevent")!;
    expect(vevent.getFirstPropertyValue("uid")).toBe("shift-s1@guyline");
    expect(vevent.getFirstPropertyValue("sequence")).toBe(5);
    expect(vevent.getFirstPropertyValue("status")).toBe("CANCELLED");
    expect(vevent.getFirstPropertyValue("url")).toBe("https://g.example/antenna-days/d1#slot-t1");
  });

  it("end a loan's due-date event at the due time, after its start", () => {
    // Source: RFC 5545 §3.8.2.2 (DTEND of a VEVENT is later than DTSTART).
    const loan = loanDueEvent(
      { bookingId: "b1", itemLabelCode: "AN-01", itemName: "Analyser", dueAt: new Date("2026-06-14T17:00:00Z"), cancelled: false, sequence: 2, updatedAt: new Date("2026-06-01T12:00:00Z"), location: "Shed" },
      "https://g.example",
    );
    const event = new ICAL.Event(parse(buildCalendar({ name: "Test", timeZone: "Europe/London", events: [loan] })).getFirstSubcomponent("vevent")!);
    expect(event.uid).toBe("loan-b1@guyline");
    expect(event.endDate.toString()).toBe("2026-06-14T18:00:00");
    expect(event.endDate.toJSDate().getTime() - event.startDate.toJSDate().getTime()).toBe(LOAN_RETURN_MINUTES * 60_000);
    expect(event.summary).toBe("Due back: AN-01 Analyser");
  });

  it("names the file after the event", () => {
    expect(icsFileName("Build a 20 m dipole!")).toBe("build-a-20-m-dipole.ics");
    expect(icsFileName("???")).toBe("event.ics");
  });
});
