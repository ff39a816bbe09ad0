"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { DAY_STATUSES, dayStatusLabels } from "@/lib/antenna-days/status";
import { signedInAction } from "@/server/action";
import { copyDay, createDay, deleteDay, updateDay } from "@/server/services/antenna-days";
import { cancelSignUp, createShift, deleteShift, signUp } from "@/server/services/shifts";
import { createSlot, deleteSlot, updateSlot } from "@/server/services/station-slots";
import { cancelReasonField, copyDayFormSchema, daySchema, dayEditSchema, shiftFormSchema } from "@/validations/antenna-days";
import { slotFormSchema } from "@/validations/slot-form";

const dayPath = (dayId: string) => `/antenna-days/${dayId}`;

export const createDayAction = signedInAction(daySchema, async (actor, input) => {
  const day = await createDay(actor, input);
  revalidatePath("/antenna-days");
  return { ok: true, message: `${day.title} is saved as a draft.`, data: { dayId: day.id } };
});

export const updateDayAction = signedInAction(dayEditSchema, async (actor, { dayId, ...input }) => {
  await updateDay(actor, dayId, input);
  revalidatePath("/antenna-days", "layout");
  return { ok: true, message: "The day is saved.", data: { dayId } };
});

export const changeDayStatusAction = signedInAction(
  z.object({ dayId: z.uuid(), status: z.enum(DAY_STATUSES), cancelReason: cancelReasonField }),
  async (actor, { dayId, status, cancelReason }) => {
    await updateDay(actor, dayId, { status, cancelReason: status === "cancelled" ? cancelReason : undefined });
    revalidatePath("/antenna-days", "layout");
    return { ok: true, message: `The day is now ${dayStatusLabels[status].toLowerCase()}.${status === "published" ? " Every member is told by e-mail." : ""}` };
  },
);

export const deleteDayAction = signedInAction(z.object({ dayId: z.uuid() }), async (actor, { dayId }) => {
  await deleteDay(actor, dayId);
  revalidatePath("/antenna-days");
  return { ok: true, message: "The draft is deleted." };
});

export const copyDayAction = signedInAction(copyDayFormSchema, async (actor, { sourceId, ...input }) => {
  const day = await copyDay(actor, sourceId, input);
  revalidatePath("/antenna-days");
  return { ok: true, message: `${day.title} is saved as a draft.`, data: { dayId: day.id } };
});

export const saveSlotAction = signedInAction(slotFormSchema, async (actor, { dayId, slotId, slot }) => {
  const saved = slotId ? await updateSlot(actor, slotId, slot) : await createSlot(actor, dayId, slot);
  revalidatePath(dayPath(dayId), "layout");
  return { ok: true, message: `${saved.name} is saved.`, data: { slotId: saved.id } };
});

export const deleteSlotAction = signedInAction(z.object({ dayId: z.uuid(), slotId: z.uuid() }), async (actor, { dayId, slotId }) => {
  await deleteSlot(actor, slotId);
  revalidatePath(dayPath(dayId), "layout");
  return { ok: true, message: "The station slot is deleted." };
});

export const addShiftAction = signedInAction(shiftFormSchema, async (actor, { slotId, ...input }) => {
  const shift = await createShift(actor, slotId, input);
  revalidatePath("/antenna-days", "layout");
  return { ok: true, message: "The shift is added.", data: { shiftId: shift.id } };
});

export const deleteShiftAction = signedInAction(z.object({ shiftId: z.uuid() }), async (actor, { shiftId }) => {
  await deleteShift(actor, shiftId);
  revalidatePath("/antenna-days", "layout");
  return { ok: true, message: "The shift is deleted." };
});

export const signUpAction = signedInAction(z.object({ shiftId: z.uuid() }), async (actor, { shiftId }) => {
  await signUp(actor, shiftId);
  revalidatePath("/", "layout");
  return { ok: true, message: "You are signed up for this shift." };
});

export const cancelSignUpAction = signedInAction(z.object({ shiftId: z.uuid(), personId: z.uuid().optional() }), async (actor, { shiftId, personId }) => {
  await cancelSignUp(actor, shiftId, personId);
  revalidatePath("/", "layout");
  return { ok: true, message: "The sign-up is cancelled." };
});
