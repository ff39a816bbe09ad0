import { route } from "@/server/api";
import { getItem, patchItem, retireItem } from "@/server/services/gear";
import { gearItemPatchSchema, itemIdParams, retireQuerySchema } from "@/validations/gear";

export const GET = route({ params: itemIdParams }, async ({ actor, params }) => ({ item: await getItem(actor, params.id) }));

/** Changes the given fields; the item as a whole must still be valid (400 names each field that is not). */
export const PATCH = route({ params: itemIdParams, body: gearItemPatchSchema }, async ({ actor, params, body }) => ({
  item: await patchItem(actor, params.id, body),
}));

/** Retires the item (it is never deleted: its history stays). */
export const DELETE = route({ params: itemIdParams, query: retireQuerySchema }, async ({ actor, params, query }) => ({
  item: await retireItem(actor, params.id, query.reason),
}));
