// The lending desk: requests, approvals, hand-outs, returns, the waitlist and its offers.
//
// Rules (DEVELOPERS.md, "Lending desk"):
// - Only approved and out bookings hold an item's time; the exclusion constraint
//   gear_bookings_no_overlap makes two of them overlapping impossible.
// - A request for a time another booking holds is refused with the next free time, and the
//   person may join the waitlist instead. Requests for free time may overlap each other on items
//   a steward approves: they queue, and the first approval wins.
// - Items with the "automatic" rule approve a request for free time at once; one winner under
//   concurrency, because every booking write locks the item's row and the constraint backs it.
// - When held time is released (cancel, decline, early return), the first people in line whose
//   wanted time is now free get an offer that holds the time for them until it lapses.
// Service functions return what happened (who was offered what); the messages of each step go
// out through lending-messages.ts inside the same transaction.
import { and, asc, count, desc, eq, gt, inArray, lte, ne, or, sql, type SQL } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import Papa from "papaparse";
import { db, type Executor, type Transaction } from "@/server/db";
import { gearBookings, gearHistory, gearItemFiles, gearItems, gearWaitlist, storedFiles, users, type GearBookingRow, type GearItemRow } from "@/server/db/schema";
import { badInput, conflict, forbidden, notFound, pgErrorCode, pgErrorCodes } from "@/server/errors";
import { can, canCancelFor, canCoSignLoan, canReturnLoan, canSeeBooking, loanNeedsCoSign, type Actor } from "@/server/policy";
import { getClubSettings, toActor } from "@/server/services/accounts";
import { itemFileUrl, recordHistory } from "@/server/services/gear";
import { tellBookingApproved, tellBookingStep, tellOffers } from "@/server/services/lending-messages";
import { gearKindLabels } from "@/lib/gear/kinds";
import { isDueSoon, isFree, isOverdue, nextFreeStart, offerExpiry, pickOffers, rangeProblem, type Interval } from "@/lib/lending/availability";
import { HAND_OUT_LEAD_HOURS } from "@/lib/lending/next-action";
import { allowedActions, openStates, releasesTime, transition, type BookingState } from "@/lib/lending/states";
import { timeInputToInstant } from "@/lib/lending/time-input";
import { formatInZone, formatRangeInZone } from "@/lib/time";
import type { BookingListQuery, BookingRequestInput, BookingStepInput } from "@/validations/lending";

export interface BookingDto {
  id: string;
  itemId: string;
  itemLabelCode: string;
  itemName: string;
  itemKind: GearItemRow["kind"];
  borrowerId: string;
  borrowerName: string;
  startsAt: string;
  endsAt: string;
  state: BookingState;
  overdue: boolean;
  note: string | null;
  coSignRequired: boolean;
  coSigned: boolean;
  coSignedByName: string | null;
  awaitingCoSign: boolean;
  declineReason: string | null;
  handedOutByName: string | null;
  handedOutAt: string | null;
  handOutCondition: GearBookingRow["handOutCondition"];
  returnedAt: string | null;
  returnCondition: GearBookingRow["returnCondition"];
  damageNotes: string | null;
  returnPhotoUrl: string | null;
  antennaDayId: string | null;
  stationSlotId: string | null;
  /** A coax run booked as its station slot's feedline (the slot's plan uses it). */
  slotFeedline: boolean;
  createdAt: string;
}

/** Someone on the waitlist who was just offered an item (for a message to them). */
export interface OfferNotice {
  waitlistId: string;
  userId: string;
  itemId: string;
  itemLabelCode: string;
  itemName: string;
  startsAt: string;
  endsAt: string;
  expiresAt: string;
}

export type RequestOutcome = "approved" | "requested" | "awaiting-co-sign";

const coSigners = alias(users, "co_signers");
const handers = alias(users, "handers");

const bookingSelection = {
  booking: gearBookings,
  itemLabelCode: gearItems.labelCode,
  itemName: gearItems.name,
  itemKind: gearItems.kind,
  borrowerName: users.name,
  coSignedByName: coSigners.name,
  handedOutByName: handers.name,
};

function selectBookings(executor: Executor) {
  return executor
    .select(bookingSelection)
    .from(gearBookings)
    .innerJoin(gearItems, eq(gearItems.id, gearBookings.itemId))
    .innerJoin(users, eq(users.id, gearBookings.borrowerId))
    .leftJoin(coSigners, eq(coSigners.id, gearBookings.coSignedBy))
    .leftJoin(handers, eq(handers.id, gearBookings.handedOutBy));
}

type BookingJoin = Awaited<ReturnType<typeof selectBookings>>[number];

function toBookingDto(row: BookingJoin, now = new Date()): BookingDto {
  const { booking } = row;
  return {
    id: booking.id,
    itemId: booking.itemId,
    itemLabelCode: row.itemLabelCode,
    itemName: row.itemName,
    itemKind: row.itemKind,
    borrowerId: booking.borrowerId,
    borrowerName: row.borrowerName,
    startsAt: booking.startsAt.toISOString(),
    endsAt: booking.endsAt.toISOString(),
    state: booking.state,
    overdue: isOverdue(booking, now),
    note: booking.note,
    coSignRequired: booking.coSignRequired,
    coSigned: booking.coSignedBy !== null,
    coSignedByName: row.coSignedByName,
    awaitingCoSign: awaitsCoSign(booking),
    declineReason: booking.declineReason,
    handedOutByName: row.handedOutByName,
    handedOutAt: booking.handedOutAt?.toISOString() ?? null,
    handOutCondition: booking.handOutCondition,
    returnedAt: booking.returnedAt?.toISOString() ?? null,
    returnCondition: booking.returnCondition,
    damageNotes: booking.damageNotes,
    returnPhotoUrl: booking.returnPhotoId ? itemFileUrl(booking.itemId, booking.returnPhotoId) : null,
    antennaDayId: booking.antennaDayId,
    stationSlotId: booking.stationSlotId,
    slotFeedline: booking.slotFeedline,
    createdAt: booking.createdAt.toISOString(),
  };
}

const awaitsCoSign = (booking: Pick<GearBookingRow, "state" | "coSignRequired" | "coSignedBy">) =>
  booking.state === "requested" && booking.coSignRequired && booking.coSignedBy === null;

async function bookingDto(executor: Executor, id: string): Promise<BookingDto> {
  const [row] = await selectBookings(executor).where(eq(gearBookings.id, id));
  return toBookingDto(row);
}

/** Every booking write for an item holds its row lock, so the checks below see a settled picture. */
async function lockItem(tx: Transaction, itemId: string): Promise<GearItemRow> {
  const [item] = await tx.select().from(gearItems).where(eq(gearItems.id, itemId)).for("update");
  if (!item) throw notFound("That item");
  return item;
}

/** The time the item is held: approved and out bookings, and open waitlist offers of other people. */
async function heldIntervals(executor: Executor, itemId: string, options: { exceptBookingId?: string; forUserId?: string; now: Date }): Promise<Interval[]> {
  const bookings = await executor
    .select({ start: gearBookings.startsAt, end: gearBookings.endsAt })
    .from(gearBookings)
    .where(
      and(
        eq(gearBookings.itemId, itemId),
        inArray(gearBookings.state, ["approved", "out"]),
        options.exceptBookingId ? ne(gearBookings.id, options.exceptBookingId) : undefined,
      ),
    );
  const offers = await executor
    .select({ start: gearWaitlist.startsAt, end: gearWaitlist.endsAt })
    .from(gearWaitlist)
    .where(
      and(
        eq(gearWaitlist.itemId, itemId),
        eq(gearWaitlist.state, "offered"),
        gt(gearWaitlist.offerExpiresAt, options.now),
        options.forUserId ? ne(gearWaitlist.userId, options.forUserId) : undefined,
      ),
    );
  return [...bookings, ...offers];
}

interface HoldOptions {
  forUserId?: string;
  exceptBookingId?: string;
  now: Date;
  /** The club's time zone, read before the transaction (a transaction never waits for a second connection). */
  timeZone: string;
}

/** The answer when the overlap guard (the exclusion constraint) refused a write: what holds the time now. */
async function timeTakenError(executor: Executor, item: GearItemRow, wanted: Interval, options: HoldOptions) {
  return timeTaken(item, await heldIntervals(executor, item.id, options), wanted, options.timeZone);
}

/** A clash with the time held, with the next free time of the same length for the form to offer. */
function timeTaken(item: GearItemRow, held: Interval[], wanted: Interval, timeZone: string) {
  const start = nextFreeStart(held, wanted);
  const end = new Date(start.getTime() + (wanted.end.getTime() - wanted.start.getTime()));
  return conflict(
    `${item.labelCode} ${item.name} is already booked for part of that time. It is free again from ${formatInZone(start, timeZone)} for as long as you asked. Ask for that time, or join the waitlist to be offered your time if it comes free.`,
    { nextFreeStart: start.toISOString(), nextFreeEnd: end.toISOString(), canJoinWaitlist: true },
  );
}

async function wantedInterval(input: { startsAt: string; endsAt: string }, timeZone: string, now: Date): Promise<Interval> {
  const wanted = { start: timeInputToInstant(input.startsAt, timeZone), end: timeInputToInstant(input.endsAt, timeZone) };
  const problem = rangeProblem(wanted, now);
  if (problem) throw badInput("endsAt", problem);
  return wanted;
}

interface NewBooking {
  item: GearItemRow;
  borrower: Actor;
  wanted: Interval;
  note?: string;
  antennaDayId?: string;
  stationSlotId?: string;
  /** A coax run booked as the station slot's feedline (station kits). */
  slotFeedline?: boolean;
  /** A keeper booking directly (station kits) approves at once, whatever the item's rule. */
  approvedBy?: Actor;
  recordedBy: Actor;
  now: Date;
  timeZone: string;
}

async function createBooking(tx: Transaction, input: NewBooking): Promise<{ bookingId: string; outcome: RequestOutcome }> {
  const { item, borrower, wanted, now } = input;
  if (item.retiredAt) throw conflict(`${item.labelCode} ${item.name} is retired and cannot be booked.`);
  if (input.stationSlotId && !input.antennaDayId) throw badInput("stationSlotId", "A station slot belongs to an antenna day; give the day too.");
  if (input.slotFeedline && (item.kind !== "coax" || !input.stationSlotId)) throw badInput("itemId", "A slot's feedline is a coax run booked for a station slot.");
  const coSignRequired = !input.approvedBy && loanNeedsCoSign(borrower, item.kind);
  const held = await heldIntervals(tx, item.id, { forUserId: borrower.id, now });
  if (!isFree(held, wanted)) throw timeTaken(item, held, wanted, input.timeZone);
  const approveNow = !!input.approvedBy || (item.approvalRule === "automatic" && !coSignRequired);
  const [booking] = await tx
    .insert(gearBookings)
    .values({
      itemId: item.id,
      borrowerId: borrower.id,
      startsAt: wanted.start,
      endsAt: wanted.end,
      state: approveNow ? "approved" : "requested",
      note: input.note ?? null,
      coSignRequired,
      decidedBy: input.approvedBy?.id ?? null,
      decidedAt: approveNow ? now : null,
      antennaDayId: input.antennaDayId ?? null,
      stationSlotId: input.stationSlotId ?? null,
      slotFeedline: input.slotFeedline ?? false,
    })
    .returning();
  await recordHistory(tx, {
    itemId: item.id,
    bookingId: booking.id,
    actorId: input.recordedBy.id,
    event: "request",
    toState: "requested",
    note: input.note ?? null,
    at: now,
  });
  if (approveNow) {
    await recordHistory(tx, {
      itemId: item.id,
      bookingId: booking.id,
      actorId: input.approvedBy?.id ?? null,
      event: "approve",
      fromState: "requested",
      toState: "approved",
      note: input.approvedBy ? null : "Approved at once: the item was free (first come, first served).",
      at: now,
    });
    await tellBookingApproved(tx, booking.id);
  }
  return { bookingId: booking.id, outcome: approveNow ? "approved" : coSignRequired ? "awaiting-co-sign" : "requested" };
}

/** Runs a booking write; a clash the exclusion constraint catches becomes the same clear message. */
async function withOverlapGuard<T>(run: () => Promise<T>, onOverlap: () => Promise<Error>): Promise<T> {
  try {
    return await run();
  } catch (error) {
    if (pgErrorCode(error) === pgErrorCodes.exclusionViolation) throw await onOverlap();
    throw error;
  }
}

export interface RequestResult {
  booking: BookingDto;
  outcome: RequestOutcome;
  /** People on the waitlist offered something while the item's offers were settled. */
  offered: OfferNotice[];
}

/** A member asks for an item for a time range (optionally for an antenna day's station slot). */
export async function requestBooking(actor: Actor, input: BookingRequestInput, now = new Date()): Promise<RequestResult> {
  if (!can(actor, "loans.request")) throw forbidden();
  return bookItem(input, now, async () => ({ borrower: actor, recordedBy: actor }), actor.id);
}

/**
 * A steward or coordinator books an item for an antenna day's station slot: approved at once,
 * for themselves or another borrower. One call for "book this coax run for this slot".
 */
export async function bookForStation(
  actor: Actor,
  input: BookingRequestInput & { antennaDayId: string; borrowerId?: string; slotFeedline?: boolean },
  now = new Date(),
): Promise<RequestResult> {
  if (!can(actor, "loans.manage")) throw forbidden();
  return bookItem(input, now, async (tx) => ({
    borrower: input.borrowerId ? await actorById(tx, input.borrowerId) : actor,
    approvedBy: actor,
    recordedBy: actor,
  }));
}

/**
 * Books an item in one transaction that holds the item's lock and settles its waitlist offers
 * first. When the exclusion constraint refuses an overlap another request won, the answer names
 * the next free time (counting the person's own offers when `forUserId` is given).
 */
async function bookItem(
  input: BookingRequestInput & { slotFeedline?: boolean },
  now: Date,
  partiesOf: (tx: Transaction) => Promise<Pick<NewBooking, "borrower" | "approvedBy" | "recordedBy">>,
  forUserId?: string,
): Promise<RequestResult> {
  const { timeZone } = await getClubSettings();
  const wanted = await wantedInterval(input, timeZone, now);
  return withOverlapGuard(
    () =>
      db().transaction(async (tx) => {
        const item = await lockItem(tx, input.itemId);
        const offered = await settleOffersOf(tx, item, now);
        const { bookingId, outcome } = await createBooking(tx, { ...input, item, ...(await partiesOf(tx)), wanted, now, timeZone });
        return { booking: await bookingDto(tx, bookingId), outcome, offered };
      }),
    async () => {
      const item = await db().query.gearItems.findFirst({ where: eq(gearItems.id, input.itemId) });
      return timeTakenError(db(), item!, wanted, { forUserId, now, timeZone });
    },
  );
}

async function actorById(executor: Executor, id: string): Promise<Actor> {
  const [row] = await executor.select().from(users).where(eq(users.id, id));
  if (!row) throw badInput("borrowerId", "That person was not found.");
  return toActor(row);
}

export interface StepResult {
  booking: BookingDto;
  offered: OfferNotice[];
}

function mayTakeStep(actor: Actor, borrowerId: string, action: BookingStepInput["action"]): boolean {
  switch (action) {
    case "return":
      return canReturnLoan(actor, borrowerId);
    case "cancel":
      return canCancelFor(actor, borrowerId, "loans.manage");
    case "co-sign":
      return canCoSignLoan(actor, borrowerId);
    default:
      return can(actor, "loans.manage");
  }
}

/** One step of a booking: approve, decline, hand out, return, cancel, co-sign or mark lost. */
export async function stepBooking(actor: Actor, id: string, step: BookingStepInput, now = new Date()): Promise<StepResult> {
  if (!can(actor, "loans.request")) throw forbidden();
  const { timeZone } = await getClubSettings();
  const [peek] = await db().select({ itemId: gearBookings.itemId }).from(gearBookings).where(eq(gearBookings.id, id));
  if (!peek) throw notFound("That booking");
  return withOverlapGuard(
    () =>
      db().transaction(async (tx) => {
        const item = await lockItem(tx, peek.itemId);
        const [booking] = await tx.select().from(gearBookings).where(eq(gearBookings.id, id));
        if (!canSeeBooking(actor, { borrowerId: booking.borrowerId, awaitingCoSign: awaitsCoSign(booking) })) throw notFound("That booking");
        if (!mayTakeStep(actor, booking.borrowerId, step.action)) throw forbidden();
        const move = transition({ state: booking.state, coSignRequired: booking.coSignRequired, coSigned: booking.coSignedBy !== null }, step.action);
        if (!move.ok) throw conflict(move.message);
        const offered = await settleOffersOf(tx, item, now);
        const changes = await stepChanges(tx, actor, item, booking, step, { now, timeZone });
        await tx
          .update(gearBookings)
          .set({ ...changes, state: move.to, sequence: sql`${gearBookings.sequence} + 1`, updatedAt: now })
          .where(eq(gearBookings.id, id));
        await recordHistory(tx, {
          itemId: item.id,
          bookingId: id,
          actorId: actor.id,
          event: step.action,
          fromState: booking.state,
          toState: move.to,
          note: stepNote(step),
          condition: "condition" in step ? step.condition : null,
          fileId: step.action === "return" ? (step.photoFileId ?? null) : null,
          at: now,
        });
        await tellBookingStep(tx, id, step.action);
        if (releasesTime(booking.state, move.to)) offered.push(...(await settleOffersOf(tx, item, now)));
        return { booking: await bookingDto(tx, id), offered };
      }),
    async () => {
      const [booking] = await db().select().from(gearBookings).where(eq(gearBookings.id, id));
      const item = await db().query.gearItems.findFirst({ where: eq(gearItems.id, peek.itemId) });
      return timeTakenError(db(), item!, { start: booking.startsAt, end: booking.endsAt }, { exceptBookingId: id, forUserId: booking.borrowerId, now, timeZone });
    },
  );
}

function stepNote(step: BookingStepInput): string | null {
  if (step.action === "decline") return step.reason;
  if (step.action === "return") return step.damageNotes ?? null;
  return step.note ?? null;
}

/** The columns a step sets, after the checks that need the database. */
async function stepChanges(
  tx: Transaction,
  actor: Actor,
  item: GearItemRow,
  booking: GearBookingRow,
  step: BookingStepInput,
  { now, timeZone }: { now: Date; timeZone: string },
): Promise<Partial<typeof gearBookings.$inferInsert>> {
  switch (step.action) {
    case "approve": {
      if (item.retiredAt) throw conflict(`${item.labelCode} is retired and cannot be lent.`);
      const hold = { exceptBookingId: booking.id, forUserId: booking.borrowerId, now, timeZone };
      const wanted = { start: booking.startsAt, end: booking.endsAt };
      const held = await heldIntervals(tx, item.id, hold);
      if (!isFree(held, wanted)) throw timeTaken(item, held, wanted, hold.timeZone);
      return { decidedBy: actor.id, decidedAt: now };
    }
    case "decline":
      return { decidedBy: actor.id, decidedAt: now, declineReason: step.reason };
    case "hand-out": {
      const [stillOut] = await selectBookings(tx).where(and(eq(gearBookings.itemId, item.id), eq(gearBookings.state, "out")));
      if (stillOut) throw conflict(`${item.labelCode} is still out with ${stillOut.borrowerName}. Take it back first.`);
      const handedOutBy = step.handedOutBy ?? actor.id;
      if (step.handedOutBy) {
        const hander = await actorById(tx, step.handedOutBy).catch(() => null);
        if (!hander || !can(hander, "loans.manage")) throw badInput("handedOutBy", "Gear is handed out by a steward or a coordinator.");
      }
      await tx.update(gearItems).set({ condition: step.condition, updatedAt: now }).where(eq(gearItems.id, item.id));
      return { handedOutBy, handedOutAt: now, handOutCondition: step.condition };
    }
    case "return": {
      if (step.photoFileId) {
        const [photo] = await tx
          .select()
          .from(gearItemFiles)
          .where(and(eq(gearItemFiles.fileId, step.photoFileId), eq(gearItemFiles.bookingId, booking.id), eq(gearItemFiles.purpose, "return")));
        if (!photo) throw badInput("photoFileId", "That photo was not uploaded for this loan.");
      }
      await tx.update(gearItems).set({ condition: step.condition, updatedAt: now }).where(eq(gearItems.id, item.id));
      return { returnedAt: now, returnRecordedBy: actor.id, returnCondition: step.condition, damageNotes: step.damageNotes ?? null, returnPhotoId: step.photoFileId ?? null };
    }
    case "co-sign":
      return { coSignedBy: actor.id, coSignedAt: now };
    case "cancel":
    case "mark-lost":
      return {};
  }
}

/**
 * Lapses the item's expired offers and offers freed time to the next people in line.
 * Runs under the item's lock, inside every booking write and from settleLapsedOffers().
 */
async function settleOffersOf(tx: Transaction, item: GearItemRow, now: Date): Promise<OfferNotice[]> {
  const lapsed = await tx
    .update(gearWaitlist)
    .set({ state: "lapsed" })
    .where(and(eq(gearWaitlist.itemId, item.id), eq(gearWaitlist.state, "offered"), lte(gearWaitlist.offerExpiresAt, now)))
    .returning();
  for (let index = 0; index < lapsed.length; index++) {
    await recordHistory(tx, { itemId: item.id, actorId: null, event: "waitlist-lapsed", fromState: "offered", toState: "lapsed", note: "The offer was not taken up in time.", at: now });
  }
  const waiting = await tx.select().from(gearWaitlist).where(and(eq(gearWaitlist.itemId, item.id), eq(gearWaitlist.state, "waiting")));
  if (waiting.length === 0 || item.retiredAt) return [];
  const held = await heldIntervals(tx, item.id, { now });
  const { offer, stale } = pickOffers(
    waiting.map((entry) => ({ id: entry.id, start: entry.startsAt, end: entry.endsAt, createdAt: entry.createdAt })),
    held,
    now,
  );
  if (stale.length > 0) await tx.update(gearWaitlist).set({ state: "lapsed" }).where(inArray(gearWaitlist.id, stale));
  const notices: OfferNotice[] = [];
  for (const id of offer) {
    const entry = waiting.find((candidate) => candidate.id === id)!;
    const expiresAt = offerExpiry(now, entry.startsAt);
    await tx.update(gearWaitlist).set({ state: "offered", offeredAt: now, offerExpiresAt: expiresAt }).where(eq(gearWaitlist.id, id));
    const [person] = await tx.select({ name: users.name }).from(users).where(eq(users.id, entry.userId));
    await recordHistory(tx, {
      itemId: item.id,
      actorId: null,
      event: "waitlist-offered",
      fromState: "waiting",
      toState: "offered",
      note: `Offered to ${person?.name ?? "the next in line"}.`,
      at: now,
    });
    notices.push({
      waitlistId: id,
      userId: entry.userId,
      itemId: item.id,
      itemLabelCode: item.labelCode,
      itemName: item.name,
      startsAt: entry.startsAt.toISOString(),
      endsAt: entry.endsAt.toISOString(),
      expiresAt: expiresAt.toISOString(),
    });
  }
  await tellOffers(tx, notices);
  return notices;
}

/**
 * Lapses every expired offer and passes the time on. Pages that show offers call it first; a
 * scheduled job may call it too. Returns the new offers.
 */
export async function settleLapsedOffers(now = new Date()): Promise<OfferNotice[]> {
  const due = await db()
    .selectDistinct({ itemId: gearWaitlist.itemId })
    .from(gearWaitlist)
    .where(and(eq(gearWaitlist.state, "offered"), lte(gearWaitlist.offerExpiresAt, now)));
  const notices: OfferNotice[] = [];
  for (const { itemId } of due) {
    notices.push(...(await db().transaction(async (tx) => settleOffersOf(tx, await lockItem(tx, itemId), now))));
  }
  return notices;
}

export interface WaitlistEntryDto {
  id: string;
  itemId: string;
  itemLabelCode: string;
  itemName: string;
  userId: string;
  userName: string;
  startsAt: string;
  endsAt: string;
  state: "waiting" | "offered" | "accepted" | "lapsed" | "withdrawn";
  offerExpiresAt: string | null;
  createdAt: string;
}

function selectWaitlist(executor: Executor) {
  return executor
    .select({ entry: gearWaitlist, itemLabelCode: gearItems.labelCode, itemName: gearItems.name, userName: users.name })
    .from(gearWaitlist)
    .innerJoin(gearItems, eq(gearItems.id, gearWaitlist.itemId))
    .innerJoin(users, eq(users.id, gearWaitlist.userId));
}

function toWaitlistDto(row: Awaited<ReturnType<typeof selectWaitlist>>[number]): WaitlistEntryDto {
  const { entry } = row;
  return {
    id: entry.id,
    itemId: entry.itemId,
    itemLabelCode: row.itemLabelCode,
    itemName: row.itemName,
    userId: entry.userId,
    userName: row.userName,
    startsAt: entry.startsAt.toISOString(),
    endsAt: entry.endsAt.toISOString(),
    state: entry.state,
    offerExpiresAt: entry.offerExpiresAt?.toISOString() ?? null,
    createdAt: entry.createdAt.toISOString(),
  };
}

/** Joins the line for an item at a time it is booked; refused when the time is free (request it). */
export async function joinWaitlist(actor: Actor, input: { itemId: string; startsAt: string; endsAt: string }, now = new Date()): Promise<WaitlistEntryDto> {
  if (!can(actor, "loans.request")) throw forbidden();
  const { timeZone } = await getClubSettings();
  const wanted = await wantedInterval(input, timeZone, now);
  return db().transaction(async (tx) => {
    const item = await lockItem(tx, input.itemId);
    if (item.retiredAt) throw conflict(`${item.labelCode} is retired and cannot be booked.`);
    await settleOffersOf(tx, item, now);
    if (isFree(await heldIntervals(tx, item.id, { forUserId: actor.id, now }), wanted)) {
      throw conflict("The item is free at that time: request it instead of waiting.");
    }
    const [entry] = await tx
      .insert(gearWaitlist)
      .values({ itemId: item.id, userId: actor.id, startsAt: wanted.start, endsAt: wanted.end, createdAt: now })
      .returning()
      .catch((error: unknown) => {
        if (pgErrorCode(error) === pgErrorCodes.uniqueViolation) throw conflict("You are already on the waitlist for this item.");
        throw error;
      });
    await recordHistory(tx, { itemId: item.id, actorId: actor.id, event: "waitlist-joined", toState: "waiting", at: now });
    const [row] = await selectWaitlist(tx).where(eq(gearWaitlist.id, entry.id));
    return toWaitlistDto(row);
  });
}

export interface WaitlistStepResult {
  entry: WaitlistEntryDto;
  /** Set when an accepted offer became a booking. */
  booking?: BookingDto;
  outcome?: RequestOutcome;
  offered: OfferNotice[];
}

/** The person on the waitlist accepts their offer (it becomes a booking) or leaves the line. */
export async function stepWaitlist(actor: Actor, id: string, action: "accept" | "withdraw", now = new Date()): Promise<WaitlistStepResult> {
  if (!can(actor, "loans.request")) throw forbidden();
  const { timeZone } = await getClubSettings();
  const [peek] = await db().select().from(gearWaitlist).where(eq(gearWaitlist.id, id));
  if (!peek || peek.userId !== actor.id) throw notFound("That waitlist entry");
  return db().transaction(async (tx) => {
    const item = await lockItem(tx, peek.itemId);
    const offered = await settleOffersOf(tx, item, now);
    const [entry] = await tx.select().from(gearWaitlist).where(eq(gearWaitlist.id, id));
    let result: Pick<WaitlistStepResult, "booking" | "outcome"> = {};
    if (action === "withdraw") {
      if (entry.state !== "waiting" && entry.state !== "offered") throw conflict("This waitlist entry is already closed.");
      await tx.update(gearWaitlist).set({ state: "withdrawn" }).where(eq(gearWaitlist.id, id));
      await recordHistory(tx, { itemId: item.id, actorId: actor.id, event: "waitlist-withdrawn", fromState: entry.state, toState: "withdrawn", at: now });
      if (entry.state === "offered") offered.push(...(await settleOffersOf(tx, item, now)));
    } else {
      if (entry.state !== "offered") {
        throw conflict(entry.state === "lapsed" ? "The offer lapsed before it was accepted; the item went to the next in line." : "There is no open offer to accept.");
      }
      const { bookingId, outcome } = await createBooking(tx, {
        item,
        borrower: actor,
        wanted: { start: entry.startsAt, end: entry.endsAt },
        recordedBy: actor,
        note: "From the waitlist.",
        now,
        timeZone,
      });
      await tx.update(gearWaitlist).set({ state: "accepted", bookingId }).where(eq(gearWaitlist.id, id));
      await recordHistory(tx, { itemId: item.id, bookingId, actorId: actor.id, event: "waitlist-accepted", fromState: "offered", toState: "accepted", at: now });
      result = { booking: await bookingDto(tx, bookingId), outcome };
    }
    const [row] = await selectWaitlist(tx).where(eq(gearWaitlist.id, id));
    return { entry: toWaitlistDto(row), ...result, offered };
  });
}

export interface BookingPage {
  rows: BookingDto[];
  rowCount: number;
  page: number;
  pageSize: number;
}

const bookingSortColumns = {
  startsAt: gearBookings.startsAt,
  endsAt: gearBookings.endsAt,
  state: gearBookings.state,
  item: gearItems.labelCode,
  borrower: users.name,
  createdAt: gearBookings.createdAt,
} as const;

function bookingListWhere(actor: Actor, query: BookingListQuery): SQL | undefined {
  // Everyone but keepers sees only their own bookings in the loans table.
  const borrowerId = can(actor, "loans.viewAll") ? query.borrowerId : actor.id;
  return and(
    borrowerId ? eq(gearBookings.borrowerId, borrowerId) : undefined,
    query.state ? eq(gearBookings.state, query.state) : undefined,
    query.kind ? eq(gearItems.kind, query.kind) : undefined,
    query.itemId ? eq(gearBookings.itemId, query.itemId) : undefined,
    query.overdue === true ? and(eq(gearBookings.state, "out"), sql`${gearBookings.endsAt} <= now()`) : undefined,
    query.overdue === false ? or(ne(gearBookings.state, "out"), sql`${gearBookings.endsAt} > now()`) : undefined,
  );
}

export async function listBookings(actor: Actor, query: BookingListQuery): Promise<BookingPage> {
  if (!can(actor, "loans.request")) throw forbidden();
  const where = bookingListWhere(actor, query);
  const order = query.dir === "asc" ? asc : desc;
  const [{ total }] = await db()
    .select({ total: count() })
    .from(gearBookings)
    .innerJoin(gearItems, eq(gearItems.id, gearBookings.itemId))
    .innerJoin(users, eq(users.id, gearBookings.borrowerId))
    .where(where);
  const rows = await selectBookings(db())
    .where(where)
    .orderBy(order(bookingSortColumns[query.sort]), desc(gearBookings.createdAt))
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  const now = new Date();
  return { rows: rows.map((row) => toBookingDto(row, now)), rowCount: total, page: query.page, pageSize: query.pageSize };
}

const EXPORT_LIMIT = 10_000;

export async function exportBookingsCsv(actor: Actor, query: BookingListQuery): Promise<string> {
  if (!can(actor, "loans.request")) throw forbidden();
  const { timeZone } = await getClubSettings();
  const order = query.dir === "asc" ? asc : desc;
  const rows = await selectBookings(db()).where(bookingListWhere(actor, query)).orderBy(order(bookingSortColumns[query.sort])).limit(EXPORT_LIMIT);
  const now = new Date();
  return Papa.unparse(
    {
      fields: ["label_code", "item", "kind", "borrower", "starts_at", "ends_at", "time_zone", "state", "overdue", "handed_out_by", "returned_at", "return_condition", "damage_notes", "decline_reason"],
      data: rows.map((row) => {
        const dto = toBookingDto(row, now);
        return [
          dto.itemLabelCode,
          dto.itemName,
          gearKindLabels[dto.itemKind],
          dto.borrowerName,
          formatCsvTime(dto.startsAt, timeZone),
          formatCsvTime(dto.endsAt, timeZone),
          timeZone,
          dto.state,
          dto.overdue ? "yes" : "no",
          dto.handedOutByName ?? "",
          dto.returnedAt ? formatCsvTime(dto.returnedAt, timeZone) : "",
          dto.returnCondition ?? "",
          dto.damageNotes ?? "",
          dto.declineReason ?? "",
        ];
      }),
    },
    { escapeFormulae: true },
  );
}

/** "2026-06-13 09:00" on the club's wall clock: what a spreadsheet reads as a date and time. */
function formatCsvTime(iso: string, timeZone: string): string {
  const parts = new Intl.DateTimeFormat("en-CA", { timeZone, year: "numeric", month: "2-digit", day: "2-digit", hour: "2-digit", minute: "2-digit", hourCycle: "h23" }).formatToParts(new Date(iso));
  const part = (type: string) => parts.find((candidate) => candidate.type === type)?.value ?? "";
  return `${part("year")}-${part("month")}-${part("day")} ${part("hour")}:${part("minute")}`;
}

export async function getBooking(actor: Actor, id: string): Promise<BookingDto> {
  if (!can(actor, "loans.request")) throw forbidden();
  const [row] = await selectBookings(db()).where(eq(gearBookings.id, id));
  if (!row || !canSeeBooking(actor, { borrowerId: row.booking.borrowerId, awaitingCoSign: awaitsCoSign(row.booking) })) throw notFound("That booking");
  return toBookingDto(row);
}

/** The item's bookings still to come or open, for its page (who has it when is public in the club). */
export async function itemBookings(actor: Actor, itemId: string): Promise<BookingDto[]> {
  if (!can(actor, "gear.view")) throw forbidden();
  const rows = await selectBookings(db())
    .where(and(eq(gearBookings.itemId, itemId), or(inArray(gearBookings.state, ["out", "lost"]), and(inArray(gearBookings.state, ["requested", "approved"]), sql`${gearBookings.endsAt} > now()`))))
    .orderBy(asc(gearBookings.startsAt));
  return rows.map((row) => toBookingDto(row));
}

/** An antenna day's gear: the requests and loans tied to the day or its station slots that are still open. */
export async function antennaDayBookings(actor: Actor, dayId: string): Promise<BookingDto[]> {
  if (!can(actor, "loans.viewAll")) throw forbidden();
  const rows = await selectBookings(db())
    .where(and(eq(gearBookings.antennaDayId, dayId), inArray(gearBookings.state, ["requested", "approved", "out"])))
    .orderBy(asc(gearItems.kind), asc(gearItems.labelCode));
  return rows.map((row) => toBookingDto(row));
}

/** The items free for the whole time: nothing approved or out, and no one's open waitlist offer, holds any of it. */
export async function freeItemIds(itemIds: readonly string[], wanted: Interval, now = new Date()): Promise<Set<string>> {
  const free = await Promise.all(itemIds.map(async (id) => isFree(await heldIntervals(db(), id, { now }), wanted)));
  return new Set(itemIds.filter((_, index) => free[index]));
}

export async function itemWaitlist(actor: Actor, itemId: string): Promise<WaitlistEntryDto[]> {
  if (!can(actor, "gear.view")) throw forbidden();
  const rows = await selectWaitlist(db())
    .where(and(eq(gearWaitlist.itemId, itemId), inArray(gearWaitlist.state, ["waiting", "offered"])))
    .orderBy(asc(gearWaitlist.createdAt));
  return rows.map(toWaitlistDto);
}

export interface HistoryEntryDto {
  id: string;
  at: string;
  actorName: string | null;
  event: string;
  fromState: string | null;
  toState: string | null;
  note: string | null;
  condition: string | null;
  fileUrl: string | null;
  bookingId: string | null;
  borrowerName: string | null;
}

const borrowers = alias(users, "borrowers");

export async function itemHistory(actor: Actor, itemId: string): Promise<HistoryEntryDto[]> {
  if (!can(actor, "gear.view")) throw forbidden();
  const rows = await db()
    .select({ entry: gearHistory, actorName: users.name, borrowerName: borrowers.name, fileId: storedFiles.id })
    .from(gearHistory)
    .leftJoin(users, eq(users.id, gearHistory.actorId))
    .leftJoin(gearBookings, eq(gearBookings.id, gearHistory.bookingId))
    .leftJoin(borrowers, eq(borrowers.id, gearBookings.borrowerId))
    .leftJoin(storedFiles, eq(storedFiles.id, gearHistory.fileId))
    .where(eq(gearHistory.itemId, itemId))
    .orderBy(desc(gearHistory.at), desc(gearHistory.id));
  return rows.map(({ entry, actorName, borrowerName, fileId }) => ({
    id: entry.id,
    at: entry.at.toISOString(),
    actorName,
    event: entry.event,
    fromState: entry.fromState,
    toState: entry.toState,
    note: entry.note,
    condition: entry.condition,
    fileUrl: fileId ? itemFileUrl(itemId, fileId) : null,
    bookingId: entry.bookingId,
    borrowerName,
  }));
}

/** The lending desk's lists for one person: theirs, and the keepers' and mentors' queues. */
export interface LendingDesk {
  mine: BookingDto[];
  myWaitlist: WaitlistEntryDto[];
  toApprove: BookingDto[];
  toHandOut: BookingDto[];
  out: BookingDto[];
  overdue: BookingDto[];
  toCoSign: BookingDto[];
}

export async function lendingDesk(actor: Actor, now = new Date()): Promise<LendingDesk> {
  if (!can(actor, "loans.request")) throw forbidden();
  await settleLapsedOffers(now);
  const keeper = can(actor, "loans.manage");
  const mentor = canCoSignLoan(actor, "");
  const open = inArray(gearBookings.state, [...openStates]);
  const handOutBy = new Date(now.getTime() + HAND_OUT_LEAD_HOURS * 3_600_000);
  const [mine, myWaitlist, toApprove, toHandOut, out, toCoSign] = await Promise.all([
    selectBookings(db())
      .where(and(eq(gearBookings.borrowerId, actor.id), or(inArray(gearBookings.state, ["out", "lost"]), and(open, gt(gearBookings.endsAt, now)))))
      .orderBy(asc(gearBookings.startsAt)),
    selectWaitlist(db())
      .where(and(eq(gearWaitlist.userId, actor.id), inArray(gearWaitlist.state, ["waiting", "offered"])))
      .orderBy(asc(gearWaitlist.startsAt)),
    keeper
      ? selectBookings(db()).where(and(eq(gearBookings.state, "requested"), gt(gearBookings.endsAt, now))).orderBy(asc(gearBookings.createdAt))
      : [],
    keeper
      ? selectBookings(db())
          .where(and(eq(gearBookings.state, "approved"), lte(gearBookings.startsAt, handOutBy), gt(gearBookings.endsAt, now)))
          .orderBy(asc(gearBookings.startsAt))
      : [],
    keeper ? selectBookings(db()).where(eq(gearBookings.state, "out")).orderBy(asc(gearBookings.endsAt)) : [],
    mentor
      ? selectBookings(db())
          .where(and(eq(gearBookings.state, "requested"), eq(gearBookings.coSignRequired, true), sql`${gearBookings.coSignedBy} is null`, ne(gearBookings.borrowerId, actor.id), gt(gearBookings.endsAt, now)))
          .orderBy(asc(gearBookings.createdAt))
      : [],
  ]);
  const dto = (row: BookingJoin) => toBookingDto(row, now);
  const outDtos = out.map(dto);
  return {
    mine: mine.map(dto),
    myWaitlist: myWaitlist.map(toWaitlistDto),
    toApprove: toApprove.map(dto),
    toHandOut: toHandOut.map(dto),
    out: outDtos.filter((booking) => !booking.overdue),
    overdue: outDtos.filter((booking) => booking.overdue),
    toCoSign: toCoSign.map(dto),
  };
}

/** The steps this person may take on the booking now: what its state allows and the policy permits. */
export function stepsFor(actor: Actor, booking: BookingDto): BookingStepInput["action"][] {
  const facts = { state: booking.state, coSignRequired: booking.coSignRequired, coSigned: booking.coSigned };
  return allowedActions(facts).filter((action) => mayTakeStep(actor, booking.borrowerId, action));
}

/** Everyone who has booked something, for the loans table's borrower filter (keepers only). */
export async function listBorrowers(actor: Actor): Promise<{ id: string; name: string }[]> {
  if (!can(actor, "loans.viewAll")) throw forbidden();
  return db()
    .selectDistinct({ id: users.id, name: users.name })
    .from(users)
    .innerJoin(gearBookings, eq(gearBookings.borrowerId, users.id))
    .orderBy(asc(users.name));
}

/** The lending desk's part of the home page, overdue things first: your gear, the keepers' desk, co-signs. */
export async function lendingHomeSections(
  actor: Actor,
  timeZone: string,
  now = new Date(),
): Promise<{ heading: string; emptyText: string; things: { title: string; detail?: string; href: string }[] }[]> {
  if (!can(actor, "loans.request")) return [];
  const desk = await lendingDesk(actor, now);
  const when = (iso: string) => formatInZone(iso, timeZone);
  const sections = [];
  const mine = desk.mine.filter((booking) => booking.state === "out" && (booking.overdue || isDueSoon({ state: booking.state, endsAt: new Date(booking.endsAt) }, now)));
  sections.push({
    heading: "Your gear",
    emptyText: "Nothing you borrowed is due back in the next two days, and no waitlist offer waits for you.",
    things: [
      ...desk.myWaitlist
        .filter((entry) => entry.state === "offered")
        .map((entry) => ({ title: `${entry.itemLabelCode} ${entry.itemName} came free for you`, detail: `Accept by ${entry.offerExpiresAt ? when(entry.offerExpiresAt) : "soon"} or it goes to the next in line.`, href: "/lending" })),
      ...mine.map((booking) => ({
        title: `${booking.itemLabelCode} ${booking.itemName} ${booking.overdue ? "is overdue" : "is due back soon"}`,
        detail: `${booking.overdue ? "Was due" : "Due"} ${when(booking.endsAt)}.`,
        href: `/gear/${booking.itemId}`,
      })),
    ],
  });
  if (can(actor, "loans.manage")) {
    sections.push({
      heading: "The lending desk",
      emptyText: "No requests to approve and nothing overdue.",
      things: [
        ...desk.overdue.map((booking) => ({ title: `Overdue: ${booking.itemLabelCode} with ${booking.borrowerName}`, detail: `Was due ${when(booking.endsAt)}.`, href: `/gear/${booking.itemId}` })),
        ...desk.toApprove.map((booking) => ({
          title: `Approve or decline: ${booking.borrowerName} asks for ${booking.itemLabelCode}`,
          detail: `${formatRangeInZone(booking.startsAt, booking.endsAt, timeZone)}${booking.awaitingCoSign ? " · waits for a mentor's co-sign" : ""}`,
          href: "/lending",
        })),
      ],
    });
  }
  if (desk.toCoSign.length > 0) {
    sections.push({
      heading: "Newcomers waiting for a mentor",
      emptyText: "",
      things: desk.toCoSign.map((booking) => ({ title: `Co-sign ${booking.borrowerName}'s request for ${booking.itemLabelCode}`, detail: formatRangeInZone(booking.startsAt, booking.endsAt, timeZone), href: `/gear/${booking.itemId}` })),
    });
  }
  return sections;
}
