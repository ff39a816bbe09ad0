/**
 * Cut lengths by iterating the solver on the real geometry.
 *
 * Most families are tuned for zero reactance: each element's length is
 * adjusted until the feed-point reactance rises through zero at that element's
 * centre frequency. The search starts from the rule of thumb and runs a
 * safeguarded secant on every element at once (a diagonal secant: each
 * element's own history gives its slope, and the elements' mutual loading is
 * absorbed over the iterations).
 *
 * The end-fed half-wave is tuned for the best match instead: the radiator
 * length that gives the lowest SWR at the centre frequency through its unun
 * (Brent's minimisation). Its short counterpoise adds a reactance in series, so
 * the feed impedance often never becomes purely resistive; builders trim an
 * end-fed wire for the SWR dip, and so does the plan (common practice).
 *
 * Both run first on a coarse segmentation, then continue on the solver's own
 * segmentation from the coarse answer, which needs a few solves more.
 */
import { complex } from "mathjs";
import { gammaFromSwr, swr } from "./feedline";
import type { FamilyModel } from "./families/family";
import { prepareStructure, solveAt, type PreparedStructure, type Solution } from "./solver";

/** Coarse segmentation for the length search, segments per wavelength. */
export const COARSE_SEGMENTS_PER_WAVELENGTH = 16;
/** Stop when no length (or frequency) changes by more than this fraction (0.1 mm per metre). */
export const LENGTH_TOLERANCE = 1e-4;
const MAX_COARSE_ITERATIONS = 12;
const MAX_FINE_ITERATIONS = 4;
/** First probe of a secant: 2 % shorter or longer, the way the first reading points. */
const FIRST_STEP = 0.02;
/** No secant step may change a length by more than 10 %. */
const MAX_STEP = 0.1;
/** Best-match search on the solver's segmentation: within 1 % of the coarse answer. */
const FINE_BRACKET = 0.01;

/**
 * How a family is tuned: for zero reactance, or for the best match against
 * `referenceOhms` with the length somewhere in `lengthRangeM`.
 */
export type Tuning =
  | { kind: "zero-reactance" }
  | { kind: "best-match"; referenceOhms: number; lengthRangeM: [number, number] };

/**
 * What the search drives: the reactance (a root, rising with length and with
 * frequency) or the reflection magnitude against the matched reference (a minimum).
 */
export function tuningMeasure(solution: Solution, tuning: Tuning): number {
  const { r, x } = solution.impedance;
  return tuning.kind === "zero-reactance" ? x : gammaFromSwr(swr(complex(r, x), tuning.referenceOhms));
}

export interface TunedAntenna {
  lengths: number[];
  /** The solver-segmented structure at the tuned lengths, prepared up to `maxMHz`. */
  prepared: PreparedStructure;
  solves: number;
  converged: boolean;
}

/** Points tried so far, x (a length or a frequency) against the measure. */
interface History {
  xs: number[];
  values: number[];
}

interface Counter {
  solves: number;
}

type Segmentation = number | undefined;

function prepare(model: FamilyModel, lengths: number[], maxMHz: number, segmentsPerWavelength: Segmentation) {
  const segmentation = segmentsPerWavelength === undefined ? undefined : { segmentsPerWavelength, maxMHz };
  return prepareStructure(model.build(lengths, segmentation).structure, maxMHz);
}

function measureAll(model: FamilyModel, prepared: PreparedStructure, counter: Counter): number[] {
  return model.elements.map((element) => {
    counter.solves += 1;
    return tuningMeasure(solveAt(prepared, element.targetMHz), model.tuning);
  });
}

/**
 * Secant step from the last two points (the measure rises with x), kept inside
 * the tightest bracket seen so far (bisecting when the secant leaves it) and
 * limited to MAX_STEP.
 */
function secantStep(history: History): number {
  const n = history.xs.length;
  const [x0, x1] = [history.xs[n - 2], history.xs[n - 1]];
  const [g0, g1] = [history.values[n - 2], history.values[n - 1]];
  let next = g1 === g0 ? x1 : x1 - (g1 * (x1 - x0)) / (g1 - g0);
  let below = -Infinity;
  let above = Infinity;
  history.xs.forEach((x, i) => {
    if (history.values[i] < 0) below = Math.max(below, x);
    else above = Math.min(above, x);
  });
  if (Number.isFinite(below) && Number.isFinite(above) && !(next > below && next < above)) next = (below + above) / 2;
  return Math.min(Math.max(next, x1 * (1 - MAX_STEP)), x1 * (1 + MAX_STEP));
}

/** Slope from the last two points of a history, if they give a rising one. */
function lastSlope(history: History): number | undefined {
  const n = history.xs.length;
  if (n < 2) return undefined;
  const slope = (history.values[n - 1] - history.values[n - 2]) / (history.xs[n - 1] - history.xs[n - 2]);
  return Number.isFinite(slope) && slope > 0 ? slope : undefined;
}

interface SearchResult {
  lengths: number[];
  prepared: PreparedStructure;
  histories: History[];
  converged: boolean;
}

/**
 * Zero reactance on every element at once: the diagonal secant from `start`.
 * `slopes` (from the coarse search) make the first step a Newton step instead of a probe.
 */
function zeroReactanceSearch(
  model: FamilyModel,
  start: number[],
  maxMHz: number,
  segmentsPerWavelength: Segmentation,
  maxIterations: number,
  counter: Counter,
  slopes?: (number | undefined)[],
): SearchResult {
  let lengths = start;
  let prepared = prepare(model, lengths, maxMHz, segmentsPerWavelength);
  let values = measureAll(model, prepared, counter);
  const histories: History[] = lengths.map((length, k) => ({ xs: [length], values: [values[k]] }));
  for (let iteration = 0; iteration < maxIterations; iteration++) {
    const next = lengths.map((length, k) => {
      if (histories[k].xs.length >= 2) return secantStep(histories[k]);
      const slope = slopes?.[k];
      const step = slope === undefined ? -Math.sign(values[k]) * FIRST_STEP * length : -values[k] / slope;
      return length + Math.min(Math.max(step, -MAX_STEP * length), MAX_STEP * length);
    });
    if (next.every((length, k) => Math.abs(length - lengths[k]) <= LENGTH_TOLERANCE * lengths[k])) {
      return { lengths, prepared, histories, converged: true };
    }
    lengths = next;
    prepared = prepare(model, lengths, maxMHz, segmentsPerWavelength);
    values = measureAll(model, prepared, counter);
    lengths.forEach((length, k) => {
      histories[k].xs.push(length);
      histories[k].values.push(values[k]);
    });
  }
  return { lengths, prepared, histories, converged: false };
}

const GOLDEN = (3 - Math.sqrt(5)) / 2;

/**
 * Brent's minimisation of f on [lo, hi] (golden-section steps with parabolic
 * interpolation), to a relative tolerance on x.
 */
export function brentMinimum(
  f: (x: number) => number,
  lo: number,
  hi: number,
  relativeTolerance: number,
  maxIterations: number,
): { x: number; value: number; converged: boolean } {
  let [a, b] = [lo, hi];
  let x = a + GOLDEN * (b - a);
  let [w, v] = [x, x];
  let fx = f(x);
  let [fw, fv] = [fx, fx];
  let [d, e] = [0, 0];
  for (let iteration = 0; iteration < maxIterations; iteration++) {
    const middle = (a + b) / 2;
    const tol = relativeTolerance * Math.abs(x) + 1e-12;
    if (Math.abs(x - middle) <= 2 * tol - (b - a) / 2) return { x, value: fx, converged: true };
    let golden = true;
    if (Math.abs(e) > tol) {
      // Parabola through x, w, v.
      const r = (x - w) * (fx - fv);
      let q = (x - v) * (fx - fw);
      let p = (x - v) * q - (x - w) * r;
      q = 2 * (q - r);
      if (q > 0) p = -p;
      q = Math.abs(q);
      if (Math.abs(p) < Math.abs(0.5 * q * e) && p > q * (a - x) && p < q * (b - x)) {
        e = d;
        d = p / q;
        const u = x + d;
        if (u - a < 2 * tol || b - u < 2 * tol) d = x < middle ? tol : -tol;
        golden = false;
      }
    }
    if (golden) {
      e = (x < middle ? b : a) - x;
      d = GOLDEN * e;
    }
    const u = Math.abs(d) >= tol ? x + d : x + (d > 0 ? tol : -tol);
    const fu = f(u);
    if (fu <= fx) {
      if (u < x) b = x;
      else a = x;
      [v, fv, w, fw, x, fx] = [w, fw, x, fx, u, fu];
    } else {
      if (u < x) a = u;
      else b = u;
      if (fu <= fw || w === x) {
        [v, fv, w, fw] = [w, fw, u, fu];
      } else if (fu <= fv || v === x || v === w) {
        [v, fv] = [u, fu];
      }
    }
  }
  return { x, value: fx, converged: false };
}

/** Best match for a single-element family: Brent on the length between the given bounds. */
function bestMatchSearch(
  model: FamilyModel,
  bounds: [number, number],
  maxMHz: number,
  segmentsPerWavelength: Segmentation,
  counter: Counter,
): { length: number; converged: boolean } {
  const target = model.elements[0].targetMHz;
  const found = brentMinimum(
    (length) => {
      counter.solves += 1;
      return tuningMeasure(solveAt(prepare(model, [length], maxMHz, segmentsPerWavelength), target), model.tuning);
    },
    bounds[0],
    bounds[1],
    LENGTH_TOLERANCE,
    MAX_COARSE_ITERATIONS * 2,
  );
  return { length: found.x, converged: found.converged };
}

/**
 * Tune every element of the model, starting from `start` (the rule of thumb,
 * or the lengths as built). `maxMHz` is the highest frequency the caller will
 * solve at, so the returned prepared structure can be swept as it is.
 */
export function tuneLengths(model: FamilyModel, start: number[], maxMHz: number): TunedAntenna {
  const counter: Counter = { solves: 0 };
  if (model.tuning.kind === "best-match") {
    const coarse = bestMatchSearch(model, model.tuning.lengthRangeM, maxMHz, COARSE_SEGMENTS_PER_WAVELENGTH, counter);
    const fine = bestMatchSearch(
      model,
      [coarse.length * (1 - FINE_BRACKET), coarse.length * (1 + FINE_BRACKET)],
      maxMHz,
      undefined,
      counter,
    );
    return {
      lengths: [fine.length],
      prepared: prepare(model, [fine.length], maxMHz, undefined),
      solves: counter.solves,
      converged: coarse.converged && fine.converged,
    };
  }
  const coarse = zeroReactanceSearch(model, start, maxMHz, COARSE_SEGMENTS_PER_WAVELENGTH, MAX_COARSE_ITERATIONS, counter);
  // Re-measure the coarse answer on the solver's segmentation; the coarse slope carries over.
  const fine = zeroReactanceSearch(
    model,
    coarse.lengths,
    maxMHz,
    undefined,
    MAX_FINE_ITERATIONS,
    counter,
    coarse.histories.map(lastSlope),
  );
  return { lengths: fine.lengths, prepared: fine.prepared, solves: counter.solves, converged: fine.converged };
}

/** How far from the start frequency a resonance is looked for. */
const FREQUENCY_SEARCH_RANGE = 0.15;

/**
 * Where a prepared structure resonates near `startMHz` by the model's tuning
 * (the reactance's rising zero, or the best match), or null if not within
 * ±15 % and the prepared range.
 */
export function resonantFrequency(prepared: PreparedStructure, tuning: Tuning, startMHz: number): number | null {
  const at = (mhz: number) => tuningMeasure(solveAt(prepared, mhz), tuning);
  const lo = startMHz * (1 - FREQUENCY_SEARCH_RANGE);
  const hi = Math.min(startMHz * (1 + FREQUENCY_SEARCH_RANGE), prepared.maxMHz);
  if (tuning.kind === "best-match") {
    const found = brentMinimum(at, lo, hi, LENGTH_TOLERANCE, MAX_COARSE_ITERATIONS * 2);
    const insideEdges = found.x > lo * (1 + 1e-3) && found.x < hi * (1 - 1e-3);
    return found.converged && insideEdges ? found.x : null;
  }
  const history: History = { xs: [startMHz], values: [at(startMHz)] };
  let next = startMHz * (1 - Math.sign(history.values[0]) * FIRST_STEP);
  for (let iteration = 0; iteration < MAX_COARSE_ITERATIONS; iteration++) {
    const last = history.xs[history.xs.length - 1];
    if (Math.abs(next - last) <= LENGTH_TOLERANCE * last) return last;
    if (!(next >= lo && next <= hi)) return null;
    history.xs.push(next);
    history.values.push(at(next));
    next = secantStep(history);
  }
  return null;
}
