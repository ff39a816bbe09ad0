import { route } from "@/server/api";
import { listLibraryPlans, saveLibraryPlan } from "@/server/services/plans";
import { libraryPlanSchema } from "@/validations/plans";

export const dynamic = "force-dynamic";

export const GET = route({}, async ({ actor }) => ({ plans: await listLibraryPlans(actor) }));

export const POST = route({ body: libraryPlanSchema }, async ({ actor, body }) => Response.json({ plan: await saveLibraryPlan(actor, body) }, { status: 201 }));
