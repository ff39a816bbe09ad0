// Build sessions: coordinators schedule them with an antenna plan and mentors; newcomers and
// members take a place or join the waitlist. Capacity is the database's to keep: `taken` only
// moves inside a transaction that holds the session's row, with `taken < capacity` in the
// update and a check constraint behind it. When a place frees up, the first in line gets it
// in the same transaction and hears by e-mail.
import { and, asc, count, desc, eq, gt, gte, inArray, ne, sql } from "drizzle-orm";
import { EngineInputError, type PlanRequest, type PlanResult } from "@/lib/antenna";
import { kitLines, materialsFor, type Materials } from "@/lib/build-sessions/materials";
import { buildSessionSafety, type SafetySection } from "@/lib/build-sessions/safety";
import { buildSessionEvent } from "@/lib/calendar/events";
import { buildCalendar, icsFileName, type CalendarEvent } from "@/lib/calendar/ics";
import type { ReminderWindow } from "@/lib/mail/reminder-clock";
import { formatRangeInZone, instantToWallTime, wallTimeToInstant } from "@/lib/time";
import { appUrl } from "@/env";
import { db, type Executor, type Transaction } from "@/server/db";
import { antennaPlans, buildSessionMentors, buildSessionSignups, buildSessions, clubSettings, users, type OutboxAttachment } from "@/server/db/schema";
import { badInput, conflict, forbidden, notFound, pgErrorCode, pgErrorCodes } from "@/server/errors";
import { runPlan } from "@/server/engine/run";
import { enqueueMail } from "@/server/mail/outbox";
import { can, canCancelFor, canMentorSessions, type Actor } from "@/server/policy";
import { getClubSettings } from "@/server/services/accounts";
import type { BuildSessionInput, BuildSessionPatch } from "@/validations/build-sessions";

type SessionRow = typeof buildSessions.$inferSelect;

export interface PersonRef {
  id: string;
  name: string;
  callSign: string | null;
}

export interface MyPlace {
  status: "confirmed" | "waitlisted";
  /** 1 for the first in line; null for a confirmed place. */
  position: number | null;
}

export interface BuildSessionSummary {
  id: string;
  title: string;
  startsAt: string;
  endsAt: string;
  place: string;
  capacity: number;
  taken: number;
  waitlisted: number;
  status: "scheduled" | "cancelled";
  mentors: PersonRef[];
  antennaLabel: string;
  myPlace: MyPlace | null;
}

export interface Participant extends PersonRef {
  status: "confirmed" | "waitlisted";
  position: number | null;
}

export interface BuildSessionDetail extends BuildSessionSummary {
  plan: PlanRequest;
  libraryPlanId: string | null;
  /** The plan library entry the antenna was taken from. */
  libraryPlan: { id: string; name: string } | null;
  antennaDayId: string | null;
  raisesMast: boolean;
  notes: string | null;
  sequence: number;
  /** Wall-clock times in the club's time zone, for edit forms. */
  startsAtWall: string;
  endsAtWall: string;
  timeZone: string;
  /** The engine's result for the plan: cut sheet, balun or unun, feedline, cautions. */
  planResult: Pick<PlanResult, "label" | "elements" | "transformer" | "feedline" | "cutSheet" | "cautions">;
  materials: Materials;
  safety: SafetySection[];
  /** Names of who is coming: for coordinators and the session's mentors only. */
  participants: Participant[] | null;
}

// ---------------------------------------------------------------------------------------------
// Reading

async function mentorsOf(executor: Executor, sessionIds: string[]): Promise<Map<string, PersonRef[]>> {
  const byId = new Map<string, PersonRef[]>(sessionIds.map((id) => [id, []]));
  if (sessionIds.length === 0) return byId;
  const rows = await executor
    .select({ sessionId: buildSessionMentors.sessionId, id: users.id, name: users.name, callSign: users.callSign })
    .from(buildSessionMentors)
    .innerJoin(users, eq(users.id, buildSessionMentors.userId))
    .where(inArray(buildSessionMentors.sessionId, sessionIds))
    .orderBy(asc(users.name));
  for (const { sessionId, ...person } of rows) byId.get(sessionId)?.push(person);
  return byId;
}

/** Sign-ups of the sessions in queue order, each with its place in line. */
async function signupsOf(executor: Executor, sessionIds: string[]): Promise<Map<string, Participant[]>> {
  const byId = new Map<string, Participant[]>(sessionIds.map((id) => [id, []]));
  if (sessionIds.length === 0) return byId;
  const rows = await executor
    .select({ sessionId: buildSessionSignups.sessionId, status: buildSessionSignups.status, id: users.id, name: users.name, callSign: users.callSign })
    .from(buildSessionSignups)
    .innerJoin(users, eq(users.id, buildSessionSignups.userId))
    .where(inArray(buildSessionSignups.sessionId, sessionIds))
    .orderBy(asc(buildSessionSignups.queue));
  for (const { sessionId, ...row } of rows) {
    const list = byId.get(sessionId)!;
    const position = row.status === "waitlisted" ? list.filter((entry) => entry.status === "waitlisted").length + 1 : null;
    list.push({ ...row, position });
  }
  return byId;
}

function antennaLabel(request: PlanRequest): string {
  const family = request.family.replace(/-/g, " ");
  const bands = request.family === "fan-dipole" ? request.bands.join(", ") : (request.band ?? `${request.centreMHz} MHz`);
  return `${family.charAt(0).toUpperCase()}${family.slice(1)}, ${bands}`;
}

function summaryOf(row: SessionRow, mentors: PersonRef[], signups: Participant[], viewerId: string): BuildSessionSummary {
  const mine = signups.find((entry) => entry.id === viewerId);
  return {
    id: row.id,
    title: row.title,
    startsAt: row.startsAt.toISOString(),
    endsAt: row.endsAt.toISOString(),
    place: row.place,
    capacity: row.capacity,
    taken: row.taken,
    waitlisted: signups.filter((entry) => entry.status === "waitlisted").length,
    status: row.status,
    mentors,
    antennaLabel: antennaLabel(row.plan),
    myPlace: mine ? { status: mine.status, position: mine.position } : null,
  };
}

export async function listBuildSessions(actor: Actor, options: { includePast?: boolean } = {}): Promise<BuildSessionSummary[]> {
  if (!can(actor, "buildSessions.view")) throw forbidden();
  const rows = await db()
    .select()
    .from(buildSessions)
    .where(options.includePast ? undefined : gt(buildSessions.endsAt, new Date()))
    .orderBy(asc(buildSessions.startsAt));
  const ids = rows.map((row) => row.id);
  const [mentors, signups] = await Promise.all([mentorsOf(db(), ids), signupsOf(db(), ids)]);
  return rows.map((row) => summaryOf(row, mentors.get(row.id)!, signups.get(row.id)!, actor.id));
}

export async function getBuildSession(actor: Actor, id: string): Promise<BuildSessionDetail> {
  if (!can(actor, "buildSessions.view")) throw forbidden();
  const [row] = await db().select().from(buildSessions).where(eq(buildSessions.id, id));
  if (!row) throw notFound("That build session");
  // The stored request was checked when it was saved; the engine runs on the worker pool.
  const [mentors, signups, club, libraryPlan, result] = await Promise.all([
    mentorsOf(db(), [id]),
    signupsOf(db(), [id]),
    getClubSettings(),
    row.libraryPlanId ? db().query.antennaPlans.findFirst({ where: eq(antennaPlans.id, row.libraryPlanId), columns: { id: true, name: true } }) : null,
    runPlan(row.plan),
  ]);
  const sessionMentors = mentors.get(id)!;
  const sessionSignups = signups.get(id)!;
  const seesNames = can(actor, "buildSessions.manage") || sessionMentors.some((mentor) => mentor.id === actor.id);
  return {
    ...summaryOf(row, sessionMentors, sessionSignups, actor.id),
    plan: row.plan,
    libraryPlanId: row.libraryPlanId,
    libraryPlan: libraryPlan ?? null,
    antennaDayId: row.antennaDayId,
    raisesMast: row.raisesMast,
    notes: row.notes,
    sequence: row.sequence,
    startsAtWall: instantToWallTime(row.startsAt, club.timeZone),
    endsAtWall: instantToWallTime(row.endsAt, club.timeZone),
    timeZone: club.timeZone,
    planResult: {
      label: result.label,
      elements: result.elements,
      transformer: result.transformer,
      feedline: result.feedline,
      cutSheet: result.cutSheet,
      cautions: result.cautions,
    },
    materials: materialsFor(result, row.capacity, { raisesMast: row.raisesMast }),
    safety: buildSessionSafety({ raisesMast: row.raisesMast }),
    participants: seesNames ? sessionSignups : null,
  };
}

// ---------------------------------------------------------------------------------------------
// Messages and calendar files

function calendarEventOf(row: SessionRow, mentors: PersonRef[]): CalendarEvent {
  return buildSessionEvent(
    {
      id: row.id,
      title: row.title,
      startsAt: row.startsAt,
      endsAt: row.endsAt,
      place: row.place,
      mentorNames: mentors.map((mentor) => mentor.name),
      cancelled: row.status === "cancelled",
      sequence: row.sequence,
      updatedAt: row.updatedAt,
    },
    appUrl(),
  );
}

/** The club's name and zone through the caller's executor (inside a transaction, never a second connection). */
async function clubOf(executor: Executor) {
  const [club] = await executor.select({ clubName: clubSettings.clubName, timeZone: clubSettings.timeZone }).from(clubSettings);
  return club;
}

async function sessionIcs(executor: Executor, row: SessionRow): Promise<OutboxAttachment> {
  const mentors = await mentorsOf(executor, [row.id]);
  const club = await clubOf(executor);
  return {
    filename: icsFileName(row.title),
    contentType: "text/calendar; charset=utf-8",
    content: buildCalendar({ name: row.title, timeZone: club.timeZone, events: [calendarEventOf(row, mentors.get(row.id)!)] }),
  };
}

export async function buildSessionIcs(actor: Actor, id: string): Promise<{ filename: string; content: string }> {
  if (!can(actor, "buildSessions.view")) throw forbidden();
  const [row] = await db().select().from(buildSessions).where(eq(buildSessions.id, id));
  if (!row) throw notFound("That build session");
  const file = await sessionIcs(db(), row);
  return { filename: file.filename, content: file.content };
}

async function messageBasics(executor: Executor, row: SessionRow) {
  const mentors = (await mentorsOf(executor, [row.id])).get(row.id)!;
  return {
    title: row.title,
    startsAt: row.startsAt.toISOString(),
    endsAt: row.endsAt.toISOString(),
    place: row.place,
    mentorNames: mentors.map((mentor) => mentor.name),
    path: `/build-sessions/${row.id}`,
  };
}

/** What one person brings, from the engine's plan for the session's antenna (run on the worker pool). */
async function bringLines(row: SessionRow): Promise<string[]> {
  const result = await runPlan(row.plan);
  return kitLines(materialsFor(result, 1, { raisesMast: row.raisesMast }).kit);
}

type PlaceMessage = { data: Awaited<ReturnType<typeof messageBasics>> & { bring: string[] }; attachments: OutboxAttachment[] };

/** The message about a place at a session: the same for everyone told about it, so built once per session. */
async function placeMessage(tx: Transaction, row: SessionRow): Promise<PlaceMessage> {
  const basics = await messageBasics(tx, row);
  const bring = await bringLines(row);
  return { data: { ...basics, bring }, attachments: [await sessionIcs(tx, row)] };
}

async function tellPlace(tx: Transaction, { data, attachments }: PlaceMessage, signup: { id: string; userId: string }, kind: "confirmed" | "promoted") {
  const to = { userId: signup.userId };
  if (kind === "confirmed") {
    await enqueueMail(tx, { template: "buildSessionConfirmed", to, key: `build-session-confirmed:${signup.id}`, data, attachments });
  } else {
    await enqueueMail(tx, { template: "buildSessionPromoted", to, key: `build-session-promoted:${signup.id}`, data, attachments });
  }
}

/** Gives freed places to the first in line, as many as the capacity allows, and tells each. */
async function promoteFromWaitlist(tx: Transaction, row: SessionRow): Promise<SessionRow> {
  let session = row;
  // Title, time, place, mentors, plan and sequence stay as they are while places are handed out.
  let message: PlaceMessage | null = null;
  while (session.taken < session.capacity) {
    const [first] = await tx
      .select({ id: buildSessionSignups.id, userId: buildSessionSignups.userId })
      .from(buildSessionSignups)
      .where(and(eq(buildSessionSignups.sessionId, session.id), eq(buildSessionSignups.status, "waitlisted")))
      .orderBy(asc(buildSessionSignups.queue))
      .limit(1);
    if (!first) break;
    await tx.update(buildSessionSignups).set({ status: "confirmed" }).where(eq(buildSessionSignups.id, first.id));
    [session] = await tx
      .update(buildSessions)
      .set({ taken: sql`${buildSessions.taken} + 1` })
      .where(and(eq(buildSessions.id, session.id), sql`${buildSessions.taken} < ${buildSessions.capacity}`))
      .returning();
    message ??= await placeMessage(tx, session);
    await tellPlace(tx, message, first, "promoted");
  }
  return session;
}

// ---------------------------------------------------------------------------------------------
// Coordinators: create, change, cancel

async function checkPlan(request: PlanRequest): Promise<void> {
  try {
    await runPlan(request);
  } catch (error) {
    if (error instanceof EngineInputError) {
      const [first] = error.problems;
      const [path, ...message] = first.split(": ");
      throw badInput(`plan.${path}`, message.join(": ") || first);
    }
    throw error;
  }
}

async function checkMentors(executor: Executor, mentorIds: string[]): Promise<void> {
  const unique = [...new Set(mentorIds)];
  const rows = await executor.select().from(users).where(inArray(users.id, unique));
  if (rows.length !== unique.length) throw badInput("mentorIds", "One of the mentors has no account.");
  const notMentor = rows.find((row) => !canMentorSessions({ isMentor: row.isMentor, role: row.role, confirmed: row.confirmedAt !== null }));
  if (notMentor) throw badInput("mentorIds", `${notMentor.name} is not a mentor. Set the mentor flag on the members page first.`);
}

/** A plan chosen from the library must be there; the share lock keeps it there until the session is saved. */
async function checkLibraryPlan(tx: Transaction, planId: string | null | undefined): Promise<void> {
  if (!planId) return;
  const [plan] = await tx.select({ id: antennaPlans.id }).from(antennaPlans).where(eq(antennaPlans.id, planId)).for("share");
  if (!plan) throw badInput("libraryPlanId", "That plan is not in the plan library any more.");
}

function instants(startsAtWall: string, endsAtWall: string, timeZone: string) {
  const startsAt = wallTimeToInstant(startsAtWall, timeZone);
  const endsAt = wallTimeToInstant(endsAtWall, timeZone);
  if (endsAt <= startsAt) throw badInput("endsAt", "The session must end after it starts.");
  return { startsAt, endsAt };
}

export async function createBuildSession(actor: Actor, input: BuildSessionInput): Promise<{ id: string }> {
  if (!can(actor, "buildSessions.manage")) throw forbidden();
  const { timeZone } = await getClubSettings();
  const { startsAt, endsAt } = instants(input.startsAt, input.endsAt, timeZone);
  if (startsAt <= new Date()) throw badInput("startsAt", "Choose a time in the future.");
  await checkPlan(input.plan);
  return db().transaction(async (tx) => {
    await checkMentors(tx, input.mentorIds);
    await checkLibraryPlan(tx, input.libraryPlanId);
    const [row] = await tx
      .insert(buildSessions)
      .values({
        title: input.title,
        plan: input.plan,
        libraryPlanId: input.libraryPlanId,
        startsAt,
        endsAt,
        place: input.place,
        antennaDayId: input.antennaDayId,
        raisesMast: input.raisesMast,
        capacity: input.capacity,
        notes: input.notes,
        createdBy: actor.id,
      })
      .returning({ id: buildSessions.id });
    await tx.insert(buildSessionMentors).values([...new Set(input.mentorIds)].map((userId) => ({ sessionId: row.id, userId })));
    return row;
  });
}

async function lockSession(tx: Transaction, id: string): Promise<SessionRow> {
  const [row] = await tx.select().from(buildSessions).where(eq(buildSessions.id, id)).for("update");
  if (!row) throw notFound("That build session");
  return row;
}

/** Everyone with a place or in line, to tell about a change. */
async function peopleSignedUp(tx: Transaction, sessionId: string): Promise<string[]> {
  const rows = await tx.select({ userId: buildSessionSignups.userId }).from(buildSessionSignups).where(eq(buildSessionSignups.sessionId, sessionId));
  return rows.map((row) => row.userId);
}

export async function updateBuildSession(actor: Actor, id: string, patch: BuildSessionPatch): Promise<void> {
  if (!can(actor, "buildSessions.manage")) throw forbidden();
  const { timeZone } = await getClubSettings();
  if (patch.plan) await checkPlan(patch.plan);
  await db().transaction(async (tx) => {
    const before = await lockSession(tx, id);
    if (before.status === "cancelled") throw conflict("This build session is cancelled; schedule a new one instead.");
    const { startsAt, endsAt } = instants(
      patch.startsAt ?? instantToWallTime(before.startsAt, timeZone),
      patch.endsAt ?? instantToWallTime(before.endsAt, timeZone),
      timeZone,
    );
    const capacity = patch.capacity ?? before.capacity;
    if (capacity < before.taken) {
      throw badInput("capacity", `${before.taken} people already have a place; the capacity cannot go below that.`);
    }
    await checkLibraryPlan(tx, patch.libraryPlanId);
    if (patch.mentorIds) {
      await checkMentors(tx, patch.mentorIds);
      await tx.delete(buildSessionMentors).where(eq(buildSessionMentors.sessionId, id));
      await tx.insert(buildSessionMentors).values([...new Set(patch.mentorIds)].map((userId) => ({ sessionId: id, userId })));
    }
    let [row] = await tx
      .update(buildSessions)
      .set({
        ...(patch.title !== undefined ? { title: patch.title } : {}),
        ...(patch.plan !== undefined ? { plan: patch.plan } : {}),
        ...(patch.libraryPlanId !== undefined ? { libraryPlanId: patch.libraryPlanId } : {}),
        ...(patch.place !== undefined ? { place: patch.place } : {}),
        ...(patch.antennaDayId !== undefined ? { antennaDayId: patch.antennaDayId } : {}),
        ...(patch.raisesMast !== undefined ? { raisesMast: patch.raisesMast } : {}),
        ...(patch.notes !== undefined ? { notes: patch.notes } : {}),
        startsAt,
        endsAt,
        capacity,
        sequence: sql`${buildSessions.sequence} + 1`,
        updatedAt: new Date(),
      })
      .where(eq(buildSessions.id, id))
      .returning();
    row = await promoteFromWaitlist(tx, row);

    const changes: string[] = [];
    if (row.startsAt.getTime() !== before.startsAt.getTime() || row.endsAt.getTime() !== before.endsAt.getTime()) {
      changes.push(`New time: ${formatRangeInZone(row.startsAt, row.endsAt, timeZone)} (was ${formatRangeInZone(before.startsAt, before.endsAt, timeZone)})`);
    }
    if (row.place !== before.place) changes.push(`New place: ${row.place} (was ${before.place})`);
    if (row.title !== before.title) changes.push(`New title: ${row.title} (was ${before.title})`);
    if (patch.plan && JSON.stringify(patch.plan) !== JSON.stringify(before.plan)) changes.push(`The antenna changed: ${antennaLabel(row.plan)}. The cut sheet and materials are updated.`);
    if (changes.length === 0) return;
    const basics = await messageBasics(tx, row);
    const attachments = [await sessionIcs(tx, row)];
    for (const userId of await peopleSignedUp(tx, id)) {
      await enqueueMail(tx, {
        template: "buildSessionChanged",
        to: { userId },
        key: `build-session-changed:${id}:${row.sequence}:${userId}`,
        data: { ...basics, changes },
        attachments,
      });
    }
  });
}

/** Cancelling keeps the session (its calendar event turns CANCELLED) and tells everyone signed up. */
export async function cancelBuildSession(actor: Actor, id: string, reason: string | null): Promise<void> {
  if (!can(actor, "buildSessions.manage")) throw forbidden();
  await db().transaction(async (tx) => {
    const before = await lockSession(tx, id);
    if (before.status === "cancelled") return;
    const [row] = await tx
      .update(buildSessions)
      .set({ status: "cancelled", sequence: sql`${buildSessions.sequence} + 1`, updatedAt: new Date() })
      .where(eq(buildSessions.id, id))
      .returning();
    const basics = await messageBasics(tx, row);
    const attachments = [await sessionIcs(tx, row)];
    for (const userId of await peopleSignedUp(tx, id)) {
      await enqueueMail(tx, { template: "buildSessionCancelled", to: { userId }, key: `build-session-cancelled:${id}:${userId}`, data: { ...basics, reason }, attachments });
    }
  });
}

// ---------------------------------------------------------------------------------------------
// Sign-ups

export interface SignupOutcome {
  status: "confirmed" | "waitlisted";
  position: number | null;
}

export async function signUpForSession(actor: Actor, sessionId: string): Promise<SignupOutcome> {
  if (!can(actor, "buildSessions.signUp")) throw forbidden();
  try {
    return await db().transaction(async (tx) => {
      const session = await lockSession(tx, sessionId);
      if (session.status === "cancelled") throw conflict("This build session is cancelled.");
      if (session.startsAt <= new Date()) throw conflict("This build session has already started.");
      const [isMentor] = await tx
        .select({ userId: buildSessionMentors.userId })
        .from(buildSessionMentors)
        .where(and(eq(buildSessionMentors.sessionId, sessionId), eq(buildSessionMentors.userId, actor.id)));
      if (isMentor) throw conflict("You mentor this session, so you already have your place.");

      // The capacity guard: only an update that finds a free place takes it.
      const [withPlace] = await tx
        .update(buildSessions)
        .set({ taken: sql`${buildSessions.taken} + 1` })
        .where(and(eq(buildSessions.id, sessionId), sql`${buildSessions.taken} < ${buildSessions.capacity}`))
        .returning();
      const status = withPlace ? "confirmed" : "waitlisted";
      const [signup] = await tx.insert(buildSessionSignups).values({ sessionId, userId: actor.id, status }).returning();
      if (withPlace) {
        await tellPlace(tx, await placeMessage(tx, withPlace), signup, "confirmed");
        return { status, position: null };
      }
      const [{ ahead }] = await tx
        .select({ ahead: count() })
        .from(buildSessionSignups)
        .where(and(eq(buildSessionSignups.sessionId, sessionId), eq(buildSessionSignups.status, "waitlisted"), sql`${buildSessionSignups.queue} < ${signup.queue}`));
      const position = ahead + 1;
      await enqueueMail(tx, {
        template: "buildSessionWaitlisted",
        to: { userId: actor.id },
        key: `build-session-waitlisted:${signup.id}`,
        data: { ...(await messageBasics(tx, session)), position },
      });
      return { status, position };
    });
  } catch (error) {
    if (pgErrorCode(error) === pgErrorCodes.uniqueViolation) throw conflict("You are already signed up for this session.");
    throw error;
  }
}

/** Gives up a place (or a place in line); a freed place goes to the first in line at once. */
export async function cancelSignup(actor: Actor, sessionId: string, userId: string = actor.id): Promise<void> {
  if (!canCancelFor(actor, userId, "buildSessions.manage")) throw forbidden();
  await db().transaction(async (tx) => {
    const session = await lockSession(tx, sessionId);
    const [removed] = await tx
      .delete(buildSessionSignups)
      .where(and(eq(buildSessionSignups.sessionId, sessionId), eq(buildSessionSignups.userId, userId)))
      .returning({ status: buildSessionSignups.status });
    if (!removed) throw notFound("That sign-up");
    if (removed.status !== "confirmed") return;
    const [freed] = await tx
      .update(buildSessions)
      .set({ taken: sql`${buildSessions.taken} - 1` })
      .where(eq(buildSessions.id, sessionId))
      .returning();
    if (session.status === "scheduled") await promoteFromWaitlist(tx, freed);
  });
}

// ---------------------------------------------------------------------------------------------
// Reminders, calendar feeds and the home page

/** A reminder the day before to everyone with a place. */
export const buildSessionReminders = {
  name: "build sessions",
  async enqueue(tx: Transaction, window: ReminderWindow): Promise<number> {
    const rows = await tx
      .select({ session: buildSessions, userId: buildSessionSignups.userId })
      .from(buildSessions)
      .innerJoin(buildSessionSignups, eq(buildSessionSignups.sessionId, buildSessions.id))
      .where(
        and(
          eq(buildSessions.status, "scheduled"),
          eq(buildSessionSignups.status, "confirmed"),
          gte(buildSessions.startsAt, window.from),
          sql`${buildSessions.startsAt} < ${window.to}`,
        ),
      );
    const bySession = new Map<string, { session: SessionRow; userIds: string[] }>();
    for (const { session, userId } of rows) {
      const entry = bySession.get(session.id) ?? { session, userIds: [] };
      entry.userIds.push(userId);
      bySession.set(session.id, entry);
    }
    let queued = 0;
    for (const { session, userIds } of bySession.values()) {
      // One message (and one engine run) per session, whoever has a place at it.
      const data = { ...(await messageBasics(tx, session)), bring: await bringLines(session) };
      for (const userId of userIds) {
        const outcome = await enqueueMail(tx, {
          template: "buildSessionReminder",
          to: { userId },
          key: `build-session-reminder:${session.id}:${userId}:${window.date}`,
          data,
        });
        if (outcome === "queued") queued += 1;
      }
    }
    return queued;
  },
};

/** Feed source: the sessions someone has a place at or mentors, from a month back. */
export const buildSessionFeed = {
  name: "build sessions",
  async eventsFor(userId: string): Promise<CalendarEvent[]> {
    const since = new Date(Date.now() - 30 * 24 * 3600 * 1000);
    const [signedUp, mentoring] = await Promise.all([
      db()
        .select({ id: buildSessionSignups.sessionId })
        .from(buildSessionSignups)
        .where(and(eq(buildSessionSignups.userId, userId), eq(buildSessionSignups.status, "confirmed"))),
      db().select({ id: buildSessionMentors.sessionId }).from(buildSessionMentors).where(eq(buildSessionMentors.userId, userId)),
    ]);
    const ids = [...new Set([...signedUp, ...mentoring].map((row) => row.id))];
    if (ids.length === 0) return [];
    const rows = await db()
      .select()
      .from(buildSessions)
      .where(and(gt(buildSessions.endsAt, since), inArray(buildSessions.id, ids)))
      .orderBy(asc(buildSessions.startsAt));
    const mentors = await mentorsOf(db(), rows.map((row) => row.id));
    return rows.map((row) => calendarEventOf(row, mentors.get(row.id)!));
  },
};

/** The next session this person has a place at or waits for. */
export async function myNextBuildSession(actor: Actor): Promise<BuildSessionSummary | null> {
  if (!can(actor, "buildSessions.view")) return null;
  const [row] = await db()
    .select({ session: buildSessions })
    .from(buildSessions)
    .innerJoin(buildSessionSignups, eq(buildSessionSignups.sessionId, buildSessions.id))
    .where(and(eq(buildSessionSignups.userId, actor.id), gt(buildSessions.endsAt, new Date()), ne(buildSessions.status, "cancelled")))
    .orderBy(asc(buildSessions.startsAt))
    .limit(1);
  if (!row) return null;
  const [mentors, signups] = await Promise.all([mentorsOf(db(), [row.session.id]), signupsOf(db(), [row.session.id])]);
  return summaryOf(row.session, mentors.get(row.session.id)!, signups.get(row.session.id)!, actor.id);
}

/** Upcoming sessions this mentor is assigned to. */
export async function sessionsIMentor(actor: Actor): Promise<BuildSessionSummary[]> {
  if (!can(actor, "buildSessions.view") || !actor.isMentor) return [];
  const rows = await db()
    .select({ session: buildSessions })
    .from(buildSessions)
    .innerJoin(buildSessionMentors, eq(buildSessionMentors.sessionId, buildSessions.id))
    .where(and(eq(buildSessionMentors.userId, actor.id), gt(buildSessions.endsAt, new Date())))
    .orderBy(asc(buildSessions.startsAt), desc(buildSessions.taken));
  const ids = rows.map((row) => row.session.id);
  const [mentors, signups] = await Promise.all([mentorsOf(db(), ids), signupsOf(db(), ids)]);
  return rows.map(({ session }) => summaryOf(session, mentors.get(session.id)!, signups.get(session.id)!, actor.id));
}

/** People who may be chosen as mentors (members with the mentor flag). */
export async function mentorCandidates(actor: Actor): Promise<PersonRef[]> {
  if (!can(actor, "buildSessions.manage")) throw forbidden();
  const rows = await db().select().from(users).where(eq(users.isMentor, true)).orderBy(asc(users.name));
  return rows
    .filter((row) => canMentorSessions({ isMentor: row.isMentor, role: row.role, confirmed: row.confirmedAt !== null }))
    .map((row) => ({ id: row.id, name: row.name, callSign: row.callSign }));
}
