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
 * wires add their skin-effect impedance (skin-effect.ts). Reactions in free
 * space and over a perfect ground between segments of one radius are
 * symmetric, so each such pair of segments is integrated once.
 *
 * Junctions of wires of different diameters: the thin-wire kernel takes the
 * test wire's radius (field on the test wire's surface from a filament on the
 * source's axis), so that the node charges of the two halves of every basis
 * function cancel at every test point even across a step in diameter, and the
 * node-charge term of kernel.ts is applied to every free-space and image
 * reaction alike. The basis functions do not model the jump in charge density
 * at the step; finer segments near the step let the sum of basis functions
 * carry it. With this the solution settles quickly: a 25 mm tube joined to
 * 2 mm wire moves its resonance by less than 0.05 % from 1× to 4× the
 * segments, and taking the source's radius instead changes it by less than
 * 0.01 % (nec2c, on the same geometry, still moves by 2.4 %).
 */
import { luFactor, luSolve } from "./complex-lu";
import { imageFactors, groundPermittivity } from "./ground";
import { farOrder, lengthPhases, nearPoints, plainPoints, react, setPhases, type SegmentGeometry, type TestPoints } from "./kernel";
import { SPEED_OF_LIGHT, Z0 } from "./physics";
import { TupleIndex } from "./tuple-index";
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
    readonly bases: Bases,
    readonly blocks: BlockPlans,
    /** The segments' end points as returned in every Solution (shared, not copied per frequency). */
    readonly segmentEnds: { start: Vec3; end: Vec3 }[],
    /** Buffers reused by every solve (solves are synchronous, so one set per structure is enough). */
    readonly work: Workspace,
  ) {}
}

interface Workspace {
  matrix: Float64Array;
  pairValues: Float64Array;
  oneWayValues: Float64Array;
  reflectionValues: Float64Array;
  rhs: Float64Array;
}

interface Bases {
  count: number;
  /** The one basis function using each monopole and its sign, or −1 where there are none or several (see monoStart). */
  single: Int32Array;
  singleSign: Float64Array;
  /** Basis functions using each monopole (index 2·segment + end), CSR: monoStart, monoBasis, monoSign. */
  monoStart: Int32Array;
  monoBasis: Int32Array;
  monoSign: Float64Array;
  /** Voltage of a 1 V delta gap seen by each basis function. */
  excitation: Float64Array;
}

/**
 * The reactions between two segments' monopoles come in "blocks" of 2×2.
 *
 * Free space and a perfect ground, segments of the same radius: with the
 * node-charge term of kernel.ts (`chargeTerm`), the block of test t and source
 * q is the transpose of the block of test q and source t, so each unordered
 * pair is integrated once, with the shorter segment as the test segment
 * (`swapped` when that is the second one). Segments of different radii: the
 * thin-wire kernel takes the test wire's radius, so that the node charges of
 * the two halves of every source basis function still cancel at each test
 * point; such pairs are not reciprocal and are integrated both ways
 * ("one-way" blocks). Real ground adds, for every ordered pair, the
 * reflected field, which is not reciprocal pair by pair either.
 *
 * Pairs that are translates of each other (same lengths, radii, directions and
 * relative position, and the same heights over a ground) share one block,
 * which makes the fill of straight, evenly cut wires nearly linear in the
 * number of segments.
 */
interface BlockPlans {
  /** Pair block of segments t ≤ q of the same radius, at t·count + q (−1 for other pairs). */
  pairOf: Int32Array;
  /** 1 where the pair block of t ≤ q was integrated with q as the test segment. */
  swapped: Uint8Array;
  pair: BlockSet;
  /** One-way block of the ordered pair (test t, source q) of different radii, at t·count + q (−1 for other pairs). */
  oneWayOf: Int32Array;
  oneWay: BlockSet;
  /** Real ground: reflection block of the ordered pair (test t, source q), at t·count + q; empty otherwise. */
  reflectionOf: Int32Array;
  reflection: BlockSet;
  /** Real ground, per reflection block: cos of the angle of incidence and the horizontal unit vector ⊥ the plane of incidence. */
  cosTheta: Float64Array;
  horizontal: Float64Array;
  plans: TestPoints[];
}

/** Representative (test, source) segments of each block and their quadrature plans. */
interface BlockSet {
  count: number;
  test: Int32Array;
  source: Int32Array;
  plan: Int32Array;
  /** Perfect ground: plan for the image of the source; empty otherwise. */
  imagePlan: Int32Array;
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
  const single = Int32Array.from({ length: 2 * seg.count }, (_, mono) => (perMono[mono].length === 1 ? perMono[mono][0].basis : -1));
  const singleSign = Float64Array.from({ length: 2 * seg.count }, (_, mono) => (perMono[mono].length === 1 ? perMono[mono][0].sign : 0));
  return { count: terms.length, single, singleSign, monoStart, monoBasis, monoSign, excitation };
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

/** The thin-wire kernel's squared radius for test segment t: ρ² + a_t² (source filament on its axis, field on the test wire's surface). */
function squaredRadius(seg: SegmentedStructure, t: number): number {
  return seg.radius[t] * seg.radius[t];
}

function buildBlocks(seg: SegmentedStructure, geometry: SegmentGeometry, maxMHz: number): BlockPlans {
  const n = seg.count;
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
  const planFor = (test: number, source: number, mirror: boolean): number => {
    const p1 = endPoint(seg.start, source, mirror);
    const p2 = endPoint(seg.end, source, mirror);
    const near = nearPoints(geometry, test, [p1, p2], squaredRadius(seg, test), kMax);
    if (near !== null) {
      plans.push(near);
      return plans.length - 1;
    }
    const gap = segmentDistance(endPoint(seg.start, test, false), endPoint(seg.end, test, false), p1, p2);
    return plain(test, farOrder(gap, geometry.length[test], kMax));
  };

  const shapeIndex = new Map<string, number>();
  const shapes = Int32Array.from(shapeKeys(seg, geometry), (key) => {
    let id = shapeIndex.get(key);
    if (id === undefined) {
      id = shapeIndex.size;
      shapeIndex.set(key, id);
    }
    return id;
  });
  const offset = (test: number, source: number, c: number) => quantise(seg.start[3 * source + c] - seg.start[3 * test + c]);
  /**
   * Blocks for the pairs of segments that `include` accepts: ordered pairs, or unordered pairs once with the
   * shorter segment as the test segment. `plan` says whether the quadrature is for the source or its mirror
   * image, `withImage` adds a plan for the image too.
   */
  const collect = (
    pairs: "unordered" | "ordered",
    include: (t: number, q: number) => boolean,
    plan: "direct" | "mirrored",
    withImage: boolean,
  ) => {
    const index = new TupleIndex(pairs === "unordered" ? (n * (n + 1)) / 2 : n * n);
    const tests: number[] = [];
    const sources: number[] = [];
    const blockOf = new Int32Array(n * n).fill(-1);
    for (let t = 0; t < n; t++) {
      for (let q = pairs === "unordered" ? t : 0; q < n; q++) {
        if (!include(t, q)) continue;
        const swap = pairs === "unordered" && geometry.length[q] < geometry.length[t];
        const [test, source] = swap ? [q, t] : [t, q];
        // Self pairs get shape −1 as source: skin effect and the self integral belong to them alone.
        const block = index.idOf(shapes[test], t === q ? -1 : shapes[source], offset(test, source, 0), offset(test, source, 1), offset(test, source, 2), 0);
        if (block === tests.length) {
          tests.push(test);
          sources.push(source);
        }
        blockOf[t * n + q] = block;
        if (swap) swapped[t * n + q] = 1;
      }
    }
    const set: BlockSet = {
      count: tests.length,
      test: Int32Array.from(tests),
      source: Int32Array.from(sources),
      plan: Int32Array.from(tests, (t, b) => planFor(t, sources[b], plan === "mirrored")),
      imagePlan: withImage ? Int32Array.from(tests, (t, b) => planFor(t, sources[b], true)) : new Int32Array(0),
    };
    return { set, blockOf };
  };

  // Pair and one-way blocks: free space, plus the image in a perfect ground.
  const swapped = new Uint8Array(n * n);
  const perfect = seg.ground.kind === "perfect";
  const sameRadius = (t: number, q: number) => seg.radius[t] === seg.radius[q];
  const pairs = collect("unordered", sameRadius, "direct", perfect);
  const oneWay = collect("ordered", (t, q) => !sameRadius(t, q), "direct", perfect);

  // Reflection blocks: real ground, every ordered pair, the source mirrored.
  const real = seg.ground.kind === "real";
  const reflections = real ? collect("ordered", () => true, "mirrored", false) : { set: emptySet(), blockOf: new Int32Array(0) };
  const cosTheta = new Float64Array(reflections.set.count);
  const horizontal = new Float64Array(3 * reflections.set.count);
  for (let b = 0; b < reflections.set.count; b++) {
    // Specular geometry from the middle of the image source to the middle of the test segment.
    const test = reflections.set.test[b];
    const source = reflections.set.source[b];
    const mid = (i: number, c: number) => (seg.start[3 * i + c] + seg.end[3 * i + c]) / 2;
    const dx = mid(test, 0) - mid(source, 0);
    const dy = mid(test, 1) - mid(source, 1);
    const dz = mid(test, 2) + mid(source, 2);
    const across = Math.hypot(dx, dy);
    cosTheta[b] = dz / Math.hypot(across, dz);
    if (across > 1e-9 * dz) horizontal.set([-dy / across, dx / across, 0], 3 * b);
  }
  return {
    pairOf: pairs.blockOf,
    swapped,
    pair: pairs.set,
    oneWayOf: oneWay.blockOf,
    oneWay: oneWay.set,
    reflectionOf: reflections.blockOf,
    reflection: reflections.set,
    cosTheta,
    horizontal,
    plans,
  };
}

function emptySet(): BlockSet {
  return { count: 0, test: new Int32Array(0), source: new Int32Array(0), plan: new Int32Array(0), imagePlan: new Int32Array(0) };
}

/** Segment the structure and set up everything that does not depend on frequency. Throws EngineInputError on bad geometry. */
export function prepareStructure(structure: Structure, maxMHz: number): PreparedStructure {
  const seg = segmentStructure(structure, maxMHz);
  const geometry = buildGeometry(seg);
  const segmentEnds = Array.from({ length: seg.count }, (_, i) => ({ start: point(seg.start, i), end: point(seg.end, i) }));
  const bases = buildBases(seg);
  const blocks = buildBlocks(seg, geometry, maxMHz);
  const work: Workspace = {
    matrix: new Float64Array(2 * bases.count * bases.count),
    pairValues: new Float64Array(8 * blocks.pair.count),
    oneWayValues: new Float64Array(8 * blocks.oneWay.count),
    reflectionValues: new Float64Array(8 * blocks.reflection.count),
    rhs: new Float64Array(2 * bases.count),
  };
  return new Prepared(seg.count, maxMHz, seg, geometry, bases, blocks, segmentEnds, work);
}

function asPrepared(prepared: PreparedStructure): Prepared {
  if (!(prepared instanceof Prepared)) throw new TypeError("not a structure from prepareStructure");
  return prepared;
}

const scratch = new Float64Array(16);
const factors = new Float64Array(4);

/**
 * Blocks of free space plus a perfect ground's image, 8 numbers each (see kernel.ts `react`), with the
 * node-charge term (on every such block, pair or one-way, so that it cancels over whole basis functions)
 * and skin effect on self blocks.
 */
function computeDirectBlocks(prep: Prepared, set: BlockSet, k: number, mhz: number, phases: Float64Array, values: Float64Array): Float64Array {
  const { seg, geometry } = prep;
  const { plans } = prep.blocks;
  const perfect = seg.ground.kind === "perfect";
  for (let b = 0; b < set.count; b++) {
    const t = set.test[b];
    const q = set.source[b];
    const a2 = squaredRadius(seg, t);
    react(k, geometry, phases, t, q, false, a2, plans[set.plan[b]], null, true, values, 8 * b);
    if (perfect) {
      // The image of a monopole in a perfect ground is the mirrored monopole with the opposite sign.
      react(k, geometry, phases, t, q, true, a2, plans[set.imagePlan[b]], null, true, scratch, 0);
      for (let j = 0; j < 8; j++) values[8 * b + j] -= scratch[j];
    }
    if (t === q) addSkinEffect(seg, geometry, t, k, mhz, values, 8 * b);
  }
  return values;
}

/** Reflection blocks of a real ground: the perfect-ground image field with its vertical and horizontal parts scaled. */
function computeReflectionBlocks(prep: Prepared, k: number, mhz: number, phases: Float64Array): Float64Array {
  const { seg, geometry } = prep;
  const { reflection, plans, cosTheta, horizontal } = prep.blocks;
  const values = prep.work.reflectionValues;
  if (seg.ground.kind !== "real") return values;
  const [epsRe, epsIm] = groundPermittivity(seg.ground.relativePermittivity, seg.ground.conductivitySm, mhz);
  for (let b = 0; b < reflection.count; b++) {
    const t = reflection.test[b];
    const q = reflection.source[b];
    imageFactors(cosTheta[b], epsRe, epsIm, factors);
    const [vr, vi, hr, hi] = factors;
    const hx = horizontal[3 * b];
    const hy = horizontal[3 * b + 1];
    const hDotU = hx * geometry.dir[3 * t] + hy * geometry.dir[3 * t + 1];
    const second: [number, number, number] | null = hDotU !== 0 ? [hx, hy, 0] : null;
    react(k, geometry, phases, t, q, true, squaredRadius(seg, t), plans[reflection.plan[b]], second, false, scratch, 0);
    const dr = (hr - vr) * hDotU;
    const di = (hi - vi) * hDotU;
    for (let j = 0; j < 8; j += 2) {
      let zr = vr * scratch[j] - vi * scratch[j + 1];
      let zi = vr * scratch[j + 1] + vi * scratch[j];
      if (second !== null) {
        zr += dr * scratch[j + 8] - di * scratch[j + 9];
        zi += dr * scratch[j + 9] + di * scratch[j + 8];
      }
      // Minus: the image of a monopole is the mirrored monopole with the opposite sign.
      values[8 * b + j] = -zr;
      values[8 * b + j + 1] = -zi;
    }
  }
  return values;
}

/** Skin-effect impedance on a segment's self block (before the common factor Z0 is applied). */
function addSkinEffect(
  seg: SegmentedStructure,
  geometry: SegmentGeometry,
  t: number,
  k: number,
  mhz: number,
  blocks: Float64Array,
  offset: number,
): void {
  const perMetre = wireImpedancePerMetre(seg.radius[t], seg.conductivity[t], mhz) / Z0;
  if (perMetre === 0) return;
  const [same, cross] = monopoleOverlaps(k, geometry.length[t]);
  // Zs = R′(1 + j): equal real and imaginary parts; same monopole at 0–1 and 6–7, the two different ones at 2–5.
  for (const j of [0, 1, 6, 7]) blocks[offset + j] += perMetre * same;
  for (const j of [2, 3, 4, 5]) blocks[offset + j] += perMetre * cross;
}

/** Add s·z to entry (min(m, n), max(m, n)) of the upper triangle, twice on the diagonal (both orders meet there). */
function addUpper(matrix: Float64Array, count: number, m: number, n: number, s: number, zr: number, zi: number): void {
  const at = m <= n ? 2 * (m * count + n) : 2 * (n * count + m);
  const f = m === n ? 2 * s : s;
  matrix[at] += f * zr;
  matrix[at + 1] += f * zi;
}

/**
 * addUpper for every pair of basis functions (m, n) using monopoles (rowMono, colMono), with weight·sign
 * (the slow path, for monopoles shared by several basis functions at a junction).
 */
function scatterUpper(bases: Bases, matrix: Float64Array, rowMono: number, colMono: number, zr: number, zi: number, weight: number): void {
  const { monoStart, monoBasis, monoSign, count } = bases;
  for (let a = monoStart[rowMono]; a < monoStart[rowMono + 1]; a++) {
    for (let b = monoStart[colMono]; b < monoStart[colMono + 1]; b++) {
      addUpper(matrix, count, monoBasis[a], monoBasis[b], weight * monoSign[a] * monoSign[b], zr, zi);
    }
  }
}

/** Add z to the matrix entry (m, n) for every pair of basis functions using monopoles (rowMono, colMono). */
function scatter(bases: Bases, matrix: Float64Array, rowMono: number, colMono: number, zr: number, zi: number): void {
  const { monoStart, monoBasis, monoSign, count } = bases;
  for (let a = monoStart[rowMono]; a < monoStart[rowMono + 1]; a++) {
    const row = 2 * monoBasis[a] * count;
    for (let b = monoStart[colMono]; b < monoStart[colMono + 1]; b++) {
      const s = monoSign[a] * monoSign[b];
      const at = row + 2 * monoBasis[b];
      matrix[at] += s * zr;
      matrix[at + 1] += s * zi;
    }
  }
}

function fillMatrix(prep: Prepared, mhz: number): Float64Array {
  const k = (2 * Math.PI * mhz * 1e6) / SPEED_OF_LIGHT;
  const n = prep.segmentCount;
  const { bases } = prep;
  const { pairOf, swapped, oneWayOf, reflectionOf } = prep.blocks;
  for (const plan of prep.blocks.plans) setPhases(plan, k);
  const phases = lengthPhases(prep.geometry, k);
  const matrix = prep.work.matrix;
  matrix.fill(0);
  const pairValues = computeDirectBlocks(prep, prep.blocks.pair, k, mhz, phases, prep.work.pairValues);
  const { single, singleSign, count } = bases;
  for (let t = 0; t < n; t++) {
    const rowB = single[2 * t + 1];
    const rowA = single[2 * t];
    for (let q = t; q < n; q++) {
      const block = pairOf[t * n + q];
      if (block < 0) continue;
      const o = 8 * block;
      // A pair t ≠ q stands for both (t, q) and (q, t); a self pair's block already holds both orders.
      const weight = t === q ? 0.5 : 1;
      // Values are (test end, source end) = (2,2), (2,1), (1,2), (1,1); swapped blocks have q as the test segment.
      const swap = swapped[t * n + q] === 1;
      const oBA = swap ? o + 4 : o + 2;
      const oAB = swap ? o + 2 : o + 4;
      const colB = single[2 * q + 1];
      const colA = single[2 * q];
      if (rowB >= 0 && rowA >= 0 && colB >= 0 && colA >= 0) {
        // Every monopole in one basis function: add straight into the upper triangle.
        const wB = weight * singleSign[2 * t + 1];
        const wA = weight * singleSign[2 * t];
        addUpper(matrix, count, rowB, colB, wB * singleSign[2 * q + 1], pairValues[o], pairValues[o + 1]);
        addUpper(matrix, count, rowB, colA, wB * singleSign[2 * q], pairValues[oBA], pairValues[oBA + 1]);
        addUpper(matrix, count, rowA, colB, wA * singleSign[2 * q + 1], pairValues[oAB], pairValues[oAB + 1]);
        addUpper(matrix, count, rowA, colA, wA * singleSign[2 * q], pairValues[o + 6], pairValues[o + 7]);
      } else {
        scatterUpper(bases, matrix, 2 * t + 1, 2 * q + 1, pairValues[o], pairValues[o + 1], weight);
        scatterUpper(bases, matrix, 2 * t + 1, 2 * q, pairValues[oBA], pairValues[oBA + 1], weight);
        scatterUpper(bases, matrix, 2 * t, 2 * q + 1, pairValues[oAB], pairValues[oAB + 1], weight);
        scatterUpper(bases, matrix, 2 * t, 2 * q, pairValues[o + 6], pairValues[o + 7], weight);
      }
    }
  }
  const m = bases.count;
  for (let row = 1; row < m; row++) {
    for (let col = 0; col < row; col++) {
      matrix[2 * (row * m + col)] = matrix[2 * (col * m + row)];
      matrix[2 * (row * m + col) + 1] = matrix[2 * (col * m + row) + 1];
    }
  }
  const scatterOrdered = (blockOf: Int32Array, values: Float64Array) => {
    for (let t = 0; t < n; t++) {
      for (let q = 0; q < n; q++) {
        const block = blockOf[t * n + q];
        if (block < 0) continue;
        const o = 8 * block;
        scatter(bases, matrix, 2 * t + 1, 2 * q + 1, values[o], values[o + 1]);
        scatter(bases, matrix, 2 * t + 1, 2 * q, values[o + 2], values[o + 3]);
        scatter(bases, matrix, 2 * t, 2 * q + 1, values[o + 4], values[o + 5]);
        scatter(bases, matrix, 2 * t, 2 * q, values[o + 6], values[o + 7]);
      }
    }
  };
  if (prep.blocks.oneWay.count > 0) {
    scatterOrdered(oneWayOf, computeDirectBlocks(prep, prep.blocks.oneWay, k, mhz, phases, prep.work.oneWayValues));
  }
  if (prep.seg.ground.kind === "real") scatterOrdered(reflectionOf, computeReflectionBlocks(prep, k, mhz, phases));
  const eta = Z0;
  for (let j = 0; j < matrix.length; j++) matrix[j] *= eta;
  return matrix;
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
  const { bases, seg, geometry, segmentEnds } = prep;
  const n = bases.count;
  const rhs = prep.work.rhs;
  rhs.fill(0);
  for (let m = 0; m < n; m++) rhs[2 * m] = bases.excitation[m];
  const x = luSolve(luFactor(fillMatrix(prep, mhz), n), rhs);

  let feedRe = 0;
  let feedIm = 0;
  for (let m = 0; m < n; m++) {
    feedRe += bases.excitation[m] * x[2 * m];
    feedIm += bases.excitation[m] * x[2 * m + 1];
  }
  const den = feedRe * feedRe + feedIm * feedIm;
  const k = (2 * Math.PI * mhz * 1e6) / SPEED_OF_LIGHT;
  const { monoStart, monoBasis, monoSign } = bases;
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
    segments.push({ wire: seg.wire[s], ...segmentEnds[s], current: { re: re * middle, im: im * middle } });
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
