"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { signedInAction } from "@/server/action";
import { createItem, importItems, retireItem, updateItem, type ImportOutcome } from "@/server/services/gear";
import { gearItemSchema, importSchema, retireSchema, type GearItemFormValues } from "@/validations/gear";

export const createItemAction = signedInAction(gearItemSchema, async (actor, input) => {
  const item = await createItem(actor, input);
  revalidatePath("/gear");
  return { ok: true, message: `${item.labelCode} ${item.name} is on the shelf.`, data: { id: item.id } };
});

/** Bound to the item's id by the edit page; the id is checked like any other input. */
export async function updateItemAction(id: string, input: GearItemFormValues) {
  const itemId = z.uuid().safeParse(id);
  if (!itemId.success) return { ok: false, message: "That item was not found." };
  return signedInAction(gearItemSchema, async (actor, item) => {
    const updated = await updateItem(actor, itemId.data, item);
    revalidatePath(`/gear/${itemId.data}`);
    return { ok: true, message: `${updated.labelCode} is saved.`, data: { id: itemId.data } };
  })(input);
}

export const retireItemAction = signedInAction(retireSchema, async (actor, { id, reason }) => {
  await retireItem(actor, id, reason);
  revalidatePath(`/gear/${id}`);
  return { ok: true, message: "The item is retired." };
});

export const importItemsAction = signedInAction(importSchema, async (actor, input) => {
  const outcome = await importItems(actor, input);
  if (outcome.imported > 0) revalidatePath("/gear");
  return { ok: outcome.problems.length === 0, data: outcome } satisfies { ok: boolean; data: ImportOutcome };
});
