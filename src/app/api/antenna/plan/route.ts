import { runPlan } from "@/server/engine/run";
import { engineRoute } from "@/server/engine/route";

export const dynamic = "force-dynamic";

/** The engine contract's `plan` call (README, "Antenna engine"). */
export const POST = engineRoute(runPlan);
