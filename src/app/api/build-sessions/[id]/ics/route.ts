import { route } from "@/server/api";
import { buildSessionIcs } from "@/server/services/build-sessions";
import { sessionIdParams } from "@/validations/build-sessions";

export const GET = route({ params: sessionIdParams }, async ({ actor, params }) => {
  const file = await buildSessionIcs(actor, params.id);
  return new Response(file.content, {
    headers: { "Content-Type": "text/calendar; charset=utf-8", "Content-Disposition": `attachment; filename="${file.filename}"`, "Cache-Control": "private, no-store" },
  });
});
