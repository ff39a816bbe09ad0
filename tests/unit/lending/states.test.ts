// The booking state machine. Source: Guyline issue 5 ("Gear shelf and lending desk"), item 2:
// states requested, approved, out, returned, declined, cancelled, lost; newcomers borrow an
// analyser only with a mentor's co-sign.
import { describe, expect, it } from "vitest";
import { allowedActions, bookingStates, holdsTime, releasesTime, transition, type BookingState } from "@/lib/lending/states";

const booking = (state: BookingState, coSign: { required?: boolean; done?: boolean } = {}) => ({
  state,
  coSignRequired: coSign.required ?? false,
  coSigned: coSign.done ?? false,
});

describe("booking transitions", () => {
  it("allows exactly the steps of the lending desk from each state", () => {
    const expected: Record<BookingState, string[]> = {
      requested: ["approve", "decline", "cancel"],
      approved: ["decline", "hand-out", "cancel"],
      out: ["return", "mark-lost"],
      returned: [],
      declined: [],
      cancelled: [],
      lost: ["return"],
    };
    for (const state of bookingStates) expect(allowedActions(booking(state))).toEqual(expected[state]);
  });

  it("moves a loan from request to return", () => {
    expect(transition(booking("requested"), "approve")).toEqual({ ok: true, to: "approved" });
    expect(transition(booking("approved"), "hand-out")).toEqual({ ok: true, to: "out" });
    expect(transition(booking("out"), "return")).toEqual({ ok: true, to: "returned" });
    expect(transition(booking("out"), "mark-lost")).toEqual({ ok: true, to: "lost" });
    expect(transition(booking("lost"), "return")).toEqual({ ok: true, to: "returned" });
  });

  it("refuses a step the state does not allow, saying why", () => {
    const result = transition(booking("returned"), "hand-out");
    expect(result).toEqual({ ok: false, message: "A booking that is returned cannot be handed out." });
    expect(transition(booking("requested"), "hand-out").ok).toBe(false);
    expect(transition(booking("out"), "cancel").ok).toBe(false);
  });

  it("needs a co-sign before a newcomer's analyser request can be approved", () => {
    const waiting = booking("requested", { required: true });
    expect(transition(waiting, "approve")).toMatchObject({ ok: false, message: expect.stringMatching(/mentor has to co-sign/) });
    expect(allowedActions(waiting)).toEqual(["decline", "cancel", "co-sign"]);
    expect(transition(waiting, "co-sign")).toEqual({ ok: true, to: "requested" });
    const coSigned = booking("requested", { required: true, done: true });
    expect(transition(coSigned, "approve")).toEqual({ ok: true, to: "approved" });
    expect(transition(coSigned, "co-sign").ok).toBe(false);
    expect(transition(booking("requested"), "co-sign")).toMatchObject({ ok: false, message: "This request does not need a co-sign." });
  });

  it("holds time only while approved or out, and releases it when that ends", () => {
    expect(bookingStates.filter(holdsTime)).toEqual(["approved", "out"]);
    expect(releasesTime("approved", "cancelled")).toBe(true);
    expect(releasesTime("approved", "declined")).toBe(true);
    expect(releasesTime("out", "returned")).toBe(true);
    expect(releasesTime("approved", "out")).toBe(false);
    expect(releasesTime("requested", "cancelled")).toBe(false);
  });
});
