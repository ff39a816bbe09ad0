/**
 * Fan dipole: two or three half-wave dipoles for different bands on one feed.
 * The elements fan out in the vertical plane: the longest (lowest band) is
 * level, each shorter one droops `spreadDeg` more, so their legs never touch.
 * All left legs start at one end of a short centre insulator and all right legs
 * at the other; the source sits across the insulator. Each element is tuned for
 * its own band, jointly, because the elements load one another.
 */
import type { FanDipolePlanRequest } from "../plan-schema";
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

/** Width of the centre insulator between the two hubs: 5 cm, at least 8 wire diameters. */
export function centreGapM(site: Site): number {
  return Math.max(0.05, (8 * site.wireDiameterMm) / 1000);
}

export function fanDipoleModel(request: FanDipolePlanRequest, elements: ElementTarget[], site: Site): FamilyModel {
  const h = site.heightM;
  const gap = centreGapM(site);
  // Longest element (lowest band) first and level; the others droop in turn.
  const order = elements.map((_, i) => i).sort((a, b) => elements[a].targetMHz - elements[b].targetMHz);
  const droopOf = (element: number) => (order.indexOf(element) * request.spreadDeg * Math.PI) / 180;
  const hub = (side: -1 | 1): Vec3 => [0, (side * gap) / 2, h];
  const tip = (element: number, legM: number, side: -1 | 1): Vec3 => {
    const droop = droopOf(element);
    return [0, side * (gap / 2 + legM * Math.cos(droop)), h - legM * Math.sin(droop)];
  };
  const legLength = (lengthM: number) => (lengthM - gap) / 2;
  const rules = elements.map((element) => halfWaveRuleOfThumb(element.targetMHz));
  return {
    family: "fan-dipole",
    label: `Fan dipole for ${elements.map((element) => element.band.name).join(", ")}`,
    elements,
    ruleOfThumb: rules,
    tuning: { kind: "zero-reactance" },
    build(lengths, segmentation) {
      const legs = lengths.flatMap((length, k) => {
        const leg = legLength(length);
        const segments = segmentsFor(leg, segmentation);
        return [wire(site, tip(k, leg, -1), hub(-1), segments), wire(site, hub(1), tip(k, leg, 1), segments)];
      });
      return {
        structure: {
          wires: [wire(site, hub(-1), hub(1), segmentation ? 2 : undefined), ...legs],
          feed: { wire: 0, at: 0.5 },
          ground: site.ground,
        },
        wireLabels: [
          "Centre insulator (feed)",
          ...elements.flatMap((element) => [`${element.band.name} left leg`, `${element.band.name} right leg`]),
        ],
      };
    },
    problems: () =>
      clearanceProblems(
        site,
        Math.min(...elements.map((element, k) => tip(k, longestHalfWaveM(element.targetMHz) / 2, 1)[2])),
        "heightM",
        "raise the feed point or reduce spreadDeg",
      ),
    cutPieces: (lengths) =>
      elements.map((element, k) => ({
        label: `${element.band.name} element, leg (one each side of the centre insulator)`,
        count: 2,
        electricalLengthM: legLength(lengths[k]),
        ruleOfThumbM: rules[k].lengthM / 2,
      })),
    transformer: "1:1",
    notes: [
      `Each element's length counts the ${Math.round(gap * 100)} cm centre insulator; cut each leg as listed.`,
      "Elements for harmonically related bands (such as 40m and 15m) interact strongly: expect to trim each in turn.",
      "A 1:1 current balun at the centre keeps RF off the outside of the coax.",
    ],
  };
}
