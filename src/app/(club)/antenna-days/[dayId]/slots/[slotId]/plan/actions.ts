"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import type { SlotPlanParamsInput } from "@/lib/antenna-days/slot-plan";
import { signedInAction } from "@/server/action";
import { saveSlotPlan } from "@/server/services/station-slots";
import { planParamsSchema } from "@/validations/antenna-days";

const saveSlotPlanSchema = z.object({ slotId: z.uuid(), planParams: planParamsSchema, libraryPlanId: z.uuid().nullable() });

/** The coordinator saves the plan screen's plan into the station slot (the service checks the role). */
export const saveSlotPlanAction = signedInAction(saveSlotPlanSchema, async (actor, input) => {
  const slot = await saveSlotPlan(actor, input.slotId, input.planParams as SlotPlanParamsInput, input.libraryPlanId);
  revalidatePath(`/antenna-days/${slot.dayId}`, "layout");
  revalidatePath("/bench/library", "layout");
  return { ok: true, message: "The plan is saved to the station slot." };
});
