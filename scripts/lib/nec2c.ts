/**
 * The cross-check against nec2c, a general-purpose NEC-2 solver (Debian
 * package `nec2c`), used only as a reference: the geometries, the NEC-2 card
 * decks written for them, running nec2c, reading its feed-point impedances,
 * and the comparison rule of issue 3.
 *
 * Each geometry is given once, as the engine's Structure. NEC-2 puts its
 * source on a whole segment, centred on the feed point; where the engine cuts
 * a short feed wire into two segments (so that a node sits at its middle),
 * the deck gives that wire one segment (`necSegments`). Real ground uses
 * NEC-2's reflection-coefficient approximation (GN 0), the approximation the
 * engine uses; copper wires use NEC-2's wire-conductivity load (LD 5).
 *
 * The decks follow the usual NEC-2 modelling rules, so that nec2c itself is
 * converged: neighbouring segments of similar length at feeds and junctions,
 * and no wires meeting at acute angles (nec2c converges very slowly there; the
 * engine's piecewise-sinusoidal Galerkin solution does not move with the
 * segmentation).
 */
import { execFileSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { Solution } from "../../src/lib/antenna/solver";
import type { Ground, Structure, Vec3, Wire } from "../../src/lib/antenna/structure";

export interface Sweep {
  startMHz: number;
  stepMHz: number;
  count: number;
}

export interface CrossCheckCase {
  name: string;
  description: string;
  structure: Structure;
  /** Segments per wire in the NEC-2 deck, where they differ from the structure's. */
  necSegments?: Record<number, number>;
  sweep: Sweep;
}

export interface ImpedancePoint {
  mhz: number;
  r: number;
  x: number;
}

export interface Fixture {
  case: CrossCheckCase;
  deck: string;
  nec2c: ImpedancePoint[];
}

export const NEC2C_PATH = "/usr/bin/nec2c";

const AVERAGE: Ground = { kind: "real", conductivitySm: 0.005, relativePermittivity: 13 };
const POOR: Ground = { kind: "real", conductivitySm: 0.001, relativePermittivity: 5 };

function horizontalDipole(length: number, height: number, diameterMm: number, segments: number, extra: Partial<Wire> = {}): Wire {
  return { from: [0, -length / 2, height], to: [0, length / 2, height], diameterMm, segments, ...extra };
}

/** Point at `length` from `from` in direction (dy, dz) in the y–z plane, with the angle below horizontal in degrees. */
function leg(from: Vec3, sign: 1 | -1, length: number, droopDegrees: number): Vec3 {
  const a = (droopDegrees * Math.PI) / 180;
  return [from[0], from[1] + sign * length * Math.cos(a), from[2] - length * Math.sin(a)];
}

/** A short horizontal feed wire across y = 0 at the given height, with legs attached at its ends. */
function feedWire(height: number, diameterMm: number): Wire {
  return { from: [0, -0.1, height], to: [0, 0.1, height], diameterMm, segments: 2 };
}

/** Fan dipole with its 15 m element crossing the 20 m one at right angles, both fed across the same feed wire. */
function fanDipole(): Structure {
  const h = 10;
  const left: Vec3 = [0, -0.1, h];
  const right: Vec3 = [0, 0.1, h];
  return {
    wires: [
      feedWire(h, 2),
      { from: left, to: [0, -5.05, h], diameterMm: 2, segments: 19 },
      { from: right, to: [0, 5.05, h], diameterMm: 2, segments: 19 },
      { from: left, to: [-3.3, -0.1, h], diameterMm: 2, segments: 13 },
      { from: right, to: [3.3, 0.1, h], diameterMm: 2, segments: 13 },
    ],
    feed: { wire: 0, at: 0.5 },
    ground: { kind: "free" },
  };
}

function yagi(): Structure {
  const h = 12;
  const element = (x: number, length: number): Wire => ({ from: [x, -length / 2, h], to: [x, length / 2, h], diameterMm: 20, segments: 21 });
  return {
    wires: [element(-3.2, 10.55), element(0, 9.9), element(3.0, 9.45)],
    feed: { wire: 1, at: 0.5 },
    ground: { kind: "free" },
  };
}

function invertedV(): Structure {
  const apex = 12;
  const left: Vec3 = [0, -0.1, apex];
  const right: Vec3 = [0, 0.1, apex];
  return {
    wires: [
      feedWire(apex, 2),
      { from: left, to: leg(left, -1, 10.3, 30), diameterMm: 2, segments: 41 },
      { from: right, to: leg(right, 1, 10.3, 30), diameterMm: 2, segments: 41 },
    ],
    feed: { wire: 0, at: 0.5 },
    ground: AVERAGE,
  };
}

function verticalWithRadials(): Structure {
  const hub: Vec3 = [0, 0, 3];
  const radials = [0, 90, 180, 270].map((degrees): Wire => {
    const a = (degrees * Math.PI) / 180;
    const droop = (30 * Math.PI) / 180;
    const length = 5.2;
    return {
      from: hub,
      to: [length * Math.cos(droop) * Math.cos(a), length * Math.cos(droop) * Math.sin(a), hub[2] - length * Math.sin(droop)],
      diameterMm: 2,
      segments: 24,
    };
  });
  return {
    wires: [
      { from: hub, to: [0, 0, 3.2], diameterMm: 2, segments: 2 },
      { from: [0, 0, 3.2], to: [0, 0, 3.2 + 4.85], diameterMm: 2, segments: 22 },
      ...radials,
    ],
    feed: { wire: 0, at: 0.5 },
    ground: AVERAGE,
  };
}

function sweepAround(centreMHz: number, spanFraction: number, count = 21): Sweep {
  const start = centreMHz * (1 - spanFraction);
  return { startMHz: Number(start.toFixed(4)), stepMHz: Number(((2 * spanFraction * centreMHz) / (count - 1)).toFixed(5)), count };
}

export const CROSS_CHECK_CASES: CrossCheckCase[] = [
  {
    name: "dipole-free-space",
    description: "10 m dipole of 2 mm wire in free space, 41 segments",
    structure: { wires: [horizontalDipole(10, 10, 2, 41)], feed: { wire: 0, at: 0.5 }, ground: { kind: "free" } },
    sweep: sweepAround(14.5, 0.04),
  },
  {
    name: "dipole-perfect-ground-0.1wl",
    description: "10 m dipole 2.1 m (0.1 λ) over a perfect ground",
    structure: { wires: [horizontalDipole(10, 2.1, 2, 41)], feed: { wire: 0, at: 0.5 }, ground: { kind: "perfect" } },
    sweep: sweepAround(13.9, 0.06),
  },
  {
    name: "dipole-perfect-ground-0.25wl",
    description: "10 m dipole 5.2 m (0.25 λ) over a perfect ground",
    structure: { wires: [horizontalDipole(10, 5.2, 2, 41)], feed: { wire: 0, at: 0.5 }, ground: { kind: "perfect" } },
    sweep: sweepAround(14.6, 0.04),
  },
  {
    name: "dipole-perfect-ground-0.5wl",
    description: "10 m dipole 10.4 m (0.5 λ) over a perfect ground",
    structure: { wires: [horizontalDipole(10, 10.4, 2, 41)], feed: { wire: 0, at: 0.5 }, ground: { kind: "perfect" } },
    sweep: sweepAround(14.5, 0.04),
  },
  {
    name: "dipole-average-ground-5m",
    description: "10 m dipole 5 m over average ground (σ = 0.005 S/m, εr = 13)",
    structure: { wires: [horizontalDipole(10, 5, 2, 41)], feed: { wire: 0, at: 0.5 }, ground: AVERAGE },
    sweep: sweepAround(14.5, 0.04),
  },
  {
    name: "dipole-average-ground-10m",
    description: "10 m dipole 10 m over average ground",
    structure: { wires: [horizontalDipole(10, 10, 2, 41)], feed: { wire: 0, at: 0.5 }, ground: AVERAGE },
    sweep: sweepAround(14.5, 0.04),
  },
  {
    name: "dipole-poor-ground-40m",
    description: "20.2 m dipole 8 m over poor ground (σ = 0.001 S/m, εr = 5)",
    structure: { wires: [horizontalDipole(20.2, 8, 2, 41)], feed: { wire: 0, at: 0.5 }, ground: POOR },
    sweep: sweepAround(7.1, 0.05),
  },
  {
    name: "dipole-copper-80m",
    description: "40 m dipole of 1 mm copper wire in free space (skin-effect loss)",
    structure: { wires: [horizontalDipole(40, 15, 1, 41, { conductor: "copper" })], feed: { wire: 0, at: 0.5 }, ground: { kind: "free" } },
    sweep: sweepAround(3.63, 0.04),
  },
  {
    name: "off-centre-fed-dipole",
    description: "20.4 m dipole fed at 0.3 of its length, 10 m over average ground, 35 segments",
    structure: { wires: [horizontalDipole(20.4, 10, 2, 35)], feed: { wire: 0, at: 0.3 }, ground: AVERAGE },
    sweep: sweepAround(7.0, 0.05),
  },
  {
    name: "inverted-v",
    description: "inverted-V, apex 12 m with a 0.2 m feed wire, legs 10.3 m drooping 30°, over average ground",
    structure: invertedV(),
    necSegments: { 0: 1 },
    sweep: sweepAround(7.0, 0.05),
  },
  {
    name: "monopole-perfect-ground",
    description: "quarter-wave monopole standing on a perfect ground, fed 0.1 m above it (0.2 m feed wire)",
    structure: {
      wires: [
        { from: [0, 0, 0], to: [0, 0, 0.2], diameterMm: 2, segments: 2 },
        { from: [0, 0, 0.2], to: [0, 0, 5.05], diameterMm: 2, segments: 22 },
      ],
      feed: { wire: 0, at: 0.5 },
      ground: { kind: "perfect" },
    },
    necSegments: { 0: 1 },
    sweep: sweepAround(14.3, 0.05),
  },
  {
    name: "vertical-drooping-radials",
    description: "quarter-wave vertical, base 3 m up (0.2 m feed wire), four 5.2 m radials drooping 30°, over average ground",
    structure: verticalWithRadials(),
    necSegments: { 0: 1 },
    sweep: sweepAround(14.2, 0.05),
  },
  {
    name: "fan-dipole-20m",
    description: "fan dipole for 20 m and 15 m on one feed wire, the elements crossing at right angles (free space), swept across 20 m",
    structure: fanDipole(),
    necSegments: { 0: 1 },
    sweep: sweepAround(14.2, 0.04),
  },
  {
    name: "fan-dipole-15m",
    description: "the same fan dipole, swept across 15 m",
    structure: fanDipole(),
    necSegments: { 0: 1 },
    sweep: sweepAround(21.2, 0.04),
  },
  {
    name: "yagi-3-element",
    description: "three-element Yagi of 20 mm tube (reflector, driven element, director), free space",
    structure: yagi(),
    sweep: sweepAround(14.2, 0.03),
  },
  {
    name: "vhf-dipole",
    description: "0.96 m dipole of 3 mm rod for 2 m, free space, 21 segments",
    structure: { wires: [horizontalDipole(0.96, 5, 3, 21)], feed: { wire: 0, at: 0.5 }, ground: { kind: "free" } },
    sweep: sweepAround(148.5, 0.04),
  },
];

export function sweepFrequencies(sweep: Sweep): number[] {
  return Array.from({ length: sweep.count }, (_, i) => Number((sweep.startMHz + i * sweep.stepMHz).toFixed(6)));
}

function necNumber(x: number): string {
  return Number(x.toPrecision(10)).toString();
}

/**
 * The NEC-2 card deck for a case. For timing, `quiet` leaves out the printout
 * of the currents (PT −1) and `repeat` runs the sweep several times in one process.
 */
export function necDeck(c: CrossCheckCase, options: { quiet?: boolean; repeat?: number } = {}): string {
  const { wires, feed, ground } = c.structure;
  const segmentsOf = (i: number) => c.necSegments?.[i] ?? wires[i].segments;
  const cards = [`CM ${c.description}`, "CE"];
  wires.forEach((w, i) => {
    const segments = segmentsOf(i);
    if (segments === undefined) throw new Error(`${c.name}: wire ${i} needs a segment count`);
    const coordinates = [...w.from, ...w.to].map(necNumber).join(" ");
    cards.push(`GW ${i + 1} ${segments} ${coordinates} ${necNumber(w.diameterMm / 2000)}`);
  });
  cards.push(ground.kind === "free" ? "GE 0" : "GE 1");
  if (ground.kind === "perfect") cards.push("GN 1");
  if (ground.kind === "real") cards.push(`GN 0 0 0 0 ${ground.relativePermittivity} ${ground.conductivitySm}`);
  wires.forEach((w, i) => {
    if (w.conductor === "copper") cards.push(`LD 5 ${i + 1} 0 0 5.8E7`);
    if (w.conductor === "aluminium") cards.push(`LD 5 ${i + 1} 0 0 3.5E7`);
  });
  // The source segment must be centred on the feed point.
  const segments = segmentsOf(feed.wire)!;
  const source = Math.round(feed.at * segments + 0.5);
  if (Math.abs((source - 0.5) / segments - feed.at) > 1e-9) {
    throw new Error(`${c.name}: no NEC-2 segment of wire ${feed.wire} is centred at ${feed.at}`);
  }
  cards.push(`EX 0 ${feed.wire + 1} ${source} 0 1.0 0.0`);
  if (options.quiet) cards.push("PT -1 0 0 0");
  for (let i = 0; i < (options.repeat ?? 1); i++) cards.push(`FR 0 ${c.sweep.count} 0 0 ${c.sweep.startMHz} ${c.sweep.stepMHz}`, "XQ");
  cards.push("EN");
  return `${cards.join("\n")}\n`;
}

/** Feed-point impedances from nec2c's output, one per frequency. */
export function parseNecOutput(output: string): ImpedancePoint[] {
  const points: ImpedancePoint[] = [];
  const lines = output.split("\n");
  let mhz = NaN;
  lines.forEach((line, i) => {
    const frequency = /FREQUENCY\s*:\s*([-+0-9.E]+)\s*MHz/i.exec(line);
    if (frequency) mhz = Number(frequency[1]);
    if (line.includes("ANTENNA INPUT PARAMETERS")) {
      const fields = lines[i + 3].trim().split(/\s+/).map(Number);
      points.push({ mhz, r: fields[6], x: fields[7] });
    }
  });
  return points;
}

/** Run nec2c on a deck and return its impedances, its wall-clock time and its output, in ms. */
export function runNec2c(deck: string): { points: ImpedancePoint[]; milliseconds: number; output: string } {
  const dir = mkdtempSync(join(tmpdir(), "nec2c-"));
  try {
    writeFileSync(join(dir, "case.nec"), deck);
    const started = performance.now();
    execFileSync(NEC2C_PATH, [`-i${join(dir, "case.nec")}`, `-o${join(dir, "case.out")}`], { stdio: "ignore" });
    const milliseconds = performance.now() - started;
    const output = readFileSync(join(dir, "case.out"), "utf8");
    return { points: parseNecOutput(output), milliseconds, output };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/**
 * Run nec2c on a case's deck. nec2c prints frequencies to five digits only, so
 * the points carry the sweep's exact frequencies (after checking they match).
 */
export function runCase(c: CrossCheckCase): { points: ImpedancePoint[]; milliseconds: number } {
  const { points, milliseconds } = runNec2c(necDeck(c));
  const frequencies = sweepFrequencies(c.sweep);
  if (points.length !== frequencies.length) throw new Error(`${c.name}: nec2c gave ${points.length} points, expected ${frequencies.length}`);
  points.forEach((p, i) => {
    if (Math.abs(p.mhz / frequencies[i] - 1) > 1e-4) throw new Error(`${c.name}: nec2c solved ${p.mhz} MHz, expected ${frequencies[i]}`);
  });
  return { points: points.map((p, i) => ({ ...p, mhz: frequencies[i] })), milliseconds };
}

export function nec2cInstalled(): boolean {
  return existsSync(NEC2C_PATH);
}

/** Frequency where the reactance first crosses zero from below, by linear interpolation; NaN when it does not. */
export function zeroReactanceMHz(points: readonly ImpedancePoint[]): number {
  for (let i = 1; i < points.length; i++) {
    const [a, b] = [points[i - 1], points[i]];
    if (a.x < 0 && b.x >= 0) return a.mhz + ((b.mhz - a.mhz) * -a.x) / (b.x - a.x);
  }
  return NaN;
}

export interface Comparison {
  /** Our zero-reactance frequency relative to nec2c's, minus 1. */
  resonanceOffset: number;
  /** The common frequency shift applied to our sweep (fraction). */
  shift: number;
  /** Worst |ΔR|/R_nec over the sweep (fraction). */
  worstR: number;
  /** Worst |ΔX|/(3 Ω + 3 %·|Z_nec|) over the sweep: at most 1 passes. */
  worstXShare: number;
  /** Worst |ΔX| in ohms. */
  worstXOhms: number;
  passes: boolean;
}

export const TOLERANCES = { resonance: 0.005, shift: 0.003, r: 0.03, xOhms: 3, xOfZ: 0.03 } as const;

/**
 * Issue 3's rule: the zero-reactance frequency within 0.5 %; at every swept
 * point, after at most one common frequency shift of 0.3 %, R within 3 % and X
 * within 3 Ω + 3 % of |Z|. `ours(mhz)` solves the engine at any frequency.
 */
export function compareSweeps(nec: readonly ImpedancePoint[], ours: (mhz: number) => Solution): Comparison {
  const oursAt = (shift: number) => nec.map((p) => ours(p.mhz * (1 + shift))).map((s, i) => ({ mhz: nec[i].mhz, r: s.impedance.r, x: s.impedance.x }));
  const unshifted = oursAt(0);
  const resonanceOffset = zeroReactanceMHz(unshifted) / zeroReactanceMHz(nec) - 1;
  const measure = (shift: number, points: ImpedancePoint[]) => {
    let worstR = 0;
    let worstXShare = 0;
    let worstXOhms = 0;
    points.forEach((p, i) => {
      const n = nec[i];
      worstR = Math.max(worstR, Math.abs(p.r - n.r) / n.r);
      const dx = Math.abs(p.x - n.x);
      worstXOhms = Math.max(worstXOhms, dx);
      worstXShare = Math.max(worstXShare, dx / (TOLERANCES.xOhms + TOLERANCES.xOfZ * Math.hypot(n.r, n.x)));
    });
    return { shift, worstR, worstXShare, worstXOhms };
  };
  // The shift that lines up the two resonances, if within the allowed 0.3 %; otherwise none.
  const aligning = Number.isFinite(resonanceOffset) ? resonanceOffset : 0;
  const candidates = [measure(0, unshifted)];
  if (aligning !== 0) {
    const shift = Math.max(-TOLERANCES.shift, Math.min(TOLERANCES.shift, aligning));
    candidates.push(measure(shift, oursAt(shift)));
  }
  const score = (c: (typeof candidates)[number]) => Math.max(c.worstR / TOLERANCES.r, c.worstXShare);
  const best = candidates.reduce((a, b) => (score(b) < score(a) ? b : a));
  return {
    resonanceOffset,
    ...best,
    passes: Math.abs(resonanceOffset) <= TOLERANCES.resonance && score(best) <= 1,
  };
}
