// Telling text from binary for stored sweep files.
// Source: WHATWG MIME Sniffing Standard, "binary data byte" (0x00–0x08, 0x0B, 0x0E–0x1A, 0x1C–0x1F).
import { describe, expect, it } from "vitest";
import { isPlainText, sniffType } from "@/lib/files/sniff";

const text = (value: string) => new TextEncoder().encode(value);

describe("plain text", () => {
  it("accepts CSV and tab-separated text, with CR LF line ends and non-ASCII letters", () => {
    expect(isPlainText(text("Freq (MHz),R (Ω),X\r\n7.050,48.2,-3.1\r\n"))).toBe(true);
    expect(isPlainText(text("7050000\t48.2\t-3.1\f\n"))).toBe(true);
  });

  it("refuses binary data bytes and empty files", () => {
    expect(isPlainText(new Uint8Array([0x37, 0x2e, 0x30, 0x00]))).toBe(false);
    expect(isPlainText(new Uint8Array([0x37, 0x0b]))).toBe(false);
    expect(isPlainText(new Uint8Array([0x1c, 0x5b]))).toBe(false);
    expect(isPlainText(new Uint8Array([0x1b, 0x5b]))).toBe(true); // ESC is not a binary data byte
    expect(isPlainText(new Uint8Array())).toBe(false);
  });

  it("leaves text out of the signature sniffing, so a photo upload never takes a text file", () => {
    expect(sniffType(text("7.050,48.2,-3.1\n"))).toBeNull();
  });
});
