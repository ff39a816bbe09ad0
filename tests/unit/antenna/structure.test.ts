import { describe, expect, it } from "vitest";
import { SPEED_OF_LIGHT } from "@/lib/antenna/physics";
import { EngineInputError } from "@/lib/antenna/problems";
import { prepareStructure, solveAt } from "@/lib/antenna/solver";
import { MIN_SEGMENT_RADII, segmentStructure, type Structure, type Wire } from "@/lib/antenna/structure";

const MHZ = 14.2;
const LAMBDA = SPEED_OF_LIGHT / (MHZ * 1e6);

function dipole(extra: Partial<Wire> = {}): Wire {
  return { from: [0, -5, 10], to: [0, 5, 10], diameterMm: 2, ...extra };
}

function problemsOf(structure: Structure, maxMHz = MHZ): string[] {
  try {
    segmentStructure(structure, maxMHz);
  } catch (error) {
    if (error instanceof EngineInputError) return error.problems;
    throw error;
  }
  return [];
}

describe("segmentation", () => {
  it("puts a node exactly at the feed and keeps the requested count (41 → 20 + 21)", () => {
    const seg = segmentStructure({ wires: [dipole({ segments: 41 })], feed: { wire: 0, at: 0.5 }, ground: { kind: "free" } }, MHZ);
    expect(seg.count).toBe(41);
    const feedPoint = seg.feedEnd === 1 ? seg.end[3 * seg.feedSegment + 1] : seg.start[3 * seg.feedSegment + 1];
    expect(feedPoint).toBeCloseTo(0, 12);
  });

  it("places the feed at any fraction of the wire", () => {
    const seg = segmentStructure({ wires: [dipole({ segments: 30 })], feed: { wire: 0, at: 0.33 }, ground: { kind: "free" } }, MHZ);
    const feedPoint = seg.feedEnd === 1 ? seg.end[3 * seg.feedSegment + 1] : seg.start[3 * seg.feedSegment + 1];
    expect(feedPoint).toBeCloseTo(-5 + 0.33 * 10, 12);
    expect(seg.count).toBe(30);
  });

  it("chooses enough segments per wavelength at the highest frequency, each at least 3 radii long", () => {
    const low = segmentStructure({ wires: [dipole()], feed: { wire: 0, at: 0.5 }, ground: { kind: "free" } }, MHZ);
    const high = segmentStructure({ wires: [dipole()], feed: { wire: 0, at: 0.5 }, ground: { kind: "free" } }, 2 * MHZ);
    expect(low.count).toBeGreaterThanOrEqual(Math.ceil((10 / LAMBDA) * 30));
    expect(high.count).toBeGreaterThan(1.8 * low.count);
    const thick = segmentStructure({ wires: [{ from: [0, 0, 1], to: [0, 0.2, 1], diameterMm: 20 }], feed: { wire: 0, at: 0.5 }, ground: { kind: "free" } }, 300);
    for (let i = 0; i < thick.count; i++) {
      const length = Math.hypot(thick.end[3 * i + 1] - thick.start[3 * i + 1], thick.end[3 * i + 2] - thick.start[3 * i + 2]);
      expect(length).toBeGreaterThanOrEqual(MIN_SEGMENT_RADII * 0.01 * (1 - 1e-9));
    }
  });

  it("joins wire ends within 1 mm: two half-dipoles fed at their joint behave as one dipole fed in the middle", () => {
    const one = prepareStructure({ wires: [dipole({ segments: 40 })], feed: { wire: 0, at: 0.5 }, ground: { kind: "free" } }, MHZ);
    const two = prepareStructure(
      {
        wires: [
          { from: [0, 0.0004, 10], to: [0, 5, 10], diameterMm: 2, segments: 20 },
          { from: [0, -5, 10], to: [0, 0, 10], diameterMm: 2, segments: 20 },
        ],
        feed: { wire: 0, at: 0 },
        ground: { kind: "free" },
      },
      MHZ,
    );
    const z1 = solveAt(one, MHZ).impedance;
    const z2 = solveAt(two, MHZ).impedance;
    expect(z2.r).toBeCloseTo(z1.r, 1);
    expect(z2.x).toBeCloseTo(z1.x, 1);
  });
});

describe("bad geometry is refused with the field named", () => {
  it.each<[string, Structure, RegExp]>([
    ["a zero-length wire", { wires: [{ from: [0, 0, 1], to: [0, 0, 1], diameterMm: 2 }], feed: { wire: 0, at: 0.5 }, ground: { kind: "free" } }, /^wires\[0\]\.to: .*zero length/],
    [
      "a wire below real ground",
      { wires: [{ from: [0, 0, 1], to: [0, 5, -1] , diameterMm: 2 }], feed: { wire: 0, at: 0.5 }, ground: { kind: "real", conductivitySm: 0.005, relativePermittivity: 13 } },
      /^wires\[0\]\.to: z = -1 m is not above the ground/,
    ],
    ["a wire below a perfect ground", { wires: [{ from: [0, 0, 1], to: [0, 5, -1], diameterMm: 2 }], feed: { wire: 0, at: 0.5 }, ground: { kind: "perfect" } }, /^wires\[0\]\.to: .*below the ground plane/],
    ["a wire lying on a perfect ground", { wires: [{ from: [0, 0, 0], to: [0, 5, 0], diameterMm: 2 }], feed: { wire: 0, at: 0.5 }, ground: { kind: "perfect" } }, /^wires\[0\]: lies on the ground plane/],
    [
      "crossing wires",
      { wires: [dipole(), { from: [-5, 0, 10], to: [5, 0, 10], diameterMm: 2 }], feed: { wire: 0, at: 0.5 }, ground: { kind: "free" } },
      /^wires\[1\]: touches or crosses wires\[0\]/,
    ],
    ["a feed at an open end", { wires: [dipole()], feed: { wire: 0, at: 1 }, ground: { kind: "free" } }, /^feed\.at: .*open end/],
    ["segments shorter than 3 radii", { wires: [dipole({ segments: 2000, diameterMm: 8 })], feed: { wire: 0, at: 0.5 }, ground: { kind: "free" } }, /^wires\[0\]\.segments: .*shorter than 3 wire radii/],
    ["a wire too short for its diameter", { wires: [{ from: [0, 0, 1], to: [0, 0.01, 1], diameterMm: 10 }], feed: { wire: 0, at: 0.5 }, ground: { kind: "free" } }, /^feed\.at: .*shorter than 3 wire radii/],
    ["segments longer than a quarter wavelength", { wires: [dipole({ segments: 1, to: [0, 20, 10] })], feed: { wire: 0, at: 0.5 }, ground: { kind: "free" } }, /^wires\[0\]\.segments: .*longer than a quarter wavelength/],
    ["a wire too thick for a thin-wire model", { wires: [dipole({ diameterMm: 1000 })], feed: { wire: 0, at: 0.5 }, ground: { kind: "free" } }, /^wires\[0\]\.diameterMm: too thick/],
    [
      "more than 2000 segments in all",
      { wires: [dipole({ segments: 1500 }), { from: [1, -5, 10], to: [1, 5, 10], diameterMm: 0.1, segments: 1500 }], feed: { wire: 0, at: 0.5 }, ground: { kind: "free" } },
      /^wires: 3000 segments in all, more than the 2000 allowed/,
    ],
    ["a feed on a wire that does not exist", { wires: [dipole()], feed: { wire: 2, at: 0.5 }, ground: { kind: "free" } }, /^feed\.wire: wire 2 does not exist/],
    ["a negative diameter", { wires: [dipole({ diameterMm: -1 })], feed: { wire: 0, at: 0.5 }, ground: { kind: "free" } }, /^wires\[0\]\.diameterMm: must be greater than 0/],
  ])("refuses %s", (_, structure, message) => {
    const problems = problemsOf(structure);
    expect(problems.some((p) => message.test(p))).toBe(true);
  });

  it("refuses a frequency out of range", () => {
    expect(problemsOf({ wires: [dipole()], feed: { wire: 0, at: 0.5 }, ground: { kind: "free" } }, 3001)).toEqual([
      "frequenciesMHz: must be greater than 0 and at most 3000 MHz",
    ]);
  });

  it("refuses joined wires that overlap", () => {
    const structure: Structure = {
      wires: [
        { from: [0, 0, 10], to: [0, 5, 10], diameterMm: 2 },
        { from: [0, 0, 10], to: [0, 5, 10.001], diameterMm: 2 },
      ],
      feed: { wire: 0, at: 0.5 },
      ground: { kind: "free" },
    };
    expect(problemsOf(structure).some((p) => /^wires\[1\]: overlaps wires\[0\]/.test(p))).toBe(true);
  });
});
