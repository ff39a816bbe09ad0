/**
 * Half-wave dipole, flat-top and centre-fed through a 1:1 balun: two legs along
 * y at the given height, the source at the centre insulator between them.
 */
import {
  clearanceProblems,
  halfWaveRuleOfThumb,
  segmentsFor,
  wire,
  type ElementTarget,
  type FamilyModel,
  type Site,
} from "./family";

export function dipoleModel(element: ElementTarget, site: Site): FamilyModel {
  const h = site.heightM;
  return {
    family: "dipole",
    label: "Half-wave dipole",
    elements: [element],
    ruleOfThumb: [halfWaveRuleOfThumb(element.targetMHz)],
    tuning: { kind: "zero-reactance" },
    build([length], segmentation) {
      const leg = length / 2;
      return {
        structure: {
          wires: [
            wire(site, [0, -leg, h], [0, 0, h], segmentsFor(leg, segmentation)),
            wire(site, [0, 0, h], [0, leg, h], segmentsFor(leg, segmentation)),
          ],
          feed: { wire: 1, at: 0 },
          ground: site.ground,
        },
        wireLabels: ["Left leg", "Right leg"],
      };
    },
    problems: () => clearanceProblems(site, h, "heightM", "raise the dipole"),
    cutPieces: ([length]) => [
      {
        label: "Leg (one each side of the centre insulator)",
        count: 2,
        electricalLengthM: length / 2,
        ruleOfThumbM: halfWaveRuleOfThumb(element.targetMHz).lengthM / 2,
      },
    ],
    transformer: "1:1",
    notes: ["A 1:1 current balun at the centre keeps RF off the outside of the coax."],
  };
}
