import { route } from "@/server/api";
import { deleteShift, getShift, updateShift } from "@/server/services/shifts";
import { shiftSchema } from "@/validations/antenna-days";
import { idParams } from "@/validations/ids";

export const dynamic = "force-dynamic";

export const GET = route({ params: idParams }, async ({ actor, params }) => ({ shift: await getShift(actor, params.id) }));

export const PATCH = route({ params: idParams, body: shiftSchema }, async ({ actor, params, body }) => ({ shift: await updateShift(actor, params.id, body) }));

export const DELETE = route({ params: idParams }, async ({ actor, params }) => {
  await deleteShift(actor, params.id);
  return { ok: true };
});
