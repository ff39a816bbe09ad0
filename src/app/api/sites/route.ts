import { route } from "@/server/api";
import { createSite, listSites } from "@/server/services/sites";
import { siteSchema } from "@/validations/antenna-days";

export const dynamic = "force-dynamic";

export const GET = route({}, async ({ actor }) => ({ sites: await listSites(actor) }));

export const POST = route({ body: siteSchema }, async ({ actor, body }) => Response.json({ site: await createSite(actor, body) }, { status: 201 }));
