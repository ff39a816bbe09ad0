import { route } from "@/server/api";
import { findItemFile, removeItemFile } from "@/server/services/gear";
import { fileResponse } from "@/server/storage/files";
import { itemFileParams } from "@/validations/gear";

export const GET = route({ params: itemFileParams }, async ({ actor, params, request }) => fileResponse(await findItemFile(actor, params.id, params.fileId), request));

export const DELETE = route({ params: itemFileParams }, async ({ actor, params }) => {
  await removeItemFile(actor, params.id, params.fileId);
  return { ok: true };
});
