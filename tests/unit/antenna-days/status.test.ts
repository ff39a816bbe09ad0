// The life of an antenna day (Guyline's own rules, issue 4: draft → published → done, or cancelled).
import { describe, expect, it } from "vitest";
import { availableTransitions, isDeletable, isEditable, transitionProblem } from "@/lib/antenna-days/status";

const day = { startsAt: new Date("2027-05-15T08:00:00Z"), endsAt: new Date("2027-05-15T16:00:00Z") };
const before = new Date("2027-05-01T12:00:00Z");
const during = new Date("2027-05-15T12:00:00Z");
const after = new Date("2027-05-16T12:00:00Z");

describe("antenna day status", () => {
  it("publishes a draft that has not ended, and cancels drafts and published days", () => {
    expect(transitionProblem("draft", "published", day, before)).toBeNull();
    expect(transitionProblem("draft", "cancelled", day, before)).toBeNull();
    expect(transitionProblem("published", "cancelled", day, during)).toBeNull();
  });

  it("refuses to publish a day that has already ended", () => {
    expect(transitionProblem("draft", "published", day, after)).toMatch(/already ended/);
  });

  it("marks a published day done only after it has ended", () => {
    expect(transitionProblem("published", "done", day, during)).toMatch(/only after it has ended/);
    expect(transitionProblem("published", "done", day, after)).toBeNull();
  });

  it("does not skip or go back", () => {
    expect(transitionProblem("draft", "done", day, after)).toMatch(/draft day cannot become done/);
    expect(transitionProblem("published", "draft", day, before)).toMatch(/cannot become draft/);
    expect(transitionProblem("draft", "draft", day, before)).toMatch(/already draft/);
  });

  it("keeps done and cancelled days final", () => {
    for (const to of ["draft", "published", "cancelled"] as const) expect(transitionProblem("done", to, day, after)).toMatch(/cannot change any more/);
    for (const to of ["draft", "published", "done"] as const) expect(transitionProblem("cancelled", to, day, after)).toMatch(/cannot change any more/);
  });

  it("offers only the moves that would succeed now", () => {
    expect(availableTransitions("draft", day, before)).toEqual(["published", "cancelled"]);
    expect(availableTransitions("draft", day, after)).toEqual(["cancelled"]);
    expect(availableTransitions("published", day, during)).toEqual(["cancelled"]);
    expect(availableTransitions("published", day, after)).toEqual(["done", "cancelled"]);
    expect(availableTransitions("done", day, after)).toEqual([]);
  });

  it("edits drafts and published days, deletes only drafts", () => {
    expect([isEditable("draft"), isEditable("published"), isEditable("done"), isEditable("cancelled")]).toEqual([true, true, false, false]);
    expect([isDeletable("draft"), isDeletable("published")]).toEqual([true, false]);
  });
});
