import { describe, expect, it } from "vitest";
import { REMINDER_HOUR, reminderWindow } from "@/lib/mail/reminder-clock";

describe("when reminders go out", () => {
  it("waits for the reminder hour on the club's clock", () => {
    // Source: IANA Time Zone Database, Europe/London (BST = UTC+1 in June). 07:59Z is 08:59 BST.
    expect(REMINDER_HOUR).toBe(9);
    expect(reminderWindow(new Date("2026-06-12T07:59:00Z"), "Europe/London")).toBeNull();
    expect(reminderWindow(new Date("2026-06-12T08:00:00Z"), "Europe/London")?.date).toBe("2026-06-13");
  });

  it("covers tomorrow from local midnight to local midnight", () => {
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
});
