import { describe, expect, it } from "vitest";
import { FALL_ZONE_MIN_MARGIN_M, fallZoneRadiusM, footprint, guyRadiusM, summariseOutline, wireSpanM, type AntennaOutline } from "@/lib/site-plan/footprint";
import { distance, pointAtBearing, pointInPolygon, pointToSegmentDistance, segmentToSegmentDistance, shapeDistance } from "@/lib/site-plan/geometry";

const invertedV: AntennaOutline = {
  family: "inverted-v",
  familyLabel: "Inverted-V",
  feedHeightM: 10,
  mastHeightM: 10,
  arms: [
    { offsetDeg: 0, lengthM: 8.8 },
    { offsetDeg: 180, lengthM: 8.8 },
  ],
  exposureDistanceM: 1.2,
};

describe("plane geometry", () => {
  it("measures bearings clockwise from north", () => {
    const east = pointAtBearing([0, 0], 90, 10);
    expect(east[0]).toBeCloseTo(10, 9);
    expect(east[1]).toBeCloseTo(0, 9);
    expect(pointAtBearing([5, 5], 0, 3)).toEqual([5, 8]);
  });

  it("finds point–segment, segment–segment and polygon distances", () => {
    expect(pointToSegmentDistance([0, 5], { from: [-10, 0], to: [10, 0] })).toBe(5);
    expect(pointToSegmentDistance([13, 4], { from: [-10, 0], to: [10, 0] })).toBe(5);
    expect(segmentToSegmentDistance({ from: [0, 0], to: [10, 10] }, { from: [0, 10], to: [10, 0] })).toBe(0);
    expect(segmentToSegmentDistance({ from: [0, 0], to: [10, 0] }, { from: [0, 3], to: [10, 3] })).toBe(3);
    const square = [[0, 0], [10, 0], [10, 10], [0, 10]] as const;
    expect(pointInPolygon([5, 5], square)).toBe(true);
    expect(pointInPolygon([10, 5], square)).toBe(true);
    expect(pointInPolygon([11, 5], square)).toBe(false);
    expect(shapeDistance({ points: [[5, 5]], closed: false }, { points: square, closed: true })).toBe(0);
    expect(shapeDistance({ points: [[15, 5]], closed: false }, { points: square, closed: true })).toBe(5);
    expect(distance([0, 0], [3, 4])).toBe(5);
  });
});

describe("an antenna's footprint", () => {
  it("has a fall zone of mast height plus the longest reach, at least height + 3 m", () => {
    // common practice (reference-data.md §8)
    expect(fallZoneRadiusM(invertedV)).toBeCloseTo(18.8, 9);
    expect(fallZoneRadiusM({ mastHeightM: 6, arms: [{ offsetDeg: 0, lengthM: 0.5 }] })).toBe(6 + FALL_ZONE_MIN_MARGIN_M);
    expect(fallZoneRadiusM({ mastHeightM: 6, arms: [] })).toBe(9);
  });

  it("puts three guy anchors at 0.8 × the mast height, away from the wire", () => {
    // common practice (reference-data.md §8): anchor radius about 0.5–0.8 × the guy attachment height
    expect(guyRadiusM(10)).toBe(8);
    const placed = footprint(summariseOutline(invertedV), { position: [40, 40], azimuthDeg: 0 });
    expect(placed.guyAnchors).toHaveLength(3);
    for (const anchor of placed.guyAnchors) expect(distance(anchor, [40, 40])).toBeCloseTo(8, 9);
    // No anchor sits on the wire's line (bearings 0° and 180°).
    for (const anchor of placed.guyAnchors) expect(Math.abs(anchor[0] - 40)).toBeGreaterThan(1);
  });

  it("turns the wire with the slot's bearing and spans tip to tip", () => {
    expect(wireSpanM(invertedV)).toBeCloseTo(17.6, 9);
    const placed = footprint(summariseOutline(invertedV), { position: [40, 40], azimuthDeg: 90 });
    expect(placed.wires[0].to[0]).toBeCloseTo(48.8, 9);
    expect(placed.wires[1].to[0]).toBeCloseTo(31.2, 9);
    expect(placed.conductors).toHaveLength(3);
  });

  it("spans an end-fed wire from its counterpoise to its far end", () => {
    expect(wireSpanM({ arms: [{ offsetDeg: 0, lengthM: 20 }, { offsetDeg: 180, lengthM: 1 }] })).toBe(21);
    expect(wireSpanM({ arms: [{ offsetDeg: 0, lengthM: 20 }] })).toBe(20);
  });
});
