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
 * junctions, and with a basis completed by its image in a perfect ground).
 *
 * Thin-wire reduced kernel: the source current is a filament on the axis and
 * the field is taken at one wire radius from it, i.e. ρ² → ρ² + a². For two
 * wires of different radii the root mean square of the radii is used, which
 * keeps the matrix symmetric and equals the radius when both are the same.
 *
 * The test integral along the other segment uses Gauss–Legendre quadrature;
 * where the test segment passes near an end of the source (self terms,
 * neighbours, bends, junctions) the test segment is cut at the near ends and
 * each piece is mapped by s = s* + h·sinh(t), which takes out the 1/R peak.
 */
import { gaussRule } from "./quadrature";

/** Segment geometry in flat arrays: start point, unit direction, length (three numbers per vector). */
export interface SegmentGeometry {
  count: number;
  start: Float64Array;
  dir: Float64Array;
  length: Float64Array;
}

/** Quadrature points (position s along the test segment from its start) and weights. */
export interface TestPoints {
  s: Float64Array;
  w: Float64Array;
}

/**
 * Gauss–Legendre points on a piece near a source end: more when the piece spans
 * many decades of distance (t-range of the sinh map) or much phase.
 */
export function nearOrder(tRange: number, phase: number): number {
  return Math.min(32, Math.max(8, Math.ceil(4 + tRange + 8 * phase)));
}
/** A source end within this many test-segment lengths of the test segment is treated as near. */
export const NEAR_FACTOR = 1.5;

/** Gauss–Legendre points mapped to [0, length]. */
export function plainPoints(order: number, length: number): TestPoints {
  const rule = gaussRule(order);
  const s = new Float64Array(order);
  const w = new Float64Array(order);
  for (let i = 0; i < order; i++) {
    s[i] = (length * (rule.nodes[i] + 1)) / 2;
    w[i] = (length * rule.weights[i]) / 2;
  }
  return { s, w };
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
  near.sort((p, q) => p.clamped - q.clamped || p.gap - q.gap);
  // Boundaries: the test ends, each near end's foot, and midway between feet; every piece touches one foot.
  const pieces: { from: number; to: number; end: NearEnd }[] = [];
  const feet = near.filter((n, i) => i === 0 || n.clamped - near[i - 1].clamped > 1e-12 * d);
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
  return { s, w };
}

/**
 * Reactions −∫ I_test · E_source ds between the two monopoles of test segment
 * `t` and the two monopoles of the source segment from (x1,y1,z1) to (x2,y2,z2).
 *
 * out[0..7] receives, as (re, im) pairs, the reactions for (test end, source end)
 * = (2,2), (2,1), (1,2), (1,1), where "end 2" is the monopole whose node is the
 * segment's end and "end 1" the one whose node is its start. When `second` is
 * given, out[8..15] receives the same with the field projected on that unit
 * vector instead of the test direction (the caller multiplies by second·u).
 */
export function react(
  k: number,
  test: SegmentGeometry,
  t: number,
  x1: number,
  y1: number,
  z1: number,
  x2: number,
  y2: number,
  z2: number,
  a2: number,
  points: TestPoints,
  second: readonly [number, number, number] | null,
  out: Float64Array,
): void {
  const ax = test.start[3 * t];
  const ay = test.start[3 * t + 1];
  const az = test.start[3 * t + 2];
  const ux = test.dir[3 * t];
  const uy = test.dir[3 * t + 1];
  const uz = test.dir[3 * t + 2];
  const dTest = test.length[t];
  const sinTest = Math.sin(k * dTest);

  let tx = x2 - x1;
  let ty = y2 - y1;
  let tz = z2 - z1;
  const d = Math.hypot(tx, ty, tz);
  tx /= d;
  ty /= d;
  tz /= d;
  const ckd = Math.cos(k * d);
  const skd = Math.sin(k * d);
  const cosPsi = tx * ux + ty * uy + tz * uz;
  const withSecond = second !== null;
  const px = withSecond ? second[0] : 0;
  const py = withSecond ? second[1] : 0;
  const pz = withSecond ? second[2] : 0;
  const cosP = tx * px + ty * py + tz * pz;

  let bbR = 0, bbI = 0, baR = 0, baI = 0, abR = 0, abI = 0, aaR = 0, aaI = 0;
  let pbbR = 0, pbbI = 0, pbaR = 0, pbaI = 0, pabR = 0, pabI = 0, paaR = 0, paaI = 0;
  const { s: sArr, w: wArr } = points;
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
    const c1 = Math.cos(k * r1);
    const s1 = Math.sin(k * r1);
    const c2 = Math.cos(k * r2);
    const s2 = Math.sin(k * r2);
    const g1R = c1 / r1;
    const g1I = -s1 / r1;
    const g2R = c2 / r2;
    const g2I = -s2 / r2;
    // Monopole rising to end 2: E_t = −j(g1 − cos kd·g2); ρE_ρ = j·Y2.
    const x2R = g1R - ckd * g2R;
    const x2I = g1I - ckd * g2I;
    const e2tR = x2I;
    const e2tI = -x2R;
    const al2 = (-zb / r2) * ckd;
    const zr1 = z / r1;
    const y2R = al2 * c2 + skd * s2 + zr1 * c1;
    const y2I = skd * c2 - al2 * s2 - zr1 * s1;
    // Monopole rising to end 1: E_t = j(g2 − cos kd·g1); ρE_ρ = j·Y1.
    const x1R = g2R - ckd * g1R;
    const x1I = g2I - ckd * g1I;
    const e1tR = -x1I;
    const e1tI = x1R;
    const al1 = zr1 * ckd;
    const zr2 = -zb / r2;
    const y1R = al1 * c1 + skd * s1 + zr2 * c2;
    const y1I = skd * c1 - al1 * s1 - zr2 * s2;

    const rhoU = (rx * ux + ry * uy + rz * uz) / re2;
    // j·Y·rhoU = (−Y.im + j·Y.re)·rhoU
    const f2R = e2tR * cosPsi - y2I * rhoU;
    const f2I = e2tI * cosPsi + y2R * rhoU;
    const f1R = e1tR * cosPsi - y1I * rhoU;
    const f1I = e1tI * cosPsi + y1R * rhoU;

    const ks = k * s;
    const w = wArr[i] / sinTest;
    const wB = w * Math.sin(ks);
    const wA = w * Math.sin(k * dTest - ks);
    bbR -= wB * f2R;
    bbI -= wB * f2I;
    baR -= wB * f1R;
    baI -= wB * f1I;
    abR += wA * f2R;
    abI += wA * f2I;
    aaR += wA * f1R;
    aaI += wA * f1I;
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
  out[0] = bbR * c0;
  out[1] = bbI * c0;
  out[2] = baR * c0;
  out[3] = baI * c0;
  out[4] = abR * c0;
  out[5] = abI * c0;
  out[6] = aaR * c0;
  out[7] = aaI * c0;
  if (withSecond) {
    out[8] = pbbR * c0;
    out[9] = pbbI * c0;
    out[10] = pbaR * c0;
    out[11] = pbaI * c0;
    out[12] = pabR * c0;
    out[13] = pabI * c0;
    out[14] = paaR * c0;
    out[15] = paaI * c0;
  }
}
