"use server";

import { revalidatePath } from "next/cache";
import { signedInAction } from "@/server/action";
import { saveLibraryPlan } from "@/server/services/plans";
import { libraryPlanSchema } from "@/validations/plans";

export const saveToLibraryAction = signedInAction(libraryPlanSchema, async (actor, input) => {
  const plan = await saveLibraryPlan(actor, input);
  revalidatePath("/bench/library");
  return { ok: true, message: `Saved to the plan library as “${plan.name}”.`, data: { id: plan.id } };
});
