// Each member's e-mail choices: which optional categories they get. Account messages and
// safety-critical ones (a cancelled antenna day or build session) are sent regardless.
import { and, eq } from "drizzle-orm";
import { serverEnv } from "@/env";
import { optionalMailCategories, type OptionalMailCategory } from "@/lib/mail/categories";
import { verifyUnsubscribeToken, type UnsubscribeClaim } from "@/lib/mail/unsubscribe-token";
import { db } from "@/server/db";
import { mailOptOuts, users } from "@/server/db/schema";
import { forbidden } from "@/server/errors";
import { can, type Actor } from "@/server/policy";

export type MailChoices = Record<OptionalMailCategory, boolean>;

export async function getMailChoices(actor: Actor): Promise<MailChoices> {
  if (!can(actor, "account.edit")) throw forbidden();
  const rows = await db().select({ category: mailOptOuts.category }).from(mailOptOuts).where(eq(mailOptOuts.userId, actor.id));
  const off = new Set(rows.map((row) => row.category));
  return Object.fromEntries(optionalMailCategories.map((category) => [category, !off.has(category)])) as MailChoices;
}

export async function setMailChoices(actor: Actor, choices: MailChoices): Promise<void> {
  if (!can(actor, "account.edit")) throw forbidden();
  await db().transaction(async (tx) => {
    await tx.delete(mailOptOuts).where(eq(mailOptOuts.userId, actor.id));
    const off = optionalMailCategories.filter((category) => !choices[category]);
    if (off.length > 0) await tx.insert(mailOptOuts).values(off.map((category) => ({ userId: actor.id, category })));
  });
}

/** The person and category an unsubscribe link names, when the link is genuine and the person exists. */
export async function readUnsubscribeToken(token: string): Promise<(UnsubscribeClaim & { email: string; subscribed: boolean }) | null> {
  const claim = verifyUnsubscribeToken(token, serverEnv().NEXTAUTH_SECRET);
  if (!claim) return null;
  const [user] = await db().select({ email: users.email }).from(users).where(eq(users.id, claim.userId));
  if (!user) return null;
  const [optOut] = await db()
    .select({ userId: mailOptOuts.userId })
    .from(mailOptOuts)
    .where(and(eq(mailOptOuts.userId, claim.userId), eq(mailOptOuts.category, claim.category)));
  return { ...claim, email: user.email, subscribed: !optOut };
}

/** One-click unsubscribe (RFC 8058) and its undo; both are idempotent. */
export async function applyUnsubscribeToken(token: string, subscribe: boolean): Promise<UnsubscribeClaim | null> {
  const claim = await readUnsubscribeToken(token);
  if (!claim) return null;
  if (subscribe) {
    await db().delete(mailOptOuts).where(and(eq(mailOptOuts.userId, claim.userId), eq(mailOptOuts.category, claim.category)));
  } else {
    await db().insert(mailOptOuts).values({ userId: claim.userId, category: claim.category }).onConflictDoNothing();
  }
  return { userId: claim.userId, category: claim.category };
}
