/**
 * The contract's `plan` call: from a family, a band choice and the site, the
 * tuned cut lengths, the feed-point impedance, the sweep at the feed point and
 * at the radio, the 2:1 bandwidth, the feedline loss, the current along the
 * wires, the RF voltage at the wire ends, the RF-exposure distances and the cut
 * sheet. Bad input throws EngineInputError with `path: message` problems.
 */
import { complex } from "mathjs";
import { bandAt, bandByName, bandCentreMHz, type Band } from "./bands";
import { cutSheet, type CutSheet } from "./cut-sheet";
import { endVoltages, feedVoltageForPower, type EndVoltages } from "./end-voltage";
import { exposureDistances, type ExposureResult } from "./exposure";
import { familyModel } from "./families";
import type { ElementTarget, FamilyModel, RuleOfThumb, Site } from "./families/family";
import { MIN_CLEARANCE_M } from "./families/family";
import { throughFeedChain } from "./feedline";
import { TRANSFORMERS, feedlineType, type FeedlineType, type Transformer } from "./feedline-types";
import { GROUND_CAUTION, toSolverGround } from "./ground-classes";
import { wavelengthMetres } from "./physics";
import { planRequestSchema, type FamilyId, type PlanRequest } from "./plan-schema";
import { EngineInputError, parseOrThrow, problem } from "./problems";
import { tuneLengths } from "./resonance";
import { solveAt, solveSweep, type PreparedStructure, type Solution } from "./solver";
import { MAX_KA, type Structure, type Vec3 } from "./structure";
import { CLOSING_CAUTION, SAFETY_CAUTIONS } from "./cautions";

/** Sweep intervals per band: 41 points, band edges and centre among them. */
export const SWEEP_INTERVALS = 40;
/** The sweep spans 1.5 × the band, and at least 3 % of the centre frequency so narrow bands still show the SWR curve. */
const SWEEP_BAND_FACTOR = 1.5;
const SWEEP_MIN_FRACTION = 0.03;
/** Free-space gain of a half-wave dipole, used for every family's exposure estimate: the others have less, so it errs safe. */
export const EXPOSURE_GAIN_DBI = 2.15;
const SWR_LIMIT = 2;

export interface Impedance {
  r: number;
  x: number;
}

export interface SweepPoint {
  mhz: number;
  /** At the feed point: the antenna's impedance, and the SWR on the line after the balun or unun. */
  feed: Impedance & { swr: number };
  /** At the radio end of the feedline; SWR against 50 Ω. */
  radio: Impedance & { swr: number };
  totalLossDb: number;
}

export interface SwrBandwidth {
  lowMHz: number;
  highMHz: number;
  widthKHz: number;
  /** True where the SWR is still under 2 at the sweep's edge, so the bandwidth is at least this. */
  lowOpen: boolean;
  highOpen: boolean;
}

export interface WireCurrent {
  wire: number;
  label: string;
  from: Vec3;
  to: Vec3;
  /** Distance from the wire's `from` end and RMS current at the transmitter's power, at the centre frequency. */
  points: { distanceM: number; rmsA: number }[];
}

export interface PlanBand {
  band: Band;
  centreMHz: number;
  /** Where the feed-point reactance crosses zero, nearest the centre; null if it does not inside the sweep. */
  zeroReactanceMHz: number | null;
  /** The SWR dip at the feed point and at the radio (the sweep's lowest point, refined by a parabola). */
  minimumSwr: { feed: { mhz: number; swr: number }; radio: { mhz: number; swr: number } };
  feedImpedanceAtCentre: Impedance;
  radioImpedanceAtCentre: Impedance;
  swrAtCentre: { feed: number; radio: number };
  loss: { matchedDb: number; totalDb: number };
  swrBandwidth: { feed: SwrBandwidth | null; radio: SwrBandwidth | null };
  /** The SWR at the radio stays at or under 2:1 across the whole band: no tuner needed. */
  bandFitsUnder2to1: boolean;
  sweep: SweepPoint[];
  currents: WireCurrent[];
  endVoltages: EndVoltages;
  exposure: ExposureResult;
}

export interface PlanElement {
  band: string;
  centreMHz: number;
  lengthM: number;
  ruleOfThumb: RuleOfThumb;
  /** (tuned − rule of thumb) / rule of thumb, in percent. */
  differenceFromRulePercent: number;
}

export interface PlanResult {
  family: FamilyId;
  label: string;
  request: PlanRequest;
  elements: PlanElement[];
  transformer: Transformer;
  feedline: FeedlineType & { lengthM: number };
  bands: PlanBand[];
  cutSheet: CutSheet;
  cautions: string[];
  model: { segments: number; solves: number; converged: boolean; notes: string[] };
}

/** The elements to tune, one per band choice. */
function elementTargets(request: PlanRequest): ElementTarget[] {
  if (request.family === "fan-dipole") {
    return request.bands.map((name) => {
      const band = bandByName(name, request.region) as Band;
      return { band, targetMHz: bandCentreMHz(band) };
    });
  }
  if (request.band !== undefined) {
    const band = bandByName(request.band, request.region) as Band;
    return [{ band, targetMHz: bandCentreMHz(band) }];
  }
  const mhz = request.centreMHz as number;
  return [{ band: bandAt(mhz, request.region) as Band, targetMHz: mhz }];
}

function siteOf(request: PlanRequest): Site {
  return {
    heightM: request.heightM,
    wireDiameterMm: request.wireDiameterMm,
    conductor: request.conductor,
    ground: toSolverGround(request.ground),
  };
}

/**
 * A validated request's family model, for solving up to `topMHz` of its
 * elements (by default the top of the plan's sweep). Throws EngineInputError on
 * geometry the family cannot build or the thin-wire model cannot take.
 */
export function planModel(
  request: PlanRequest,
  topMHz: (elements: ElementTarget[]) => number = sweepTopMHz,
): FamilyModel {
  const model = familyModel(request, elementTargets(request), siteOf(request));
  const top = topMHz(model.elements);
  const thickest = (MAX_KA * wavelengthMetres(top) * 1000) / Math.PI;
  const problems = [
    ...model.problems(),
    ...(request.wireDiameterMm > thickest
      ? [`wireDiameterMm: too thick for a thin-wire model at ${significant(top)} MHz (at most ${significant(thickest)} mm)`]
      : []),
  ];
  if (problems.length > 0) throw new EngineInputError(problems);
  return model;
}

/** Sweep frequencies for a band: 41 points with the band edges (and its centre) on the grid. */
export function sweepFrequencies(band: Band): number[] {
  const width = band.highMHz - band.lowMHz;
  const span = Math.max(SWEEP_BAND_FACTOR * width, SWEEP_MIN_FRACTION * bandCentreMHz(band));
  const inBand = Math.max(2, 2 * Math.round((SWEEP_INTERVALS * width) / span / 2));
  const step = width / inBand;
  const below = (SWEEP_INTERVALS - inBand) / 2;
  return Array.from({ length: SWEEP_INTERVALS + 1 }, (_, i) => band.lowMHz + (i - below) * step);
}

/** Where `values` cross zero (either way), interpolated, nearest to `near`; null if they never do. */
export function zeroCrossing(mhz: number[], values: number[], near: number): number | null {
  let best: number | null = null;
  for (let i = 0; i + 1 < mhz.length; i++) {
    if (values[i] === 0 || values[i] * values[i + 1] < 0) {
      const f = mhz[i] + ((mhz[i + 1] - mhz[i]) * -values[i]) / (values[i + 1] - values[i]);
      if (best === null || Math.abs(f - near) < Math.abs(best - near)) best = f;
    }
  }
  return best;
}

/** The stretch around the SWR minimum where the SWR stays at or under 2, with its edges interpolated. */
export function swrBandwidth(mhz: number[], swr: number[]): SwrBandwidth | null {
  let lowest = 0;
  swr.forEach((value, i) => {
    if (value < swr[lowest]) lowest = i;
  });
  if (!(swr[lowest] <= SWR_LIMIT)) return null;
  let lo = lowest;
  while (lo > 0 && swr[lo - 1] <= SWR_LIMIT) lo -= 1;
  let hi = lowest;
  while (hi < swr.length - 1 && swr[hi + 1] <= SWR_LIMIT) hi += 1;
  const cross = (inside: number, outside: number) =>
    mhz[inside] + ((mhz[outside] - mhz[inside]) * (SWR_LIMIT - swr[inside])) / (swr[outside] - swr[inside]);
  const lowMHz = lo === 0 ? mhz[0] : cross(lo, lo - 1);
  const highMHz = hi === swr.length - 1 ? mhz[hi] : cross(hi, hi + 1);
  return { lowMHz, highMHz, widthKHz: (highMHz - lowMHz) * 1000, lowOpen: lo === 0, highOpen: hi === swr.length - 1 };
}

/** The lowest SWR of a sweep, refined by the parabola through it and its neighbours. */
export function swrMinimum(points: { mhz: number; swr: number }[]): { mhz: number; swr: number } {
  let i = 0;
  points.forEach((point, j) => {
    if (point.swr < points[i].swr) i = j;
  });
  if (i === 0 || i === points.length - 1) return points[i];
  const [a, b, c] = [points[i - 1], points[i], points[i + 1]];
  const curvature = a.swr - 2 * b.swr + c.swr;
  if (!(curvature > 0)) return b;
  const step = c.mhz - b.mhz;
  const offset = (0.5 * (a.swr - c.swr)) / curvature;
  return { mhz: b.mhz + offset * step, swr: b.swr - 0.25 * (a.swr - c.swr) * offset };
}

function distance(a: Vec3, b: Vec3): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);
}

function wireCurrents(structure: Structure, solution: Solution, wireLabels: string[], powerW: number): WireCurrent[] {
  const scale = feedVoltageForPower(solution, powerW) / Math.SQRT2;
  return structure.wires.map((w, index) => ({
    wire: index,
    label: wireLabels[index],
    from: w.from,
    to: w.to,
    points: solution.segments
      .filter((segment) => segment.wire === index)
      .map((segment) => {
        const middle: Vec3 = [0, 1, 2].map((c) => (segment.start[c] + segment.end[c]) / 2) as Vec3;
        return { distanceM: distance(w.from, middle), rmsA: scale * Math.hypot(segment.current.re, segment.current.im) };
      }),
  }));
}

function bandResult(
  request: PlanRequest,
  model: FamilyModel,
  element: ElementTarget,
  prepared: PreparedStructure,
  structure: Structure,
  wireLabels: string[],
  transformer: Transformer,
  line: FeedlineType,
): PlanBand {
  const mhz = sweepFrequencies(element.band);
  const solutions = solveSweep(prepared, mhz);
  const centreIndex = mhz.findIndex((f) => Math.abs(f - element.targetMHz) < 1e-9);
  const centre = centreIndex >= 0 ? solutions[centreIndex] : solveAt(prepared, element.targetMHz);
  const chain = (solution: Solution) =>
    throughFeedChain(
      complex(solution.impedance.r, solution.impedance.x),
      transformer,
      line,
      request.feedline.lengthM,
      solution.mhz,
    );
  const sweep = solutions.map((solution): SweepPoint => {
    const point = chain(solution);
    return {
      mhz: solution.mhz,
      feed: { ...solution.impedance, swr: point.swrFeed },
      radio: { r: point.zRadio.re, x: point.zRadio.im, swr: point.swrRadio },
      totalLossDb: point.totalLossDb,
    };
  });
  const atCentre = chain(centre);
  const inBand = sweep.filter((p) => p.mhz >= element.band.lowMHz - 1e-9 && p.mhz <= element.band.highMHz + 1e-9);
  return {
    band: element.band,
    centreMHz: element.targetMHz,
    zeroReactanceMHz: zeroCrossing(
      mhz,
      solutions.map((solution) => solution.impedance.x),
      element.targetMHz,
    ),
    minimumSwr: {
      feed: swrMinimum(sweep.map((p) => ({ mhz: p.mhz, swr: p.feed.swr }))),
      radio: swrMinimum(sweep.map((p) => ({ mhz: p.mhz, swr: p.radio.swr }))),
    },
    feedImpedanceAtCentre: centre.impedance,
    radioImpedanceAtCentre: { r: atCentre.zRadio.re, x: atCentre.zRadio.im },
    swrAtCentre: { feed: atCentre.swrFeed, radio: atCentre.swrRadio },
    loss: { matchedDb: atCentre.matchedLossDb, totalDb: atCentre.totalLossDb },
    swrBandwidth: {
      feed: swrBandwidth(mhz, sweep.map((p) => p.feed.swr)),
      radio: swrBandwidth(mhz, sweep.map((p) => p.radio.swr)),
    },
    bandFitsUnder2to1: inBand.every((p) => p.radio.swr <= SWR_LIMIT),
    sweep,
    currents: wireCurrents(structure, centre, wireLabels, request.transmitter.powerW),
    endVoltages: endVoltages(structure, centre, wireLabels, request.transmitter.powerW),
    exposure: exposureDistances({
      mhz: element.targetMHz,
      pepW: request.transmitter.powerW,
      mode: request.transmitter.mode,
      gainDbi: EXPOSURE_GAIN_DBI,
      transmitTimeFraction: request.transmitter.transmitTimeFraction,
    }),
  };
}

const STANDING_CAUTIONS = [SAFETY_CAUTIONS.powerLines, SAFETY_CAUTIONS.fallZone, CLOSING_CAUTION];

function planCautions(request: PlanRequest, model: FamilyModel, converged: boolean, line: FeedlineType): string[] {
  const cautions = [...STANDING_CAUTIONS, ...model.notes];
  const lowest = Math.min(...model.elements.map((element) => element.targetMHz));
  if (toSolverGround(request.ground).kind === "real") {
    cautions.push(GROUND_CAUTION);
    if (request.heightM < 0.1 * wavelengthMetres(lowest)) {
      cautions.push(
        "The antenna is lower than 0.1 λ: ground loss and the ground model's error grow this close, so expect to trim more than usual.",
      );
    }
  }
  if (!converged) cautions.push("The length search did not fully settle; the cut lengths may be off by more than usual.");
  cautions.push(`Feedline figures: ${line.provenance}`);
  cautions.push(`Wires are kept at least ${MIN_CLEARANCE_M} m above the ground (common practice).`);
  return cautions;
}

/** Highest frequency any band's sweep reaches. */
function sweepTopMHz(elements: ElementTarget[]): number {
  return Math.max(...elements.map((element) => Math.max(...sweepFrequencies(element.band))));
}

/** Every number to six significant figures: more than the model's accuracy, and short enough to read. */
export function significant<T>(value: T): T {
  if (typeof value === "number") return (Number.isFinite(value) ? Number(value.toPrecision(6)) : value) as T;
  if (Array.isArray(value)) return value.map((item) => significant(item)) as T;
  if (value !== null && typeof value === "object") {
    return Object.fromEntries(Object.entries(value).map(([key, item]) => [key, significant(item)])) as T;
  }
  return value;
}

/**
 * Run solver work for a request whose fields already passed every check. Should
 * the solver still refuse the geometry a family built, say so against the
 * request, not against wires the caller never wrote.
 */
export function asRequestProblems<T>(run: () => T): T {
  try {
    return run();
  } catch (error) {
    if (!(error instanceof EngineInputError)) throw error;
    throw new EngineInputError(error.problems.map((line) => problem([], `this antenna cannot be modelled as asked (${line})`)));
  }
}

/** The plan for a request (unknown input is validated first). */
export function plan(input: unknown): PlanResult {
  const request = parseOrThrow(planRequestSchema, input);
  const model = planModel(request);
  return asRequestProblems(() => planFor(request, model));
}

function planFor(request: PlanRequest, model: FamilyModel): PlanResult {
  const start = model.ruleOfThumb.map((rule) => rule.lengthM);
  const tuned = tuneLengths(model, start, sweepTopMHz(model.elements));
  const { structure, wireLabels } = model.build(tuned.lengths);
  const transformer = TRANSFORMERS[model.transformer];
  const line = feedlineType(request.feedline.type);
  const bands = model.elements.map((element) =>
    bandResult(request, model, element, tuned.prepared, structure, wireLabels, transformer, line),
  );
  const sweepSolves = bands.reduce((sum, band) => sum + band.sweep.length, 0);
  return significant({
    family: model.family,
    label: model.label,
    request,
    elements: model.elements.map((element, k) => ({
      band: element.band.name,
      centreMHz: element.targetMHz,
      lengthM: tuned.lengths[k],
      ruleOfThumb: model.ruleOfThumb[k],
      differenceFromRulePercent: (100 * (tuned.lengths[k] - model.ruleOfThumb[k].lengthM)) / model.ruleOfThumb[k].lengthM,
    })),
    transformer,
    feedline: { ...line, lengthM: request.feedline.lengthM },
    bands,
    cutSheet: cutSheet(model.cutPieces(tuned.lengths)),
    cautions: planCautions(request, model, tuned.converged, line),
    model: {
      segments: tuned.prepared.segmentCount,
      solves: tuned.solves + sweepSolves,
      converged: tuned.converged,
      notes: [
        model.tuning.kind === "zero-reactance"
          ? "Thin-wire method of moments on the real geometry; cut lengths found by iterating the solver until the feed-point reactance crosses zero at each element's centre frequency."
          : "Thin-wire method of moments on the real geometry; the cut length found by iterating the solver for the lowest SWR at the centre frequency through the unun.",
        "Baluns and ununs are ideal transformers; the feedline is a lossy line with the matched-loss fit of its type.",
      ],
    },
  });
}
