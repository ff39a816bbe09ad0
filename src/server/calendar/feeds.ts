// Private calendar feeds: one secret address per person, listing their events from every
// feed source. Only the SHA-256 of the token is stored; a wrong or revoked token finds nothing.
import { createHash, randomBytes } from "node:crypto";
import { eq } from "drizzle-orm";
import { appUrl } from "@/env";
import { buildCalendar, type CalendarEvent } from "@/lib/calendar/ics";
import { db } from "@/server/db";
import { calendarFeeds } from "@/server/db/schema";
import { forbidden } from "@/server/errors";
import { can, type Actor } from "@/server/policy";
import { getClubSettings } from "@/server/services/accounts";
import { buildSessionFeed } from "@/server/services/build-sessions";
import { antennaDayFeed, loanFeed, shiftFeed } from "./feed-sources";

/** Where a person's events come from. */
export interface FeedSource {
  name: string;
  eventsFor(userId: string): Promise<CalendarEvent[]>;
}

export const feedSources: FeedSource[] = [antennaDayFeed, shiftFeed, buildSessionFeed, loanFeed];

const hashToken = (token: string) => createHash("sha256").update(token).digest("hex");


export const feedUrl = (token: string) => `${appUrl()}/api/calendar/${token}`;

export interface FeedStatus {
  active: boolean;
  createdAt: string | null;
}

export async function feedStatus(actor: Actor): Promise<FeedStatus> {
  const [row] = await db().select({ createdAt: calendarFeeds.createdAt }).from(calendarFeeds).where(eq(calendarFeeds.userId, actor.id));
  return { active: !!row, createdAt: row?.createdAt.toISOString() ?? null };
}

/** A new secret address; the old one (if any) stops working at once. Shown once: only its hash is kept. */
export async function renewFeed(actor: Actor): Promise<string> {
  if (!can(actor, "account.edit") || !actor.confirmed) throw forbidden("Your account must be confirmed before it has a calendar feed.");
  const token = randomBytes(32).toString("base64url");
  await db()
    .insert(calendarFeeds)
    .values({ userId: actor.id, tokenHash: hashToken(token) })
    .onConflictDoUpdate({ target: calendarFeeds.userId, set: { tokenHash: hashToken(token), createdAt: new Date() } });
  return feedUrl(token);
}

export async function revokeFeed(actor: Actor): Promise<void> {
  if (!can(actor, "account.edit")) throw forbidden();
  await db().delete(calendarFeeds).where(eq(calendarFeeds.userId, actor.id));
}

/** The feed behind a token, or null for a token that is wrong or revoked. */
export async function calendarForToken(token: string): Promise<string | null> {
  const [feed] = await db().select({ userId: calendarFeeds.userId }).from(calendarFeeds).where(eq(calendarFeeds.tokenHash, hashToken(token)));
  if (!feed) return null;
  const [club, events] = await Promise.all([
    getClubSettings(),
    Promise.all(feedSources.map((source) => source.eventsFor(feed.userId))).then((lists) => lists.flat()),
  ]);
  return buildCalendar({ name: `${club.clubName} on Guyline`, timeZone: club.timeZone, events, refreshMinutes: 60 });
}
