// What a file really is, from its bytes, not its name or the type the browser claims.
// Only the few formats Guyline accepts are recognised; everything else is refused.
// The signatures are those of the WHATWG MIME Sniffing Standard (image type pattern matching
// and the PDF signature); text is told from binary by the same standard's binary data bytes.

export const acceptedTypes = ["image/jpeg", "image/png", "image/webp", "application/pdf", "text/plain"] as const;
export type AcceptedType = (typeof acceptedTypes)[number];

interface Signature {
  type: AcceptedType;
  /** Bytes to match; null matches any byte. */
  pattern: (number | null)[];
}

const ascii = (text: string) => [...text].map((char) => char.charCodeAt(0));

const signatures: Signature[] = [
  { type: "image/jpeg", pattern: [0xff, 0xd8, 0xff] },
  { type: "image/png", pattern: [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a] },
  { type: "image/webp", pattern: [...ascii("RIFF"), null, null, null, null, ...ascii("WEBPVP")] },
  { type: "application/pdf", pattern: ascii("%PDF-") },
];

/** The accepted binary type the bytes begin with, or null (text has no signature: see isPlainText). */
export function sniffType(bytes: Uint8Array): AcceptedType | null {
  const match = signatures.find(
    ({ pattern }) => bytes.length >= pattern.length && pattern.every((byte, index) => byte === null || bytes[index] === byte),
  );
  return match?.type ?? null;
}

/**
 * Text holds no binary data byte (0x00–0x08, 0x0B, 0x0E–0x1A, 0x1C–0x1F: WHATWG MIME Sniffing
 * Standard, "binary data byte"), checked over the whole file rather than its first bytes.
 */
export function isPlainText(bytes: Uint8Array): boolean {
  return bytes.length > 0 && bytes.every((byte) => !(byte <= 0x08 || byte === 0x0b || (byte >= 0x0e && byte <= 0x1a) || (byte >= 0x1c && byte <= 0x1f)));
}

/** File name extensions kept for each type; the first is given to a file whose own is not listed. */
export const fileExtensions: Record<AcceptedType, readonly string[]> = {
  "image/jpeg": ["jpg"],
  "image/png": ["png"],
  "image/webp": ["webp"],
  "application/pdf": ["pdf"],
  "text/plain": ["txt", "csv", "tsv", "dat", "prn"],
};

export const isImage = (type: string) => type.startsWith("image/");
