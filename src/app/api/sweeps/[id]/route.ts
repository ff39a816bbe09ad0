import { route } from "@/server/api";
import { deleteSweep, getSweep } from "@/server/services/sweeps";
import { sweepIdParams } from "@/validations/sweeps";

export const dynamic = "force-dynamic";

export const GET = route({ params: sweepIdParams }, async ({ actor, params }) => ({ sweep: await getSweep(actor, params.id) }));

export const DELETE = route({ params: sweepIdParams }, async ({ actor, params }) => {
  await deleteSweep(actor, params.id);
  return { ok: true };
});
