/**
 * The generic feedline types and the ideal baluns and ununs, as plain data (reference-data.md
 * §5). Kept apart from the line formulas in feedline.ts, which need mathjs, so that forms in
 * the browser can list the types without loading it.
 */

export type FeedlineTypeId = "rg58" | "rg8x" | "rg213" | "rg174" | "rg6" | "window450";

export interface FeedlineType {
  id: FeedlineTypeId;
  label: string;
  z0Ohms: number;
  velocityFactor: number;
  /** Matched-loss fit α(f) = k1·√f + k2·f in dB per 100 m, f in MHz. */
  k1: number;
  k2: number;
  /** Where the figures come from, said plainly for the plan screen. */
  provenance: string;
}

const HANDBOOK_TYPICAL =
  "Typical handbook figures, from memory (±20 %), fitted as k1·√f + k2·f; real cable varies by make and age.";

export const FEEDLINE_TYPES: readonly FeedlineType[] = [
  { id: "rg58", label: "RG-58", z0Ohms: 50, velocityFactor: 0.66, k1: 1.311, k2: 0.0316, provenance: HANDBOOK_TYPICAL },
  {
    id: "rg8x",
    label: "RG-8X",
    z0Ohms: 50,
    velocityFactor: 0.8,
    k1: 0.963,
    k2: 0.0265,
    provenance: `${HANDBOOK_TYPICAL} Foam dielectric: velocity factor 0.78–0.82.`,
  },
  { id: "rg213", label: "RG-213", z0Ohms: 50, velocityFactor: 0.66, k1: 0.586, k2: 0.0111, provenance: HANDBOOK_TYPICAL },
  {
    id: "rg174",
    label: "RG-174",
    z0Ohms: 50,
    velocityFactor: 0.66,
    k1: 3.372,
    k2: 0,
    provenance: "Typical handbook figures, from memory (±30 %); a copper-clad steel centre adds loss below about 10 MHz.",
  },
  {
    id: "rg6",
    label: "RG-6 (75 Ω)",
    z0Ohms: 75,
    velocityFactor: 0.83,
    k1: 0.641,
    k2: 0.0015,
    provenance: `${HANDBOOK_TYPICAL} Foam dielectric: velocity factor 0.82–0.85; a copper-clad steel centre adds loss below about 10 MHz.`,
  },
  {
    id: "window450",
    label: "450 Ω window line",
    z0Ohms: 450,
    velocityFactor: 0.91,
    k1: 0.066,
    k2: 0.0098,
    provenance:
      "From memory, not from a table (±50 %): about 0.3 dB per 100 m at 10 MHz when dry. Wet or iced line loses several times more and its velocity factor drops.",
  },
];

export function feedlineType(id: FeedlineTypeId): FeedlineType {
  const type = FEEDLINE_TYPES.find((candidate) => candidate.id === id);
  if (!type) throw new Error(`Unknown feedline type ${id}`);
  return type;
}

export type TransformerId = "1:1" | "4:1" | "9:1" | "49:1" | "64:1";

export interface Transformer {
  id: TransformerId;
  /** Impedance ratio antenna side : line side. */
  impedanceRatio: number;
  /** A balun joins a balanced antenna to coax; an unun joins an unbalanced one. */
  kind: "balun" | "unun";
  label: string;
}

export const TRANSFORMERS: Record<TransformerId, Transformer> = {
  "1:1": { id: "1:1", impedanceRatio: 1, kind: "balun", label: "1:1 current balun" },
  "4:1": { id: "4:1", impedanceRatio: 4, kind: "balun", label: "4:1 balun" },
  "9:1": { id: "9:1", impedanceRatio: 9, kind: "unun", label: "9:1 unun" },
  "49:1": { id: "49:1", impedanceRatio: 49, kind: "unun", label: "49:1 unun" },
  "64:1": { id: "64:1", impedanceRatio: 64, kind: "unun", label: "64:1 unun" },
};

