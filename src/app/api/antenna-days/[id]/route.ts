import { route } from "@/server/api";
import { deleteDay, getDay, updateDay } from "@/server/services/antenna-days";
import { dayPatchSchema } from "@/validations/antenna-days";
import { idParams } from "@/validations/ids";

export const dynamic = "force-dynamic";

export const GET = route({ params: idParams }, async ({ actor, params }) => ({ day: await getDay(actor, params.id) }));

export const PATCH = route({ params: idParams, body: dayPatchSchema }, async ({ actor, params, body }) => ({ day: await updateDay(actor, params.id, body) }));

export const DELETE = route({ params: idParams }, async ({ actor, params }) => {
  await deleteDay(actor, params.id);
  return { ok: true };
});
