import { z } from "zod";
import { planRequestSchema } from "@/lib/antenna";

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
  reason: z.string().trim().max(500, "Use at most 500 characters.").nullable().default(null),
});

export const sessionIdParams = z.object({ id: z.uuid("Unknown build session.") });

export const signupTargetSchema = z.object({
  /** Coordinators may cancel someone else's place; everyone else acts for themselves. */
  userId: z.uuid("Unknown person.").optional(),
});
