// Stored files: photos and manuals kept in PostgreSQL (stored_files + stored_file_bytes), so a
// database backup keeps them and every app instance sees the same files. Uploads are checked by
// size and by their first bytes (never by name or claimed type); downloads are streamed in
// chunks with caching headers. DEVELOPERS.md, "Stored files", says how to use it from an area.
import { createHash } from "node:crypto";
import { eq } from "drizzle-orm";
import { type Executor, pool } from "@/server/db";
import { storedFileBytes, storedFiles, type StoredFileRow } from "@/server/db/schema";
import { badInput } from "@/server/errors";
import { SWEEP_LIMITS } from "@/lib/sweeps/parse";
import { fileExtensions, isImage, isPlainText, sniffType, type AcceptedType } from "@/lib/files/sniff";

export interface UploadRule {
  /** What the upload is called in messages, e.g. "A photo". */
  label: string;
  types: readonly AcceptedType[];
  maxBytes: number;
}

const MB = 1024 * 1024;
export const uploadRules = {
  photo: { label: "A photo", types: ["image/jpeg", "image/png", "image/webp"], maxBytes: 8 * MB },
  manual: { label: "A manual", types: ["application/pdf"], maxBytes: 20 * MB },
  sweep: { label: "A sweep file", types: ["text/plain"], maxBytes: SWEEP_LIMITS.maxBytes },
} as const satisfies Record<string, UploadRule>;

/** The largest body any upload route reads, so an oversized request is refused before it is read. */
export const MAX_UPLOAD_BYTES = Math.max(...Object.values(uploadRules).map((rule) => rule.maxBytes)) + MB;

const typeNames: Record<AcceptedType, string> = {
  "image/jpeg": "JPEG",
  "image/png": "PNG",
  "image/webp": "WebP",
  "application/pdf": "PDF",
  "text/plain": "text (CSV or whitespace-separated)",
};

export function describeTypes(types: readonly AcceptedType[]): string {
  return types.map((type) => typeNames[type]).join(", ");
}

/**
 * Reads a multipart/form-data upload: the file in `file` and the other fields as text. Refuses
 * a body larger than MAX_UPLOAD_BYTES from its Content-Length before reading it.
 */
export async function readMultipartUpload(request: Request): Promise<{ file: File; fields: Record<string, string> }> {
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > MAX_UPLOAD_BYTES) throw badInput("file", `The file is too large (at most ${Math.floor(MAX_UPLOAD_BYTES / MB)} MB).`);
  if (!(request.headers.get("content-type") ?? "").startsWith("multipart/form-data")) {
    throw badInput("file", "Send the file as multipart/form-data in a field named file.");
  }
  const form = await request.formData().catch(() => null);
  const file = form?.get("file");
  if (!form || !(file instanceof File)) throw badInput("file", "Choose a file to upload.");
  const fields: Record<string, string> = {};
  for (const [key, value] of form.entries()) if (typeof value === "string") fields[key] = value;
  return { file, fields };
}

/** Checks the bytes against the rule and stores them; returns the file's row. */
export async function storeFile(
  executor: Executor,
  rule: UploadRule,
  upload: { bytes: Uint8Array; fileName: string; uploadedBy: string },
): Promise<StoredFileRow> {
  const { bytes } = upload;
  if (bytes.length === 0) throw badInput("file", "The file is empty.");
  if (bytes.length > rule.maxBytes) {
    throw badInput("file", `${rule.label} may be at most ${rule.maxBytes / MB} MB; this file is ${(bytes.length / MB).toFixed(1)} MB.`);
  }
  const type = sniffType(bytes) ?? (isPlainText(bytes) ? "text/plain" : null);
  if (!type || !rule.types.includes(type)) {
    throw badInput("file", `${rule.label} must be a ${describeTypes(rule.types)} file; this file's contents are not.`);
  }
  const [row] = await executor
    .insert(storedFiles)
    .values({
      fileName: cleanFileName(upload.fileName, type),
      contentType: type,
      byteSize: bytes.length,
      sha256: createHash("sha256").update(bytes).digest("hex"),
      uploadedBy: upload.uploadedBy,
    })
    .returning();
  await executor.insert(storedFileBytes).values({ fileId: row.id, bytes: Buffer.from(bytes) });
  return row;
}

/** A safe file name for the download header: no paths or control characters, an extension of the sniffed type. */
export function cleanFileName(name: string, type: AcceptedType): string {
  const last = name.split(/[\\/]/).pop() ?? "";
  const own = /\.([^.]*)$/.exec(last)?.[1].toLowerCase() ?? "";
  const extension = fileExtensions[type].includes(own) ? own : fileExtensions[type][0];
  const base = last
    .replace(/\.[^.]*$/, "")
    .replace(/[^\p{L}\p{N} ._-]/gu, "")
    .trim()
    .slice(0, 80);
  return `${base || "file"}.${extension}`;
}

export async function findStoredFile(executor: Executor, id: string): Promise<StoredFileRow | undefined> {
  const [row] = await executor.select().from(storedFiles).where(eq(storedFiles.id, id));
  return row;
}

const CHUNK_BYTES = 256 * 1024;

/**
 * The file as an HTTP response, streamed from the database in chunks. Files never change once
 * stored (a new upload is a new id), so browsers may keep them; they are private to signed-in
 * people, so shared caches may not. A matching If-None-Match gets 304.
 */
export function fileResponse(file: StoredFileRow, request: Request): Response {
  const etag = `"${file.sha256}"`;
  const headers = new Headers({
    "Content-Type": file.contentType,
    "Cache-Control": "private, max-age=31536000, immutable",
    ETag: etag,
    "X-Content-Type-Options": "nosniff",
    "Content-Disposition": `${isImage(file.contentType) ? "inline" : "attachment"}; filename="${file.fileName.replace(/"/g, "")}"; filename*=UTF-8''${encodeURIComponent(file.fileName)}`,
    // A stored PDF or image never runs scripts in Guyline's origin.
    "Content-Security-Policy": "default-src 'none'; img-src 'self'; style-src 'unsafe-inline'; sandbox",
  });
  if (request.headers.get("if-none-match") === etag) return new Response(null, { status: 304, headers });
  headers.set("Content-Length", String(file.byteSize));
  let offset = 0;
  const body = new ReadableStream<Uint8Array>({
    async pull(controller) {
      // substring() on bytea is 1-based; with uncompressed storage it reads only this chunk.
      const result = await pool().query<{ chunk: Buffer }>(
        "select substring(bytes from $2 for $3) as chunk from stored_file_bytes where file_id = $1",
        [file.id, offset + 1, CHUNK_BYTES],
      );
      const chunk = result.rows[0]?.chunk;
      if (!chunk || chunk.length === 0) {
        controller.close();
        return;
      }
      controller.enqueue(new Uint8Array(chunk));
      offset += chunk.length;
      if (offset >= file.byteSize) controller.close();
    },
  });
  return new Response(body, { status: 200, headers });
}
