import { describe, expect, it } from "vitest";
import { formatInZone, instantToDate, instantToWallTime, wallTimeToInstant } from "@/lib/time";

describe("club time zone conversions", () => {
  it("turns a wall-clock time into the right instant in summer and winter", () => {
    // Source: IANA Time Zone Database, Europe/London (GMT in winter, BST = UTC+1 in summer).
    expect(wallTimeToInstant("2026-06-13T09:00", "Europe/London").toISOString()).toBe("2026-06-13T08:00:00.000Z");
    expect(wallTimeToInstant("2026-12-05T09:00", "Europe/London").toISOString()).toBe("2026-12-05T09:00:00.000Z");
    // Source: IANA Time Zone Database, America/Denver (MDT = UTC-6 in summer).
    expect(wallTimeToInstant("2026-06-13T09:00", "America/Denver").toISOString()).toBe("2026-06-13T15:00:00.000Z");
  });

  it("moves a time in the spring-forward gap forward, as RFC 5545 asks", () => {
    // Source: RFC 5545 §3.3.5 (a local time in a gap is taken with the offset before the gap);
    // Europe/London skips 01:00–02:00 on 29 March 2026 (IANA Time Zone Database).
    expect(wallTimeToInstant("2026-03-29T01:30", "Europe/London").toISOString()).toBe("2026-03-29T01:30:00.000Z");
    expect(instantToWallTime(new Date("2026-03-29T01:30:00Z"), "Europe/London")).toBe("2026-03-29T02:30");
  });

  it("reads an instant back on the wall clock and as a date", () => {
    // Source: IANA Time Zone Database, Europe/London: BST (UTC+1) ends on 25 October 2026 at 01:00 UTC, so
    // 23:30Z on the 24th is still BST, 00:30 on the 25th.
    const instant = new Date("2026-10-24T23:30:00Z");
    expect(instantToWallTime(instant, "Europe/London")).toBe("2026-10-25T00:30");
    expect(instantToDate(instant, "Europe/London")).toBe("2026-10-25");
    expect(formatInZone(instant, "Europe/London", "time")).toBe("00:30");
  });
});
