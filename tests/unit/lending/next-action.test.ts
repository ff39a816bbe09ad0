// The next action offered on an item page and behind its QR label.
// Source: Guyline issue 5, item 6 ("opening that link on a phone offers the right next action
// (request, hand out, take back) to the user's role").
import { describe, expect, it } from "vitest";
import { nextActionFor, type ItemBookingFacts, type ViewerFacts } from "@/lib/lending/next-action";

const now = new Date("2026-06-13T08:00:00Z");
const hours = (h: number) => new Date(now.getTime() + h * 3_600_000);
const booking = (over: Partial<ItemBookingFacts>): ItemBookingFacts => ({
  id: "b1",
  state: "approved",
  borrowerId: "member",
  startsAt: hours(1),
  endsAt: hours(9),
  coSignRequired: false,
  coSigned: false,
  ...over,
});
const steward: ViewerFacts = { id: "steward", managesLoans: true, mayRequest: true, mayCoSign: true };
const member: ViewerFacts = { id: "member", managesLoans: false, mayRequest: true, mayCoSign: false };
const mentor: ViewerFacts = { id: "mentor", managesLoans: false, mayRequest: true, mayCoSign: true };
const item = { retired: false, requestNeedsCoSign: false };

describe("the next action for an item", () => {
  it("offers a steward take-back while it is out, hand-out when a booking starts soon, request otherwise", () => {
    expect(nextActionFor(steward, item, [booking({ state: "out" })], now)).toEqual({ kind: "take-back", bookingId: "b1" });
    expect(nextActionFor(steward, item, [booking({})], now)).toEqual({ kind: "hand-out", bookingId: "b1" });
    expect(nextActionFor(steward, item, [booking({ startsAt: hours(72), endsAt: hours(80) })], now)).toEqual({ kind: "request", needsCoSign: false });
  });

  it("offers the borrower return while out, and tells them to collect an approved booking", () => {
    expect(nextActionFor(member, item, [booking({ state: "out" })], now)).toEqual({ kind: "return", bookingId: "b1" });
    expect(nextActionFor(member, item, [booking({})], now)).toEqual({ kind: "collect", bookingId: "b1" });
    expect(nextActionFor(member, item, [booking({ state: "requested" })], now)).toEqual({ kind: "awaiting", bookingId: "b1", awaitingCoSign: false });
  });

  it("offers a mentor the co-sign of someone else's waiting request", () => {
    const waiting = booking({ state: "requested", borrowerId: "newcomer", coSignRequired: true });
    expect(nextActionFor(mentor, item, [waiting], now)).toEqual({ kind: "co-sign", bookingId: "b1" });
    expect(nextActionFor(member, item, [waiting], now)).toEqual({ kind: "request", needsCoSign: false });
  });

  it("says when nothing can be done", () => {
    expect(nextActionFor(member, { retired: true, requestNeedsCoSign: false }, [], now)).toMatchObject({ kind: "none" });
    expect(nextActionFor({ ...member, mayRequest: false }, item, [], now)).toMatchObject({ kind: "none" });
    expect(nextActionFor(member, { retired: false, requestNeedsCoSign: true }, [], now)).toEqual({ kind: "request", needsCoSign: true });
  });
});
