// A measured sweep seen at both ends of the feedline. An analyser clipped on at the feed point
// (on the coax side of the balun or unun) or at the radio end of the slot's coax run reads one
// end; the other is computed through the run: forward with the lossy-line formula, or backward
// by inverting it (de-embedding). Formulas: Pozar, Microwave Engineering §2.3 and §2.7, and the
// ARRL Antenna Book's matched-loss relation |Γin| = |ΓL|·10^(−A/10) (reference-data.md §4).
import { complex, multiply, type Complex } from "mathjs";
import {
  RADIO_REFERENCE_OHMS,
  gammaFromSwr,
  inputGammaMagnitude,
  inputImpedance,
  lineSection,
  loadImpedance,
  matchedLossDb,
  swr,
  swrFromGamma,
} from "@/lib/antenna/feedline";
import { TRANSFORMERS, feedlineType, type FeedlineType, type FeedlineTypeId, type Transformer, type TransformerId } from "@/lib/antenna/feedline-types";
import type { MeasuredPoint } from "./parse";

export const SWEEP_PLACES = ["feed-point", "radio-end"] as const;
export type SweepPlace = (typeof SWEEP_PLACES)[number];
export const PLACE_LABELS: Record<SweepPlace, string> = {
  "feed-point": "at the feed point",
  "radio-end": "at the radio end of the feedline",
};

/** What lies between the antenna and the radio: the balun or unun and the coax run. */
export interface FeedChain {
  transformer: Transformer;
  line: FeedlineType;
  lengthM: number;
}

/** The chain as stored with a sweep: ids and the length. */
export interface FeedChainRef {
  transformerId: TransformerId;
  feedlineType: FeedlineTypeId;
  lengthM: number;
}

export const chainOf = (ref: FeedChainRef): FeedChain => ({ transformer: TRANSFORMERS[ref.transformerId], line: feedlineType(ref.feedlineType), lengthM: ref.lengthM });

export interface ViewPoint {
  mhz: number;
  /** Null where it cannot be estimated. */
  swr: number | null;
  r?: number;
  x?: number;
}

export interface SweepViews {
  /**
   * At the feed point: the SWR on the line after the balun or unun (as the plan's feed-point
   * curve), and R and X of the antenna itself, before the balun or unun.
   */
  feed: ViewPoint[];
  /** At the radio end: the SWR and the R and X a 50 Ω analyser reads there. */
  radio: ViewPoint[];
  measuredAt: SweepPlace;
  hasImpedance: boolean;
  /** How the other end was computed, and what could not be. */
  explanation: string[];
}

/** Above this matched loss, inverting the line magnifies small measurement errors a lot. */
export const ROUGH_DE_EMBEDDING_DB = 3;

const lineText = (chain: FeedChain) => `${Number(chain.lengthM.toFixed(1))} m of ${chain.line.label}`;

/**
 * The feed-point impedance behind a radio-end reading: the lossy-line formula solved for the
 * load, ZL = Z0·(Zin − Z0·tanh γl)/(Z0 − Zin·tanh γl), times the balun's or unun's ratio.
 */
export function feedPointImpedance(zRadio: Complex, chain: FeedChain, mhz: number): { zLineEnd: Complex; zAntenna: Complex } {
  const zLineEnd = loadImpedance(zRadio, lineSection(chain.line, mhz, chain.lengthM));
  return { zLineEnd, zAntenna: multiply(zLineEnd, chain.transformer.impedanceRatio) as Complex };
}

/** SWR at the load behind an SWR read at the line's input: |ΓL| = |Γin|·10^(A/10); null where no load could give it. */
export function loadSwrFromInputSwr(inputSwr: number, matchedDb: number): number | null {
  const loadGamma = gammaFromSwr(inputSwr) * 10 ** (matchedDb / 10);
  return loadGamma < 1 ? swrFromGamma(loadGamma) : null;
}

export function sweepViews(points: MeasuredPoint[], measuredAt: SweepPlace, chain: FeedChain): SweepViews {
  const hasImpedance = points.every((point) => point.r !== undefined && point.x !== undefined);
  const ratio = chain.transformer.impedanceRatio;
  const z0 = chain.line.z0Ohms;
  const explanation: string[] = [];
  const middle = points[Math.floor(points.length / 2)].mhz;
  const lossAtMiddle = matchedLossDb(chain.line, middle, chain.lengthM);
  const lossText = `${lossAtMiddle.toFixed(2)} dB matched loss at ${middle.toFixed(3)} MHz`;
  const sameReference = z0 === RADIO_REFERENCE_OHMS;

  if (hasImpedance) {
    const feed: ViewPoint[] = [];
    const radio: ViewPoint[] = [];
    for (const point of points) {
      const measured = complex(point.r as number, point.x as number);
      if (measuredAt === "feed-point") {
        const zRadio = inputImpedance(measured, lineSection(chain.line, point.mhz, chain.lengthM));
        const zAntenna = multiply(measured, ratio) as Complex;
        feed.push({ mhz: point.mhz, swr: swr(measured, z0), r: zAntenna.re, x: zAntenna.im });
        radio.push({ mhz: point.mhz, swr: swr(zRadio, RADIO_REFERENCE_OHMS), r: zRadio.re, x: zRadio.im });
      } else {
        const { zLineEnd, zAntenna } = feedPointImpedance(measured, chain, point.mhz);
        feed.push({ mhz: point.mhz, swr: swr(zLineEnd, z0), r: zAntenna.re, x: zAntenna.im });
        radio.push({ mhz: point.mhz, swr: point.swr, r: point.r, x: point.x });
      }
    }
    if (measuredAt === "feed-point") {
      explanation.push(
        `Measured at the feed point: the readings at the radio are computed forward through ${lineText(chain)} (${lossText}) with the lossy-line formula.`,
      );
      if (ratio !== 1) explanation.push(`R and X of the antenna itself are the readings times the ${chain.transformer.label}'s ratio, ${ratio}.`);
    } else {
      explanation.push(
        `Measured at the radio end: the feed-point impedance is estimated by inverting the lossy-line formula for ${lineText(chain)} (${lossText}), ZL = Z0·(Zin − Z0·tanh γl)/(Z0 − Zin·tanh γl), then ${ratio === 1 ? `through the ${chain.transformer.label}` : `multiplied by the ${chain.transformer.label}'s ratio, ${ratio}`}.`,
        "The estimate is only as good as the run's figures: its length to the connectors, its velocity factor and its loss. On a long or lossy run a few per cent move R and X noticeably; the resonance moves much less.",
      );
      if (lossAtMiddle > ROUGH_DE_EMBEDDING_DB) {
        explanation.push(`With more than ${ROUGH_DE_EMBEDDING_DB} dB of line loss the feed-point estimate is rough: measure at the feed point if you can.`);
      }
      if (feed.some((point) => (point.r as number) < 0)) {
        explanation.push("The estimate gives a negative resistance at some frequencies: the run's figures differ from the real cable (length, velocity factor or loss).");
      }
    }
    return { feed, radio, measuredAt, hasImpedance, explanation };
  }

  // SWR alone: only the reflection's size crosses the line, and only when the analyser's
  // reference is the line's own impedance.
  const feed: ViewPoint[] = [];
  const radio: ViewPoint[] = [];
  let beyondLoss = 0;
  for (const point of points) {
    const matched = matchedLossDb(chain.line, point.mhz, chain.lengthM);
    if (measuredAt === "feed-point") {
      feed.push({ mhz: point.mhz, swr: point.swr });
      radio.push({ mhz: point.mhz, swr: sameReference ? swrFromGamma(inputGammaMagnitude(gammaFromSwr(point.swr), matched)) : null });
    } else {
      const atLoad = sameReference ? loadSwrFromInputSwr(point.swr, matched) : null;
      if (sameReference && atLoad === null) beyondLoss++;
      feed.push({ mhz: point.mhz, swr: atLoad });
      radio.push({ mhz: point.mhz, swr: point.swr });
    }
  }
  if (!sameReference) {
    explanation.push(
      `The run is ${chain.line.label} (${z0} Ω), not 50 Ω like the analyser: an SWR reading alone cannot be carried through it. Measure R and X to compare the other end.`,
    );
  } else if (measuredAt === "feed-point") {
    explanation.push(`Measured at the feed point as SWR only: the SWR at the radio is computed through ${lineText(chain)} (${lossText}) as |Γ| at the radio = |Γ| at the feed point × 10^(−A/10).`);
  } else {
    explanation.push(
      `Measured at the radio end as SWR only: the SWR at the feed point is estimated from the SWR at the radio and the run's matched loss A (${lossText}): |Γ| at the feed point = |Γ| at the radio × 10^(A/10).`,
      "R and X at the feed point cannot be recovered from SWR: SWR carries no phase. The resonance is therefore taken at the SWR dip, which the feedline hardly moves.",
    );
    if (beyondLoss > 0) {
      explanation.push(
        `At ${beyondLoss} frequenc${beyondLoss === 1 ? "y" : "ies"} the SWR at the radio is higher than any load could give through this run's loss: the cable loses less than its figures say. Those points are left out at the feed point.`,
      );
    }
  }
  return { feed, radio, measuredAt, hasImpedance, explanation };
}
