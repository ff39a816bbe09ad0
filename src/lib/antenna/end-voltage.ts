/**
 * RF voltage at the wire ends for a transmitter power, from the solver's currents.
 *
 * The currents (for 1 V at the feed) are scaled to the power: P = ½·Re(V·I*), so
 * V = √(2P / Re(I)) for I the feed current at 1 V. The charge per metre follows
 * from the continuity equation, q = (j/ω)·dI/dl, taken between the middles of
 * neighbouring segments and between the last middle and an open end (where the
 * current is zero). The voltage of an open end is the scalar potential of all
 * those charges at the wire's surface there, φ = (1/4πε0)·Σ∫ q·e^(−jkR)/R dl,
 * with the static part of each integral in closed form and the rest by
 * Gauss–Legendre quadrature. A ground adds the image charges: −q over a
 * perfect ground, −q·(εc − 1)/(εc + 1) over real ground (the quasi-static image,
 * which is what matters for the near field of the wire's own charge).
 */
import { groundPermittivity } from "./ground";
import { EPS0, SPEED_OF_LIGHT } from "./physics";
import { gaussRule } from "./quadrature";
import type { Solution } from "./solver";
import { JOIN_TOLERANCE_M, type Structure, type Vec3 } from "./structure";

/**
 * Above this RMS voltage we warn that a wire end is dangerous to touch while
 * transmitting: 50 V RMS, the extra-low-voltage limit for AC in IEC 61140 /
 * IEC 60364 (from memory). RF at these voltages burns through the small contact
 * area of a fingertip rather than shocking, so no gentler figure is safe.
 */
export const TOUCH_DANGER_VRMS = 50;

export const END_VOLTAGE_CAUTION =
  "Wire ends and the feed terminals carry high RF voltage while transmitting: they can burn and can arc to anything near. Insulate or guard them, keep them out of reach (common practice: at least 2.5 m up or behind a barrier), and never touch the antenna while anyone can transmit.";

export interface EndVoltage {
  label: string;
  position: Vec3;
  peakV: number;
  rmsV: number;
  dangerousToTouch: boolean;
}

export interface EndVoltages {
  powerW: number;
  thresholdVrms: number;
  thresholdReason: string;
  points: EndVoltage[];
  caution: string;
}

/** Scale that turns the 1 V solution into one delivering `powerW` (peak volts at the feed). */
export function feedVoltageForPower(solution: Solution, powerW: number): number {
  return Math.sqrt((2 * powerW) / solution.feedCurrent.re);
}

interface ChargeCell {
  a: Vec3;
  b: Vec3;
  /** Charge per metre, for 1 V at the feed, as [re, im]. */
  q: [number, number];
}

type Point = readonly [number, number, number];

function sub(a: Point, b: Point): Vec3 {
  return [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
}

function dot(a: Point, b: Point): number {
  return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
}

function middle(a: Point, b: Point): Vec3 {
  return [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2, (a[2] + b[2]) / 2];
}

function near(a: Point, b: Point): boolean {
  return Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]) <= JOIN_TOLERANCE_M;
}

/** Wire ends that touch no other wire end (and, over a perfect ground, not the ground): where the current stops. */
export function openEnds(structure: Structure): { wire: number; end: 0 | 1; position: Vec3 }[] {
  const ends = structure.wires.flatMap((w, i) => [
    { wire: i, end: 0 as const, position: w.from },
    { wire: i, end: 1 as const, position: w.to },
  ]);
  return ends.filter(
    (candidate) =>
      !ends.some((other) => other !== candidate && near(other.position, candidate.position)) &&
      !(structure.ground.kind === "perfect" && candidate.position[2] <= JOIN_TOLERANCE_M),
  );
}

/** Charge cells between segment middles along every wire, and out to its open ends. */
function chargeCells(structure: Structure, solution: Solution, omega: number): ChargeCell[] {
  const open = openEnds(structure);
  const cells: ChargeCell[] = [];
  const cell = (a: Vec3, b: Vec3, i0: { re: number; im: number }, i1: { re: number; im: number }) => {
    const length = Math.hypot(...sub(b, a));
    // q = (j/ω)·dI/dl
    const dRe = (i1.re - i0.re) / length;
    const dIm = (i1.im - i0.im) / length;
    cells.push({ a, b, q: [-dIm / omega, dRe / omega] });
  };
  const zero = { re: 0, im: 0 };
  structure.wires.forEach((w, index) => {
    const segments = solution.segments.filter((segment) => segment.wire === index);
    const middles = segments.map((segment) => middle(segment.start, segment.end));
    if (open.some((end) => end.wire === index && end.end === 0)) cell(w.from, middles[0], zero, segments[0].current);
    for (let j = 0; j + 1 < segments.length; j++) {
      cell(middles[j], middles[j + 1], segments[j].current, segments[j + 1].current);
    }
    const last = segments.length - 1;
    if (open.some((end) => end.wire === index && end.end === 1)) cell(middles[last], w.to, segments[last].current, zero);
  });
  return cells;
}

const QUADRATURE = gaussRule(6);

/**
 * ∫ e^(−jkR)/R dl over the cell, R measured to a point at distance `radius`
 * off the axis at P: the static 1/R part exactly, the rest by quadrature.
 */
function cellIntegral(cell: ChargeCell, p: Point, radius: number, k: number): [number, number] {
  const axis = sub(cell.b, cell.a);
  const length = Math.hypot(...axis);
  const u: Vec3 = [axis[0] / length, axis[1] / length, axis[2] / length];
  const ap = sub(p, cell.a);
  const t0 = dot(ap, u);
  const rho2 = Math.max(dot(ap, ap) - t0 * t0, 0) + radius * radius;
  const rho = Math.sqrt(rho2);
  let re = Math.asinh((length - t0) / rho) + Math.asinh(t0 / rho);
  let im = 0;
  for (let i = 0; i < QUADRATURE.nodes.length; i++) {
    const t = ((QUADRATURE.nodes[i] + 1) / 2) * length;
    const r = Math.sqrt((t - t0) ** 2 + rho2);
    const w = (QUADRATURE.weights[i] * length) / 2;
    re += (w * (Math.cos(k * r) - 1)) / r;
    im -= (w * Math.sin(k * r)) / r;
  }
  return [re, im];
}

/** Image charge factor −(εc − 1)/(εc + 1) as [re, im]; −1 over a perfect ground; 0 in free space. */
function imageFactor(structure: Structure, mhz: number): [number, number] {
  const ground = structure.ground;
  if (ground.kind === "free") return [0, 0];
  if (ground.kind === "perfect") return [-1, 0];
  const [er, ei] = groundPermittivity(ground.relativePermittivity, ground.conductivitySm, mhz);
  const den = (er + 1) ** 2 + ei ** 2;
  // (εc − 1)/(εc + 1)
  const re = ((er - 1) * (er + 1) + ei * ei) / den;
  const im = (ei * (er + 1) - (er - 1) * ei) / den;
  return [-re, -im];
}

function mirror(p: Point): Vec3 {
  return [p[0], p[1], -p[2]];
}

/** Scalar potential (for 1 V at the feed) at an open end, as [re, im]. */
function potentialAt(cells: ChargeCell[], p: Point, radius: number, k: number, image: [number, number]): [number, number] {
  let re = 0;
  let im = 0;
  const hasImage = image[0] !== 0 || image[1] !== 0;
  for (const cell of cells) {
    let [gr, gi] = cellIntegral(cell, p, radius, k);
    if (hasImage) {
      const [mr, mi] = cellIntegral({ ...cell, a: mirror(cell.a), b: mirror(cell.b) }, p, radius, k);
      gr += image[0] * mr - image[1] * mi;
      gi += image[0] * mi + image[1] * mr;
    }
    re += cell.q[0] * gr - cell.q[1] * gi;
    im += cell.q[0] * gi + cell.q[1] * gr;
  }
  const scale = 1 / (4 * Math.PI * EPS0);
  return [re * scale, im * scale];
}

/**
 * RF voltage at every open wire end and at the feed terminals, for `powerW`
 * delivered to the antenna. `wireLabels` name the wires (one per wire).
 */
export function endVoltages(structure: Structure, solution: Solution, wireLabels: string[], powerW: number): EndVoltages {
  const omega = 2 * Math.PI * solution.mhz * 1e6;
  const k = omega / SPEED_OF_LIGHT;
  const scale = feedVoltageForPower(solution, powerW);
  const cells = chargeCells(structure, solution, omega);
  const image = imageFactor(structure, solution.mhz);
  const open = openEnds(structure);
  const point = (label: string, position: Vec3, peakV: number): EndVoltage => ({
    label,
    position,
    peakV,
    rmsV: peakV / Math.SQRT2,
    dangerousToTouch: peakV / Math.SQRT2 > TOUCH_DANGER_VRMS,
  });
  const feedWire = structure.wires[structure.feed.wire];
  const feedPosition: Vec3 = [0, 1, 2].map(
    (c) => feedWire.from[c] + (feedWire.to[c] - feedWire.from[c]) * structure.feed.at,
  ) as Vec3;
  return {
    powerW,
    thresholdVrms: TOUCH_DANGER_VRMS,
    thresholdReason:
      "50 V RMS is the extra-low-voltage limit for AC (IEC 61140 / IEC 60364, from memory); RF above it burns through a fingertip's small contact area.",
    points: [
      point("Feed point terminals", feedPosition, scale),
      ...open.map((end) => {
        const radius = structure.wires[end.wire].diameterMm / 2000;
        const [re, im] = potentialAt(cells, end.position, radius, k, image);
        return point(`Tip of ${wireLabels[end.wire]}`, end.position, scale * Math.hypot(re, im));
      }),
    ],
    caution: END_VOLTAGE_CAUTION,
  };
}
