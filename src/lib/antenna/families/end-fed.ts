/**
 * End-fed half-wave: a half-wave radiator fed at one end through a high-ratio
 * unun (49:1 or 64:1), with a short counterpoise on the other side of the unun.
 * Counterpoise and radiator lie on one straight line, from the counterpoise tip
 * through the feed point to the far end (level, or sloping when the far end is
 * higher or lower). Tuned for the lowest SWR at the centre frequency through
 * the unun (see resonance.ts for why not for zero reactance).
 */
import { TRANSFORMERS, feedlineType } from "../feedline-types";
import { wavelengthMetres } from "../physics";
import type { SingleBandPlanRequest } from "../plan-schema";
import type { Vec3 } from "../structure";
import {
  clearanceProblems,
  halfWaveRuleOfThumb,
  longestHalfWaveM,
  round,
  segmentsFor,
  wire,
  type ElementTarget,
  type FamilyModel,
  type Site,
} from "./family";

type EndFedRequest = Extract<SingleBandPlanRequest, { family: "end-fed" }>;

/** Counterpoise when the plan gives none: about 0.05 λ (common practice). */
export const DEFAULT_COUNTERPOISE_WAVELENGTHS = 0.05;

export function endFedModel(request: EndFedRequest, element: ElementTarget, site: Site): FamilyModel {
  const feedHeight = site.heightM;
  const farEndHeight = request.farEndHeightM ?? feedHeight;
  const rise = farEndHeight - feedHeight;
  const counterpoise = request.counterpoiseM ?? DEFAULT_COUNTERPOISE_WAVELENGTHS * wavelengthMetres(element.targetMHz);
  const rule = halfWaveRuleOfThumb(element.targetMHz);
  /** Counterpoise tip, feed point and far end for a radiator of the given length. */
  const line = (radiatorM: number): [Vec3, Vec3, Vec3] => {
    const run = Math.sqrt(Math.max(radiatorM ** 2 - rise ** 2, 0));
    const u: Vec3 = [0, run / radiatorM, rise / radiatorM];
    return [
      [0, -counterpoise * u[1], feedHeight - counterpoise * u[2]],
      [0, 0, feedHeight],
      [0, run, farEndHeight],
    ];
  };
  return {
    family: "end-fed",
    label: `End-fed half-wave with a ${request.unun} unun`,
    elements: [element],
    ruleOfThumb: [rule],
    tuning: {
      kind: "best-match",
      referenceOhms: TRANSFORMERS[request.unun].impedanceRatio * feedlineType(request.feedline.type).z0Ohms,
      lengthRangeM: [0.85 * longestHalfWaveM(element.targetMHz), longestHalfWaveM(element.targetMHz)],
    },
    build([radiator], segmentation) {
      const [tip, feed, far] = line(radiator);
      return {
        structure: {
          wires: [
            wire(site, tip, feed, segmentsFor(counterpoise, segmentation)),
            wire(site, feed, far, segmentsFor(radiator, segmentation)),
          ],
          // The source sits at the unun, between counterpoise and radiator.
          feed: { wire: 1, at: 0 },
          ground: site.ground,
        },
        wireLabels: ["Counterpoise", "Radiator"],
      };
    },
    problems() {
      const shortestCounterpoise = Math.max(0.01 * wavelengthMetres(element.targetMHz), (3 * site.wireDiameterMm) / 1000);
      if (counterpoise < shortestCounterpoise) {
        return [
          `counterpoiseM: must be at least ${round(shortestCounterpoise, 3)} m (a hundredth of a wavelength, and 3 wire diameters)`,
        ];
      }
      const shortest = 0.9 * rule.lengthM;
      if (Math.abs(rise) > shortest) {
        return [
          `farEndHeightM: the radiator is only about ${round(shortest, 1)} m long, so its far end cannot be ${round(Math.abs(rise), 1)} m ${rise > 0 ? "above" : "below"} the feed point`,
        ];
      }
      const lowest = Math.min(
        ...[shortest, longestHalfWaveM(element.targetMHz)].flatMap((length) => line(length).map((p) => p[2])),
      );
      return clearanceProblems(site, lowest, request.farEndHeightM === undefined ? "heightM" : "farEndHeightM", "raise the feed point or the far end");
    },
    cutPieces: ([radiator]) => [
      { label: "Radiator", count: 1, electricalLengthM: radiator, ruleOfThumbM: rule.lengthM },
      { label: "Counterpoise", count: 1, electricalLengthM: counterpoise },
    ],
    transformer: request.unun,
    notes: [
      `The counterpoise is ${round(counterpoise)} m (${request.counterpoiseM === undefined ? "0.05 λ, common practice" : "as given"}); the coax shield also carries current, so a common-mode choke a few metres down the coax is common practice.`,
      "The feed end and the far end both carry high RF voltage: the unun's antenna terminal is as dangerous as the wire's tip.",
      "The unun is modelled as an ideal transformer; a real one has loss and a compensating capacitor that shift the match.",
    ],
  };
}
