import { route } from "@/server/api";
import { antennaDayIcs } from "@/server/services/antenna-days";
import { idParams } from "@/validations/ids";

export const dynamic = "force-dynamic";

export const GET = route({ params: idParams }, async ({ actor, params }) => {
  const file = await antennaDayIcs(actor, params.id);
  return new Response(file.content, {
    headers: { "Content-Type": "text/calendar; charset=utf-8", "Content-Disposition": `attachment; filename="${file.filename}"`, "Cache-Control": "private, no-store" },
  });
});
