// File types from their first bytes.
// Source: WHATWG MIME Sniffing Standard, §6.1 "Matching an image type pattern" (JPEG FF D8 FF;
// PNG 89 50 4E 47 0D 0A 1A 0A; WebP "RIFF" + 4 bytes + "WEBPVP") and §7.1 "Identifying a
// resource with an unknown MIME type" (PDF "%PDF-").
import { describe, expect, it } from "vitest";
import { sniffType } from "@/lib/files/sniff";

const bytes = (...values: (number | string)[]) =>
  new Uint8Array(values.flatMap((value) => (typeof value === "string" ? [...value].map((char) => char.charCodeAt(0)) : [value])));

describe("sniffing uploads", () => {
  it("recognises the four accepted formats by their signatures", () => {
    expect(sniffType(bytes(0xff, 0xd8, 0xff, 0xe0, 0, 0x10, "JFIF"))).toBe("image/jpeg");
    expect(sniffType(bytes(0x89, "PNG", 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, "IHDR"))).toBe("image/png");
    expect(sniffType(bytes("RIFF", 0x24, 0, 0, 0, "WEBPVP8 "))).toBe("image/webp");
    expect(sniffType(bytes("%PDF-1.7\n"))).toBe("application/pdf");
  });

  it("refuses everything else, whatever the file is called", () => {
    expect(sniffType(bytes("<svg xmlns='http://www.w3.org/2000/svg'/>"))).toBeNull();
    expect(sniffType(bytes("GIF89a"))).toBeNull();
    expect(sniffType(bytes("MZ", 0x90, 0))).toBeNull();
    expect(sniffType(bytes("RIFF", 0, 0, 0, 0, "WAVEfmt "))).toBeNull();
    expect(sniffType(bytes(0x89, "PN"))).toBeNull();
    expect(sniffType(new Uint8Array())).toBeNull();
  });
});
