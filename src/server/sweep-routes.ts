// The HTTP side of measured sweeps, shared by a station slot's and a library plan's sweeps:
// the list, and the upload (multipart/form-data: `file` and the text fields of
// sweepUploadFieldsSchema; with `preview=true` the file is only read, nothing is stored).
import { NextResponse } from "next/server";
import { badRequest, route, zodProblems } from "@/server/api";
import { listSweeps, previewSweep, sweepAccess, uploadSweep, type SweepTarget } from "@/server/services/sweeps";
import { readMultipartUpload } from "@/server/storage/files";
import { idParams } from "@/validations/ids";
import { sweepPreviewFieldsSchema, sweepUploadFieldsSchema } from "@/validations/sweeps";

export function sweepListRoute(kind: SweepTarget["kind"]) {
  return route({ params: idParams }, async ({ actor, params }) => {
    const target = { kind, id: params.id };
    const [sweeps, access] = await Promise.all([listSweeps(actor, target), sweepAccess(actor, target)]);
    return { sweeps, canUpload: access.canUpload, uploadRefusedBecause: access.reason || null };
  });
}

export function sweepUploadRoute(kind: SweepTarget["kind"]) {
  return route({ params: idParams }, async ({ actor, params, request }) => {
    const target = { kind, id: params.id };
    const { file, fields } = await readMultipartUpload(request);
    const bytes = new Uint8Array(await file.arrayBuffer());
    if (fields.preview === "true") {
      const preview = sweepPreviewFieldsSchema.safeParse(fields);
      if (!preview.success) return badRequest(zodProblems(preview.error));
      return { preview: await previewSweep(actor, target, bytes, preview.data.mapping) };
    }
    const parsed = sweepUploadFieldsSchema.safeParse(fields);
    if (!parsed.success) return badRequest(zodProblems(parsed.error));
    const outcome = await uploadSweep(actor, target, { fileName: file.name, bytes, fields: parsed.data });
    if (!outcome.ok) return badRequest(outcome.problems);
    return NextResponse.json({ sweep: outcome.sweep }, { status: 201 });
  });
}
