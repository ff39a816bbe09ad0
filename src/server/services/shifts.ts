// Shifts: time windows to operate a station slot, with a capacity. Members sign up and cancel.
// The database keeps the rules under concurrent sign-ups: `taken <= capacity` (a check, bumped
// with `where taken < capacity`), one sign-up per person and shift (a unique index), and one
// shift at a time per person (an exclusion constraint over the person and the time range).
// A coordinator who removes someone's shift (deleting it, or taking the person off) tells them.
import { and, asc, eq, gt, inArray, lt, sql } from "drizzle-orm";
import { db, type Executor } from "@/server/db";
import { antennaDays, shifts, shiftSignups, stationSlots, users, type AntennaDayRow, type ShiftRow } from "@/server/db/schema";
import { badInput, conflict, forbidden, notFound, pgConstraint, pgErrorCode, pgErrorCodes } from "@/server/errors";
import { can, canCancelFor, type Actor } from "@/server/policy";
import { getClubSettings } from "@/server/services/accounts";
import { tellSignUpsRemoved } from "@/server/services/antenna-day-messages";
import { findEditableDay, findVisibleDay, visibleStatuses, type PersonRef } from "@/server/services/antenna-days";
import { instantToWallTime, wallTimeToInstant } from "@/lib/time";
import type { ShiftInput } from "@/validations/antenna-days";

export interface ShiftDto {
  id: string;
  slotId: string;
  startsAt: string;
  endsAt: string;
  startsAtLocal: string;
  endsAtLocal: string;
  capacity: number;
  taken: number;
  sequence: number;
  people: PersonRef[];
  /** The asking person is signed up. */
  signedUp: boolean;
  /** Why the asking person cannot sign up now, or null when they can. */
  signUpBlockedBy: string | null;
}

/** Why `actor` cannot sign up for the shift now (before the database has its say), or null. */
export function signUpProblem(actor: Actor, shift: Pick<ShiftRow, "startsAt" | "taken" | "capacity">, day: Pick<AntennaDayRow, "status">, signedUp: boolean, now: Date): string | null {
  if (!can(actor, "shifts.signUp")) return "Newcomers join build sessions first; operating shifts are for members.";
  if (day.status !== "published") return "Sign-ups are open only while the day is published.";
  if (shift.startsAt <= now) return "This shift has already started.";
  if (signedUp) return "You are signed up for this shift.";
  if (shift.taken >= shift.capacity) return "This shift is full.";
  return null;
}

async function shiftWithDay(executor: Executor, shiftId: string) {
  const [row] = await executor
    .select({ shift: shifts, dayId: stationSlots.dayId })
    .from(shifts)
    .innerJoin(stationSlots, eq(stationSlots.id, shifts.slotId))
    .where(eq(shifts.id, shiftId));
  if (!row) throw notFound("That shift");
  return row;
}

async function slotDayId(executor: Executor, slotId: string): Promise<string> {
  const slot = await executor.query.stationSlots.findFirst({ where: eq(stationSlots.id, slotId), columns: { dayId: true } });
  if (!slot) throw notFound("That station slot");
  return slot.dayId;
}

async function toShiftDtos(actor: Actor, rows: ShiftRow[], day: AntennaDayRow, timeZone: string, now = new Date()): Promise<ShiftDto[]> {
  if (rows.length === 0) return [];
  const signups = await db()
    .select({ shiftId: shiftSignups.shiftId, id: users.id, name: users.name, callSign: users.callSign })
    .from(shiftSignups)
    .innerJoin(users, eq(users.id, shiftSignups.personId))
    .where(inArray(shiftSignups.shiftId, rows.map((row) => row.id)))
    .orderBy(asc(shiftSignups.createdAt));
  return rows.map((row) => {
    const people = signups.filter((signup) => signup.shiftId === row.id).map(({ id, name, callSign }) => ({ id, name, callSign }));
    const signedUp = people.some((person) => person.id === actor.id);
    return {
      id: row.id,
      slotId: row.slotId,
      startsAt: row.startsAt.toISOString(),
      endsAt: row.endsAt.toISOString(),
      startsAtLocal: instantToWallTime(row.startsAt, timeZone),
      endsAtLocal: instantToWallTime(row.endsAt, timeZone),
      capacity: row.capacity,
      taken: row.taken,
      sequence: row.sequence,
      people,
      signedUp,
      signUpBlockedBy: signUpProblem(actor, row, day, signedUp, now),
    };
  });
}

export async function listShifts(actor: Actor, slotId: string): Promise<ShiftDto[]> {
  const day = await findVisibleDay(actor, await slotDayId(db(), slotId));
  const { timeZone } = await getClubSettings();
  const rows = await db().select().from(shifts).where(eq(shifts.slotId, slotId)).orderBy(asc(shifts.startsAt));
  return toShiftDtos(actor, rows, day, timeZone);
}

/** The shifts of every slot of a day, by slot id. */
export async function listShiftsOfDay(actor: Actor, dayId: string): Promise<Record<string, ShiftDto[]>> {
  const day = await findVisibleDay(actor, dayId);
  const { timeZone } = await getClubSettings();
  const rows = await db()
    .select({ shift: shifts })
    .from(shifts)
    .innerJoin(stationSlots, eq(stationSlots.id, shifts.slotId))
    .where(eq(stationSlots.dayId, dayId))
    .orderBy(asc(shifts.startsAt));
  const dtos = await toShiftDtos(actor, rows.map((row) => row.shift), day, timeZone);
  const bySlot: Record<string, ShiftDto[]> = {};
  for (const dto of dtos) (bySlot[dto.slotId] ??= []).push(dto);
  return bySlot;
}

export async function getShift(actor: Actor, shiftId: string): Promise<ShiftDto> {
  const { shift, dayId } = await shiftWithDay(db(), shiftId);
  const day = await findVisibleDay(actor, dayId);
  const { timeZone } = await getClubSettings();
  const [dto] = await toShiftDtos(actor, [shift], day, timeZone);
  return dto;
}

function shiftTimes(input: ShiftInput, day: AntennaDayRow, timeZone: string) {
  const startsAt = wallTimeToInstant(input.startsAtLocal, timeZone);
  const endsAt = wallTimeToInstant(input.endsAtLocal, timeZone);
  if (startsAt < day.startsAt || endsAt > day.endsAt) {
    throw badInput("startsAtLocal", `A shift lies within its day (${instantToWallTime(day.startsAt, timeZone).replace("T", " ")} to ${instantToWallTime(day.endsAt, timeZone).replace("T", " ")}).`);
  }
  return { startsAt, endsAt };
}

function capacityOrOverlap(error: unknown): never {
  if (pgErrorCode(error) === pgErrorCodes.checkViolation && pgConstraint(error) === "shifts_taken_within_capacity") {
    throw badInput("capacity", "More people have already signed up than that; cancel sign-ups first or keep the capacity.");
  }
  if (pgErrorCode(error) === pgErrorCodes.exclusionViolation) {
    throw conflict("Someone signed up for this shift already operates another shift at the new time.");
  }
  throw error;
}

export async function createShift(actor: Actor, slotId: string, input: ShiftInput): Promise<ShiftDto> {
  const { timeZone } = await getClubSettings();
  const id = await db().transaction(async (tx) => {
    const day = await findEditableDay(actor, await slotDayId(tx, slotId), tx, true);
    const [row] = await tx.insert(shifts).values({ slotId, capacity: input.capacity, ...shiftTimes(input, day, timeZone) }).returning({ id: shifts.id });
    return row.id;
  });
  return getShift(actor, id);
}

/** New times carry the sign-ups' ranges along, so the one-shift-at-a-time rule still holds. */
export async function updateShift(actor: Actor, shiftId: string, input: ShiftInput): Promise<ShiftDto> {
  const { timeZone } = await getClubSettings();
  await db()
    .transaction(async (tx) => {
      const { dayId } = await shiftWithDay(tx, shiftId);
      const day = await findEditableDay(actor, dayId, tx, true);
      const times = shiftTimes(input, day, timeZone);
      await tx
        .update(shifts)
        .set({ ...times, capacity: input.capacity, sequence: sql`${shifts.sequence} + 1`, updatedAt: new Date() })
        .where(eq(shifts.id, shiftId));
      await tx
        .update(shiftSignups)
        .set({ during: sql`tstzrange(${times.startsAt.toISOString()}::timestamptz, ${times.endsAt.toISOString()}::timestamptz, '[)')` })
        .where(eq(shiftSignups.shiftId, shiftId));
    })
    .catch(capacityOrOverlap);
  return getShift(actor, shiftId);
}

export async function deleteShift(actor: Actor, shiftId: string): Promise<void> {
  await db().transaction(async (tx) => {
    const { dayId } = await shiftWithDay(tx, shiftId);
    await findEditableDay(actor, dayId, tx, true);
    await tellSignUpsRemoved(tx, eq(shiftSignups.shiftId, shiftId));
    await tx.delete(shifts).where(eq(shifts.id, shiftId));
  });
}

/**
 * Signs the person up. The capacity bump and the sign-up row are one transaction: of many
 * people racing for the last place, the row lock lets one `taken < capacity` succeed and the
 * others find the shift full; the unique index and the exclusion constraint refuse a second
 * sign-up and an overlapping shift even when two requests arrive at once.
 */
export async function signUp(actor: Actor, shiftId: string, now = new Date()): Promise<ShiftDto> {
  if (!can(actor, "shifts.signUp")) throw forbidden("Newcomers join build sessions first; operating shifts are for members.");
  await db()
    .transaction(async (tx) => {
      const { shift, dayId } = await shiftWithDay(tx, shiftId);
      const day = await findVisibleDay(actor, dayId, tx);
      const problem = signUpProblem(actor, { ...shift, taken: 0 }, day, false, now);
      if (problem) throw conflict(problem);
      const [bumped] = await tx
        .update(shifts)
        .set({ taken: sql`${shifts.taken} + 1` })
        .where(and(eq(shifts.id, shiftId), lt(shifts.taken, shifts.capacity)))
        .returning({ startsAt: shifts.startsAt, endsAt: shifts.endsAt });
      if (!bumped) throw conflict("This shift is full.");
      await tx.insert(shiftSignups).values({
        shiftId,
        personId: actor.id,
        during: sql`tstzrange(${bumped.startsAt.toISOString()}::timestamptz, ${bumped.endsAt.toISOString()}::timestamptz, '[)')`,
      });
    })
    .catch((error: unknown) => {
      if (pgErrorCode(error) === pgErrorCodes.uniqueViolation) throw conflict("You are already signed up for this shift.");
      if (pgErrorCode(error) === pgErrorCodes.exclusionViolation) throw conflict("You already operate another shift at that time: one shift at a time.");
      throw error;
    });
  return getShift(actor, shiftId);
}

/** Cancels a sign-up: your own, or anyone's for a coordinator. */
export async function cancelSignUp(actor: Actor, shiftId: string, personId = actor.id): Promise<ShiftDto> {
  if (!canCancelFor(actor, personId, "antennaDays.manage")) throw forbidden();
  await db().transaction(async (tx) => {
    const { dayId } = await shiftWithDay(tx, shiftId);
    await findVisibleDay(actor, dayId, tx);
    const theirs = and(eq(shiftSignups.shiftId, shiftId), eq(shiftSignups.personId, personId));
    if (personId !== actor.id) await tellSignUpsRemoved(tx, theirs!);
    const [removed] = await tx
      .delete(shiftSignups)
      .where(theirs)
      .returning({ id: shiftSignups.id });
    if (!removed) throw notFound("That sign-up");
    await tx
      .update(shifts)
      .set({ taken: sql`${shifts.taken} - 1` })
      .where(eq(shifts.id, shiftId));
  });
  return getShift(actor, shiftId);
}

export interface MyShift {
  shiftId: string;
  startsAt: string;
  endsAt: string;
  slotId: string;
  slotName: string;
  dayId: string;
  dayTitle: string;
}

/** The person's own shifts on days they may see, in a time range (for the calendar and the home page). */
export async function listMyShifts(actor: Actor, range: { from: Date; to?: Date }): Promise<MyShift[]> {
  if (!can(actor, "antennaDays.view")) return [];
  const rows = await db()
    .select({
      shiftId: shifts.id,
      startsAt: shifts.startsAt,
      endsAt: shifts.endsAt,
      slotId: stationSlots.id,
      slotName: stationSlots.name,
      dayId: antennaDays.id,
      dayTitle: antennaDays.title,
    })
    .from(shiftSignups)
    .innerJoin(shifts, eq(shifts.id, shiftSignups.shiftId))
    .innerJoin(stationSlots, eq(stationSlots.id, shifts.slotId))
    .innerJoin(antennaDays, eq(antennaDays.id, stationSlots.dayId))
    .where(
      and(
        eq(shiftSignups.personId, actor.id),
        inArray(antennaDays.status, visibleStatuses(actor).filter((status) => status !== "cancelled")),
        gt(shifts.endsAt, range.from),
        range.to ? lt(shifts.startsAt, range.to) : undefined,
      ),
    )
    .orderBy(asc(shifts.startsAt));
  return rows.map((row) => ({ ...row, startsAt: row.startsAt.toISOString(), endsAt: row.endsAt.toISOString() }));
}
