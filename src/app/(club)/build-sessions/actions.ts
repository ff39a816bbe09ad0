"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { signedInAction } from "@/server/action";
import { cancelBuildSession, cancelSignup, createBuildSession, signUpForSession, updateBuildSession } from "@/server/services/build-sessions";
import { buildSessionCancelSchema, buildSessionFormSchema, editBuildSessionFormSchema } from "@/validations/build-sessions";

const sessionRef = z.object({ sessionId: z.uuid("Unknown build session.") });

export const createBuildSessionAction = signedInAction(buildSessionFormSchema, async (actor, input) => {
  const { id } = await createBuildSession(actor, input);
  revalidatePath("/build-sessions");
  return { ok: true, message: "The build session is scheduled.", data: { id } };
});

export const updateBuildSessionAction = signedInAction(editBuildSessionFormSchema, async (actor, { id, ...input }) => {
  await updateBuildSession(actor, id, input);
  revalidatePath("/build-sessions", "layout");
  return { ok: true, message: "The build session is saved; everyone signed up hears about a new time or place.", data: { id } };
});

export const cancelBuildSessionAction = signedInAction(buildSessionCancelSchema.extend(sessionRef.shape), async (actor, input) => {
  await cancelBuildSession(actor, input.sessionId, input.reason);
  revalidatePath("/build-sessions", "layout");
  return { ok: true, message: "The build session is cancelled and everyone signed up is told." };
});

export const signUpAction = signedInAction(sessionRef, async (actor, { sessionId }) => {
  const outcome = await signUpForSession(actor, sessionId);
  revalidatePath("/build-sessions", "layout");
  return {
    ok: true,
    message: outcome.status === "confirmed" ? "You have a place. A confirmation is on its way by e-mail." : `The session is full: you are number ${outcome.position} on the waitlist.`,
  };
});

export const cancelSignupAction = signedInAction(sessionRef.extend({ userId: z.uuid().optional() }), async (actor, { sessionId, userId }) => {
  await cancelSignup(actor, sessionId, userId);
  revalidatePath("/build-sessions", "layout");
  return { ok: true, message: "The place is given up; the first in line gets it." };
});
