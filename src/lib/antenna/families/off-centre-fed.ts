/**
 * Off-centre-fed dipole: a flat-top half-wave wire fed at a fraction of its
 * length through a 4:1 balun. Resonance is the half-wave's, as for the centre-fed dipole.
 */
import type { SingleBandPlanRequest } from "../plan-schema";
import {
  clearanceProblems,
  halfWaveRuleOfThumb,
  segmentsFor,
  wire,
  type ElementTarget,
  type FamilyModel,
  type Site,
} from "./family";

type OffCentreFedRequest = Extract<SingleBandPlanRequest, { family: "off-centre-fed" }>;

export function offCentreFedModel(request: OffCentreFedRequest, element: ElementTarget, site: Site): FamilyModel {
  const h = site.heightM;
  const p = request.feedPosition;
  const rule = halfWaveRuleOfThumb(element.targetMHz);
  return {
    family: "off-centre-fed",
    label: "Off-centre-fed dipole",
    elements: [element],
    ruleOfThumb: [rule],
    tuning: { kind: "zero-reactance" },
    build([length], segmentation) {
      const [short, long] = [p * length, (1 - p) * length];
      return {
        structure: {
          wires: [
            wire(site, [0, -short, h], [0, 0, h], segmentsFor(short, segmentation)),
            wire(site, [0, 0, h], [0, long, h], segmentsFor(long, segmentation)),
          ],
          feed: { wire: 1, at: 0 },
          ground: site.ground,
        },
        wireLabels: ["Short leg", "Long leg"],
      };
    },
    problems: () => clearanceProblems(site, h, "heightM", "raise the wire"),
    cutPieces: ([length]) => [
      { label: "Short leg", count: 1, electricalLengthM: p * length, ruleOfThumbM: p * rule.lengthM },
      { label: "Long leg", count: 1, electricalLengthM: (1 - p) * length, ruleOfThumbM: (1 - p) * rule.lengthM },
    ],
    transformer: "4:1",
    notes: [
      "The 4:1 balun sits at the feed point; a common-mode choke on the coax below it keeps RF off the shield.",
      "Only the band the wire is cut for is planned here; harmonic bands need their own check.",
    ],
  };
}
