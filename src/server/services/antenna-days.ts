// Antenna days: create, edit, publish, mark done, cancel, delete drafts, copy. Members see
// published (and done or cancelled) days; coordinators see drafts too. Every change of a day
// raises its `sequence` (iCalendar SEQUENCE for calendar feeds) and its `updated_at`; publishing,
// changing a published day and cancelling it e-mail the club in the same transaction.
import { and, asc, eq, gte, inArray, isNotNull, lte, ne, sql } from "drizzle-orm";
import { db, type Executor } from "@/server/db";
import { antennaDays, sites, stationSlots, users, type AntennaDayRow } from "@/server/db/schema";
import { badInput, conflict, forbidden, notFound, pgErrorCode, pgErrorCodes } from "@/server/errors";
import { can, type Actor } from "@/server/policy";
import { getClubSettings } from "@/server/services/accounts";
import { dayIcsFile, daySnapshot, tellDayChange } from "@/server/services/antenna-day-messages";
import { availableTransitions, DAY_STATUSES, isDeletable, isEditable, transitionProblem, type DayStatus } from "@/lib/antenna-days/status";
import { instantToWallTime, wallTimeToInstant } from "@/lib/time";
import type { DayInput, DayPatch } from "@/validations/antenna-days";

export interface PersonRef {
  id: string;
  name: string;
  callSign: string | null;
}

export interface DayDto {
  id: string;
  title: string;
  status: DayStatus;
  site: { id: string; name: string };
  startsAt: string;
  endsAt: string;
  /** Wall-clock times in the club's time zone, as the forms take them. */
  startsAtLocal: string;
  endsAtLocal: string;
  timeZone: string;
  meetingPoint: string;
  description: string;
  safetyLead: PersonRef;
  sequence: number;
  updatedAt: string;
  copiedFromId: string | null;
  /** Status changes a coordinator may make now. */
  nextStatuses: DayStatus[];
}

const dayColumns = {
  day: antennaDays,
  siteName: sites.name,
  leadName: users.name,
  leadCallSign: users.callSign,
};

type DayJoinRow = { day: AntennaDayRow; siteName: string; leadName: string; leadCallSign: string | null };

function selectDays(executor: Executor = db()) {
  return executor.select(dayColumns).from(antennaDays).innerJoin(sites, eq(sites.id, antennaDays.siteId)).innerJoin(users, eq(users.id, antennaDays.safetyLeadId));
}

function toDayDto(row: DayJoinRow, timeZone: string, now = new Date()): DayDto {
  const { day } = row;
  return {
    id: day.id,
    title: day.title,
    status: day.status,
    site: { id: day.siteId, name: row.siteName },
    startsAt: day.startsAt.toISOString(),
    endsAt: day.endsAt.toISOString(),
    startsAtLocal: instantToWallTime(day.startsAt, timeZone),
    endsAtLocal: instantToWallTime(day.endsAt, timeZone),
    timeZone,
    meetingPoint: day.meetingPoint,
    description: day.description,
    safetyLead: { id: day.safetyLeadId, name: row.leadName, callSign: row.leadCallSign },
    sequence: day.sequence,
    updatedAt: day.updatedAt.toISOString(),
    copiedFromId: day.copiedFromId,
    nextStatuses: availableTransitions(day.status, day, now),
  };
}

/** Statuses the person may see: drafts only for coordinators. */
export function visibleStatuses(actor: Actor): DayStatus[] {
  return can(actor, "antennaDays.viewDrafts") ? [...DAY_STATUSES] : DAY_STATUSES.filter((status) => status !== "draft");
}

/** The day row if the person may see it; a draft is "not found" for those who may not see drafts. */
export async function findVisibleDay(actor: Actor, dayId: string, executor: Executor = db(), lock = false): Promise<AntennaDayRow> {
  if (!can(actor, "antennaDays.view")) throw forbidden();
  const query = executor.select().from(antennaDays).where(eq(antennaDays.id, dayId));
  const [day] = lock ? await query.for("update") : await query;
  if (!day || !visibleStatuses(actor).includes(day.status)) throw notFound("That antenna day");
  return day;
}

/** For changes to the day or its slots and shifts: coordinators, while the day is a draft or published. */
export async function findEditableDay(actor: Actor, dayId: string, executor: Executor = db(), lock = false): Promise<AntennaDayRow> {
  const day = await findVisibleDay(actor, dayId, executor, lock);
  if (!can(actor, "antennaDays.manage")) throw forbidden();
  if (!isEditable(day.status)) throw conflict(`This day is ${day.status}; it cannot change any more. Copy it to plan a new one.`);
  return day;
}

/** Days the person may see, optionally overlapping a range; a caller that read the club's settings passes them. */
export async function listDays(actor: Actor, range: { from?: Date; to?: Date } = {}, club?: { timeZone: string }): Promise<DayDto[]> {
  if (!can(actor, "antennaDays.view")) throw forbidden();
  const { timeZone } = club ?? (await getClubSettings());
  const rows = await selectDays()
    .where(
      and(
        inArray(antennaDays.status, visibleStatuses(actor)),
        range.to ? lte(antennaDays.startsAt, range.to) : undefined,
        range.from ? gte(antennaDays.endsAt, range.from) : undefined,
      ),
    )
    .orderBy(asc(antennaDays.startsAt));
  return rows.map((row) => toDayDto(row, timeZone));
}

export async function getDay(actor: Actor, dayId: string): Promise<DayDto> {
  await findVisibleDay(actor, dayId);
  const { timeZone } = await getClubSettings();
  const [row] = await selectDays().where(eq(antennaDays.id, dayId));
  return toDayDto(row, timeZone);
}

/** People who can be a day's safety lead: confirmed members, stewards and coordinators. */
export async function listSafetyLeadCandidates(actor: Actor): Promise<PersonRef[]> {
  if (!can(actor, "antennaDays.manage")) throw forbidden();
  return db()
    .select({ id: users.id, name: users.name, callSign: users.callSign })
    .from(users)
    .where(and(ne(users.role, "newcomer"), isNotNull(users.confirmedAt)))
    .orderBy(asc(users.name));
}

async function checkSafetyLead(executor: Executor, personId: string): Promise<void> {
  const person = await executor.query.users.findFirst({ where: eq(users.id, personId) });
  if (!person || !person.confirmedAt || person.role === "newcomer") {
    throw badInput("safetyLeadId", "The safety lead must be a confirmed member, steward or coordinator.");
  }
}

async function checkSite(executor: Executor, siteId: string): Promise<void> {
  const site = await executor.query.sites.findFirst({ where: eq(sites.id, siteId) });
  if (!site) throw badInput("siteId", "Choose one of the club's sites.");
}

export async function createDay(actor: Actor, input: DayInput): Promise<DayDto> {
  if (!can(actor, "antennaDays.manage")) throw forbidden();
  const { timeZone } = await getClubSettings();
  const id = await db().transaction(async (tx) => {
    await Promise.all([checkSite(tx, input.siteId), checkSafetyLead(tx, input.safetyLeadId)]);
    const [row] = await tx
      .insert(antennaDays)
      .values({
        title: input.title,
        siteId: input.siteId,
        startsAt: wallTimeToInstant(input.startsAtLocal, timeZone),
        endsAt: wallTimeToInstant(input.endsAtLocal, timeZone),
        meetingPoint: input.meetingPoint,
        description: input.description,
        safetyLeadId: input.safetyLeadId,
        createdBy: actor.id,
      })
      .returning({ id: antennaDays.id });
    return row.id;
  });
  return getDay(actor, id);
}

/** Edits the day's details and/or moves its status; one change, one step of `sequence`. */
export async function updateDay(actor: Actor, dayId: string, patch: DayPatch, now = new Date()): Promise<DayDto> {
  if (!can(actor, "antennaDays.manage")) throw forbidden();
  const { timeZone } = await getClubSettings();
  await db().transaction(async (tx) => {
    const day = await findVisibleDay(actor, dayId, tx, true);
    const { status, cancelReason, ...fields } = patch;
    const detailsChange = Object.values(fields).some((value) => value !== undefined);
    if (detailsChange && !isEditable(day.status)) throw conflict(`This day is ${day.status}; its details cannot change any more.`);
    if (fields.siteId) await checkSite(tx, fields.siteId);
    if (fields.safetyLeadId) await checkSafetyLead(tx, fields.safetyLeadId);
    const startsAt = fields.startsAtLocal ? wallTimeToInstant(fields.startsAtLocal, timeZone) : day.startsAt;
    const endsAt = fields.endsAtLocal ? wallTimeToInstant(fields.endsAtLocal, timeZone) : day.endsAt;
    if (endsAt <= startsAt) throw badInput("endsAtLocal", "The end must come after the start.");
    if (status !== undefined && status !== day.status) {
      const problem = transitionProblem(day.status, status, { startsAt, endsAt }, now);
      if (problem) throw conflict(problem);
    }
    if (!detailsChange && (status === undefined || status === day.status)) return;
    const before = await daySnapshot(tx, dayId);
    await tx
      .update(antennaDays)
      .set({
        title: fields.title,
        siteId: fields.siteId,
        meetingPoint: fields.meetingPoint,
        description: fields.description,
        safetyLeadId: fields.safetyLeadId,
        startsAt,
        endsAt,
        status: status ?? day.status,
        sequence: sql`${antennaDays.sequence} + 1`,
        updatedAt: now,
      })
      .where(eq(antennaDays.id, dayId));
    await tellDayChange(tx, before, { timeZone, cancelReason: cancelReason ?? null });
  });
  return getDay(actor, dayId);
}

/** The day as an iCalendar file, for whoever may see it (a draft is "not found" to members). */
export async function antennaDayIcs(actor: Actor, dayId: string): Promise<{ filename: string; content: string }> {
  await findVisibleDay(actor, dayId);
  const file = await dayIcsFile(db(), await daySnapshot(db(), dayId));
  return { filename: file.filename, content: file.content };
}

export async function deleteDay(actor: Actor, dayId: string): Promise<void> {
  if (!can(actor, "antennaDays.manage")) throw forbidden();
  await db().transaction(async (tx) => {
    const day = await findVisibleDay(actor, dayId, tx, true);
    if (!isDeletable(day.status)) throw conflict("Only drafts can be deleted; cancel a published day instead, so that members are told.");
    try {
      await tx.delete(antennaDays).where(eq(antennaDays.id, dayId));
    } catch (error) {
      // gear_bookings.antenna_day_id restricts: booked gear keeps its day.
      if (pgErrorCode(error) === pgErrorCodes.foreignKeyViolation) {
        throw conflict("Gear is booked for this draft. Cancel those bookings on the lending desk first, or cancel the day instead.");
      }
      throw error;
    }
  });
}

/**
 * A new draft from an earlier day: the same site, meeting point, description and safety lead,
 * and every station slot with its plan and place on the site plan. Shifts and bookings stay
 * behind: they belong to the old date.
 */
export async function copyDay(actor: Actor, sourceId: string, input: { title: string; startsAtLocal: string; endsAtLocal: string }): Promise<DayDto> {
  if (!can(actor, "antennaDays.manage")) throw forbidden();
  const { timeZone } = await getClubSettings();
  const id = await db().transaction(async (tx) => {
    const source = await findVisibleDay(actor, sourceId, tx);
    const [copy] = await tx
      .insert(antennaDays)
      .values({
        title: input.title,
        siteId: source.siteId,
        startsAt: wallTimeToInstant(input.startsAtLocal, timeZone),
        endsAt: wallTimeToInstant(input.endsAtLocal, timeZone),
        meetingPoint: source.meetingPoint,
        description: source.description,
        safetyLeadId: source.safetyLeadId,
        copiedFromId: source.id,
        createdBy: actor.id,
      })
      .returning({ id: antennaDays.id });
    const slots = await tx.select().from(stationSlots).where(eq(stationSlots.dayId, source.id));
    if (slots.length > 0) {
      await tx.insert(stationSlots).values(
        slots.map((slot) => ({
          dayId: copy.id,
          name: slot.name,
          bands: slot.bands,
          powerW: slot.powerW,
          mode: slot.mode,
          planParams: slot.planParams,
          libraryPlanId: slot.libraryPlanId,
          x: slot.x,
          y: slot.y,
          azimuthDeg: slot.azimuthDeg,
          tentX: slot.tentX,
          tentY: slot.tentY,
          feedlineRunOverrideM: slot.feedlineRunOverrideM,
          summary: slot.summary,
        })),
      );
    }
    return copy.id;
  }).catch((error: unknown) => {
    if (pgErrorCode(error) === pgErrorCodes.checkViolation) throw badInput("endsAtLocal", "The end must come after the start.");
    throw error;
  });
  return getDay(actor, id);
}
