// zod schemas of the gear shelf, shared by the item form, the routes and the CSV import.
// One item is a discriminated union on its kind: each kind carries its own details.
import { z } from "zod";
import {
  approvalRules,
  cableTypeIds,
  coaxConnectors,
  gearConditions,
  gearKinds,
  shelfConditions,
  transformerRatios,
  transformerStyles,
} from "@/lib/gear/kinds";

/** Form fields and CSV cells arrive as strings; an empty one means "not given". */
const blankToUndefined = (value: unknown) => (typeof value === "string" && value.trim() === "" ? undefined : value);

/** A number typed as text ("9", "9.5" or "9,5"); blank stays undefined so the message can ask for it. */
const toNumber = (value: unknown) => {
  if (typeof value !== "string") return value;
  const text = value.trim();
  if (text === "") return undefined;
  const number = Number(text.replace(",", "."));
  return Number.isNaN(number) ? value : number;
};

const numberIn = (label: string, min: number, max: number, unit: string) =>
  z.preprocess(
    toNumber,
    z
      .number({ error: (issue) => (issue.input === undefined ? `Enter the ${label}.` : `The ${label} must be a number.`) })
      .min(min, `The ${label} must be at least ${min} ${unit}.`)
      .max(max, `The ${label} must be at most ${max} ${unit}.`),
  );

const optionalDate = (label: string) =>
  z.preprocess(
    (value) => blankToUndefined(value) ?? null,
    z.iso.date(`Write the ${label} as a date, like 2026-03-14.`).nullable(),
  );

const optionalText = (max: number) =>
  z.preprocess(
    (value) => (typeof value === "string" ? value.trim() : value) || null,
    z.string().max(max, `Use at most ${max} characters.`).nullable(),
  );

export const labelCodeField = z
  .string()
  .trim()
  .toUpperCase()
  .regex(/^[A-Z0-9][A-Z0-9-]{1,11}$/, "A label code has 2–12 letters, digits or hyphens, like AN-01.");

const base = {
  labelCode: labelCodeField,
  name: z.string().trim().min(1, "Enter a name.").max(80, "Use at most 80 characters."),
  condition: z.enum(shelfConditions, "Choose good, worn or needs repair."),
  location: z.string().trim().min(1, "Say where the item is kept.").max(80, "Use at most 80 characters."),
  notes: optionalText(1000),
  /** Left out: the kind's default (defaultApprovalRule). */
  approvalRule: z.preprocess(blankToUndefined, z.enum(approvalRules, "Choose automatic or steward.").optional()),
};

const analyser = z
  .object({
    ...base,
    kind: z.literal("analyser"),
    minMhz: numberIn("lowest frequency", 0.001, 100_000, "MHz"),
    maxMhz: numberIn("highest frequency", 0.001, 100_000, "MHz"),
    batteryCheckedOn: optionalDate("battery check date"),
    calibrationCheckedOn: optionalDate("calibration check date"),
  })
  .refine((item) => item.maxMhz > item.minMhz, { path: ["maxMhz"], message: "The highest frequency must be above the lowest." });

const coax = z.object({
  ...base,
  kind: z.literal("coax"),
  cableType: z.enum(cableTypeIds, "Choose a cable type from the feedline table."),
  lengthM: numberIn("length", 0.1, 500, "m"),
  connectorA: z.enum(coaxConnectors, "Choose the connector on one end."),
  connectorB: z.enum(coaxConnectors, "Choose the connector on the other end."),
});

const mast = z.object({
  ...base,
  kind: z.literal("mast"),
  heightM: numberIn("height", 0.5, 40, "m"),
  guyKit: z.string().trim().min(1, "Describe the guy kit (or write none).").max(200, "Use at most 200 characters."),
});

const balun = z.object({
  ...base,
  kind: z.literal("balun"),
  transformerStyle: z.enum(transformerStyles, "Choose balun or unun."),
  transformerRatio: z.enum(transformerRatios, "Choose the impedance ratio."),
  powerRatingW: numberIn("power rating", 1, 20_000, "W").pipe(z.number().int("The power rating is a whole number of watts.")),
});

const plain = (kind: "tuner" | "power" | "radio" | "tools" | "other") => z.object({ ...base, kind: z.literal(kind) });

export const gearItemSchema = z.discriminatedUnion(
  "kind",
  [analyser, coax, mast, balun, plain("tuner"), plain("power"), plain("radio"), plain("tools"), plain("other")],
  { error: "Choose a kind of item." },
);
export type GearItemInput = z.output<typeof gearItemSchema>;
export type GearItemFormValues = z.input<typeof gearItemSchema>;

export const retireSchema = z.object({ id: z.uuid(), reason: z.string().trim().min(3, "Say why the item is retired.").max(500) });

const boolFlag = z.enum(["true", "false"]).transform((value) => value === "true");

export const gearSortFields = ["labelCode", "name", "kind", "condition", "location", "updatedAt"] as const;

export const gearListQuerySchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(20),
  sort: z.enum(gearSortFields).default("labelCode"),
  dir: z.enum(["asc", "desc"]).default("asc"),
  kind: z.enum(gearKinds).optional(),
  condition: z.enum(gearConditions).optional(),
  /** Only items with no approved or out booking on this date (in the club's time zone). */
  availableOn: z.iso.date().optional(),
  q: z.string().trim().max(80).optional(),
  includeRetired: boolFlag.optional(),
  format: z.enum(["json", "csv"]).default("json"),
});
export type GearListQuery = z.output<typeof gearListQuerySchema>;

export const importSchema = z.object({
  mode: z.enum(["preview", "commit"]),
  csv: z.string().max(1_000_000, "The file is too large to import at once (1 MB at most)."),
});

/** PATCH /api/gear/:id: any item fields; merged onto the item, then checked as a whole. */
export const gearItemPatchSchema = z.record(z.string(), z.unknown());

export const itemIdParams = z.object({ id: z.uuid("That item was not found.") });
export const itemFileParams = z.object({ id: z.uuid("That item was not found."), fileId: z.uuid("That file was not found.") });
export const retireQuerySchema = z.object({ reason: retireSchema.shape.reason });

export const uploadFieldsSchema = z.discriminatedUnion("purpose", [
  z.object({ purpose: z.literal("photo") }),
  z.object({ purpose: z.literal("manual") }),
  z.object({ purpose: z.literal("return"), bookingId: z.uuid("Say which loan the return photo belongs to.") }),
]);
