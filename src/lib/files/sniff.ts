// What a file really is, from its first bytes, not its name or the type the browser claims.
// Only the few formats Guyline accepts are recognised; everything else is refused.
// The signatures are those of the WHATWG MIME Sniffing Standard (image type pattern matching
// and the PDF signature).

export const acceptedTypes = ["image/jpeg", "image/png", "image/webp", "application/pdf"] as const;
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

/** The accepted type the bytes begin with, or null. */
export function sniffType(bytes: Uint8Array): AcceptedType | null {
  const match = signatures.find(
    ({ pattern }) => bytes.length >= pattern.length && pattern.every((byte, index) => byte === null || bytes[index] === byte),
  );
  return match?.type ?? null;
}

export const fileExtensions: Record<AcceptedType, string> = {
  "image/jpeg": "jpg",
  "image/png": "png",
  "image/webp": "webp",
  "application/pdf": "pdf",
};

export const isImage = (type: string) => type.startsWith("image/");
