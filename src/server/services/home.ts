// "What needs me next": the few things on the home page that wait for this person.
// Each area of Guyline adds its own source here.
import { and, count, isNull } from "drizzle-orm";
import { db } from "@/server/db";
import { users } from "@/server/db/schema";
import { can, type Actor } from "@/server/policy";
import { getClubSettings } from "@/server/services/accounts";
import { listDays } from "@/server/services/antenna-days";
import { listMyShifts } from "@/server/services/shifts";
import { formatInZone, formatRangeInZone } from "@/lib/time";
import { myNextBuildSession, sessionsIMentor } from "@/server/services/build-sessions";
import { lendingHomeSections } from "@/server/services/lending";

export interface NextThing {
  title: string;
  detail?: string;
  href: string;
}

export interface HomeSection {
  heading: string;
  /** Shown when the section has nothing in it. */
  emptyText: string;
  things: NextThing[];
}

async function membersAwaitingConfirmation(actor: Actor): Promise<HomeSection | null> {
  if (!can(actor, "members.manage")) return null;
  const [{ waiting }] = await db().select({ waiting: count() }).from(users).where(and(isNull(users.confirmedAt)));
  return {
    heading: "People waiting for you",
    emptyText: "Nobody is waiting to be confirmed.",
    things: waiting > 0 ? [{ title: `${waiting} ${waiting === 1 ? "person joined and waits" : "people joined and wait"} for confirmation`, href: "/members" }] : [],
  };
}

async function myNextShifts(actor: Actor): Promise<HomeSection | null> {
  if (!can(actor, "shifts.signUp")) return null;
  const [shifts, { timeZone }] = await Promise.all([listMyShifts(actor, { from: new Date() }), getClubSettings()]);
  return {
    heading: "Your next shifts",
    emptyText: "You have no shifts coming up. Antenna days list the shifts that need operators.",
    things: shifts.slice(0, 5).map((shift) => ({
      title: `${shift.slotName}, ${formatRangeInZone(shift.startsAt, shift.endsAt, timeZone)}`,
      detail: shift.dayTitle,
      href: `/antenna-days/${shift.dayId}#slot-${shift.slotId}`,
    })),
  };
}

async function nextBuildSession(actor: Actor): Promise<HomeSection | null> {
  if (!can(actor, "buildSessions.view")) return null;
  const [session, club] = await Promise.all([myNextBuildSession(actor), getClubSettings()]);
  const place = session?.myPlace?.status === "waitlisted" ? `number ${session.myPlace.position} on the waitlist` : "you have a place";
  return {
    heading: "Your next build session",
    emptyText: "You are not signed up for a build session. Find one under Build sessions.",
    things: session
      ? [{ title: session.title, detail: `${formatRangeInZone(session.startsAt, session.endsAt, club.timeZone)} · ${session.place} · ${place}`, href: `/build-sessions/${session.id}` }]
      : [],
  };
}

async function buildSessionsIMentor(actor: Actor): Promise<HomeSection | null> {
  if (!actor.isMentor || !can(actor, "buildSessions.view")) return null;
  const [sessions, club] = await Promise.all([sessionsIMentor(actor), getClubSettings()]);
  return {
    heading: "Build sessions you mentor",
    emptyText: "You are not mentoring an upcoming build session.",
    things: sessions.map((session) => ({
      title: session.title,
      detail: `${formatRangeInZone(session.startsAt, session.endsAt, club.timeZone)} · ${session.taken} of ${session.capacity} places taken${session.waitlisted > 0 ? `, ${session.waitlisted} waiting` : ""}`,
      href: `/build-sessions/${session.id}`,
    })),
  };
}

async function draftAntennaDays(actor: Actor): Promise<HomeSection | null> {
  if (!can(actor, "antennaDays.viewDrafts")) return null;
  const [days, { timeZone }] = await Promise.all([listDays(actor), getClubSettings()]);
  return {
    heading: "Antenna days still in draft",
    emptyText: "No drafts: every planned antenna day is published.",
    things: days
      .filter((day) => day.status === "draft")
      .map((day) => ({ title: day.title, detail: `${formatInZone(day.startsAt, timeZone, "date")} · not yet published`, href: `/antenna-days/${day.id}` })),
  };
}

export async function whatNeedsMeNext(actor: Actor): Promise<HomeSection[]> {
  const sections = await Promise.all([
    membersAwaitingConfirmation(actor),
    myNextShifts(actor),
    nextBuildSession(actor),
    buildSessionsIMentor(actor),
    draftAntennaDays(actor),
    lendingHomeSections(actor),
  ]);
  return sections.flat().filter((section): section is HomeSection => section !== null);
}
