import { describe, expect, it } from "vitest";
import { plan, planRequestSchema } from "@/lib/antenna";
import { antennaSummaryOf, outlineOfPlan, slotExposureDistanceM } from "@/lib/antenna-days/antenna-outline";

const site = { region: 1, ground: "average", feedline: { type: "rg213", lengthM: 30 }, transmitter: { powerW: 100, mode: "ssb" }, wireDiameterMm: 2 } as const;

describe("the outline of a computed antenna", () => {
  it("lays a dipole's two halves either side of the mast, spanning its tuned length", () => {
    const result = plan(planRequestSchema.parse({ ...site, family: "dipole", band: "20m", heightM: 10 }));
    const outline = outlineOfPlan(result, 1);
    const length = result.elements[0].lengthM;
    expect(outline.arms.map((arm) => Math.round(arm.offsetDeg)).sort((a, b) => a - b)).toEqual([0, 180]);
    for (const arm of outline.arms) expect(arm.lengthM).toBeCloseTo(length / 2, 6);
    expect(outline.mastHeightM).toBe(10);
    // common practice: the half-wave rule 468/f ft = 143/f m, about 10.1 m at the 20 m band centre; the tuned wire is within 5 %.
    expect(length).toBeGreaterThan(0.95 * (142.65 / 14.175));
    expect(length).toBeLessThan(1.05 * (142.65 / 14.175));
  });

  it("draws a vertical's radials around the mast and counts the radiator in the mast height", () => {
    const result = plan(planRequestSchema.parse({ ...site, family: "vertical", band: "15m", heightM: 3, radials: 4, radialDroopDeg: 45 }));
    const summary = antennaSummaryOf(result, { bands: [{ name: "15m", lowMHz: 21, highMHz: 21.45 }], powerW: 100, mode: "ssb" });
    const length = result.elements[0].lengthM;
    expect(summary.arms).toHaveLength(4);
    for (const arm of summary.arms) expect(arm.lengthM).toBeCloseTo(length * Math.cos(Math.PI / 4), 6);
    expect(summary.mastHeightM).toBeCloseTo(3 + length, 6);
    expect(summary.feedHeightM).toBe(3);
    // fall zone: mast height + the longest reach, at least + 3 m (common practice, reference-data.md §8)
    expect(summary.fallZoneRadiusM).toBeCloseTo(summary.mastHeightM + Math.max(3, length * Math.cos(Math.PI / 4)), 6);
  });
});

describe("the exposure distance kept on a slot", () => {
  it("is the larger public-limit distance of the worked example (ICNIRP's 1.06 m over the FCC's 0.85 m)", () => {
    // Source: FCC OET Bulletin 65, Ed. 97-01, and its Supplement B; 47 CFR 1.1310 Table 1; ICNIRP (2020) guidelines,
    // Health Phys. 118(5):483–524 — reference-data.md §6 worked example, computed: 100 W PEP SSB, dipole, 14.0 MHz.
    expect(slotExposureDistanceM([{ name: "test", lowMHz: 14, highMHz: 14 }], 100, "ssb")).toBeCloseTo(1.06, 2);
  });

  it("takes each band at its top edge and the largest over the slot's bands", () => {
    const twenty = slotExposureDistanceM([{ name: "20m", lowMHz: 14, highMHz: 14.35 }], 100, "ssb");
    const both = slotExposureDistanceM([{ name: "40m", lowMHz: 7, highMHz: 7.2 }, { name: "20m", lowMHz: 14, highMHz: 14.35 }], 100, "ssb");
    expect(twenty).toBeGreaterThan(1.06);
    expect(both).toBe(twenty);
  });
});
