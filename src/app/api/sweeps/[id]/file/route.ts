import { route } from "@/server/api";
import { sweepFile } from "@/server/services/sweeps";
import { fileResponse } from "@/server/storage/files";
import { sweepIdParams } from "@/validations/sweeps";

export const dynamic = "force-dynamic";

/** The raw file as uploaded, streamed (If-None-Match honoured). */
export const GET = route({ params: sweepIdParams }, async ({ actor, params, request }) => fileResponse(await sweepFile(actor, params.id), request));
