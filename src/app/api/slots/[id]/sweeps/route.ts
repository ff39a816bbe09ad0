import { sweepListRoute, sweepUploadRoute } from "@/server/sweep-routes";

export const dynamic = "force-dynamic";

export const GET = sweepListRoute("slot");

export const POST = sweepUploadRoute("slot");
