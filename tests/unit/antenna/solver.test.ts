import { describe, expect, it } from "vitest";
import { prepareStructure, solveAt, solveSweep, type Solution } from "@/lib/antenna/solver";
import type { Structure } from "@/lib/antenna/structure";

function dipole(segments: number): Structure {
  return { wires: [{ from: [0, -5, 10], to: [0, 5, 10], diameterMm: 2, segments }], feed: { wire: 0, at: 0.5 }, ground: { kind: "free" } };
}

/** Frequency where the reactance crosses zero upwards, by bisection between lo and hi. */
function zeroReactance(structure: Structure, lo: number, hi: number): number {
  const prepared = prepareStructure(structure, hi);
  const x = (mhz: number) => solveAt(prepared, mhz).impedance.x;
  for (let i = 0; i < 40; i++) {
    const mid = (lo + hi) / 2;
    if (x(mid) < 0) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

describe("solver", () => {
  it("gives the feed current as 1/Z for 1 V at the feed", () => {
    const solution = solveAt(prepareStructure(dipole(40), 14.2), 14.2);
    const { r, x } = solution.impedance;
    const { re, im } = solution.feedCurrent;
    expect(re).toBeCloseTo(r / (r * r + x * x), 12);
    expect(im).toBeCloseTo(-x / (r * r + x * x), 12);
  });

  it("gives mirror-symmetric currents on a centre-fed dipole, largest at the feed", () => {
    const { segments } = solveAt(prepareStructure(dipole(40), 14.2), 14.2);
    const magnitude = (s: Solution["segments"][number]) => Math.hypot(s.current.re, s.current.im);
    for (let i = 0; i < 20; i++) expect(magnitude(segments[i])).toBeCloseTo(magnitude(segments[39 - i]), 9);
    expect(magnitude(segments[19])).toBeGreaterThan(10 * magnitude(segments[0]));
  });

  it("solves a sweep as point by point", () => {
    const prepared = prepareStructure(dipole(21), 14.5);
    const sweep = solveSweep(prepared, [14.0, 14.5]);
    expect(sweep.map((s) => s.impedance)).toEqual([solveAt(prepared, 14.0).impedance, solveAt(prepared, 14.5).impedance]);
  });

  it("refuses a frequency above the one the structure was prepared for", () => {
    expect(() => solveAt(prepareStructure(dipole(21), 14.5), 15)).toThrow(RangeError);
  });

  it("cuts wires finely enough by itself: resonance within 0.3 % of an 81-segment solution", () => {
    const automatic: Structure = { wires: [{ from: [0, -5, 10], to: [0, 5, 10], diameterMm: 2 }], feed: { wire: 0, at: 0.5 }, ground: { kind: "free" } };
    const fine = zeroReactance(dipole(81), 13.5, 15.5);
    expect(Math.abs(zeroReactance(automatic, 13.5, 15.5) / fine - 1)).toBeLessThan(0.003);
  });

  // A right-angle bend: the source's far end and the shared node project onto the same point of the test
  // segment, so which one decides the quadrature must not depend on rounding.
  it("does not depend on rounding at a right-angle bend (inverted-V at 90°)", () => {
    for (const length of [18.9, 18.95, 19, 19.05, 19.1]) {
      const leg = length / 2;
      const tip = (side: -1 | 1): [number, number, number] => [0, side * leg * Math.SQRT1_2, 12 - leg * Math.SQRT1_2];
      const resistances = [9, 10, 11].map((segments) => {
        const structure: Structure = {
          wires: [
            { from: tip(-1), to: [0, 0, 12], diameterMm: 2, segments },
            { from: [0, 0, 12], to: tip(1), diameterMm: 2, segments },
          ],
          feed: { wire: 1, at: 0 },
          ground: { kind: "free" },
        };
        return solveAt(prepareStructure(structure, 7.1), 7.1).impedance.r;
      });
      expect(Math.max(...resistances) / Math.min(...resistances)).toBeLessThan(1.01);
    }
  });

  // Junctions of different diameters: the solution must settle as the segments get shorter (a 25 mm centre
  // section, 2 mm outer wires). nec2c, on the same geometry, still moves by more than 2 % from 1× to 4×.
  it("settles at a junction of a 25 mm and a 2 mm wire as the segmentation is refined", () => {
    const stepped = (k: number): Structure => ({
      wires: [
        { from: [0, -2, 10], to: [0, 2, 10], diameterMm: 25, segments: 8 * k },
        { from: [0, 2, 10], to: [0, 5.1, 10], diameterMm: 2, segments: 6 * k },
        { from: [0, -2, 10], to: [0, -5.1, 10], diameterMm: 2, segments: 6 * k },
      ],
      feed: { wire: 0, at: 0.5 },
      ground: { kind: "free" },
    });
    const coarse = zeroReactance(stepped(1), 13, 16);
    const fine = zeroReactance(stepped(3), 13, 16);
    expect(Math.abs(fine / coarse - 1)).toBeLessThan(0.001);
  }, 60_000);
});
