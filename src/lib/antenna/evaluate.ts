/**
 * The contract's `evaluate` call (engine-contract.md §1): the feed-point
 * impedance of an arbitrary wire structure at a list of frequencies.
 * Bad input throws EngineInputError with every problem as `path: message`.
 */
import { complex } from "mathjs";
import { evaluateRequestSchema } from "./evaluate-schema";
import { swr } from "./feedline";
import { parseOrThrow } from "./problems";
import { prepareStructure, solveSweep } from "./solver";

export interface EvaluatePoint {
  mhz: number;
  r: number;
  x: number;
  /** Standing-wave ratio against referenceOhms, when the request gives one (null for a purely reactive load). */
  swr?: number | null;
}

export interface EvaluateResponse {
  points: EvaluatePoint[];
  /** Segments in the whole structure, as solved. */
  segments: number;
}

function round(value: number, places: number): number {
  const scale = 10 ** places;
  return Math.round(value * scale) / scale;
}

export function evaluate(input: unknown): EvaluateResponse {
  const request = parseOrThrow(evaluateRequestSchema, input);
  const { wires, feed, ground, frequenciesMHz, referenceOhms } = request;
  const prepared = prepareStructure({ wires, feed, ground }, Math.max(...frequenciesMHz));
  const points = solveSweep(prepared, frequenciesMHz).map((solution): EvaluatePoint => {
    const { r, x } = solution.impedance;
    const point: EvaluatePoint = { mhz: solution.mhz, r: round(r, 3), x: round(x, 3) };
    if (referenceOhms !== undefined) {
      const ratio = swr(complex(r, x), referenceOhms);
      point.swr = Number.isFinite(ratio) ? round(ratio, 3) : null;
    }
    return point;
  });
  return { points, segments: prepared.segmentCount };
}
