// "What needs me next": the few things on the home page that wait for this person.
// Each area of Guyline adds its own source here. The club's settings are read once per request
// and passed to every section.
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

interface Club {
  timeZone: string;
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

async function myNextShifts(actor: Actor, club: Club): Promise<HomeSection | null> {
  if (!can(actor, "shifts.signUp")) return null;
  const shifts = await listMyShifts(actor, { from: new Date() });
  return {
    heading: "Your next shifts",
    emptyText: "You have no shifts coming up. Antenna days list the shifts that need operators.",
    things: shifts.slice(0, 5).map((shift) => ({
      title: `${shift.slotName}, ${formatRangeInZone(shift.startsAt, shift.endsAt, club.timeZone)}`,
      detail: shift.dayTitle,
      href: `/antenna-days/${shift.dayId}#slot-${shift.slotId}`,
    })),
  };
}

async function nextBuildSession(actor: Actor, club: Club): Promise<HomeSection | null> {
  if (!can(actor, "buildSessions.view")) return null;
  const session = await myNextBuildSession(actor);
  const place = session?.myPlace?.status === "waitlisted" ? `number ${session.myPlace.position} on the waitlist` : "you have a place";
  return {
    heading: "Your next build session",
    emptyText: "You are not signed up for a build session. Find one under Build sessions.",
    things: session
      ? [{ title: session.title, detail: `${formatRangeInZone(session.startsAt, session.endsAt, club.timeZone)} · ${session.place} · ${place}`, href: `/build-sessions/${session.id}` }]
      : [],
  };
}

async function buildSessionsIMentor(actor: Actor, club: Club): Promise<HomeSection | null> {
  if (!actor.isMentor || !can(actor, "buildSessions.view")) return null;
  const sessions = await sessionsIMentor(actor);
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

async function draftAntennaDays(actor: Actor, club: Club): Promise<HomeSection | null> {
  if (!can(actor, "antennaDays.viewDrafts")) return null;
  const days = await listDays(actor, {}, club);
  return {
    heading: "Antenna days still in draft",
    emptyText: "No drafts: every planned antenna day is published.",
    things: days
      .filter((day) => day.status === "draft")
      .map((day) => ({ title: day.title, detail: `${formatInZone(day.startsAt, club.timeZone, "date")} · not yet published`, href: `/antenna-days/${day.id}` })),
  };
}

/**
 * The sections in order of urgency: overdue gear and the lending desk's queue first, then the
 * person's own next shifts and sessions, then what waits for a coordinator. Sections with
 * something in them come before empty ones, each group keeping that order.
 */
export async function whatNeedsMeNext(actor: Actor): Promise<HomeSection[]> {
  const club = await getClubSettings();
  const sections = await Promise.all([
    lendingHomeSections(actor, club.timeZone),
    myNextShifts(actor, club),
    nextBuildSession(actor, club),
    buildSessionsIMentor(actor, club),
    membersAwaitingConfirmation(actor),
    draftAntennaDays(actor, club),
  ]);
  const shown = sections.flat().filter((section): section is HomeSection => section !== null);
  return [...shown.filter((section) => section.things.length > 0), ...shown.filter((section) => section.things.length === 0)];
}
