/**
 * Inverted-V: a half-wave dipole hung from one support, fed at the apex, the
 * two legs sloping down in the y–z plane with the given included angle.
 */
import type { SingleBandPlanRequest } from "../plan-schema";
import type { Vec3 } from "../structure";
import {
  clearanceProblems,
  halfWaveRuleOfThumb,
  longestHalfWaveM,
  segmentsFor,
  wire,
  type ElementTarget,
  type FamilyModel,
  type Site,
} from "./family";

type InvertedVRequest = Extract<SingleBandPlanRequest, { family: "inverted-v" }>;

export function invertedVModel(request: InvertedVRequest, element: ElementTarget, site: Site): FamilyModel {
  const apex: Vec3 = [0, 0, site.heightM];
  const half = (request.includedAngleDeg * Math.PI) / 360;
  const tip = (legM: number, side: -1 | 1): Vec3 => [0, side * legM * Math.sin(half), site.heightM - legM * Math.cos(half)];
  return {
    family: "inverted-v",
    label: "Inverted-V",
    elements: [element],
    ruleOfThumb: [halfWaveRuleOfThumb(element.targetMHz)],
    tuning: { kind: "zero-reactance" },
    build([length], segmentation) {
      const leg = length / 2;
      return {
        structure: {
          wires: [
            wire(site, tip(leg, -1), apex, segmentsFor(leg, segmentation)),
            wire(site, apex, tip(leg, 1), segmentsFor(leg, segmentation)),
          ],
          // The source sits at the apex, between the two legs.
          feed: { wire: 1, at: 0 },
          ground: site.ground,
        },
        wireLabels: ["Left leg", "Right leg"],
      };
    },
    problems: () =>
      clearanceProblems(
        site,
        tip(longestHalfWaveM(element.targetMHz) / 2, 1)[2],
        "heightM",
        "raise the apex or widen includedAngleDeg",
      ),
    cutPieces: ([length]) => [
      {
        label: "Leg (one each side of the apex insulator)",
        count: 2,
        electricalLengthM: length / 2,
        ruleOfThumbM: halfWaveRuleOfThumb(element.targetMHz).lengthM / 2,
      },
    ],
    transformer: "1:1",
    notes: [
      "A 1:1 current balun at the apex keeps RF off the outside of the coax.",
      "The leg ends hang low: keep them out of reach or guard them, they carry high RF voltage.",
    ],
  };
}
