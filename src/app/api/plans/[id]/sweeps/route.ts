import { sweepListRoute, sweepUploadRoute } from "@/server/sweep-routes";

export const dynamic = "force-dynamic";

export const GET = sweepListRoute("plan");

export const POST = sweepUploadRoute("plan");
