// zod schemas of measured sweeps: the column mapping (the preview form and the upload route),
// the upload's multipart fields, and the upload form in the browser.
import { z } from "zod";
import { timeInputPattern } from "@/lib/lending/time-input";
import { SWEEP_PLACES } from "@/lib/sweeps/feed-point";
import { FREQUENCY_UNITS, SWEEP_QUANTITIES, columnsRead, type SweepMapping } from "@/lib/sweeps/parse";

export const SWEEP_NOTE_MAX = 500;
/** A fan dipole has at most three elements. */
const MAX_ELEMENTS = 3;

/** A column index, or null ("" or absent) for a quantity the file does not give. */
const column = z.preprocess((value) => (value === "" || value === undefined ? null : typeof value === "string" ? Number(value) : value), z.number().int().min(0).nullable());

export const sweepMappingSchema = z
  .object({
    frequencyColumn: z.preprocess((value) => (typeof value === "string" && value !== "" ? Number(value) : value), z.number({ error: "Choose the frequency column." }).int().min(0)),
    frequencyUnit: z.enum(FREQUENCY_UNITS, "Choose Hz, kHz or MHz."),
    quantity: z.enum(SWEEP_QUANTITIES, "Choose what the file measures: swr, impedance or return-loss."),
    swrColumn: column,
    rColumn: column,
    xColumn: column,
    returnLossColumn: column,
  })
  .superRefine((mapping, ctx) => {
    const fieldOf: Record<string, keyof SweepMapping> = { SWR: "swrColumn", R: "rColumn", X: "xColumn", "return loss": "returnLossColumn", frequency: "frequencyColumn" };
    const seen = new Map<number, string>();
    for (const { role, column: index } of columnsRead(mapping as SweepMapping)) {
      if (index === null) {
        ctx.addIssue({ code: "custom", path: [fieldOf[role]], message: `Choose the column that holds ${role}.` });
      } else if (seen.has(index)) {
        ctx.addIssue({ code: "custom", path: [fieldOf[role]], message: `Column ${index + 1} already holds ${seen.get(index)}.` });
      } else {
        seen.set(index, role);
      }
    }
  });

const place = z.enum(SWEEP_PLACES, "Say where the analyser was connected: feed-point or radio-end.");
const note = z.string().trim().max(SWEEP_NOTE_MAX, `Use at most ${SWEEP_NOTE_MAX} characters.`);
const builtLength = z.number({ error: "must be a length in metres" }).positive("must be greater than 0").max(1000, "must be at most 1000 m");
const measuredAt = z.string().trim().regex(timeInputPattern, "Enter when it was measured as a date and time, like 2026-10-03T10:40.");

/** A multipart field holding JSON, checked with `schema`. */
function jsonField<T extends z.ZodType>(schema: T) {
  return z.preprocess((value, ctx) => {
    if (value === undefined || value === "") return undefined;
    try {
      return JSON.parse(String(value));
    } catch {
      ctx.addIssue({ code: "custom", message: "must be JSON" });
      return z.NEVER;
    }
  }, schema.optional());
}

/** The text fields of `POST /api/slots/:id/sweeps` (multipart/form-data beside `file`). */
export const sweepUploadFieldsSchema = z.object({
  mapping: jsonField(sweepMappingSchema),
  place,
  analyserId: z.preprocess((value) => (value === "" ? undefined : value), z.uuid("Choose an analyser from the gear shelf.").optional()),
  /** Wall-clock time in the club's zone, or an instant with an offset; the upload's time when absent. */
  measuredAt: z.preprocess((value) => (value === "" ? undefined : value), measuredAt.optional()),
  /** Each element's length as built, in the plan's element order; null (or all absent) for the plan's own cut length. */
  builtLengthsM: jsonField(z.array(builtLength.nullable()).min(1).max(MAX_ELEMENTS)),
  note: note.default(""),
});
export type SweepUploadFields = z.output<typeof sweepUploadFieldsSchema>;

/** `preview=true`: only the file and, optionally, a mapping to try. */
export const sweepPreviewFieldsSchema = z.object({ preview: z.literal("true"), mapping: jsonField(sweepMappingSchema) });

/** The upload form in the browser: the same checks on the values as typed. */
export const sweepUploadFormSchema = z.object({
  mapping: sweepMappingSchema,
  place,
  analyserId: z.string(),
  measuredAt,
  /** One per element of the plan, as typed; blank for the plan's own cut length. */
  builtLengths: z
    .array(
      z.object({
        value: z
          .string()
          .trim()
          .refine((text) => text === "" || (Number(text.replace(",", ".")) > 0 && Number(text.replace(",", ".")) <= 1000), "Enter a length in metres, or leave it blank for the plan's length."),
      }),
    )
    .max(MAX_ELEMENTS),
  note,
});
export type SweepUploadFormValues = z.input<typeof sweepUploadFormSchema>;

export const sweepIdParams = z.object({ id: z.uuid("must be a sweep id (uuid)") });
