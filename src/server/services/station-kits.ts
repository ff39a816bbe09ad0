// Station kits and the lending desk meeting antenna days.
//
// - For an antenna day, a coordinator or a steward books each station slot's kit in one place:
//   Guyline suggests the coax runs on the shelf that suit the slot's feedline run and are free
//   for the day, each with the loss and SWR at the radio the engine computes for that actual run
//   at the slot's bands, and a mast, a balun or unun and an analyser that suit it. One call books
//   an item for the slot, approved at once (bookForStation); a coax run booked this way becomes
//   the slot's feedline (one per slot, by a unique index), and the slot's plan uses it from then on.
// - Members ask for an item for an upcoming antenna day (and optionally a station slot) instead
//   of typing times: the booking runs from the day's start to its end and names the day.
import { and, inArray, isNull } from "drizzle-orm";
import { bandByName, type ItuRegion } from "@/lib/antenna/bands";
import { planModel } from "@/lib/antenna/plan";
import { planRequestSchema } from "@/lib/antenna/plan-schema";
import { EngineInputError } from "@/lib/antenna/problems";
import { isEditable } from "@/lib/antenna-days/status";
import type { BookedFeedline } from "@/lib/station-kits/booked-feedline";
import { isKitKind, KIT_KINDS, kitProblem, longestSensibleRunM, suggestKit, type KitKind, type KitNeed } from "@/lib/station-kits/kit-rules";
import { runFigures, withFeedline, type RunFigures } from "@/lib/station-kits/run-figures";
import { db } from "@/server/db";
import { antennaDays, gearItems, stationSlots } from "@/server/db/schema";
import { runPlan } from "@/server/engine/run";
import { badInput, conflict, forbidden, pgConstraint, pgErrorCode, pgErrorCodes } from "@/server/errors";
import { can, type Actor } from "@/server/policy";
import { findVisibleDay, getDay, listDays, type DayDto } from "@/server/services/antenna-days";
import { getItem, toItemDto, type GearItemDto } from "@/server/services/gear";
import { antennaDayBookings, bookForStation, freeItemIds, requestBooking, type BookingDto, type RequestResult } from "@/server/services/lending";
import { bookedFeedlines, getSlot, getSlotWithContext, listSlots, type SlotContext, type SlotDto } from "@/server/services/station-slots";
import type { DayBookingRequestInput } from "@/validations/station-kits";

export interface SlotKitNeed extends KitNeed {
  /** The longest coax run worth carrying for the slot. */
  longestRunM: number;
}

export interface CoaxCandidate {
  item: GearItemDto;
  /** The engine's plan of the slot computed with this run. */
  figures: RunFigures;
}

export interface SlotKit {
  slotId: string;
  dayId: string;
  slotName: string;
  need: SlotKitNeed;
  /** Kit is booked while the day is a draft or published and has not ended. */
  bookable: boolean;
  notBookableReason: string | null;
  /** The slot's open requests and loans (requested, approved, out). */
  booked: BookingDto[];
  /** The run the slot's plan uses now (the booked feedline, or the slot's own run) and what the engine makes of it. */
  current: { feedline: BookedFeedline | null; figures: RunFigures };
  /** Suggestions, best first, for the kinds the slot has not booked yet. */
  coax: CoaxCandidate[];
  mast: GearItemDto[];
  balun: GearItemDto[];
  analyser: GearItemDto[];
}

function requireKeeper(actor: Actor): void {
  if (!can(actor, "loans.manage")) throw forbidden("Station kits are booked by stewards and coordinators.");
}

function bookableProblem(day: Pick<DayDto, "status" | "endsAt">, now: Date): string | null {
  if (!isEditable(day.status)) return `This antenna day is ${day.status}: its kit is no longer booked.`;
  if (new Date(day.endsAt) <= now) return "This antenna day is over: its kit is no longer booked.";
  return null;
}

/** The engine's problem with the slot's plan, said as a conflict to fix on the plan screen. */
function planConflict(error: unknown): never {
  if (error instanceof EngineInputError) {
    throw conflict(`The slot's antenna plan cannot be computed (${error.problems.join("; ")}). Fix it on the plan screen first.`);
  }
  throw error;
}

/** What the slot needs from the shelf: its own feedline run and line, its bands, its mast, its balun or unun. */
function slotNeed({ slot, planRequest, region }: Pick<SlotContext, "slot" | "planRequest" | "region">): SlotKitNeed {
  let transformer: KitNeed["transformer"];
  try {
    transformer = planModel(planRequestSchema.parse(planRequest)).transformer;
  } catch (error) {
    planConflict(error);
  }
  const bands = slot.bands.flatMap((name) => bandByName(name, region as ItuRegion) ?? []);
  const runM = slot.feedlineRun.lengthM;
  return {
    runM,
    longestRunM: longestSensibleRunM(runM),
    plannedLine: slot.planParams.feedlineType,
    lowMHz: Math.min(...bands.map((band) => band.lowMHz)),
    topMHz: Math.max(...bands.map((band) => band.highMHz)),
    mastHeightM: slot.summary.mastHeightM,
    transformer,
    powerW: slot.powerW,
  };
}

/** Items of the kinds a station kit is made of, still on the shelf. */
async function kitShelf(): Promise<GearItemDto[]> {
  const rows = await db()
    .select()
    .from(gearItems)
    .where(and(inArray(gearItems.kind, [...KIT_KINDS]), isNull(gearItems.retiredAt)));
  return rows.map(toItemDto);
}

/** The slot's kit: what is booked, the run its plan uses, and what the shelf has that suits it, computed by the engine. */
export async function slotKit(actor: Actor, slotId: string, now = new Date()): Promise<SlotKit> {
  requireKeeper(actor);
  const context = await getSlotWithContext(actor, slotId);
  const { slot, day } = context;
  const need = slotNeed(context);
  const [dayBookings, feedlines] = await Promise.all([antennaDayBookings(actor, day.id), bookedFeedlines([slot.id])]);
  const booked = dayBookings.filter((booking) => booking.stationSlotId === slot.id);
  const feedline = feedlines.get(slot.id) ?? null;
  const notBookableReason = bookableProblem(day, now);

  let suggestions: Record<KitKind, GearItemDto[]> = { coax: [], mast: [], balun: [], analyser: [] };
  if (!notBookableReason) {
    const fitting = (await kitShelf()).filter((item) => kitProblem(item, need) === null);
    const free = await freeItemIds(
      fitting.map((item) => item.id),
      { start: new Date(day.startsAt), end: new Date(day.endsAt) },
      now,
    );
    suggestions = suggestKit(
      fitting.filter((item) => free.has(item.id)),
      need,
    );
    // A kind the slot already has is not offered again; a coax run only while it has no feedline.
    const bookedKinds = new Set(booked.map((booking) => booking.itemKind));
    for (const kind of KIT_KINDS) {
      if (kind === "coax" ? feedline !== null : bookedKinds.has(kind)) suggestions[kind] = [];
    }
  }

  // The run in use and every candidate run, computed at once in the engine's worker pool.
  const currentRequest = feedline ? withFeedline(context.planRequest, { type: feedline.cableType, lengthM: feedline.lengthM }) : context.planRequest;
  const requests = [currentRequest, ...suggestions.coax.map((item) => withFeedline(context.planRequest, { type: item.cableType!, lengthM: item.lengthM! }))];
  const [current, ...candidates] = await Promise.all(requests.map((request) => runPlan(request))).catch(planConflict);

  return {
    slotId: slot.id,
    dayId: day.id,
    slotName: slot.name,
    need,
    bookable: notBookableReason === null,
    notBookableReason,
    booked,
    current: { feedline, figures: runFigures(current) },
    coax: suggestions.coax.map((item, index) => ({ item, figures: runFigures(candidates[index]) })),
    mast: suggestions.mast,
    balun: suggestions.balun,
    analyser: suggestions.analyser,
  };
}

/**
 * Books an item for the slot for the whole day, approved at once, with the keeper as borrower.
 * A coax run becomes the slot's feedline. Items of the kit kinds must suit the slot; a clash with
 * another booking is refused with the next free time.
 */
export async function bookKit(actor: Actor, slotId: string, input: { itemId: string }, now = new Date()): Promise<RequestResult> {
  requireKeeper(actor);
  const context = await getSlotWithContext(actor, slotId);
  const { slot, day } = context;
  const problem = bookableProblem(day, now);
  if (problem) throw conflict(problem);
  const item = await getItem(actor, input.itemId);
  if (isKitKind(item.kind)) {
    const unsuitable = kitProblem(item, slotNeed(context));
    if (unsuitable) throw badInput("itemId", unsuitable);
  }
  try {
    return await bookForStation(
      actor,
      {
        itemId: item.id,
        startsAt: day.startsAt,
        endsAt: day.endsAt,
        note: `Station kit for ${slot.name}.`,
        antennaDayId: day.id,
        stationSlotId: slot.id,
        slotFeedline: item.kind === "coax",
      },
      now,
    );
  } catch (error) {
    if (pgErrorCode(error) === pgErrorCodes.uniqueViolation && pgConstraint(error) === "gear_bookings_one_feedline_per_slot") {
      const current = (await bookedFeedlines([slot.id])).get(slot.id);
      throw conflict(`${slot.name} already has a coax run booked as its feedline${current ? ` (${current.labelCode})` : ""}. Cancel that booking first to book another run.`);
    }
    throw error;
  }
}

export interface DayKitSlot {
  slot: SlotDto;
  booked: BookingDto[];
  feedline: BookedFeedline | null;
}

export interface DayKit {
  day: DayDto;
  slots: DayKitSlot[];
  /** Requests and loans for the day that name no slot. */
  wholeDay: BookingDto[];
  notBookableReason: string | null;
}

/** What each slot of the day has booked, for the kit page (the engine's suggestions load per slot). */
export async function dayKit(actor: Actor, dayId: string, now = new Date()): Promise<DayKit> {
  requireKeeper(actor);
  const day = await getDay(actor, dayId);
  const [slots, bookings] = await Promise.all([listSlots(actor, day.id), antennaDayBookings(actor, day.id)]);
  const feedlines = await bookedFeedlines(slots.map((slot) => slot.id));
  return {
    day,
    slots: slots.map((slot) => ({ slot, booked: bookings.filter((booking) => booking.stationSlotId === slot.id), feedline: feedlines.get(slot.id) ?? null })),
    wholeDay: bookings.filter((booking) => booking.stationSlotId === null),
    notBookableReason: bookableProblem(day, now),
  };
}

export interface DayChoice {
  id: string;
  title: string;
  startsAt: string;
  endsAt: string;
  slots: { id: string; name: string }[];
}

/** Published antenna days still to come, with their slots: what a request can be tied to. */
export async function upcomingDayChoices(actor: Actor, now = new Date()): Promise<DayChoice[]> {
  const days = (await listDays(actor, { from: now })).filter((day) => day.status === "published" && new Date(day.endsAt) > now);
  return Promise.all(
    days.map(async (day) => ({
      id: day.id,
      title: day.title,
      startsAt: day.startsAt,
      endsAt: day.endsAt,
      slots: (await listSlots(actor, day.id)).map((slot) => ({ id: slot.id, name: slot.name })),
    })),
  );
}

/** A request for an item for an antenna day (and optionally one of its slots): from the day's start to its end. */
export async function requestForAntennaDay(actor: Actor, input: DayBookingRequestInput, now = new Date()): Promise<RequestResult> {
  const day = await findVisibleDay(actor, input.antennaDayId);
  if (!isEditable(day.status)) throw conflict(`That antenna day is ${day.status}; ask for a time instead.`);
  if (input.stationSlotId) {
    const slot = await getSlot(actor, input.stationSlotId);
    if (slot.dayId !== day.id) throw badInput("stationSlotId", "That station slot belongs to another antenna day.");
  }
  return requestBooking(
    actor,
    {
      itemId: input.itemId,
      startsAt: day.startsAt.toISOString(),
      endsAt: day.endsAt.toISOString(),
      note: input.note,
      antennaDayId: day.id,
      stationSlotId: input.stationSlotId,
    },
    now,
  );
}

/** "Spring antenna day · Forty metres" for each booking tied to an antenna day, by booking id. */
export async function antennaDayLabels(bookings: readonly Pick<BookingDto, "id" | "antennaDayId" | "stationSlotId">[]): Promise<Map<string, string>> {
  const dayIds = [...new Set(bookings.flatMap((booking) => booking.antennaDayId ?? []))];
  if (dayIds.length === 0) return new Map();
  const slotIds = [...new Set(bookings.flatMap((booking) => booking.stationSlotId ?? []))];
  const [days, slots] = await Promise.all([
    db().select({ id: antennaDays.id, title: antennaDays.title }).from(antennaDays).where(inArray(antennaDays.id, dayIds)),
    slotIds.length > 0 ? db().select({ id: stationSlots.id, name: stationSlots.name }).from(stationSlots).where(inArray(stationSlots.id, slotIds)) : [],
  ]);
  const dayTitle = new Map(days.map((day) => [day.id, day.title]));
  const slotName = new Map(slots.map((slot) => [slot.id, slot.name]));
  const labels = new Map<string, string>();
  for (const booking of bookings) {
    const title = booking.antennaDayId ? dayTitle.get(booking.antennaDayId) : undefined;
    if (!title) continue;
    const slot = booking.stationSlotId ? slotName.get(booking.stationSlotId) : undefined;
    labels.set(booking.id, slot ? `${title} · ${slot}` : title);
  }
  return labels;
}
