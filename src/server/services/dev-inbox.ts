// The development inbox: messages the local SMTP server captured. Coordinators only, and only
// on deployments with GUYLINE_DEV_TOOLS=on (never in production).
import { desc, eq } from "drizzle-orm";
import { serverEnv } from "@/env";
import { db } from "@/server/db";
import { capturedMail } from "@/server/db/schema";
import { notFound } from "@/server/errors";
import { can, type Actor } from "@/server/policy";

export function devInboxOpen(actor: Actor | null): boolean {
  return serverEnv().GUYLINE_DEV_TOOLS && can(actor, "devInbox.view");
}

function requireInbox(actor: Actor) {
  // Answered as not found, so production does not even reveal the page exists.
  if (!devInboxOpen(actor)) throw notFound("The development inbox");
}

export async function listCapturedMail(actor: Actor, limit = 100) {
  requireInbox(actor);
  return db()
    .select({ id: capturedMail.id, receivedAt: capturedMail.receivedAt, envelopeTo: capturedMail.envelopeTo, subject: capturedMail.subject })
    .from(capturedMail)
    .orderBy(desc(capturedMail.receivedAt))
    .limit(limit);
}

export async function getCapturedMail(actor: Actor, id: string) {
  requireInbox(actor);
  const [message] = await db().select().from(capturedMail).where(eq(capturedMail.id, id));
  if (!message) throw notFound("That message");
  return message;
}
