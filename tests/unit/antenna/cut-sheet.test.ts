import { describe, expect, it } from "vitest";
import { cutSheet, feetAndInches, wrapAllowanceM } from "@/lib/antenna/cut-sheet";

describe("feet and inches to the nearest 1/8 in", () => {
  // 1 in = 25.4 mm exactly (the international inch)
  it.each([
    [10.1727, "33 ft 4 1/2 in"],
    [10.16, "33 ft 4 in"],
    [0.3048, "1 ft 0 in"],
    [0.0254 * 9.375, "9 3/8 in"],
    [0.0254 * (12 * 16 + 11.75), "16 ft 11 3/4 in"],
    [0.0254 * 11.97, "1 ft 0 in"],
    [0.0254 * 0.0624, "0 in"],
    [0.0254 * 0.0626, "1/8 in"],
    [0.0254 * (12 * 33 + 0.5), "33 ft 1/2 in"],
  ])("%f m is %s", (metres, expected) => {
    expect(feetAndInches(metres)).toBe(expected);
  });
});

describe("cut sheet", () => {
  it("adds a wrap allowance at both ends of every piece (common practice: 15 cm, or 5 % of a short piece)", () => {
    // common practice
    expect(wrapAllowanceM(5)).toBe(0.15);
    expect(wrapAllowanceM(0.5)).toBeCloseTo(0.025, 9);
    const sheet = cutSheet([
      { label: "Leg", count: 2, electricalLengthM: 5.0123, ruleOfThumbM: 5.035 },
      { label: "Radial", count: 4, electricalLengthM: 0.48 },
    ]);
    expect(sheet.lines[0]).toMatchObject({
      label: "Leg",
      count: 2,
      electricalLengthM: 5.012,
      wrapPerEndM: 0.15,
      cutLengthM: 5.312,
      cutLength: "17 ft 5 1/8 in",
      ruleOfThumbM: 5.035,
    });
    expect(sheet.lines[1].wrapPerEndM).toBe(0.024);
    expect(sheet.lines[1].cutLengthM).toBe(0.528);
    expect(sheet.totalWireM).toBeCloseTo(2 * 5.312 + 4 * 0.528, 9);
    expect(sheet.wrapNote).toMatch(/15 cm/);
  });
});
