/**
 * Quarter-wave vertical with N elevated radials: the radial hub at the base
 * height, the vertical above it, radials spread evenly in azimuth and drooping
 * by the given angle. The radials are cut to the vertical's length (common
 * practice), so one length is tuned.
 */
import type { SingleBandPlanRequest } from "../plan-schema";
import type { Vec3 } from "../structure";
import {
  clearanceProblems,
  longestHalfWaveM,
  quarterWaveRuleOfThumb,
  segmentsFor,
  wire,
  type ElementTarget,
  type FamilyModel,
  type Site,
} from "./family";

type VerticalRequest = Extract<SingleBandPlanRequest, { family: "vertical" }>;

export function verticalModel(request: VerticalRequest, element: ElementTarget, site: Site): FamilyModel {
  const hub: Vec3 = [0, 0, site.heightM];
  const droop = (request.radialDroopDeg * Math.PI) / 180;
  const radialTip = (lengthM: number, index: number): Vec3 => {
    const azimuth = (2 * Math.PI * index) / request.radials;
    const run = lengthM * Math.cos(droop);
    return [run * Math.cos(azimuth), run * Math.sin(azimuth), site.heightM - lengthM * Math.sin(droop)];
  };
  const radialIndices = Array.from({ length: request.radials }, (_, i) => i);
  const rule = quarterWaveRuleOfThumb(element.targetMHz);
  return {
    family: "vertical",
    label: `Quarter-wave vertical with ${request.radials} elevated radial${request.radials === 1 ? "" : "s"}`,
    elements: [element],
    ruleOfThumb: [rule],
    tuning: { kind: "zero-reactance" },
    build([length], segmentation) {
      const segments = segmentsFor(length, segmentation);
      return {
        structure: {
          wires: [
            wire(site, hub, [0, 0, site.heightM + length], segments),
            ...radialIndices.map((i) => wire(site, hub, radialTip(length, i), segments)),
          ],
          // The source sits at the hub, between the vertical and the radials.
          feed: { wire: 0, at: 0 },
          ground: site.ground,
        },
        wireLabels: ["Vertical", ...radialIndices.map((i) => `Radial ${i + 1}`)],
      };
    },
    problems: () =>
      clearanceProblems(
        site,
        radialTip(longestHalfWaveM(element.targetMHz) / 2, 0)[2],
        "heightM",
        "raise the base or reduce radialDroopDeg",
      ),
    cutPieces: ([length]) => [
      { label: "Vertical element", count: 1, electricalLengthM: length, ruleOfThumbM: rule.lengthM },
      { label: "Radial", count: request.radials, electricalLengthM: length, ruleOfThumbM: rule.lengthM },
    ],
    transformer: "1:1",
    notes: [
      "A 1:1 current balun (choke) at the feed point keeps the coax shield from acting as another radial.",
      "Radials carry RF voltage at their ends: keep them out of reach.",
    ],
  };
}
