import { z } from "zod";
import { route } from "@/server/api";
import { createBuildSession, listBuildSessions } from "@/server/services/build-sessions";
import { buildSessionSchema } from "@/validations/build-sessions";

export const GET = route({ query: z.object({ include: z.enum(["past"]).optional() }) }, async ({ actor, query }) => ({
  sessions: await listBuildSessions(actor, { includePast: query.include === "past" }),
}));

export const POST = route({ body: buildSessionSchema }, async ({ actor, body }) => {
  const created = await createBuildSession(actor, body);
  return Response.json(created, { status: 201 });
});
