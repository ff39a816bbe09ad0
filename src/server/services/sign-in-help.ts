// Sign-in help: a password reset by an e-mailed link with a single-use token that expires.
// Only the token's SHA-256 is stored; asking is rate-limited per address and per network
// address, and the answer never says whether an account exists.
import { createHash, randomBytes } from "node:crypto";
import { and, eq, gt, isNull } from "drizzle-orm";
import { db } from "@/server/db";
import { passwordResets, users } from "@/server/db/schema";
import { PublicError, badInput } from "@/server/errors";
import { enqueueMail } from "@/server/mail/outbox";
import { hitRateLimit, type RateLimitRule } from "@/server/rate-limit";
import { hashPassword } from "@/server/services/accounts";

export const RESET_LINK_MINUTES = 60;

// common practice: a few requests per address an hour stop a mailbox being flooded.
export const signInHelpLimits = {
  perEmail: { bucket: "sign-in-help-email", limit: 3, windowSeconds: 3600 },
  perAddress: { bucket: "sign-in-help-address", limit: 20, windowSeconds: 3600 },
} satisfies Record<string, RateLimitRule>;

const hashToken = (token: string) => createHash("sha256").update(token).digest("hex");

export async function requestSignInHelp(input: { email: string; clientAddress: string }): Promise<void> {
  const [byEmail, byAddress] = await Promise.all([
    hitRateLimit(signInHelpLimits.perEmail, input.email),
    hitRateLimit(signInHelpLimits.perAddress, input.clientAddress),
  ]);
  if (!byEmail.allowed || !byAddress.allowed) {
    const minutes = Math.ceil(Math.max(byEmail.retryAfterSeconds, byAddress.retryAfterSeconds) / 60);
    throw new PublicError("rate-limited", `Too many requests for sign-in help. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}.`);
  }
  const user = await db().query.users.findFirst({ where: eq(users.email, input.email) });
  if (!user) return;
  const token = randomBytes(32).toString("base64url");
  const expiresAt = new Date(Date.now() + RESET_LINK_MINUTES * 60 * 1000);
  await db().transaction(async (tx) => {
    const [reset] = await tx.insert(passwordResets).values({ userId: user.id, tokenHash: hashToken(token), expiresAt }).returning({ id: passwordResets.id });
    await enqueueMail(tx, {
      template: "signInHelp",
      to: { userId: user.id },
      key: `sign-in-help:${reset.id}`,
      data: { resetPath: `/reset-password/${token}`, expiresAt: expiresAt.toISOString() },
    });
  });
}

/** The open reset behind a token, for the page that asks for the new password. */
export async function findOpenReset(token: string): Promise<{ email: string } | null> {
  const [row] = await db()
    .select({ email: users.email })
    .from(passwordResets)
    .innerJoin(users, eq(users.id, passwordResets.userId))
    .where(and(eq(passwordResets.tokenHash, hashToken(token)), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, new Date())));
  return row ?? null;
}

/** Sets the new password and uses up the link, and every other open link of that person. */
export async function resetPassword(input: { token: string; password: string }): Promise<{ email: string }> {
  const passwordHash = await hashPassword(input.password);
  return db().transaction(async (tx) => {
    const [reset] = await tx
      .update(passwordResets)
      .set({ usedAt: new Date() })
      .where(and(eq(passwordResets.tokenHash, hashToken(input.token)), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, new Date())))
      .returning({ userId: passwordResets.userId });
    if (!reset) throw badInput("token", "This link has expired or was already used. Ask for a new one.");
    await tx.update(passwordResets).set({ usedAt: new Date() }).where(and(eq(passwordResets.userId, reset.userId), isNull(passwordResets.usedAt)));
    const [user] = await tx.update(users).set({ passwordHash }).where(eq(users.id, reset.userId)).returning({ email: users.email });
    return user;
  });
}
