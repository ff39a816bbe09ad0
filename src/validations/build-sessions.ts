import { z } from "zod";
import { planRequestSchema, type PlanRequest } from "@/lib/antenna";

/** A wall-clock time in the club's time zone, as a datetime-local input gives it. */
export const wallTimeField = z
  .string()
  .trim()
  .regex(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/, "Use a date and time like 2026-06-13T09:00 (club time).");

const buildSessionFields = {
  title: z.string().trim().min(3, "Use at least 3 characters.").max(120, "Use at most 120 characters."),
  /** The antenna engine's plan request, checked with the engine's own schema. */
  plan: planRequestSchema,
  libraryPlanId: z.uuid("Unknown plan.").nullable().default(null),
  startsAt: wallTimeField,
  endsAt: wallTimeField,
  place: z.string().trim().min(2, "Say where the session takes place.").max(200, "Use at most 200 characters."),
  antennaDayId: z.uuid("Unknown antenna day.").nullable().default(null),
  capacity: z.coerce.number().int("Use a whole number.").min(1, "At least 1 place.").max(100, "At most 100 places."),
  mentorIds: z.array(z.uuid("Unknown mentor.")).min(1, "Choose at least one mentor.").max(10, "At most 10 mentors."),
  raisesMast: z.coerce.boolean().default(false),
  notes: z
    .string()
    .trim()
    .max(2000, "Use at most 2000 characters.")
    .nullable()
    .default(null)
    .transform((value) => (value ? value : null)),
};

export const buildSessionSchema = z.object(buildSessionFields);
export type BuildSessionInput = z.infer<typeof buildSessionSchema>;

/** A change to a session: any of the fields, at least one. */
export const buildSessionPatchSchema = z
  .object({
    title: buildSessionFields.title,
    plan: buildSessionFields.plan,
    libraryPlanId: z.uuid("Unknown plan.").nullable(),
    startsAt: wallTimeField,
    endsAt: wallTimeField,
    place: buildSessionFields.place,
    antennaDayId: z.uuid("Unknown antenna day.").nullable(),
    capacity: buildSessionFields.capacity,
    mentorIds: buildSessionFields.mentorIds,
    raisesMast: z.boolean(),
    notes: z.string().trim().max(2000, "Use at most 2000 characters.").nullable(),
  })
  .partial()
  .refine((patch) => Object.keys(patch).length > 0, { message: "Change at least one field." });
export type BuildSessionPatch = z.infer<typeof buildSessionPatchSchema>;

export const buildSessionCancelSchema = z.object({
  reason: z
    .string()
    .trim()
    .max(500, "Use at most 500 characters.")
    .optional()
    .transform((value) => value || null),
});

export const sessionIdParams = z.object({ id: z.uuid("Unknown build session.") });

export const signupTargetSchema = z.object({
  /** Coordinators may cancel someone else's place; everyone else acts for themselves. */
  userId: z.uuid("Unknown person.").optional(),
});

// The session form: one flat set of plan fields for the single-band families (the fan dipole
// goes through the API), reduced to the chosen family's own parameters and then checked with
// the engine's schema, so form errors land on `plan.<field>` like the API's.
export const formFamilies = ["dipole", "inverted-v", "vertical", "end-fed", "off-centre-fed"] as const;

/** Transmitter assumed for a build session's plan: it only sets the RF-exposure figures. */
export const buildSessionTransmitter = { powerW: 100, mode: "ssb" } as const;

const formPlanSchema = z
  .object({
    family: z.enum(formFamilies, { message: "Choose an antenna." }),
    region: z.coerce.number(),
    band: z.string().min(1, "Choose a band."),
    heightM: z.coerce.number({ message: "Enter a height in metres." }),
    wireDiameterMm: z.coerce.number({ message: "Enter the wire diameter in millimetres." }),
    ground: z.string(),
    feedline: z.object({ type: z.string(), lengthM: z.coerce.number({ message: "Enter a length in metres." }) }),
    includedAngleDeg: z.coerce.number(),
    radials: z.coerce.number(),
    radialDroopDeg: z.coerce.number(),
    unun: z.string(),
    feedPosition: z.coerce.number(),
  })
  .transform(({ includedAngleDeg, radials, radialDroopDeg, unun, feedPosition, ...common }, context) => {
    const own = { "inverted-v": { includedAngleDeg }, vertical: { radials, radialDroopDeg }, "end-fed": { unun }, "off-centre-fed": { feedPosition }, dipole: {} }[common.family];
    const result = planRequestSchema.safeParse({ ...common, ...own, transmitter: buildSessionTransmitter });
    if (result.success) return result.data;
    for (const issue of result.error.issues) context.addIssue({ code: "custom", message: issue.message, path: issue.path });
    return z.NEVER;
  });

export const buildSessionFormSchema = buildSessionSchema.extend({
  plan: formPlanSchema,
  // The form's "none" is an empty choice.
  libraryPlanId: z.preprocess((value) => (value === "" ? null : value), buildSessionFields.libraryPlanId),
  mentorIds: z.preprocess((value) => (Array.isArray(value) ? value : value ? [value] : []), buildSessionFields.mentorIds),
  notes: z.string().trim().max(2000, "Use at most 2000 characters.").transform((value) => value || null),
});
export type BuildSessionFormValues = z.input<typeof buildSessionFormSchema>;

export const editBuildSessionFormSchema = buildSessionFormSchema.extend({ id: z.uuid("Unknown build session.") });

/** Defaults of the session form's plan fields; a stored plan fills in its own values. */
export function formPlanValues(region: number, plan?: PlanRequest): BuildSessionFormValues["plan"] {
  const defaults = {
    family: "dipole" as (typeof formFamilies)[number],
    region,
    band: "20m",
    heightM: 8,
    wireDiameterMm: 1.6,
    ground: "average",
    feedline: { type: "rg58", lengthM: 15 },
    includedAngleDeg: 120,
    radials: 4,
    radialDroopDeg: 30,
    unun: "49:1",
    feedPosition: 0.33,
  };
  if (!plan || plan.family === "fan-dipole") return defaults;
  return {
    ...defaults,
    ...plan,
    band: plan.band ?? defaults.band,
    ground: typeof plan.ground === "string" ? plan.ground : defaults.ground,
    feedline: { ...plan.feedline },
  } as BuildSessionFormValues["plan"];
}
