"use server";

import { revalidatePath } from "next/cache";
import { signedInAction } from "@/server/action";
import { createSite, updateSite } from "@/server/services/sites";
import { siteFormSchema } from "@/validations/antenna-days";

export const saveSiteAction = signedInAction(siteFormSchema, async (actor, { siteId, ...input }) => {
  const site = siteId ? await updateSite(actor, siteId, input) : await createSite(actor, input);
  revalidatePath("/sites", "layout");
  revalidatePath("/antenna-days", "layout");
  return { ok: true, message: `${site.name} is saved.`, data: { siteId: site.id } };
});
