import { route } from "@/server/api";
import { getSite, updateSite } from "@/server/services/sites";
import { siteSchema } from "@/validations/antenna-days";
import { idParams } from "@/validations/ids";

export const dynamic = "force-dynamic";

export const GET = route({ params: idParams }, async ({ actor, params }) => ({ site: await getSite(actor, params.id) }));

/** Replaces the site's details and hazards (send the whole site). */
export const PATCH = route({ params: idParams, body: siteSchema }, async ({ actor, params, body }) => ({ site: await updateSite(actor, params.id, body) }));
