/**
 * What every antenna family gives the plan: its elements and their resonance
 * targets, a geometry builder from element lengths, the pieces to cut, and its
 * matching transformer. The plan tunes the lengths with the solver
 * (resonance.ts); the family only knows its shape.
 */
import type { Band } from "../bands";
import type { CutPiece } from "../cut-sheet";
import type { TransformerId } from "../feedline-types";
import { wavelengthMetres } from "../physics";
import type { FamilyId } from "../plan-schema";
import type { Tuning } from "../resonance";
import type { Conductor, Ground, Structure, Vec3, Wire } from "../structure";

/** Where and with what the antenna is built. */
export interface Site {
  heightM: number;
  wireDiameterMm: number;
  conductor: Conductor;
  ground: Ground;
}

/** One element to tune, for one band. */
export interface ElementTarget {
  band: Band;
  targetMHz: number;
}

export interface RuleOfThumb {
  lengthM: number;
  /** The rule as the trade writes it, e.g. "468/f ft (143/f m)". */
  rule: string;
}

/** A built geometry: the solver's structure and a name for every wire (for the current chart). */
export interface BuiltAntenna {
  structure: Structure;
  wireLabels: string[];
}

export interface FamilyModel {
  family: FamilyId;
  label: string;
  /** One element per tuned length; the fan dipole has one per band. */
  elements: ElementTarget[];
  /** The rule-of-thumb length of each element. */
  ruleOfThumb: RuleOfThumb[];
  /** What the length search aims for: zero reactance, or the best match through the transformer. */
  tuning: Tuning;
  /**
   * Wire structure for the given element lengths. With `segmentsPerWavelength`
   * every wire gets that density at `maxMHz`; without it the solver chooses.
   */
  build(lengths: number[], segmentation?: { segmentsPerWavelength: number; maxMHz: number }): BuiltAntenna;
  /** Geometry problems as `path: message`, checked before any solve. */
  problems(): string[];
  cutPieces(lengths: number[]): CutPiece[];
  transformer: TransformerId;
  /** Family-specific cautions and modelling notes for the plan screen. */
  notes: string[];
}

/** 468 ft = 142.65 m: the handbooks' half-wave dipole length, L = 468/f ft (common practice). */
export const HALF_WAVE_RULE_M = 468 * 0.3048;

export function halfWaveRuleOfThumb(mhz: number): RuleOfThumb {
  return { lengthM: HALF_WAVE_RULE_M / mhz, rule: "468/f ft (143/f m), common practice" };
}

export function quarterWaveRuleOfThumb(mhz: number): RuleOfThumb {
  return { lengthM: HALF_WAVE_RULE_M / 2 / mhz, rule: "234/f ft (71.3/f m), common practice" };
}

/**
 * Lowest point any wire may reach, common practice: half a metre keeps the wire
 * out of grass and people's way, and keeps the ground model (the
 * reflection-coefficient approximation) away from the grazing case where it
 * fails.
 */
export const MIN_CLEARANCE_M = 0.5;

/** Longest a tuned element can become: the free-space half wave (or quarter wave); resonant wires are shorter. */
export function longestHalfWaveM(mhz: number): number {
  return wavelengthMetres(mhz) / 2;
}

export function wire(site: Site, from: Vec3, to: Vec3, segments?: number): Wire {
  return {
    from,
    to,
    diameterMm: site.wireDiameterMm,
    conductor: site.conductor,
    ...(segments === undefined ? {} : { segments }),
  };
}

/** Segments for a wire of `lengthM` at a density per wavelength; undefined lets the solver choose. */
export function segmentsFor(
  lengthM: number,
  segmentation: { segmentsPerWavelength: number; maxMHz: number } | undefined,
): number | undefined {
  if (!segmentation) return undefined;
  return Math.max(1, Math.ceil((lengthM * segmentation.segmentsPerWavelength) / wavelengthMetres(segmentation.maxMHz)));
}

/** A height problem when ground matters and the lowest point is too low. */
export function clearanceProblems(site: Site, lowestZ: number, path: string, advice: string): string[] {
  if (site.ground.kind === "free" || lowestZ >= MIN_CLEARANCE_M) return [];
  const where = lowestZ <= 0 ? `${round(-lowestZ)} m below the ground` : `only ${round(lowestZ)} m above the ground`;
  return [`${path}: the lowest wire end would be ${where}; keep every wire at least ${MIN_CLEARANCE_M} m up (${advice})`];
}

export function round(x: number, digits = 2): number {
  return Number(x.toFixed(digits));
}
