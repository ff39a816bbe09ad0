"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { bookingStateLabels } from "@/lib/lending/states";
import { signedInAction } from "@/server/action";
import { joinWaitlist, requestBooking, stepBooking, stepWaitlist, type RequestResult } from "@/server/services/lending";
import { requestForAntennaDay } from "@/server/services/station-kits";
import { bookingRequestSchema, bookingStepSchema, waitlistJoinSchema, waitlistStepSchema } from "@/validations/lending";
import { dayBookingRequestSchema } from "@/validations/station-kits";

const outcomeMessages = {
  approved: "Booked: the item is yours for that time. Collect it from a steward.",
  requested: "Requested: a steward will approve or decline it.",
  "awaiting-co-sign": "Requested: a mentor co-signs it first, then a steward approves it.",
} as const;

function revalidateLending(itemId: string) {
  revalidatePath(`/gear/${itemId}`);
  revalidatePath("/lending");
  revalidatePath("/");
}

/** A request; a clash comes back (through `failure`) with the next free time as `data`, so the form can offer it or the waitlist. */
async function request(itemId: string, ask: () => Promise<RequestResult>) {
  const { outcome } = await ask();
  revalidateLending(itemId);
  return { ok: true, message: outcomeMessages[outcome] };
}

export const requestBookingAction = signedInAction(bookingRequestSchema, async (actor, input) => request(input.itemId, () => requestBooking(actor, input)));

/** A request for an antenna day (and optionally a slot): the day gives the times. */
export const requestForDayAction = signedInAction(dayBookingRequestSchema, async (actor, input) => request(input.itemId, () => requestForAntennaDay(actor, input)));

export const bookingStepAction = signedInAction(z.object({ bookingId: z.uuid(), step: bookingStepSchema }), async (actor, { bookingId, step }) => {
  const { booking } = await stepBooking(actor, bookingId, step);
  revalidateLending(booking.itemId);
  return { ok: true, message: `${booking.itemLabelCode}: ${bookingStateLabels[booking.state].toLowerCase()}.` };
});

export const joinWaitlistAction = signedInAction(waitlistJoinSchema, async (actor, input) => {
  await joinWaitlist(actor, input);
  revalidateLending(input.itemId);
  return { ok: true, message: "You are on the waitlist. If the time comes free, you are offered it here and on your home page." };
});

export const waitlistStepAction = signedInAction(z.object({ entryId: z.uuid() }).and(waitlistStepSchema), async (actor, { entryId, action }) => {
  const { entry, outcome } = await stepWaitlist(actor, entryId, action);
  revalidateLending(entry.itemId);
  return { ok: true, message: action === "accept" && outcome ? outcomeMessages[outcome] : "You left the waitlist." };
});
