"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { signedInAction } from "@/server/action";
import { bookKit } from "@/server/services/station-kits";
import { kitBookingSchema } from "@/validations/station-kits";

/** A keeper books an item for a station slot from the kit page (the service checks the role and the fit). */
export const bookKitAction = signedInAction(kitBookingSchema.extend({ slotId: z.uuid() }), async (actor, { slotId, itemId }) => {
  const { booking } = await bookKit(actor, slotId, { itemId });
  revalidatePath(`/antenna-days/${booking.antennaDayId}`, "layout");
  revalidatePath(`/gear/${itemId}`);
  revalidatePath("/lending");
  return { ok: true, message: `${booking.itemLabelCode} ${booking.itemName} is booked for the slot${booking.slotFeedline ? " as its feedline" : ""}.` };
});
