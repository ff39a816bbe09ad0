import { route, badRequest, zodProblems } from "@/server/api";
import { getItem, retireItem, updateItem } from "@/server/services/gear";
import { can } from "@/server/policy";
import { forbidden } from "@/server/errors";
import { gearItemPatchSchema, gearItemSchema, itemIdParams, retireQuerySchema } from "@/validations/gear";

export const GET = route({ params: itemIdParams }, async ({ actor, params }) => ({ item: await getItem(actor, params.id) }));

export const PATCH = route({ params: itemIdParams, body: gearItemPatchSchema }, async ({ actor, params, body }) => {
  if (!can(actor, "gear.manage")) throw forbidden();
  const current = await getItem(actor, params.id);
  const parsed = gearItemSchema.safeParse({ ...current, ...body });
  if (!parsed.success) return badRequest(zodProblems(parsed.error));
  return { item: await updateItem(actor, params.id, parsed.data) };
});

/** Retires the item (it is never deleted: its history stays). */
export const DELETE = route({ params: itemIdParams, query: retireQuerySchema }, async ({ actor, params, query }) => ({
  item: await retireItem(actor, params.id, query.reason),
}));
