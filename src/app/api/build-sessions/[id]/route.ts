import { route } from "@/server/api";
import { cancelBuildSession, getBuildSession, updateBuildSession } from "@/server/services/build-sessions";
import { buildSessionCancelSchema, buildSessionPatchSchema, sessionIdParams } from "@/validations/build-sessions";

export const GET = route({ params: sessionIdParams }, async ({ actor, params }) => getBuildSession(actor, params.id));

export const PATCH = route({ params: sessionIdParams, body: buildSessionPatchSchema }, async ({ actor, params, body }) => {
  await updateBuildSession(actor, params.id, body);
  return getBuildSession(actor, params.id);
});

/** Cancels the session (an optional ?reason= goes into the message): it stays listed (its calendar event turns CANCELLED) and everyone signed up is told. */
export const DELETE = route({ params: sessionIdParams, query: buildSessionCancelSchema }, async ({ actor, params, query }) => {
  await cancelBuildSession(actor, params.id, query.reason);
  return { ok: true };
});
