import { route } from "@/server/api";
import { createSlot, listSlots } from "@/server/services/station-slots";
import { slotSchema } from "@/validations/antenna-days";
import { idParams } from "@/validations/ids";

export const dynamic = "force-dynamic";

export const GET = route({ params: idParams }, async ({ actor, params }) => ({ slots: await listSlots(actor, params.id) }));

export const POST = route({ params: idParams, body: slotSchema }, async ({ actor, params, body }) =>
  Response.json({ slot: await createSlot(actor, params.id, body) }, { status: 201 }),
);
