/**
 * The reaction between sinusoidal monopoles: the building block of the
 * piecewise-sinusoidal Galerkin method of moments (see solver.ts).
 *
 * A monopole on a segment of length d carries I(s) = sin(k·s)/sin(k·d), zero at
 * one end and 1 at the other (its node end), flowing towards the node end.
 * Because this current satisfies I'' + k²I = 0, its electric field is a closed
 * form in the distances R1, R2 to the segment's ends (the classical result for
 * sinusoidal filaments: integrate the potentials by parts twice). With g = e^(−jkR)/R,
 * η the wave impedance, z the coordinate along the segment from its zero end and
 * ρ the distance from its axis, for a monopole rising from end 1 to end 2:
 *
 *   E_z   = −jη/(4π sin kd) · [g1 − cos(kd)·g2]
 *   ρ·E_ρ =  jη/(4π sin kd) · [((d − z)/R2·cos(kd) + j·sin(kd))·e^(−jkR2) + (z/R1)·e^(−jkR1)]
 *
 * The point charge at the node end, I(node)·∇g, is left out: the two halves of
 * every basis function carry equal and opposite charges at their shared node,
 * so those terms cancel exactly in every basis function (also at bends and
 * junctions, and with a basis completed by its image in a perfect ground),
 * as long as both halves' fields at a test point use the same radius, which
 * is why the kernel takes the test wire's radius.
 *
 * Thin-wire reduced kernel: the source current is a filament on its axis and
 * the field is taken on the test wire's surface, i.e. ρ² → ρ² + a² with a the
 * test wire's radius (the caller passes a²).
 *
 * The test integral along the other segment uses Gauss–Legendre quadrature;
 * where the test segment passes near an end of the source (self terms,
 * neighbours, bends, junctions) the test segment is cut at the near ends and
 * each piece is mapped by s = s* + h·sinh(t), which takes out the 1/R peak.
 */
import { gaussRule } from "./quadrature";
import { sincos } from "./sincos";

const phase = new Float64Array(2);
const phase1 = new Float64Array(2);
const phase2 = new Float64Array(2);

/** Segment geometry in flat arrays: start point, unit direction, length (three numbers per vector). */
export interface SegmentGeometry {
  count: number;
  start: Float64Array;
  dir: Float64Array;
  length: Float64Array;
}

/**
 * Quadrature points (position s along the test segment from its start) and
 * weights, with sin(k·s) and cos(k·s) kept for the frequency last set by
 * `setPhases`: plans are shared by many pairs, so these are computed once per
 * frequency rather than once per pair.
 */
export interface TestPoints {
  s: Float64Array;
  w: Float64Array;
  sinKs: Float64Array;
  cosKs: Float64Array;
}

function testPoints(s: Float64Array, w: Float64Array): TestPoints {
  return { s, w, sinKs: new Float64Array(s.length), cosKs: new Float64Array(s.length) };
}

/** Set sin(k·s) and cos(k·s) of every point for wavenumber k. */
export function setPhases(points: TestPoints, k: number): void {
  for (let i = 0; i < points.s.length; i++) {
    sincos(k * points.s[i], phase);
    points.sinKs[i] = phase[0];
    points.cosKs[i] = phase[1];
  }
}

/**
 * Gauss–Legendre points on a piece near a source end: more when the piece spans
 * many decades of distance (t-range of the sinh map) or much phase.
 */
function nearOrder(tRange: number, phaseSpan: number): number {
  return Math.min(32, Math.max(8, Math.ceil(4 + tRange + 8 * phaseSpan)));
}

/** A source end within this many test-segment lengths of the test segment is treated as near. */
const NEAR_FACTOR = 1.5;

/** Gauss–Legendre points mapped to [0, length]. */
export function plainPoints(order: number, length: number): TestPoints {
  const rule = gaussRule(order);
  const s = new Float64Array(order);
  const w = new Float64Array(order);
  for (let i = 0; i < order; i++) {
    s[i] = (length * (rule.nodes[i] + 1)) / 2;
    w[i] = (length * rule.weights[i]) / 2;
  }
  return testPoints(s, w);
}

/** Points for a far pair: fewer the farther the source is, relative to the test segment's length. */
export function farOrder(distance: number, testLength: number, k: number): number {
  const ratio = distance / testLength;
  const byDistance = ratio > 4 ? 2 : 3;
  // And at least two points per radian of phase along the test segment.
  return Math.max(byDistance, Math.ceil(2 * k * testLength));
}

interface NearEnd {
  sStar: number;
  clamped: number;
  h: number;
  /** Distance from the source end to the test segment. */
  gap: number;
}

/**
 * Quadrature points along test segment `t` for a source segment from p1 to p2
 * (ends given as coordinates), with `a2` the squared thin-wire radius.
 * Returns null when neither source end is near, so the caller uses a plain rule.
 */
export function nearPoints(
  test: SegmentGeometry,
  t: number,
  ends: readonly (readonly [number, number, number])[],
  a2: number,
  kMax: number,
): TestPoints | null {
  const ax = test.start[3 * t];
  const ay = test.start[3 * t + 1];
  const az = test.start[3 * t + 2];
  const ux = test.dir[3 * t];
  const uy = test.dir[3 * t + 1];
  const uz = test.dir[3 * t + 2];
  const d = test.length[t];
  const near: NearEnd[] = [];
  for (const [px, py, pz] of ends) {
    const sStar = (px - ax) * ux + (py - ay) * uy + (pz - az) * uz;
    const qx = px - ax - sStar * ux;
    const qy = py - ay - sStar * uy;
    const qz = pz - az - sStar * uz;
    const perp2 = qx * qx + qy * qy + qz * qz;
    const clamped = Math.min(Math.max(sStar, 0), d);
    const along = sStar - clamped;
    const gap = Math.sqrt(perp2 + along * along);
    if (gap < NEAR_FACTOR * d) near.push({ sStar, clamped, h: Math.sqrt(perp2 + a2), gap });
  }
  if (near.length === 0) return null;
  near.sort((p, q) => p.clamped - q.clamped);
  // Ends whose feet coincide (up to rounding) share one foot: the nearest of them decides the map.
  const feet: NearEnd[] = [];
  for (const end of near) {
    const last = feet[feet.length - 1];
    if (last === undefined || end.clamped - last.clamped > 1e-9 * d) feet.push(end);
    else if (end.gap < last.gap) feet[feet.length - 1] = end;
  }
  // Boundaries: the test ends, each foot, and midway between feet; every piece touches one foot.
  const pieces: { from: number; to: number; end: NearEnd }[] = [];
  let cursor = 0;
  feet.forEach((foot, i) => {
    if (foot.clamped > cursor) pieces.push({ from: cursor, to: foot.clamped, end: foot });
    const next = i + 1 < feet.length ? (foot.clamped + feet[i + 1].clamped) / 2 : d;
    if (next > foot.clamped) pieces.push({ from: foot.clamped, to: next, end: foot });
    cursor = next;
  });
  const maps = pieces.map(({ from, to, end }) => {
    const t0 = Math.asinh((from - end.sStar) / end.h);
    const t1 = Math.asinh((to - end.sStar) / end.h);
    return { t0, t1, end, order: nearOrder(t1 - t0, kMax * (to - from)) };
  });
  const total = maps.reduce((sum, m) => sum + m.order, 0);
  const s = new Float64Array(total);
  const w = new Float64Array(total);
  let j = 0;
  for (const { t0, t1, end, order } of maps) {
    const rule = gaussRule(order);
    for (let i = 0; i < order; i++, j++) {
      const tt = ((t1 - t0) * (rule.nodes[i] + 1)) / 2 + t0;
      s[j] = end.sStar + end.h * Math.sinh(tt);
      w[j] = ((t1 - t0) / 2) * rule.weights[i] * end.h * Math.cosh(tt);
    }
  }
  return testPoints(s, w);
}

/** sin(k·d) and cos(k·d) of every segment length, interleaved, for wavenumber k. */
export function lengthPhases(geometry: SegmentGeometry, k: number): Float64Array {
  const out = new Float64Array(2 * geometry.count);
  for (let i = 0; i < geometry.count; i++) {
    sincos(k * geometry.length[i], phase);
    out[2 * i] = phase[0];
    out[2 * i + 1] = phase[1];
  }
  return out;
}

/**
 * Reactions −∫ I_test · E_source ds between the two monopoles of test segment
 * `t` and the two monopoles of source segment `q` (or of its mirror image in
 * z = 0), with `points` phased by setPhases and `lengthPhases` for the same k.
 *
 * With `chargeTerm`, each reaction also gets the term that makes it
 * symmetric in test and source: adding back the source's node charge Q and
 * integrating its part by parts, −∫ I·E_Q ds = −Φ_Q(test node) + ∫ I′·Φ_Q ds.
 * The first part is symmetric already; the second, (jη/4πk)·∫ I′_test·g(node) ds,
 * is what is added. It depends on the source only through its node, so it
 * cancels over every whole source basis function (whose two halves share the
 * node with opposite signs), provided all reactions with that test monopole
 * include it; the basis matrix is unchanged, but a pair of segments with a
 * symmetric kernel is then integrated once and used both ways. This holds for
 * free space and a perfect ground, whose image field is a true field; not
 * under the reflection-coefficient approximation, which scales the image
 * field's parts separately.
 *
 * out[offset..offset+7] receives, as (re, im) pairs, the reactions for (test end, source end)
 * = (2,2), (2,1), (1,2), (1,1), where "end 2" is the monopole whose node is the
 * segment's end and "end 1" the one whose node is its start. When `second` is
 * given, out[offset+8..offset+15] receives the same with the field projected on that unit
 * vector instead of the test direction (the caller multiplies by second·u).
 */
export function react(
  k: number,
  geometry: SegmentGeometry,
  lengthPhases: Float64Array,
  t: number,
  q: number,
  mirror: boolean,
  a2: number,
  points: TestPoints,
  second: readonly [number, number, number] | null,
  chargeTerm: boolean,
  out: Float64Array,
  offset: number,
): void {
  const ax = geometry.start[3 * t];
  const ay = geometry.start[3 * t + 1];
  const az = geometry.start[3 * t + 2];
  const ux = geometry.dir[3 * t];
  const uy = geometry.dir[3 * t + 1];
  const uz = geometry.dir[3 * t + 2];
  const sinTest = lengthPhases[2 * t];
  const cosTest = lengthPhases[2 * t + 1];

  // The source, or its mirror image in z = 0.
  const zSign = mirror ? -1 : 1;
  const x1 = geometry.start[3 * q];
  const y1 = geometry.start[3 * q + 1];
  const z1 = zSign * geometry.start[3 * q + 2];
  const tx = geometry.dir[3 * q];
  const ty = geometry.dir[3 * q + 1];
  const tz = zSign * geometry.dir[3 * q + 2];
  const d = geometry.length[q];
  const skd = lengthPhases[2 * q];
  const ckd = lengthPhases[2 * q + 1];
  const cosPsi = tx * ux + ty * uy + tz * uz;
  const withSecond = second !== null;
  const px = withSecond ? second[0] : 0;
  const py = withSecond ? second[1] : 0;
  const pz = withSecond ? second[2] : 0;
  const cosP = tx * px + ty * py + tz * pz;
  const radial = withSecond || Math.abs(cosPsi) < 1 - 1e-12;

  let bbR = 0, bbI = 0, baR = 0, baI = 0, abR = 0, abI = 0, aaR = 0, aaI = 0;
  let pbbR = 0, pbbI = 0, pbaR = 0, pbaI = 0, pabR = 0, pabI = 0, paaR = 0, paaI = 0;
  let qbbR = 0, qbbI = 0, qbaR = 0, qbaI = 0, qabR = 0, qabI = 0, qaaR = 0, qaaI = 0;
  const { s: sArr, w: wArr, sinKs: sinKsArr, cosKs: cosKsArr } = points;
  for (let i = 0; i < sArr.length; i++) {
    const s = sArr[i];
    const vx = ax + s * ux - x1;
    const vy = ay + s * uy - y1;
    const vz = az + s * uz - z1;
    const z = vx * tx + vy * ty + vz * tz;
    const rx = vx - z * tx;
    const ry = vy - z * ty;
    const rz = vz - z * tz;
    const re2 = rx * rx + ry * ry + rz * rz + a2;
    const zb = z - d;
    const r1 = Math.sqrt(z * z + re2);
    const r2 = Math.sqrt(zb * zb + re2);
    sincos(k * r1, phase1);
    sincos(k * r2, phase2);
    const s1 = phase1[0];
    const c1 = phase1[1];
    const s2 = phase2[0];
    const c2 = phase2[1];
    const g1R = c1 / r1;
    const g1I = -s1 / r1;
    const g2R = c2 / r2;
    const g2I = -s2 / r2;
    // Monopole rising to end 2: E_t = −j(g1 − cos kd·g2); monopole rising to end 1: E_t = j(g2 − cos kd·g1).
    const e2tR = g1I - ckd * g2I;
    const e2tI = ckd * g2R - g1R;
    const e1tR = ckd * g1I - g2I;
    const e1tI = g2R - ckd * g1R;
    let f2R = e2tR * cosPsi;
    let f2I = e2tI * cosPsi;
    let f1R = e1tR * cosPsi;
    let f1I = e1tI * cosPsi;
    // ρE_ρ = j·Y2 and j·Y1; not needed on parallel segments unless a second projection is asked for.
    let y2R = 0;
    let y2I = 0;
    let y1R = 0;
    let y1I = 0;
    if (radial) {
      const zr1 = z / r1;
      const zr2 = -zb / r2;
      const al2 = zr2 * ckd;
      const al1 = zr1 * ckd;
      y2R = al2 * c2 + skd * s2 + zr1 * c1;
      y2I = skd * c2 - al2 * s2 - zr1 * s1;
      y1R = al1 * c1 + skd * s1 + zr2 * c2;
      y1I = skd * c1 - al1 * s1 - zr2 * s2;
      const rhoU = (rx * ux + ry * uy + rz * uz) / re2;
      // j·Y·rhoU = (−Y.im + j·Y.re)·rhoU
      f2R -= y2I * rhoU;
      f2I += y2R * rhoU;
      f1R -= y1I * rhoU;
      f1I += y1R * rhoU;
    }

    const sinKs = sinKsArr[i];
    const cosKs = cosKsArr[i];
    const w = wArr[i] / sinTest;
    const wB = w * sinKs;
    // sin(k(d − s)) = sin(kd)·cos(ks) − cos(kd)·sin(ks)
    const wA = w * (sinTest * cosKs - cosTest * sinKs);
    bbR -= wB * f2R;
    bbI -= wB * f2I;
    baR -= wB * f1R;
    baI -= wB * f1I;
    abR += wA * f2R;
    abI += wA * f2I;
    aaR += wA * f1R;
    aaI += wA * f1I;
    if (chargeTerm) {
      // I′ of the test monopoles: k·cos(k·s′)/sin(kd), s′ from each one's zero end (k is in the factor below).
      const cB = w * cosKs;
      const cA = w * (cosTest * cosKs + sinTest * sinKs);
      qbbR += cB * g2R;
      qbbI += cB * g2I;
      qbaR += cB * g1R;
      qbaI += cB * g1I;
      qabR += cA * g2R;
      qabI += cA * g2I;
      qaaR += cA * g1R;
      qaaI += cA * g1I;
    }
    if (withSecond) {
      const rhoP = (rx * px + ry * py + rz * pz) / re2;
      const q2R = e2tR * cosP - y2I * rhoP;
      const q2I = e2tI * cosP + y2R * rhoP;
      const q1R = e1tR * cosP - y1I * rhoP;
      const q1I = e1tI * cosP + y1R * rhoP;
      pbbR -= wB * q2R;
      pbbI -= wB * q2I;
      pbaR -= wB * q1R;
      pbaI -= wB * q1I;
      pabR += wA * q2R;
      pabI += wA * q2I;
      paaR += wA * q1R;
      paaI += wA * q1I;
    }
  }
  const c0 = 1 / (4 * Math.PI * skd);
  const q0 = 1 / (4 * Math.PI);
  // j·q = (−q.im, q.re)
  out[offset + 0] = bbR * c0 - qbbI * q0;
  out[offset + 1] = bbI * c0 + qbbR * q0;
  out[offset + 2] = baR * c0 - qbaI * q0;
  out[offset + 3] = baI * c0 + qbaR * q0;
  out[offset + 4] = abR * c0 - qabI * q0;
  out[offset + 5] = abI * c0 + qabR * q0;
  out[offset + 6] = aaR * c0 - qaaI * q0;
  out[offset + 7] = aaI * c0 + qaaR * q0;
  if (withSecond) {
    out[offset + 8] = pbbR * c0;
    out[offset + 9] = pbbI * c0;
    out[offset + 10] = pbaR * c0;
    out[offset + 11] = pbaI * c0;
    out[offset + 12] = pabR * c0;
    out[offset + 13] = pabI * c0;
    out[offset + 14] = paaR * c0;
    out[offset + 15] = paaI * c0;
  }
}
