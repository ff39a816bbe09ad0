import { route } from "@/server/api";
import { createShift, listShifts } from "@/server/services/shifts";
import { shiftSchema } from "@/validations/antenna-days";
import { idParams } from "@/validations/ids";

export const dynamic = "force-dynamic";

export const GET = route({ params: idParams }, async ({ actor, params }) => ({ shifts: await listShifts(actor, params.id) }));

export const POST = route({ params: idParams, body: shiftSchema }, async ({ actor, params, body }) =>
  Response.json({ shift: await createShift(actor, params.id, body) }, { status: 201 }),
);
