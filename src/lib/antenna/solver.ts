/**
 * Thin-wire method-of-moments solver: the reaction (Galerkin) formulation with
 * piecewise-sinusoidal basis and test functions, after J. H. Richmond,
 * "Radiation and scattering by thin-wire structures in the complex frequency
 * domain" (NASA CR-2396, 1974), with the exact near field of a sinusoidal
 * current filament (kernel.ts) and Gauss–Legendre quadrature along the test
 * segment. Every basis function spans the two segments meeting at a node
 * (a "V-dipole"); at a junction of n wires, n − 1 basis functions share one
 * reference segment (the fed one when the source is at the junction), which
 * keeps Kirchhoff's current law. A wire end on a perfect ground plane carries a
 * half basis function completed by its image. The source is a delta-gap
 * voltage at a node. Grounds: free space, perfect ground by images, real ground
 * by the reflection-coefficient approximation (ground.ts). Copper or aluminium
 * wires add their skin-effect impedance (skin-effect.ts). The Galerkin matrix
 * is symmetric, so each pair of segments is integrated once.
 *
 * Junctions of wires of different diameters: the thin-wire kernel between two
 * segments uses the root mean square of their radii (kernel.ts), and the basis
 * functions ignore the diameter step (no charge redistribution at the step).
 * Like any thin-wire code, results at such junctions converge slowly with
 * segment length; keep segments near a step in diameter short and of similar
 * length on both sides.
 */
import { luFactor, luSolve } from "./complex-lu";
import { imageFactors, groundPermittivity } from "./ground";
import { farOrder, nearPoints, plainPoints, react, type SegmentGeometry, type TestPoints } from "./kernel";
import { SPEED_OF_LIGHT, Z0 } from "./physics";
import { monopoleOverlaps, wireImpedancePerMetre } from "./skin-effect";
import { segmentDistance, segmentStructure, type SegmentedStructure, type Structure, type Vec3 } from "./structure";

export interface Complex {
  re: number;
  im: number;
}
/** Current at the segment's middle, along the segment from `start` to `end`, for 1 V at the feed. */
export interface SegmentCurrent {
  wire: number;
  start: Vec3;
  end: Vec3;
  current: Complex;
}
export interface Solution {
  mhz: number;
  impedance: { r: number; x: number };
  feedCurrent: Complex;
  segments: SegmentCurrent[];
}
/** A structure segmented and set up for solving up to `maxMHz`: everything that does not change with frequency. */
export interface PreparedStructure {
  readonly segmentCount: number;
  readonly maxMHz: number;
}

class Prepared implements PreparedStructure {
  constructor(
    readonly segmentCount: number,
    readonly maxMHz: number,
    readonly seg: SegmentedStructure,
    readonly geometry: SegmentGeometry,
    readonly basisCount: number,
    /** Basis functions using each monopole (index 2·segment + end), CSR: monoStart, monoBasis, monoSign. */
    readonly monoStart: Int32Array,
    readonly monoBasis: Int32Array,
    readonly monoSign: Float64Array,
    /** Voltage of a 1 V delta gap seen by each basis function. */
    readonly excitation: Float64Array,
    readonly pairs: PairPlans,
  ) {}
}

/**
 * Reactions are computed for every ordered pair (test segment, source segment):
 * with the node charges left out of the monopole fields (kernel.ts), a single
 * monopole pair is not reciprocal, only whole basis functions are. Pairs that
 * are translates of each other (same lengths, radii, directions and relative
 * position, and the same heights over a ground) share one "block", which makes
 * the fill of straight, evenly cut wires nearly linear in the segment count.
 */
interface PairPlans {
  /** Block index of the ordered pair (test t, source q), at t·count + q. */
  blockOf: Int32Array;
  blockCount: number;
  /** Per block: a representative test and source segment and its quadrature plans. */
  test: Int32Array;
  source: Int32Array;
  freePlan: Int32Array;
  imagePlan: Int32Array;
  /** Real ground, per block: cos of the angle of incidence, and the horizontal unit vector ⊥ the plane of incidence. */
  cosTheta: Float64Array;
  horizontal: Float64Array;
  plans: TestPoints[];
}

function endPoint(array: Float64Array, i: number, mirror: boolean): [number, number, number] {
  return [array[3 * i], array[3 * i + 1], mirror ? -array[3 * i + 2] : array[3 * i + 2]];
}

function buildGeometry(seg: SegmentedStructure): SegmentGeometry {
  const dir = new Float64Array(3 * seg.count);
  const length = new Float64Array(seg.count);
  for (let i = 0; i < seg.count; i++) {
    const dx = seg.end[3 * i] - seg.start[3 * i];
    const dy = seg.end[3 * i + 1] - seg.start[3 * i + 1];
    const dz = seg.end[3 * i + 2] - seg.start[3 * i + 2];
    const d = Math.hypot(dx, dy, dz);
    length[i] = d;
    dir[3 * i] = dx / d;
    dir[3 * i + 1] = dy / d;
    dir[3 * i + 2] = dz / d;
  }
  return { count: seg.count, start: seg.start, dir, length };
}

interface Bases {
  count: number;
  monoStart: Int32Array;
  monoBasis: Int32Array;
  monoSign: Float64Array;
  excitation: Float64Array;
}

/** Basis functions from the node connectivity, and the excitation of a 1 V gap at the feed. */
function buildBases(seg: SegmentedStructure): Bases {
  const ends: number[][] = Array.from({ length: seg.nodeCount }, () => []);
  for (let i = 0; i < seg.count; i++) {
    ends[seg.startNode[i]].push(2 * i);
    ends[seg.endNode[i]].push(2 * i + 1);
  }
  const feedMono = 2 * seg.feedSegment + seg.feedEnd;
  const terms: { mono: number; sign: number }[][] = [];
  ends.forEach((monos, node) => {
    if (seg.groundNode[node] === 1) {
      for (const mono of monos) terms.push([{ mono, sign: 1 }]);
    } else if (monos.length >= 2) {
      const reference = monos.includes(feedMono) ? feedMono : monos[0];
      for (const mono of monos) if (mono !== reference) terms.push([{ mono, sign: 1 }, { mono: reference, sign: -1 }]);
    }
  });
  const perMono: { basis: number; sign: number }[][] = Array.from({ length: 2 * seg.count }, () => []);
  const excitation = new Float64Array(terms.length);
  terms.forEach((list, basis) => {
    for (const { mono, sign } of list) {
      perMono[mono].push({ basis, sign });
      // A monopole's current flows towards its node end: along the segment for end 1, against it for end 0.
      if (mono === feedMono) excitation[basis] += sign * (seg.feedEnd === 1 ? 1 : -1);
    }
  });
  const monoStart = new Int32Array(2 * seg.count + 1);
  perMono.forEach((list, mono) => (monoStart[mono + 1] = monoStart[mono] + list.length));
  const monoBasis = new Int32Array(monoStart[2 * seg.count]);
  const monoSign = new Float64Array(monoStart[2 * seg.count]);
  perMono.forEach((list, mono) =>
    list.forEach(({ basis, sign }, j) => {
      monoBasis[monoStart[mono] + j] = basis;
      monoSign[monoStart[mono] + j] = sign;
    }),
  );
  return { count: terms.length, monoStart, monoBasis, monoSign, excitation };
}

/** Round to 1 nm (or one part in 10⁹ of a direction) for recognising translated pairs. */
function quantise(x: number): number {
  return Math.round(x * 1e9);
}

/** A key for what a segment's reactions depend on besides its position. */
function shapeKeys(seg: SegmentedStructure, geometry: SegmentGeometry): string[] {
  const withGround = seg.ground.kind !== "free";
  return Array.from({ length: seg.count }, (_, i) =>
    [
      quantise(geometry.length[i]),
      quantise(seg.radius[i]),
      quantise(geometry.dir[3 * i]),
      quantise(geometry.dir[3 * i + 1]),
      quantise(geometry.dir[3 * i + 2]),
      seg.conductivity[i],
      withGround ? quantise(seg.start[3 * i + 2]) : 0,
    ].join(","),
  );
}

function buildPairs(seg: SegmentedStructure, geometry: SegmentGeometry, maxMHz: number): PairPlans {
  const n = seg.count;
  const withImage = seg.ground.kind !== "free";
  const real = seg.ground.kind === "real";
  const kMax = (2 * Math.PI * maxMHz * 1e6) / SPEED_OF_LIGHT;
  const plans: TestPoints[] = [];
  const plainIndex = new Map<number, number>();
  const plain = (test: number, order: number): number => {
    const key = test * 64 + order;
    let index = plainIndex.get(key);
    if (index === undefined) {
      index = plans.length;
      plans.push(plainPoints(order, geometry.length[test]));
      plainIndex.set(key, index);
    }
    return index;
  };
  const planFor = (test: number, source: number, mirror: boolean, a2: number): number => {
    const p1 = endPoint(seg.start, source, mirror);
    const p2 = endPoint(seg.end, source, mirror);
    const near = nearPoints(geometry, test, [p1, p2], a2, kMax);
    if (near !== null) {
      plans.push(near);
      return plans.length - 1;
    }
    const gap = segmentDistance(endPoint(seg.start, test, false), endPoint(seg.end, test, false), p1, p2);
    return plain(test, farOrder(gap, geometry.length[test], kMax));
  };

  const shapes = shapeKeys(seg, geometry);
  const blockOf = new Int32Array(n * n);
  const blockIndex = new Map<string, number>();
  const representatives: [number, number][] = [];
  for (let t = 0; t < n; t++) {
    for (let q = 0; q < n; q++) {
      const key = [
        shapes[t],
        shapes[q],
        t === q ? "self" : "",
        quantise(seg.start[3 * q] - seg.start[3 * t]),
        quantise(seg.start[3 * q + 1] - seg.start[3 * t + 1]),
        quantise(seg.start[3 * q + 2] - seg.start[3 * t + 2]),
      ].join("|");
      let block = blockIndex.get(key);
      if (block === undefined) {
        block = representatives.length;
        blockIndex.set(key, block);
        representatives.push([t, q]);
      }
      blockOf[t * n + q] = block;
    }
  }

  const count = representatives.length;
  const pairs: PairPlans = {
    blockOf,
    blockCount: count,
    test: new Int32Array(count),
    source: new Int32Array(count),
    freePlan: new Int32Array(count),
    imagePlan: new Int32Array(withImage ? count : 0),
    cosTheta: new Float64Array(real ? count : 0),
    horizontal: new Float64Array(real ? 3 * count : 0),
    plans,
  };
  representatives.forEach(([test, source], b) => {
    const a2 = (seg.radius[test] ** 2 + seg.radius[source] ** 2) / 2;
    pairs.test[b] = test;
    pairs.source[b] = source;
    pairs.freePlan[b] = planFor(test, source, false, a2);
    if (withImage) pairs.imagePlan[b] = planFor(test, source, true, a2);
    if (real) {
      // Specular geometry from the middle of the image source to the middle of the test segment.
      const mid = (array: Float64Array, i: number, c: number) => (array[3 * i + c] + seg.end[3 * i + c]) / 2;
      const dx = mid(seg.start, test, 0) - mid(seg.start, source, 0);
      const dy = mid(seg.start, test, 1) - mid(seg.start, source, 1);
      const dz = mid(seg.start, test, 2) + mid(seg.start, source, 2);
      const horizontal = Math.hypot(dx, dy);
      pairs.cosTheta[b] = dz / Math.hypot(horizontal, dz);
      if (horizontal > 1e-9 * dz) pairs.horizontal.set([-dy / horizontal, dx / horizontal, 0], 3 * b);
    }
  });
  return pairs;
}

/** Segment the structure and set up everything that does not depend on frequency. Throws EngineInputError on bad geometry. */
export function prepareStructure(structure: Structure, maxMHz: number): PreparedStructure {
  const seg = segmentStructure(structure, maxMHz);
  const geometry = buildGeometry(seg);
  const bases = buildBases(seg);
  const pairs = buildPairs(seg, geometry, maxMHz);
  return new Prepared(
    seg.count,
    maxMHz,
    seg,
    geometry,
    bases.count,
    bases.monoStart,
    bases.monoBasis,
    bases.monoSign,
    bases.excitation,
    pairs,
  );
}

function asPrepared(prepared: PreparedStructure): Prepared {
  if (!(prepared instanceof Prepared)) throw new TypeError("not a structure from prepareStructure");
  return prepared;
}

/** Add the reaction z between monopoles (testMono, sourceMono) to every pair of basis functions using them. */
function accumulate(prep: Prepared, matrix: Float64Array, testMono: number, sourceMono: number, zr: number, zi: number): void {
  const { monoStart, monoBasis, monoSign, basisCount } = prep;
  for (let a = monoStart[testMono]; a < monoStart[testMono + 1]; a++) {
    const row = monoBasis[a] * basisCount;
    const sa = monoSign[a];
    for (let b = monoStart[sourceMono]; b < monoStart[sourceMono + 1]; b++) {
      const s = sa * monoSign[b];
      const mn = 2 * (row + monoBasis[b]);
      matrix[mn] += s * zr;
      matrix[mn + 1] += s * zi;
    }
  }
}

const scratch = new Float64Array(16);
const factors = new Float64Array(4);

/** The 2×2 monopole reactions of every block, 8 numbers each (see kernel.ts `react`), including ground and skin effect. */
function computeBlocks(prep: Prepared, k: number, mhz: number): Float64Array {
  const { seg, geometry, pairs } = prep;
  const ground = seg.ground;
  const [epsRe, epsIm] = ground.kind === "real" ? groundPermittivity(ground.relativePermittivity, ground.conductivitySm, mhz) : [0, 0];
  const blocks = new Float64Array(8 * pairs.blockCount);
  for (let b = 0; b < pairs.blockCount; b++) {
    const t = pairs.test[b];
    const q = pairs.source[b];
    const a2 = (seg.radius[t] * seg.radius[t] + seg.radius[q] * seg.radius[q]) / 2;
    const x1 = seg.start[3 * q];
    const y1 = seg.start[3 * q + 1];
    const z1 = seg.start[3 * q + 2];
    const x2 = seg.end[3 * q];
    const y2 = seg.end[3 * q + 1];
    const z2 = seg.end[3 * q + 2];
    react(k, geometry, t, x1, y1, z1, x2, y2, z2, a2, pairs.plans[pairs.freePlan[b]], null, scratch);
    for (let j = 0; j < 8; j++) blocks[8 * b + j] = scratch[j];
    if (ground.kind !== "free") {
      // The image of a monopole in a perfect ground is the mirrored monopole with the opposite sign;
      // a real ground scales its field's vertical and horizontal parts by the reflection factors.
      let vr = 1;
      let vi = 0;
      let dr = 0;
      let di = 0;
      let second: [number, number, number] | null = null;
      if (ground.kind === "real") {
        imageFactors(pairs.cosTheta[b], epsRe, epsIm, factors);
        const hx = pairs.horizontal[3 * b];
        const hy = pairs.horizontal[3 * b + 1];
        const hDotU = hx * geometry.dir[3 * t] + hy * geometry.dir[3 * t + 1];
        vr = factors[0];
        vi = factors[1];
        if (hDotU !== 0) {
          second = [hx, hy, 0];
          dr = (factors[2] - vr) * hDotU;
          di = (factors[3] - vi) * hDotU;
        }
      }
      react(k, geometry, t, x1, y1, -z1, x2, y2, -z2, a2, pairs.plans[pairs.imagePlan[b]], second, scratch);
      for (let j = 0; j < 8; j += 2) {
        let zr = vr * scratch[j] - vi * scratch[j + 1];
        let zi = vr * scratch[j + 1] + vi * scratch[j];
        if (second !== null) {
          zr += dr * scratch[j + 8] - di * scratch[j + 9];
          zi += dr * scratch[j + 9] + di * scratch[j + 8];
        }
        blocks[8 * b + j] -= zr;
        blocks[8 * b + j + 1] -= zi;
      }
    }
    if (t === q) addSkinEffect(seg, geometry, t, k, mhz, blocks.subarray(8 * b, 8 * b + 8));
  }
  const eta = Z0;
  for (let j = 0; j < blocks.length; j++) blocks[j] *= eta;
  return blocks;
}

function fillMatrix(prep: Prepared, mhz: number): Float64Array {
  const k = (2 * Math.PI * mhz * 1e6) / SPEED_OF_LIGHT;
  const blocks = computeBlocks(prep, k, mhz);
  const n = prep.segmentCount;
  const { blockOf } = prep.pairs;
  const matrix = new Float64Array(2 * prep.basisCount * prep.basisCount);
  for (let t = 0; t < n; t++) {
    for (let q = 0; q < n; q++) {
      const o = 8 * blockOf[t * n + q];
      accumulate(prep, matrix, 2 * t + 1, 2 * q + 1, blocks[o], blocks[o + 1]);
      accumulate(prep, matrix, 2 * t + 1, 2 * q, blocks[o + 2], blocks[o + 3]);
      accumulate(prep, matrix, 2 * t, 2 * q + 1, blocks[o + 4], blocks[o + 5]);
      accumulate(prep, matrix, 2 * t, 2 * q, blocks[o + 6], blocks[o + 7]);
    }
  }
  return matrix;
}

/** Skin-effect impedance on a segment's self block (before the common factor Z0 is applied). */
function addSkinEffect(seg: SegmentedStructure, geometry: SegmentGeometry, t: number, k: number, mhz: number, block: Float64Array): void {
  const perMetre = wireImpedancePerMetre(seg.radius[t], seg.conductivity[t], mhz) / Z0;
  if (perMetre === 0) return;
  const [same, cross] = monopoleOverlaps(k, geometry.length[t]);
  block[0] += perMetre * same;
  block[1] += perMetre * same;
  block[6] += perMetre * same;
  block[7] += perMetre * same;
  block[2] += perMetre * cross;
  block[3] += perMetre * cross;
  block[4] += perMetre * cross;
  block[5] += perMetre * cross;
}

function point(array: Float64Array, i: number): Vec3 {
  return [array[3 * i], array[3 * i + 1], array[3 * i + 2]];
}

/** Feed-point impedance and segment currents at one frequency (MHz, at most the prepared maxMHz). */
export function solveAt(prepared: PreparedStructure, mhz: number): Solution {
  const prep = asPrepared(prepared);
  if (!(mhz > 0 && mhz <= prep.maxMHz * (1 + 1e-9))) {
    throw new RangeError(`solveAt: ${mhz} MHz is outside (0, ${prep.maxMHz}] MHz, the range the structure was prepared for`);
  }
  const n = prep.basisCount;
  const matrix = fillMatrix(prep, mhz);
  const rhs = new Float64Array(2 * n);
  for (let m = 0; m < n; m++) rhs[2 * m] = prep.excitation[m];
  const x = luSolve(luFactor(matrix, n), rhs);

  let feedRe = 0;
  let feedIm = 0;
  for (let m = 0; m < n; m++) {
    feedRe += prep.excitation[m] * x[2 * m];
    feedIm += prep.excitation[m] * x[2 * m + 1];
  }
  const den = feedRe * feedRe + feedIm * feedIm;
  const k = (2 * Math.PI * mhz * 1e6) / SPEED_OF_LIGHT;
  const { seg, geometry, monoStart, monoBasis, monoSign } = prep;
  const segments: SegmentCurrent[] = [];
  for (let s = 0; s < seg.count; s++) {
    let re = 0;
    let im = 0;
    for (let end = 0; end < 2; end++) {
      const mono = 2 * s + end;
      const direction = end === 1 ? 1 : -1;
      for (let a = monoStart[mono]; a < monoStart[mono + 1]; a++) {
        re += direction * monoSign[a] * x[2 * monoBasis[a]];
        im += direction * monoSign[a] * x[2 * monoBasis[a] + 1];
      }
    }
    // A monopole's current at the middle of its segment is 1/(2·cos(k·d/2)) of its node value.
    const middle = 1 / (2 * Math.cos((k * geometry.length[s]) / 2));
    segments.push({
      wire: seg.wire[s],
      start: point(seg.start, s),
      end: point(seg.end, s),
      current: { re: re * middle, im: im * middle },
    });
  }
  return {
    mhz,
    impedance: { r: feedRe / den, x: -feedIm / den },
    feedCurrent: { re: feedRe, im: feedIm },
    segments,
  };
}

/** solveAt at every frequency of the list. */
export function solveSweep(prepared: PreparedStructure, mhzList: number[]): Solution[] {
  return mhzList.map((mhz) => solveAt(prepared, mhz));
}
