import { describe, expect, it } from "vitest";
import { REMINDER_HOUR, clubDaysSince, reminderWindow } from "@/lib/mail/reminder-clock";

describe("when reminders go out", () => {
  it("waits for the reminder hour on the club's clock", () => {
    // Source: IANA Time Zone Database, Europe/London (BST = UTC+1 in June). 07:59Z is 08:59 BST.
    expect(REMINDER_HOUR).toBe(9);
    expect(reminderWindow(new Date("2026-06-12T07:59:00Z"), "Europe/London")).toBeNull();
    expect(reminderWindow(new Date("2026-06-12T08:00:00Z"), "Europe/London")?.date).toBe("2026-06-13");
  });

  it("covers tomorrow from local midnight to local midnight", () => {
    // Source: IANA Time Zone Database, Europe/London (BST = UTC+1 in June): local midnight is 23:00Z the day before.
    const window = reminderWindow(new Date("2026-06-12T15:00:00Z"), "Europe/London")!;
    expect(window.from.toISOString()).toBe("2026-06-12T23:00:00.000Z");
    expect(window.to.toISOString()).toBe("2026-06-13T23:00:00.000Z");
  });

  it("makes the day of the spring change 23 hours long and the autumn one 25", () => {
    // Source: IANA Time Zone Database, Europe/London: clocks go forward on 29 March 2026 and
    // back on 25 October 2026, at 01:00 UTC.
    const spring = reminderWindow(new Date("2026-03-28T12:00:00Z"), "Europe/London")!;
    expect(spring.date).toBe("2026-03-29");
    expect((spring.to.getTime() - spring.from.getTime()) / 3_600_000).toBe(23);
    const autumn = reminderWindow(new Date("2026-10-24T12:00:00Z"), "Europe/London")!;
    expect((autumn.to.getTime() - autumn.from.getTime()) / 3_600_000).toBe(25);
  });

  it("uses the club's zone, not the server's", () => {
    // Source: IANA Time Zone Database, Pacific/Auckland (NZST = UTC+12 in June).
    const window = reminderWindow(new Date("2026-06-12T21:30:00Z"), "Pacific/Auckland")!;
    expect(window.date).toBe("2026-06-14");
    expect(window.from.toISOString()).toBe("2026-06-13T12:00:00.000Z");
  });

  it("names today's date on the club's clock, for reminders sent once a day", () => {
    // Source: IANA Time Zone Database, Pacific/Auckland (NZST = UTC+12 in June): 21:30Z on the 12th is 09:30 on the 13th.
    const window = reminderWindow(new Date("2026-06-12T21:30:00Z"), "Pacific/Auckland")!;
    expect(window.today).toBe("2026-06-13");
    expect(window.timeZone).toBe("Pacific/Auckland");
  });
});

describe("days on the club's calendar", () => {
  it("count dates, not 24-hour periods, in the club's zone", () => {
    // Source: IANA Time Zone Database, Europe/London (BST = UTC+1 in June). 22:30Z on the 10th is 23:30 BST the same date.
    expect(clubDaysSince(new Date("2026-06-10T22:30:00Z"), "2026-06-11", "Europe/London")).toBe(1);
    // 23:30Z on the 10th is already 00:30 BST on the 11th.
    expect(clubDaysSince(new Date("2026-06-10T23:30:00Z"), "2026-06-11", "Europe/London")).toBe(0);
    expect(clubDaysSince(new Date("2026-06-01T12:00:00Z"), "2026-06-11", "Europe/London")).toBe(10);
  });

  it("are whole days across a daylight-saving change", () => {
    // Source: IANA Time Zone Database, Europe/London: clocks go forward on 29 March 2026.
    expect(clubDaysSince(new Date("2026-03-28T12:00:00Z"), "2026-03-30", "Europe/London")).toBe(2);
  });
});
