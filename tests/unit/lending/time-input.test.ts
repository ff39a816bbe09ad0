// Booking times typed in the club's time zone.
// Source: IANA Time Zone Database, zone Europe/London (GMT, UTC+0, in winter; BST, UTC+1, from
// the last Sunday of March to the last Sunday of October).
import { describe, expect, it } from "vitest";
import { timeInputPattern, timeInputToInstant } from "@/lib/lending/time-input";

describe("booking time input", () => {
  it("reads a wall-clock time in the club's zone, summer and winter", () => {
    expect(timeInputToInstant("2026-06-13T09:00", "Europe/London").toISOString()).toBe("2026-06-13T08:00:00.000Z");
    expect(timeInputToInstant("2026-12-12T09:00", "Europe/London").toISOString()).toBe("2026-12-12T09:00:00.000Z");
  });

  it("takes a time with an offset as the instant it names", () => {
    expect(timeInputToInstant("2026-06-13T09:00+02:00", "Europe/London").toISOString()).toBe("2026-06-13T07:00:00.000Z");
    expect(timeInputToInstant("2026-06-13T09:00Z", "Europe/London").toISOString()).toBe("2026-06-13T09:00:00.000Z");
  });

  it("accepts only date-and-time shapes", () => {
    expect(timeInputPattern.test("2026-06-13T09:00")).toBe(true);
    expect(timeInputPattern.test("2026-06-13")).toBe(false);
    expect(timeInputPattern.test("13/06/2026 09:00")).toBe(false);
  });
});
