"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { signedInAction } from "@/server/action";
import { deleteLibraryPlan, updateLibraryPlan } from "@/server/services/plans";
import { planNameField, planNotesField } from "@/validations/plans";

export const renameLibraryPlanAction = signedInAction(z.object({ id: z.uuid(), name: planNameField, notes: planNotesField }), async (actor, { id, ...patch }) => {
  await updateLibraryPlan(actor, id, patch);
  revalidatePath("/bench/library", "layout");
  return { ok: true, message: "The plan's name and notes are saved." };
});

export const deleteLibraryPlanAction = signedInAction(z.object({ id: z.uuid() }), async (actor, { id }) => {
  await deleteLibraryPlan(actor, id);
  revalidatePath("/bench/library", "layout");
  return { ok: true, message: "The plan is deleted." };
});
