// The action wrapper's answer to a thrown error (src/server/action.ts); the rule is the project's own design.
import { describe, expect, it, vi } from "vitest";
import { badInput, conflict } from "@/server/errors";

vi.mock("@/server/session", () => ({ getViewer: async () => null }));
const { failure } = await import("@/server/action");

describe("failure", () => {
  it("passes a PublicError's details on as data, so a form can offer the next free time", () => {
    const details = { nextFreeStart: "2026-05-02T08:00:00.000Z", nextFreeEnd: "2026-05-02T12:00:00.000Z" };
    expect(failure(conflict("That time is taken.", details))).toEqual({ ok: false, message: "That time is taken.", data: details });
  });

  it("puts a message on its field and adds no data when the error has none", () => {
    expect(failure(badInput("endsAt", "End after the start."))).toEqual({ ok: false, fieldErrors: { endsAt: "End after the start." } });
  });
});
