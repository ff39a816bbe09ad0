// What the plan library learns from the sweeps of antennas built from a plan: the mean
// measured offset per band, and the cut that starts from it. The length scales with 1/f, so an
// antenna that resonates o per cent away from its model wants its wire o per cent longer or
// shorter next time: L_next = L_plan × (1 + o/100) (common practice, reference-data.md §8).
import { planModel } from "@/lib/antenna/plan";
import type { PlanRequest } from "@/lib/antenna/plan-schema";
import { pieceChanges, type PieceChange } from "@/lib/antenna/trim";

export interface OffsetSample {
  band: string;
  offsetPercent: number;
}

export interface BandOffset {
  band: string;
  meanPercent: number;
  /** How many antennas (or sweeps on the plan itself) it comes from. */
  samples: number;
}

/** The mean offset of each band over the samples given (one per antenna). */
export function meanOffsets(samples: OffsetSample[]): BandOffset[] {
  const byBand = new Map<string, number[]>();
  for (const sample of samples) byBand.set(sample.band, [...(byBand.get(sample.band) ?? []), sample.offsetPercent]);
  return [...byBand].map(([band, values]) => ({ band, meanPercent: values.reduce((sum, value) => sum + value, 0) / values.length, samples: values.length }));
}

export interface NextCut {
  elements: { band: string; plannedM: number; offsetPercent: number | null; suggestedM: number }[];
  /** Per piece to cut: the plan's length, the suggested one and the difference. */
  pieces: PieceChange[];
}

/**
 * The plan's tuned element lengths corrected by the measured offsets; an element with no
 * measurement keeps its planned length.
 */
export function nextCut(request: PlanRequest, planned: { band: string; lengthM: number }[], offsets: BandOffset[]): NextCut {
  const elements = planned.map((element) => {
    const offset = offsets.find((candidate) => candidate.band === element.band)?.meanPercent ?? null;
    return { band: element.band, plannedM: element.lengthM, offsetPercent: offset, suggestedM: element.lengthM * (1 + (offset ?? 0) / 100) };
  });
  const model = planModel(request);
  return {
    elements,
    pieces: pieceChanges(
      model.cutPieces(elements.map((element) => element.plannedM)),
      model.cutPieces(elements.map((element) => element.suggestedM)),
    ),
  };
}
