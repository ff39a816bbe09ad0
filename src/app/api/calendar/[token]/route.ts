import { z } from "zod";
import { route } from "@/server/api";
import { notFound } from "@/server/errors";
import { calendarForToken } from "@/server/calendar/feeds";

// The private feed: calendar apps fetch it without a session; the secret token is the key.
export const GET = route({ signedIn: false, params: z.object({ token: z.string() }) }, async ({ params }) => {
  const calendar = await calendarForToken(params.token);
  if (!calendar) throw notFound("That calendar feed");
  return new Response(calendar, { headers: { "Content-Type": "text/calendar; charset=utf-8", "Cache-Control": "private, no-store" } });
});
