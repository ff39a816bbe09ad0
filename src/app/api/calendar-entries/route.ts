import { route } from "@/server/api";
import { calendarEntries, calendarKinds } from "@/server/services/calendar";
import { calendarRangeSchema } from "@/validations/antenna-days";

export const dynamic = "force-dynamic";

export const GET = route({ query: calendarRangeSchema }, async ({ actor, query }) => ({
  kinds: calendarKinds(),
  entries: await calendarEntries(actor, { from: new Date(query.from), to: new Date(query.to) }),
}));
