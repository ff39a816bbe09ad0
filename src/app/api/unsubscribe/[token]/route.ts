import { z } from "zod";
import { route } from "@/server/api";
import { notFound } from "@/server/errors";
import { applyUnsubscribeToken } from "@/server/services/mail-preferences";

// RFC 8058 one-click unsubscribe: mail programs POST "List-Unsubscribe=One-Click" to the
// address in the List-Unsubscribe header, without a session and without a page in between.
export const POST = route({ signedIn: false, params: z.object({ token: z.string() }) }, async ({ params }) => {
  const claim = await applyUnsubscribeToken(params.token, false);
  if (!claim) throw notFound("That unsubscribe link");
  return { ok: true, category: claim.category };
});
