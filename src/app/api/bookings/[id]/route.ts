import { z } from "zod";
import { route } from "@/server/api";
import { getBooking, stepBooking } from "@/server/services/lending";
import { bookingStepSchema } from "@/validations/lending";

const params = z.object({ id: z.uuid("That booking was not found.") });

export const GET = route({ params }, async ({ actor, params }) => ({ booking: await getBooking(actor, params.id) }));

export const PATCH = route({ params, body: bookingStepSchema }, async ({ actor, params, body }) => {
  const { booking, offered } = await stepBooking(actor, params.id, body);
  return { booking, offeredTo: offered.map((offer) => offer.waitlistId) };
});
