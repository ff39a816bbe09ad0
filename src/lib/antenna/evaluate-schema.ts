/**
 * zod schemas of the engine's wire structure and of the contract's `evaluate`
 * request (engine-contract.md §1). Field rules live here once; the geometry
 * rules that need more than one field (joins, ground, thin-wire limits) live in
 * structure.ts.
 */
import { z } from "zod";
import type { Structure } from "./structure";

/** Highest frequency the engine accepts, MHz (engine-contract.md). */
export const MAX_MHZ = 3000;
/** Most segments the engine accepts in one structure (engine-contract.md). */
export const MAX_SEGMENTS = 2000;
/** Most frequencies in one evaluate request. */
export const MAX_FREQUENCIES = 1001;

const point = z.tuple([z.number(), z.number(), z.number()], { error: "must be [x, y, z] in metres" });

const wireSchema = z.strictObject({
  from: point,
  to: point,
  diameterMm: z.number().gt(0, "must be greater than 0"),
  segments: z
    .number()
    .int("must be a whole number")
    .min(1, "must be at least 1")
    .max(MAX_SEGMENTS, `must be at most ${MAX_SEGMENTS}`)
    .optional(),
  conductor: z.enum(["perfect", "copper", "aluminium"]).optional(),
});

const groundSchema = z.discriminatedUnion(
  "kind",
  [
    z.strictObject({ kind: z.literal("free") }),
    z.strictObject({ kind: z.literal("perfect") }),
    z.strictObject({
      kind: z.literal("real"),
      conductivitySm: z.number().min(0, "must be 0 or more"),
      relativePermittivity: z.number().min(1, "must be at least 1"),
    }),
  ],
  { error: 'must be {"kind":"free"}, {"kind":"perfect"} or {"kind":"real", conductivitySm, relativePermittivity}' },
);

const structureShape = {
  wires: z.array(wireSchema).min(1, "must list at least one wire"),
  feed: z.strictObject({
    wire: z.number().int("must be a whole number").min(0, "must be 0 or more"),
    at: z.number().min(0, "must be between 0 and 1").max(1, "must be between 0 and 1"),
  }),
  ground: groundSchema,
};

function checkFeedWire(value: { wires: unknown[]; feed: { wire: number } }, ctx: z.RefinementCtx): void {
  if (value.feed.wire >= value.wires.length) {
    ctx.addIssue({
      code: "custom",
      path: ["feed", "wire"],
      message: `wire ${value.feed.wire} does not exist (wires are numbered 0 to ${value.wires.length - 1})`,
    });
  }
}

/** A wire structure as the engine takes it (structure.ts `Structure`). */
export const structureSchema: z.ZodType<Structure> = z.strictObject(structureShape).superRefine(checkFeedWire);

/** The contract's evaluate request. */
export const evaluateRequestSchema = z
  .strictObject({
    ...structureShape,
    frequenciesMHz: z
      .array(
        z
          .number()
          .gt(0, "must be greater than 0")
          .max(MAX_MHZ, `must be at most ${MAX_MHZ} MHz`),
      )
      .min(1, "must list at least one frequency")
      .max(MAX_FREQUENCIES, `must list at most ${MAX_FREQUENCIES} frequencies`),
    referenceOhms: z.number().gt(0, "must be greater than 0").optional(),
  })
  .superRefine(checkFeedWire);

export type EvaluateRequest = z.infer<typeof evaluateRequestSchema>;
