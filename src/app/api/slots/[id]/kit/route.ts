import { route } from "@/server/api";
import { bookKit, slotKit } from "@/server/services/station-kits";
import { idParams } from "@/validations/ids";
import { kitBookingSchema } from "@/validations/station-kits";

export const dynamic = "force-dynamic";

export const GET = route({ params: idParams }, async ({ actor, params }) => ({ kit: await slotKit(actor, params.id) }));

export const POST = route({ params: idParams, body: kitBookingSchema }, async ({ actor, params, body }) => {
  const { booking, outcome } = await bookKit(actor, params.id, body);
  return Response.json({ booking, outcome }, { status: 201 });
});
