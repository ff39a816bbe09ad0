import { route } from "@/server/api";
import { deleteSlot, getSlot, updateSlot } from "@/server/services/station-slots";
import { slotPatchSchema } from "@/validations/antenna-days";
import { idParams } from "@/validations/ids";

export const dynamic = "force-dynamic";

export const GET = route({ params: idParams }, async ({ actor, params }) => ({ slot: await getSlot(actor, params.id) }));

export const PATCH = route({ params: idParams, body: slotPatchSchema }, async ({ actor, params, body }) => ({ slot: await updateSlot(actor, params.id, body) }));

export const DELETE = route({ params: idParams }, async ({ actor, params }) => {
  await deleteSlot(actor, params.id);
  return { ok: true };
});
