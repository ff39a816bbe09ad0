import { z } from "zod";
import { route } from "@/server/api";
import { createDay, listDays } from "@/server/services/antenna-days";
import { daySchema } from "@/validations/antenna-days";

export const dynamic = "force-dynamic";

const rangeQuery = z.object({ from: z.iso.datetime({ offset: true }).optional(), to: z.iso.datetime({ offset: true }).optional() });

export const GET = route({ query: rangeQuery }, async ({ actor, query }) => ({
  days: await listDays(actor, { from: query.from ? new Date(query.from) : undefined, to: query.to ? new Date(query.to) : undefined }),
}));

export const POST = route({ body: daySchema }, async ({ actor, body }) => Response.json({ day: await createDay(actor, body) }, { status: 201 }));
