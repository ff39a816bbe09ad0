/**
 * Ground classes for HF/MF modelling (reference-data.md §7). The figures are
 * recalled handbook and ITU-R P.368 values, not measurements: real ground
 * changes with frequency and moisture, several-fold at HF.
 */
import type { Ground } from "./structure";

export type GroundClassId = "very-good" | "average" | "poor" | "sea-water" | "fresh-water";

export interface GroundClass {
  id: GroundClassId;
  label: string;
  conductivitySm: number;
  relativePermittivity: number;
  source: string;
}

export const GROUND_CLASSES: readonly GroundClass[] = [
  {
    id: "very-good",
    label: "Very good (pastoral, rich soil)",
    conductivitySm: 0.0303,
    relativePermittivity: 20,
    source: "Antenna-modelling convention, ARRL Antenna Book (from memory)",
  },
  {
    id: "average",
    label: "Average",
    conductivitySm: 0.005,
    relativePermittivity: 13,
    source: "ARRL Antenna Book (from memory)",
  },
  {
    id: "poor",
    label: "Poor (city, rocky, sandy)",
    conductivitySm: 0.001,
    relativePermittivity: 5,
    source: "ARRL Antenna Book (from memory)",
  },
  {
    id: "sea-water",
    label: "Sea water",
    conductivitySm: 5,
    relativePermittivity: 70,
    source: "ITU-R P.368 / P.527, average salinity (from memory)",
  },
  {
    id: "fresh-water",
    label: "Fresh water",
    conductivitySm: 0.003,
    relativePermittivity: 80,
    source: "ITU-R P.368 / P.527 (from memory)",
  },
];

export const GROUND_CLASS_IDS = GROUND_CLASSES.map((groundClass) => groundClass.id) as [
  GroundClassId,
  ...GroundClassId[],
];

export const GROUND_CAUTION =
  "Ground constants are typical values: real ground changes with frequency and moisture, several-fold at HF.";

/** A plan's ground: a named class, a custom σ/εr, or the idealised free space and perfect ground. */
export type GroundChoice =
  | GroundClassId
  | "free-space"
  | "perfect"
  | { conductivitySm: number; relativePermittivity: number };

export function groundClass(id: GroundClassId): GroundClass {
  const found = GROUND_CLASSES.find((candidate) => candidate.id === id);
  if (!found) throw new Error(`Unknown ground class ${id}`);
  return found;
}

/** The solver's ground for a plan's ground choice. */
export function toSolverGround(choice: GroundChoice): Ground {
  if (choice === "free-space") return { kind: "free" };
  if (choice === "perfect") return { kind: "perfect" };
  if (typeof choice === "object") {
    return { kind: "real", conductivitySm: choice.conductivitySm, relativePermittivity: choice.relativePermittivity };
  }
  const { conductivitySm, relativePermittivity } = groundClass(choice);
  return { kind: "real", conductivitySm, relativePermittivity };
}
