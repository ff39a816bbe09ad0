// Comparing a measured sweep with the plan: per band, the measured resonance (where X crosses
// zero, or the SWR dip), its shift from the predicted one, the measured 2:1 bandwidth at the
// radio, whether the whole band fits under 2:1, and what to ask the engine's trim for.
import type { PlanResult, SwrBandwidth } from "@/lib/antenna/plan";
import { planModel, swrBandwidth, swrMinimum, zeroCrossing } from "@/lib/antenna/plan";
import type { Tuning } from "@/lib/antenna/resonance";
import type { TrimRequestInput, TrimResult } from "@/lib/antenna/trim";
import type { PlanRequest } from "@/lib/antenna/plan-schema";
import { chainOf, sweepViews, type FeedChainRef, type SweepPlace, type SweepViews, type ViewPoint } from "./feed-point";
import type { MeasuredPoint } from "./parse";

/** A band's part of a sweep: within ±15 % of its centre, so the bands of a fan dipole (20, 15, 10 m) never share points. */
export const BAND_WINDOW = 0.15;
/** A resonance within 0.3 % of the prediction is on target: less than a sweep's usual step or a half cut changes (common practice). */
export const ON_TARGET_PERCENT = 0.3;
const SWR_LIMIT = 2;

export type ResonanceMethod = "reactance-zero" | "swr-minimum";
export type BandFit = "yes" | "no" | "not-covered" | "unknown";

export interface BandComparison {
  band: string;
  lowMHz: number;
  highMHz: number;
  targetMHz: number;
  /** How the resonance was read, the same way for the prediction and the measurement. */
  method: ResonanceMethod;
  predictedMHz: number | null;
  measuredMHz: number | null;
  shiftKHz: number | null;
  shiftPercent: number | null;
  verdict: "low" | "high" | "on-target" | "not-found";
  /** The resonance in the engine's own terms (where X crosses zero, or the best match for an end-fed), for the trim. */
  trimMHz: number | null;
  /** The 2:1 bandwidth at the radio end, measured or carried there through the feedline. */
  bandwidth: SwrBandwidth | null;
  bandFits: BandFit;
  /** The stretch of the band's window the sweep covers. */
  coveredMHz: [number, number];
  notes: string[];
}

export type TrimOutcome =
  | { ok: true; result: TrimResult; builtLengthsM: number[]; builtFrom: "plan" | "uploader" }
  | { ok: false; reason: string };

export interface SweepAnalysis {
  chain: FeedChainRef;
  bands: BandComparison[];
  trim: TrimOutcome;
  /**
   * The measured resonance against the model of the antenna as built, per band, in per cent:
   * what the plan library learns from. Negative: the real antenna resonates lower.
   */
  offsets: { band: string; offsetPercent: number }[];
  explanation: string[];
}

const inWindow = (points: ViewPoint[], centre: number) =>
  points.filter((point) => point.mhz >= centre * (1 - BAND_WINDOW) && point.mhz <= centre * (1 + BAND_WINDOW));

const withSwr = (points: ViewPoint[]) => points.filter((point): point is ViewPoint & { swr: number } => point.swr !== null);

/** The SWR dip, when its lowest point lies inside the sweep (at an end, the dip is beyond it). */
function interiorDip(points: { mhz: number; swr: number }[]): { mhz: number; swr: number } | null {
  if (points.length < 3) return null;
  // swrMinimum hands back the end point itself when the lowest reading is at an end.
  const dip = swrMinimum(points);
  return dip === points[0] || dip === points[points.length - 1] ? null : dip;
}

function bandFit(radio: { mhz: number; swr: number }[], low: number, high: number): BandFit {
  if (radio.length === 0) return "unknown";
  const inBand = radio.filter((point) => point.mhz >= low && point.mhz <= high);
  if (inBand.length === 0) return "not-covered";
  if (inBand.some((point) => point.swr > SWR_LIMIT)) return "no";
  const steps = radio.slice(1).map((point, index) => point.mhz - radio[index].mhz);
  const tolerance = steps.sort((a, b) => a - b)[Math.floor(steps.length / 2)] ?? 0;
  return radio[0].mhz <= low + tolerance && radio[radio.length - 1].mhz >= high - tolerance ? "yes" : "not-covered";
}

/** Compares the sweep with each band of the plan it reaches; bands it does not reach are left out. */
export function compareWithPlan(views: SweepViews, plan: PlanResult, tuning: Tuning["kind"]): BandComparison[] {
  return plan.bands.flatMap((band): BandComparison[] => {
    const feed = inWindow(views.feed, band.centreMHz);
    const radio = withSwr(inWindow(views.radio, band.centreMHz));
    if (feed.length < 3 && radio.length < 3) return [];
    const notes: string[] = [];
    const feedSwr = withSwr(feed);

    let method: ResonanceMethod = "swr-minimum";
    let measuredMHz: number | null = null;
    let predictedMHz: number | null = null;
    if (tuning === "zero-reactance" && views.hasImpedance && band.zeroReactanceMHz !== null) {
      measuredMHz = zeroCrossing(
        feed.map((point) => point.mhz),
        feed.map((point) => point.x as number),
        band.zeroReactanceMHz,
      );
      if (measuredMHz !== null) {
        method = "reactance-zero";
        predictedMHz = band.zeroReactanceMHz;
      } else {
        notes.push("X does not cross zero inside the sweep: the resonance is read at the SWR dip instead.");
      }
    }
    if (method === "swr-minimum") {
      // The dip at the feed point when it is known; otherwise at the radio, where the line hardly moves it.
      const atFeed = feedSwr.length >= 3;
      const dip = interiorDip(atFeed ? feedSwr : radio);
      measuredMHz = dip?.mhz ?? null;
      predictedMHz = atFeed ? band.minimumSwr.feed.mhz : band.minimumSwr.radio.mhz;
      if (!dip) {
        const points = atFeed ? feedSwr : radio;
        const falling = points.length > 1 && points[0].swr < points[points.length - 1].swr ? "low" : "high";
        notes.push(`The SWR keeps falling toward the sweep's ${falling} end: the resonance lies beyond it. Sweep wider.`);
      }
    }

    const shiftKHz = measuredMHz !== null && predictedMHz !== null ? (measuredMHz - predictedMHz) * 1000 : null;
    const shiftPercent = measuredMHz !== null && predictedMHz !== null ? (measuredMHz / predictedMHz - 1) * 100 : null;
    const verdict = shiftPercent === null ? "not-found" : Math.abs(shiftPercent) <= ON_TARGET_PERCENT ? "on-target" : shiftPercent < 0 ? "low" : "high";
    // The engine trims an X-zero family for its zero crossing: a dip is carried over by the ratio the model has between them.
    const trimMHz =
      measuredMHz === null
        ? null
        : tuning === "zero-reactance" && method === "swr-minimum" && band.zeroReactanceMHz !== null && predictedMHz !== null
          ? measuredMHz * (band.zeroReactanceMHz / predictedMHz)
          : measuredMHz;
    if (views.measuredAt === "feed-point" && radio.length > 0) notes.push("The bandwidth and the fit at the radio are carried there through the feedline.");
    const covered = feed.length > 0 ? feed : radio;
    return [
      {
        band: band.band.name,
        lowMHz: band.band.lowMHz,
        highMHz: band.band.highMHz,
        targetMHz: band.centreMHz,
        method,
        predictedMHz,
        measuredMHz,
        shiftKHz,
        shiftPercent,
        verdict,
        trimMHz,
        bandwidth: radio.length >= 3 ? swrBandwidth(radio.map((point) => point.mhz), radio.map((point) => point.swr)) : null,
        bandFits: bandFit(radio, band.band.lowMHz, band.band.highMHz),
        coveredMHz: [covered[0].mhz, covered[covered.length - 1].mhz],
        notes,
      },
    ];
  });
}

/**
 * The engine's trim request for a sweep: one measured resonance per element of the plan. A fan
 * dipole's elements interact, so every band must have been swept and found.
 */
export function trimRequestOf(
  request: PlanRequest,
  plan: PlanResult,
  bands: BandComparison[],
  builtLengthsM: number[] | null,
): { ok: true; input: TrimRequestInput } | { ok: false; reason: string } {
  const measuredMHz: number[] = [];
  for (const element of plan.elements) {
    const found = bands.find((band) => band.band === element.band)?.trimMHz ?? null;
    if (found === null) {
      return {
        ok: false,
        reason:
          plan.elements.length > 1
            ? `No resonance was found for ${element.band}: sweep every band of this antenna to get trim advice, as its elements pull on each other.`
            : `No resonance was found for ${element.band}: sweep across it to get trim advice.`,
      };
    }
    measuredMHz.push(found);
  }
  // Built to plan means the plan's own cut lengths: the engine need not search for them again.
  return { ok: true, input: { plan: request, measuredMHz, builtLengthsM: builtLengthsM ?? plan.elements.map((element) => element.lengthM) } };
}

/**
 * How far the real antenna sits from the model of the same wire: the measured resonance
 * against the model's resonance for the lengths as built. Without the engine's answer, a sweep
 * of an antenna cut to the plan's own lengths still compares with the plan's prediction.
 */
export function measuredOffsets(bands: BandComparison[], trim: TrimOutcome, builtToPlan: boolean): { band: string; offsetPercent: number }[] {
  return bands.flatMap((band) => {
    if (band.trimMHz === null) return [];
    const modelMHz = trim.ok ? trim.result.elements.find((element) => element.band === band.band)?.modelMHz : null;
    if (modelMHz) return [{ band: band.band, offsetPercent: (band.trimMHz / modelMHz - 1) * 100 }];
    return builtToPlan && band.shiftPercent !== null ? [{ band: band.band, offsetPercent: band.shiftPercent }] : [];
  });
}

export interface Comparison {
  chain: FeedChainRef;
  views: SweepViews;
  bands: BandComparison[];
}

/** The sweep through the plan's balun or unun and feedline, compared band by band with the plan. */
export function compareSweep(points: MeasuredPoint[], place: SweepPlace, plan: PlanResult): Comparison {
  const chain: FeedChainRef = { transformerId: plan.transformer.id, feedlineType: plan.feedline.id, lengthM: plan.feedline.lengthM };
  const views = sweepViews(points, place, chainOf(chain));
  return { chain, views, bands: compareWithPlan(views, plan, planModel(plan.request).tuning.kind) };
}

/** The analysis kept with a sweep, once the engine's trim has answered (or could not). */
export function analysisOf(comparison: Comparison, trim: TrimOutcome, builtToPlan: boolean): SweepAnalysis {
  return {
    chain: comparison.chain,
    bands: comparison.bands,
    trim,
    offsets: measuredOffsets(comparison.bands, trim, builtToPlan),
    explanation: comparison.views.explanation,
  };
}
