/**
 * The site plan's view of a computed antenna plan: the outline of the built antenna seen from
 * above, and its general-public RF-exposure distance over every band the slot uses.
 */
import { exposureDistances, type OperatingMode } from "@/lib/antenna/exposure";
import { EXPOSURE_GAIN_DBI, planModel, type PlanResult } from "@/lib/antenna/plan";
import { summariseOutline, type AntennaOutline, type AntennaSummary } from "@/lib/site-plan/footprint";
import type { BandRange } from "@/lib/site-plan/checks";

/** Limits that protect the public (reference-data.md §6): FCC uncontrolled and ICNIRP 2020 general public. */
const PUBLIC_LIMITS = new Set(["fcc-uncontrolled", "icnirp-2020-public"]);

/** Wire ends closer than this to the mast, seen from above, are on the mast (a vertical's top). */
const ON_MAST_M = 0.05;

/**
 * The largest general-public exposure distance over the slot's bands, each at its top edge:
 * the limits fall with frequency on HF, so the top edge is the worst case. The same antenna
 * gain as the engine's plan (a half-wave dipole's, which the other families do not exceed).
 */
export function slotExposureDistanceM(bands: readonly BandRange[], powerW: number, mode: OperatingMode): number {
  const distances = bands.flatMap((band) =>
    exposureDistances({ mhz: band.highMHz, pepW: powerW, mode, gainDbi: EXPOSURE_GAIN_DBI })
      .distances.filter((distance) => PUBLIC_LIMITS.has(distance.limit))
      .map((distance) => distance.distanceM),
  );
  return Math.max(0, ...distances);
}

/**
 * The antenna seen from above, from the engine's own geometry of the plan: every wire end
 * becomes an arm from the feed point (the mast), by its bearing from the engine's +y axis
 * (the slot's wire direction) and its reach on the ground.
 */
export function outlineOfPlan(result: PlanResult, exposureDistanceM: number): AntennaOutline {
  const { structure } = planModel(result.request).build(result.elements.map((element) => element.lengthM));
  const fed = structure.wires[structure.feed.wire];
  const feed = [0, 1, 2].map((c) => fed.from[c] + structure.feed.at * (fed.to[c] - fed.from[c]));
  const ends = structure.wires.flatMap((wire) => [wire.from, wire.to]);
  const arms = new Map<string, { offsetDeg: number; lengthM: number }>();
  for (const end of ends) {
    const east = end[0] - feed[0];
    const north = end[1] - feed[1];
    const lengthM = Math.hypot(east, north);
    if (lengthM < ON_MAST_M) continue;
    const offsetDeg = ((Math.atan2(east, north) * 180) / Math.PI + 360) % 360;
    arms.set(`${offsetDeg.toFixed(1)}:${lengthM.toFixed(2)}`, { offsetDeg, lengthM });
  }
  return {
    family: result.family,
    familyLabel: result.label,
    feedHeightM: result.request.heightM,
    mastHeightM: Math.max(...ends.map((end) => end[2])),
    arms: [...arms.values()],
    exposureDistanceM,
  };
}

export function antennaSummaryOf(result: PlanResult, slot: { bands: readonly BandRange[]; powerW: number; mode: OperatingMode }): AntennaSummary {
  return summariseOutline(outlineOfPlan(result, slotExposureDistanceM(slot.bands, slot.powerW, slot.mode)));
}
