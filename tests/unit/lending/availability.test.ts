// Free time, the next free time and waitlist offers. Intervals are half-open like PostgreSQL's
// default tstzrange: Source: PostgreSQL 15 documentation, §8.17 Range Types ("[)" bounds, &&).
// The rest are Guyline's own rules (issue 5, "Lending desk"), checked on hand-worked cases.
import { describe, expect, it } from "vitest";
import { isDueSoon, isFree, isOverdue, nextFreeStart, offerExpiry, overlaps, pickOffers, rangeProblem } from "@/lib/lending/availability";

const at = (hour: number, day = 13) => new Date(Date.UTC(2026, 5, day, hour));
const span = (start: number, end: number) => ({ start: at(start), end: at(end) });

describe("overlaps", () => {
  it("treats touching ends as free, like PostgreSQL's [) ranges", () => {
    expect(overlaps(span(9, 12), span(12, 15))).toBe(false);
    expect(overlaps(span(9, 12), span(11, 15))).toBe(true);
    expect(overlaps(span(9, 17), span(10, 11))).toBe(true);
  });
});

describe("the next free time", () => {
  const busy = [span(9, 12), span(13, 15), span(15, 18)];

  it("is the wanted start when that is free", () => {
    expect(nextFreeStart(busy, span(6, 9))).toEqual(at(6));
    expect(isFree(busy, span(12, 13))).toBe(true);
  });

  it("skips past every booking the wanted length does not fit between", () => {
    // 2 hours wanted from 10:00: 12–13 is only 1 hour, 13–18 is booked solid, so 18:00.
    expect(nextFreeStart(busy, span(10, 12))).toEqual(at(18));
    // 1 hour fits between 12:00 and 13:00.
    expect(nextFreeStart(busy, span(10, 11))).toEqual(at(12));
  });
});

describe("wanted ranges", () => {
  const now = at(8);
  it("refuses ends before starts, times already over and very long bookings", () => {
    expect(rangeProblem(span(12, 10), now)).toMatch(/end must come after/);
    expect(rangeProblem(span(6, 7), now)).toMatch(/already over/);
    expect(rangeProblem({ start: at(9), end: at(9, 13 + 61) }, now)).toMatch(/at most 60 days/);
    expect(rangeProblem(span(9, 17), now)).toBeNull();
  });
});

describe("overdue and due soon", () => {
  it("marks only loans that are out past their end", () => {
    expect(isOverdue({ state: "out", endsAt: at(12) }, at(13))).toBe(true);
    expect(isOverdue({ state: "approved", endsAt: at(12) }, at(13))).toBe(false);
    expect(isOverdue({ state: "out", endsAt: at(14) }, at(13))).toBe(false);
    expect(isDueSoon({ state: "out", endsAt: at(14) }, at(13))).toBe(true);
    expect(isDueSoon({ state: "out", endsAt: at(12, 20) }, at(13))).toBe(false);
  });
});

describe("waitlist offers", () => {
  it("lasts a day, or until the wanted time starts, but at least an hour", () => {
    expect(offerExpiry(at(8), at(12, 20))).toEqual(at(8, 14));
    expect(offerExpiry(at(8), at(12))).toEqual(at(12));
    expect(offerExpiry(at(8), at(8))).toEqual(at(9));
  });

  it("goes to people in the order they joined, each holding their time against the next", () => {
    const waiting = [
      { id: "late", ...span(10, 11), createdAt: at(3) },
      { id: "first", ...span(9, 12), createdAt: at(1) },
      { id: "second", ...span(14, 16), createdAt: at(2) },
      { id: "clash", ...span(15, 17), createdAt: at(4) },
      { id: "over", ...span(5, 6), createdAt: at(0) },
    ];
    expect(pickOffers(waiting, [span(15, 18)], at(8))).toEqual({ offer: ["first"], stale: ["over"] });
    expect(pickOffers(waiting, [], at(8))).toEqual({ offer: ["first", "second"], stale: ["over"] });
  });
});
