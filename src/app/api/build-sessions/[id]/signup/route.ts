import { z } from "zod";
import { route } from "@/server/api";
import { cancelSignup, signUpForSession } from "@/server/services/build-sessions";
import { sessionIdParams } from "@/validations/build-sessions";

/** Takes a place, or a place in the waitlist when the session is full. */
export const POST = route({ params: sessionIdParams }, async ({ actor, params }) => {
  const outcome = await signUpForSession(actor, params.id);
  return Response.json(outcome, { status: 201 });
});

/** Gives up the signed-in person's place; coordinators may name someone else with ?userId=. */
export const DELETE = route({ params: sessionIdParams, query: z.object({ userId: z.uuid("Unknown person.").optional() }) }, async ({ actor, params, query }) => {
  await cancelSignup(actor, params.id, query.userId);
  return { ok: true };
});
