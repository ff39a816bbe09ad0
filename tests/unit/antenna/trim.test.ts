import { describe, expect, it } from "vitest";
import { EngineInputError } from "@/lib/antenna/problems";
import { ruleOfThumbLength, trim } from "@/lib/antenna/trim";
import { DIPOLE_14_2, TEST_SITE } from "../../fixtures/plan-requests";

describe("trimming from a measured resonance", () => {
  it("scales the length by f_measured / f_target: 10.20 m at 13.90 MHz becomes 9.985 m for 14.20 MHz (common practice)", () => {
    // common practice: L ∝ 1/f (reference-data.md §8 worked example)
    expect(ruleOfThumbLength(10.2, 13.9, 14.2)).toBeCloseTo(9.985, 3);
  });

  it("takes 0.215 m off in all, half from each leg's end, cutting half of that first (common practice)", () => {
    // common practice
    const result = trim({ plan: DIPOLE_14_2, builtLengthsM: [10.2], measuredMHz: [13.9] });
    expect(result.elements[0].ruleLengthM).toBeCloseTo(9.985, 3);
    const [legs] = result.rule;
    expect(legs.count).toBe(2);
    expect(legs.lengthM).toBeCloseTo(5.1, 9);
    expect(legs.count * legs.changeM).toBeCloseTo(-0.215, 3);
    expect(legs.firstStepM).toBeCloseTo(legs.changeM / 2, 5);
    expect(result.advice[0]).toMatch(/take 5\.\d cm off the outer end first \(half of 1[01]\.\d cm\)/);
    expect(result.advice.join(" ")).toMatch(/Cut half the change first and measure again/);
  });

  it("re-solves the geometry for the engine's answer, which agrees with the rule for a dipole well above ground within 0.5 %", () => {
    // common practice: the 1/f rule holds well when nothing but the length changes
    const result = trim({ plan: DIPOLE_14_2, builtLengthsM: [10.2], measuredMHz: [13.9] });
    const [element] = result.elements;
    expect(element.modelMHz).not.toBeNull();
    expect(element.engineLengthM).not.toBeNull();
    expect(Math.abs((element.engineLengthM as number) / element.ruleLengthM - 1)).toBeLessThan(0.005);
    expect(result.engine?.[0].changeM).toBeLessThan(0);
  });

  it("advises adding wire from the wrap when the antenna resonates high", () => {
    const result = trim({ plan: DIPOLE_14_2, builtLengthsM: [10.2], measuredMHz: [14.6] });
    expect(result.engine?.[0].changeM).toBeGreaterThan(0);
    expect(result.advice[0]).toMatch(/add .* cm by unfolding wire from the wrap/);
  });

  it("starts from the plan's own lengths when none are given, and trims each fan element for its own band", () => {
    const result = trim({ plan: { family: "fan-dipole", bands: ["40m", "20m"], ...TEST_SITE }, measuredMHz: [7.0, 14.3] });
    expect(result.elements.map((element) => element.band)).toEqual(["40m", "20m"]);
    expect(result.engine?.[0].changeM).toBeLessThan(0);
    expect(result.engine?.[1].changeM).toBeGreaterThan(0);
    for (const element of result.elements) {
      expect(element.modelMHz as number).toBeCloseTo(element.targetMHz, 1);
    }
  });

  it("trims an end-fed half-wave by its SWR dip", () => {
    const result = trim({ plan: { family: "end-fed", band: "40m", ...TEST_SITE }, measuredMHz: [6.95] });
    expect(result.elements[0].modelMHz).not.toBeNull();
    expect(result.engine?.map((piece) => piece.label)).toEqual(["Radiator", "Counterpoise"]);
    expect(result.engine?.[0].changeM).toBeLessThan(0);
    expect(result.engine?.[1].changeM).toBe(0);
  });
});

function problemsOf(request: unknown): string[] {
  try {
    trim(request);
  } catch (error) {
    if (error instanceof EngineInputError) return error.problems;
    throw error;
  }
  throw new Error("the trim accepted bad input");
}

describe("bad trim requests give `path: message`", () => {
  it.each([
    ["a bad plan inside", { plan: { family: "dipole", band: "11m", ...TEST_SITE }, measuredMHz: [27] }, ['plan.band: "11m" is not an amateur band in Region 1']],
    ["no measurement", { plan: DIPOLE_14_2, measuredMHz: [] }, ["measuredMHz: must give at least one measured resonance"]],
    ["one measurement for two elements", { plan: { family: "fan-dipole", bands: ["40m", "20m"], ...TEST_SITE }, measuredMHz: [7.0] }, ["measuredMHz: must give 2 values, one per element"]],
    ["a measurement far from the band", { plan: DIPOLE_14_2, measuredMHz: [7.1] }, ["measuredMHz[0]: 7.1 MHz is far from the element's 14.2 MHz; check the sweep is of this antenna"]],
    ["a length in feet", { plan: DIPOLE_14_2, builtLengthsM: [33.5], measuredMHz: [14.1] }, ["builtLengthsM[0]: 33.5 m is far from this element's rule-of-thumb 10.0455 m; check it is the whole element in metres"]],
    ["a negative length", { plan: DIPOLE_14_2, builtLengthsM: [-1], measuredMHz: [14.1] }, ["builtLengthsM[0]: must be greater than 0"]],
  ] as const)("%s", (_name, request, expected) => {
    expect(problemsOf(request)).toEqual(expected);
  });
});
