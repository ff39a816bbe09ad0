// The plan library's input: a name, the engine's whole plan request (its own schema, so the
// paths of problems match the engine contract) and notes. Forms, actions and routes share these.
import { z } from "zod";
import { planRequestSchema } from "@/lib/antenna/plan-schema";

export const PLAN_NAME_MAX = 80;
export const PLAN_NOTES_MAX = 2000;

export const planNameField = z.string().trim().min(1, "Give the plan a name.").max(PLAN_NAME_MAX, `Use at most ${PLAN_NAME_MAX} characters.`);
export const planNotesField = z.string().trim().max(PLAN_NOTES_MAX, `Use at most ${PLAN_NOTES_MAX} characters.`);

export const libraryPlanSchema = z.object({
  name: planNameField,
  parameters: planRequestSchema,
  notes: planNotesField.default(""),
});
export type LibraryPlanInput = z.infer<typeof libraryPlanSchema>;

export const libraryPlanPatchSchema = z
  .object({ name: planNameField, parameters: planRequestSchema, notes: planNotesField })
  .partial()
  .refine((patch) => Object.values(patch).some((value) => value !== undefined), { message: "Change at least one of name, parameters or notes." });
export type LibraryPlanPatch = z.infer<typeof libraryPlanPatchSchema>;

export const planIdParams = z.object({ id: z.uuid("Not a plan id.") });
