import { NextResponse } from "next/server";
import { badRequest, route, zodProblems } from "@/server/api";
import { addItemFile } from "@/server/services/gear";
import { readMultipartUpload } from "@/server/storage/files";
import { itemIdParams, uploadFieldsSchema } from "@/validations/gear";

/** multipart/form-data: `file`, `purpose` (photo, manual or return) and, for a return photo, `bookingId`. */
export const POST = route({ params: itemIdParams }, async ({ actor, params, request }) => {
  const { file, fields } = await readMultipartUpload(request);
  const parsed = uploadFieldsSchema.safeParse(fields);
  if (!parsed.success) return badRequest(zodProblems(parsed.error));
  const stored = await addItemFile(actor, params.id, {
    purpose: parsed.data.purpose,
    bookingId: parsed.data.purpose === "return" ? parsed.data.bookingId : undefined,
    fileName: file.name,
    bytes: new Uint8Array(await file.arrayBuffer()),
  });
  return NextResponse.json({ file: stored }, { status: 201 });
});
