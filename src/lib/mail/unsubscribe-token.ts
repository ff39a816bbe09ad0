// Unsubscribe links: a token naming a person and a category, signed with HMAC-SHA256 under a
// key derived from the app's secret, so that a link cannot be forged or pointed at someone
// else. Tokens do not expire: a link in an old message must keep working (RFC 8058 §4).
import { createHmac, timingSafeEqual } from "node:crypto";
import { isOptionalCategory, type OptionalMailCategory } from "./categories";

const tokenVersion = "u1";

export interface UnsubscribeClaim {
  userId: string;
  category: OptionalMailCategory;
}

/** A key for this purpose only, so the app secret's other uses never sign an unsubscribe token. */
function purposeKey(secret: string): Buffer {
  return createHmac("sha256", secret).update("guyline:unsubscribe-token").digest();
}

function mac(secret: string, payload: string): Buffer {
  return createHmac("sha256", purposeKey(secret)).update(`${tokenVersion}.${payload}`).digest();
}

export function signUnsubscribeToken(claim: UnsubscribeClaim, secret: string): string {
  const payload = Buffer.from(`${claim.userId} ${claim.category}`).toString("base64url");
  return `${tokenVersion}.${payload}.${mac(secret, payload).toString("base64url")}`;
}

/** The claim of a genuine token; null for anything altered, truncated or signed with another secret. */
export function verifyUnsubscribeToken(token: string, secret: string): UnsubscribeClaim | null {
  const [version, payload, signature, ...rest] = token.split(".");
  if (version !== tokenVersion || !payload || !signature || rest.length > 0) return null;
  const expected = mac(secret, payload);
  const given = Buffer.from(signature, "base64url");
  if (given.length !== expected.length || !timingSafeEqual(given, expected)) return null;
  const [userId, category, ...extra] = Buffer.from(payload, "base64url").toString("utf8").split(" ");
  if (extra.length > 0 || !userId || !category || !isOptionalCategory(category)) return null;
  return { userId, category };
}
