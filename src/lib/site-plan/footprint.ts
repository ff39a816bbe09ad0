/**
 * A station's antenna on the ground: the mast, the horizontal run of its wires, its radials,
 * the guy anchors, and the two safety circles (RF exposure and fall zone).
 * Safety figures are screening numbers; local codes and licensed practice prevail.
 */
import { distance, pointAtBearing, type Point, type Segment } from "./geometry";

/** The antenna in its own frame: what the site plan needs from a computed antenna plan. */
export interface AntennaOutline {
  family: string;
  familyLabel: string;
  /** Height of the feed point (the mast top for wire antennas, the base of a vertical). */
  feedHeightM: number;
  /** The highest point of the mast and what it carries: what could fall. */
  mastHeightM: number;
  /**
   * Horizontal runs of wire from the mast (wires, legs, radials, a counterpoise), as bearings
   * relative to the slot's wire direction and their reach on the ground.
   */
  arms: { offsetDeg: number; lengthM: number }[];
  /** The largest general-public RF-exposure distance over the slot's bands, from the antenna. */
  exposureDistanceM: number;
}

/** The outline with the figures the site plan and the station sheet show. */
export interface AntennaSummary extends AntennaOutline {
  wireSpanM: number;
  fallZoneRadiusM: number;
  guyRadiusM: number;
}

/**
 * Fall zone, common practice (reference-data.md §8): nothing may reach an overhead line if the
 * mast falls or a wire slips, so keep the line at least mast height + the longest wire or
 * element reach away, and never less than height + 3 m. For comparison only (not an amateur
 * rule): MSHA 30 CFR 77.807-2 keeps booms and masts at least 10 ft (3.05 m) from energized
 * lines below 69 kV, which is where the 3 m floor comes from.
 */
export const FALL_ZONE_MIN_MARGIN_M = 3;

export function fallZoneRadiusM(outline: Pick<AntennaOutline, "mastHeightM" | "arms">): number {
  const reach = Math.max(0, ...outline.arms.map((arm) => arm.lengthM));
  return outline.mastHeightM + Math.max(reach, FALL_ZONE_MIN_MARGIN_M);
}

/**
 * Guy anchor radius, common practice (reference-data.md §8): about 0.5–0.8 × the height of the
 * guy attachment. The plan draws the outer value, 0.8 (guys at about 51° from the ground), so
 * that the room the anchors take and the trip hazard of the ropes are never understated.
 */
export const GUY_RADIUS_FACTOR = 0.8;
/** Three anchors at 120° (common practice, §8). */
export const GUY_ANCHOR_COUNT = 3;

export function guyRadiusM(feedHeightM: number): number {
  return GUY_RADIUS_FACTOR * feedHeightM;
}

/** The widest distance across the antenna seen from above: between two wire ends, or an end and the mast. */
export function wireSpanM(outline: Pick<AntennaOutline, "arms">): number {
  const tips: Point[] = [[0, 0], ...outline.arms.map((arm) => pointAtBearing([0, 0], arm.offsetDeg, arm.lengthM))];
  let widest = 0;
  for (const a of tips) for (const b of tips) widest = Math.max(widest, distance(a, b));
  return widest;
}

export function summariseOutline(outline: AntennaOutline): AntennaSummary {
  return { ...outline, wireSpanM: wireSpanM(outline), fallZoneRadiusM: fallZoneRadiusM(outline), guyRadiusM: guyRadiusM(outline.feedHeightM) };
}

export interface Placement {
  /** The mast (feed point) on the plan. */
  position: Point;
  /** Compass bearing of the wire, 0° north, 90° east. */
  azimuthDeg: number;
}

export interface Footprint {
  mast: Point;
  wires: Segment[];
  guyAnchors: Point[];
  guyRadiusM: number;
  exposureDistanceM: number;
  fallZoneRadiusM: number;
  /** Every conductor of the antenna, for distances to it: the mast point and the wires. */
  conductors: Segment[];
}

export function footprint(summary: AntennaSummary, placement: Placement): Footprint {
  const { position, azimuthDeg } = placement;
  const wires = summary.arms.map((arm) => ({ from: position, to: pointAtBearing(position, azimuthDeg + arm.offsetDeg, arm.lengthM) }));
  // Anchors between the wire directions (30°, 150°, 270° from the wire), so guys clear the wire.
  const guyAnchors = Array.from({ length: GUY_ANCHOR_COUNT }, (_, i) =>
    pointAtBearing(position, azimuthDeg + 30 + (360 * i) / GUY_ANCHOR_COUNT, summary.guyRadiusM),
  );
  return {
    mast: position,
    wires,
    guyAnchors,
    guyRadiusM: summary.guyRadiusM,
    exposureDistanceM: summary.exposureDistanceM,
    fallZoneRadiusM: summary.fallZoneRadiusM,
    conductors: [{ from: position, to: position }, ...wires],
  };
}
