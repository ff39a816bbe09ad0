import { describe, expect, it } from "vitest";
import { signUnsubscribeToken, verifyUnsubscribeToken } from "@/lib/mail/unsubscribe-token";

const secret = "a-test-secret-of-enough-length";
const claim = { userId: "3f0c1e9a-7b2d-4c8e-9a1f-5d6e7f8a9b0c", category: "build-sessions" as const };

describe("unsubscribe tokens", () => {
  it("round-trip the person and the category", () => {
    expect(verifyUnsubscribeToken(signUnsubscribeToken(claim, secret), secret)).toEqual(claim);
  });

  it("are safe in a URL path", () => {
    expect(signUnsubscribeToken(claim, secret)).toMatch(/^[A-Za-z0-9_.-]+$/);
  });

  it("refuse another secret", () => {
    expect(verifyUnsubscribeToken(signUnsubscribeToken(claim, secret), `${secret}-other`)).toBeNull();
  });

  it("refuse a token pointed at another person or category", () => {
    const token = signUnsubscribeToken(claim, secret);
    const [version, , signature] = token.split(".");
    const otherPerson = Buffer.from(`00000000-0000-4000-8000-000000000000 build-sessions`).toString("base64url");
    const otherCategory = Buffer.from(`${claim.userId} lending`).toString("base64url");
    expect(verifyUnsubscribeToken(`${version}.${otherPerson}.${signature}`, secret)).toBeNull();
    expect(verifyUnsubscribeToken(`${version}.${otherCategory}.${signature}`, secret)).toBeNull();
  });

  it("refuse truncated, altered and malformed tokens", () => {
    const token = signUnsubscribeToken(claim, secret);
    expect(verifyUnsubscribeToken(token.slice(0, -2), secret)).toBeNull();
    expect(verifyUnsubscribeToken(`${token}x`, secret)).toBeNull();
    expect(verifyUnsubscribeToken(token.replace(/^u1/, "u2"), secret)).toBeNull();
    expect(verifyUnsubscribeToken("", secret)).toBeNull();
    expect(verifyUnsubscribeToken("u1..", secret)).toBeNull();
    expect(verifyUnsubscribeToken(`${token}.extra`, secret)).toBeNull();
  });

  it("never name the account category, which cannot be turned off", () => {
    const forged = signUnsubscribeToken({ userId: claim.userId, category: "account" as never }, secret);
    expect(verifyUnsubscribeToken(forged, secret)).toBeNull();
  });
});
