import { route } from "@/server/api";
import { deleteLibraryPlan, getLibraryPlan, updateLibraryPlan } from "@/server/services/plans";
import { libraryPlanPatchSchema, planIdParams } from "@/validations/plans";

export const dynamic = "force-dynamic";

export const GET = route({ params: planIdParams }, async ({ actor, params }) => ({ plan: await getLibraryPlan(actor, params.id) }));

export const PATCH = route({ params: planIdParams, body: libraryPlanPatchSchema }, async ({ actor, params, body }) => ({
  plan: await updateLibraryPlan(actor, params.id, body),
}));

export const DELETE = route({ params: planIdParams }, async ({ actor, params }) => {
  await deleteLibraryPlan(actor, params.id);
  return new Response(null, { status: 204 });
});
