/**
 * Trimming from a measured resonance.
 *
 * The rule (common practice): a wire's resonant length scales as 1/f, so
 * L_new = L_built × f_measured / f_target. The engine's answer: the model of
 * the geometry as built resonates at f_model; the real antenna resonates
 * f_measured / f_model times that, so we re-tune the model for
 * f_target × f_model / f_measured and cut to the length that gives. It accounts
 * for what the rule ignores (end effects, height, the shape), and agrees with
 * the rule when those do not matter.
 */
import { z } from "zod";
import { wavelengthMetres } from "./physics";
import type { CutPiece } from "./cut-sheet";
import type { FamilyModel } from "./families/family";
import { planModel, significant } from "./plan";
import { planRequestSchema } from "./plan-schema";
import { EngineInputError, parseOrThrow, problem } from "./problems";
import { resonantFrequency, tuneLengths } from "./resonance";
import { prepareStructure } from "./solver";

/** How far a measured resonance may sit from the target before we suspect the sweep is of something else. */
const MAX_MEASURED_OFFSET = 0.3;

export const trimRequestSchema = z.strictObject({
  plan: planRequestSchema,
  /** Each element's length as built (insulator eye to eye), in the plan's element order; the plan's cut lengths when absent. */
  builtLengthsM: z
    .array(z.number({ error: "must be a number (metres)" }).positive("must be greater than 0"), {
      error: "must be a list of lengths in metres, one per element",
    })
    .optional(),
  /** The measured resonance of each element, MHz, in the plan's element order. */
  measuredMHz: z
    .array(z.number({ error: "must be a number (MHz)" }).positive("must be greater than 0"), {
      error: "must be a list of frequencies in MHz, one per element",
    })
    .min(1, "must give at least one measured resonance"),
});

export type TrimRequestInput = z.input<typeof trimRequestSchema>;

export interface PieceChange {
  label: string;
  count: number;
  lengthM: number;
  newLengthM: number;
  /** New minus built, per piece: negative to cut off, positive to add. */
  changeM: number;
  /** Half the change: the first step, before measuring again (common practice). */
  firstStepM: number;
}

export interface ElementTrim {
  band: string;
  targetMHz: number;
  measuredMHz: number;
  builtLengthM: number;
  /** L × f_measured / f_target. */
  ruleLengthM: number;
  /** Where the model of the antenna as built resonates. */
  modelMHz: number | null;
  /** The length that moves the model's resonance by the measured ratio; null when the model cannot say. */
  engineLengthM: number | null;
}

export interface TrimResult {
  elements: ElementTrim[];
  rule: PieceChange[];
  engine: PieceChange[] | null;
  advice: string[];
}

/** L_new = L × f_measured / f_target: length scales as 1/f (common practice). */
export function ruleOfThumbLength(lengthM: number, measuredMHz: number, targetMHz: number): number {
  return (lengthM * measuredMHz) / targetMHz;
}

/** Per-piece changes between two sets of element lengths. */
export function pieceChanges(before: CutPiece[], after: CutPiece[]): PieceChange[] {
  return before.map((piece, i) => {
    const changeM = after[i].electricalLengthM - piece.electricalLengthM;
    return {
      label: piece.label,
      count: piece.count,
      lengthM: piece.electricalLengthM,
      newLengthM: after[i].electricalLengthM,
      changeM,
      firstStepM: changeM / 2,
    };
  });
}

function centimetres(m: number): string {
  return `${(Math.abs(m) * 100).toFixed(1)} cm`;
}

function advice(changes: PieceChange[]): string[] {
  const lines = changes
    .filter((change) => Math.abs(change.changeM) >= 0.0005)
    .map((change) =>
      change.changeM < 0
        ? `${change.label}: take ${centimetres(change.firstStepM)} off the outer end first (half of ${centimetres(change.changeM)}), measure again, then the rest.`
        : `${change.label}: add ${centimetres(change.changeM)} by unfolding wire from the wrap at the outer insulator; if the wrap is too short, splice.`,
    );
  return [
    ...(lines.length > 0 ? lines : ["The antenna already resonates where it should: leave it as it is."]),
    "Cut half the change first and measure again: a cut cannot be undone, and the feedline, nearby objects and the weather move the resonance too (common practice).",
    "Measure at the feed point, or correct a sweep taken at the radio for the feedline, before trimming.",
  ];
}

/** The model's resonance of each element as built, and the lengths that shift it by the measured ratios. */
function engineAnswer(
  model: FamilyModel,
  built: number[],
  measured: number[],
): { modelMHz: (number | null)[]; lengths: number[] | null } {
  const targets = model.elements.map((element) => element.targetMHz);
  const maxMHz = (1 + MAX_MEASURED_OFFSET) * Math.max(...targets);
  const prepared = prepareStructure(model.build(built).structure, maxMHz);
  const modelMHz = targets.map((target) => resonantFrequency(prepared, model.tuning, target));
  if (modelMHz.some((mhz) => mhz === null)) return { modelMHz, lengths: null };
  const shifted: FamilyModel = {
    ...model,
    elements: model.elements.map((element, k) => ({
      ...element,
      targetMHz: (element.targetMHz * (modelMHz[k] as number)) / measured[k],
    })),
  };
  const tuned = tuneLengths(shifted, built, maxMHz);
  return { modelMHz, lengths: tuned.converged ? tuned.lengths : null };
}

export function trim(input: unknown): TrimResult {
  const request = parseOrThrow(trimRequestSchema, input);
  const model = planModel(request.plan);
  const count = model.elements.length;
  const problems: string[] = [];
  if (request.measuredMHz.length !== count) {
    problems.push(problem(["measuredMHz"], `must give ${count} value${count === 1 ? "" : "s"}, one per element`));
  }
  if (request.builtLengthsM && request.builtLengthsM.length !== count) {
    problems.push(problem(["builtLengthsM"], `must give ${count} value${count === 1 ? "" : "s"}, one per element`));
  }
  request.measuredMHz.forEach((mhz, k) => {
    const target = model.elements[k]?.targetMHz;
    if (target !== undefined && Math.abs(mhz / target - 1) > MAX_MEASURED_OFFSET) {
      problems.push(
        problem(["measuredMHz", k], `${mhz} MHz is far from the element's ${target} MHz; check the sweep is of this antenna`),
      );
    }
  });
  request.builtLengthsM?.forEach((length, k) => {
    const target = model.elements[k]?.targetMHz;
    if (target !== undefined && length > wavelengthMetres(target)) {
      problems.push(problem(["builtLengthsM", k], `${length} m is longer than a whole wavelength at ${target} MHz`));
    }
  });
  if (problems.length > 0) throw new EngineInputError(problems);

  const targets = model.elements.map((element) => element.targetMHz);
  const built =
    request.builtLengthsM ??
    tuneLengths(
      model,
      model.ruleOfThumb.map((rule) => rule.lengthM),
      (1 + MAX_MEASURED_OFFSET) * Math.max(...targets),
    ).lengths;
  const ruleLengths = built.map((length, k) => ruleOfThumbLength(length, request.measuredMHz[k], targets[k]));
  const engine = engineAnswer(model, built, request.measuredMHz);
  const before = model.cutPieces(built);
  const rule = pieceChanges(before, model.cutPieces(ruleLengths));
  const engineChanges = engine.lengths ? pieceChanges(before, model.cutPieces(engine.lengths)) : null;
  return significant({
    elements: model.elements.map((element, k) => ({
      band: element.band.name,
      targetMHz: element.targetMHz,
      measuredMHz: request.measuredMHz[k],
      builtLengthM: built[k],
      ruleLengthM: ruleLengths[k],
      modelMHz: engine.modelMHz[k],
      engineLengthM: engine.lengths ? engine.lengths[k] : null,
    })),
    rule,
    engine: engineChanges,
    advice: advice(engineChanges ?? rule),
  });
}
