// Station slots: one station's place on the site plan, its bands, power and mode, its antenna
// plan and its feedline run. The plan is stored as the plan's own parameters and checked with
// the engine's schema in the context of the slot and its site; a small summary of the computed
// antenna (outline, exposure distance, fall zone) is kept on the slot for the site plan.
import { and, asc, desc, eq, inArray, sql } from "drizzle-orm";
import { bandByName, type ItuRegion } from "@/lib/antenna/bands";
import { EngineInputError, formatPath } from "@/lib/antenna/problems";
import { planRequestSchema, type PlanRequest, type PlanRequestInput } from "@/lib/antenna/plan-schema";
import { antennaSummaryOf } from "@/lib/antenna-days/antenna-outline";
import { feedlineRun, planRequestForSlot, slotFieldOfPlanPath, slotPlanParamsOf, type FeedlineRun, type SlotMode, type SlotPlanParams, type SlotPlanParamsInput } from "@/lib/antenna-days/slot-plan";
import { isEditable } from "@/lib/antenna-days/status";
import type { AntennaSummary } from "@/lib/site-plan/footprint";
import type { BookedFeedline } from "@/lib/station-kits/booked-feedline";
import { withFeedline } from "@/lib/station-kits/run-figures";
import type { BandRange } from "@/lib/site-plan/checks";
import { db, type Executor } from "@/server/db";
import { gearBookings, gearItems, shifts, sites, stationSlots, type AntennaDayRow, type SiteRow, type StationSlotRow } from "@/server/db/schema";
import { runPlan } from "@/server/engine/run";
import { badInput, notFound, pgErrorCode, pgErrorCodes } from "@/server/errors";
import { can, type Actor } from "@/server/policy";
import { getClubSettings } from "@/server/services/accounts";
import { tellSignUpsRemoved } from "@/server/services/antenna-day-messages";
import { findEditableDay, findVisibleDay, getDay, type DayDto } from "@/server/services/antenna-days";
import { listShifts, type ShiftDto } from "@/server/services/shifts";
import { toSiteDto, type SiteDto } from "@/server/services/sites";
import type { SlotInput, SlotPatch } from "@/validations/antenna-days";

export interface SlotDto {
  id: string;
  dayId: string;
  name: string;
  bands: string[];
  powerW: number;
  mode: SlotMode;
  planParams: SlotPlanParams;
  libraryPlanId: string | null;
  x: number;
  y: number;
  azimuthDeg: number;
  tentX: number;
  tentY: number;
  feedlineRunOverrideM: number | null;
  feedlineRun: FeedlineRun;
  summary: AntennaSummary;
  updatedAt: string;
}

export function toSlotDto(row: StationSlotRow): SlotDto {
  return {
    id: row.id,
    dayId: row.dayId,
    name: row.name,
    bands: row.bands,
    powerW: row.powerW,
    mode: row.mode,
    planParams: row.planParams,
    libraryPlanId: row.libraryPlanId,
    x: row.x,
    y: row.y,
    azimuthDeg: row.azimuthDeg,
    tentX: row.tentX,
    tentY: row.tentY,
    feedlineRunOverrideM: row.feedlineRunOverrideM,
    feedlineRun: feedlineRun({ position: [row.x, row.y], tent: [row.tentX, row.tentY], feedHeightM: row.planParams.heightM, overrideM: row.feedlineRunOverrideM }),
    summary: row.summary,
    updatedAt: row.updatedAt.toISOString(),
  };
}

type SlotFields = Omit<SlotInput, "planParams"> & { planParams: SlotPlanParamsInput; libraryPlanId: string | null };

/** The slot's bands in the club's region, by their canonical names, lowest first; unknown ones refused. */
function bandRanges(names: readonly string[], region: ItuRegion): BandRange[] {
  const ranges = names.map((name) => {
    const band = bandByName(name, region);
    if (!band) throw badInput("bands", `“${name}” is not an amateur band in ITU Region ${region}.`);
    return { name: band.name, lowMHz: band.lowMHz, highMHz: band.highMHz };
  });
  return [...new Map(ranges.map((band) => [band.name, band])).values()].sort((a, b) => a.lowMHz - b.lowMHz);
}

function checkOnSite(fields: Pick<SlotFields, "x" | "y" | "tentX" | "tentY">, site: SiteRow): void {
  const inside = (x: number, y: number) => x >= 0 && x <= site.widthM && y >= 0 && y <= site.depthM;
  const bounds = `0–${site.widthM} m east and 0–${site.depthM} m north`;
  if (!inside(fields.x, fields.y)) throw badInput(fields.x < 0 || fields.x > site.widthM ? "x" : "y", `Place the mast on the site (${bounds}).`);
  if (!inside(fields.tentX, fields.tentY)) throw badInput(fields.tentX < 0 || fields.tentX > site.widthM ? "tentX" : "tentY", `Place the operating tent on the site (${bounds}).`);
}

/** The engine's problems ("heightM: must be ...") as a bad-input error on the slot's own field. */
function planProblem(path: string, message: string) {
  return badInput(slotFieldOfPlanPath(path), message);
}

type SlotPlanFields = Pick<SlotFields, "bands" | "powerW" | "mode" | "planParams" | "x" | "y" | "tentX" | "tentY" | "feedlineRunOverrideM">;

/** The engine's full request for a slot's antenna at its place on the site (as the slot itself stores it). */
function slotPlanRequestOf(slot: SlotPlanFields, site: SiteRow, region: ItuRegion): PlanRequestInput {
  return planRequestForSlot(
    { bands: slot.bands, powerW: slot.powerW, mode: slot.mode, planParams: slot.planParams, position: [slot.x, slot.y], tent: [slot.tentX, slot.tentY], feedlineRunOverrideM: slot.feedlineRunOverrideM },
    site,
    region,
  );
}

/** Validates the slot's plan with the engine's schema; the request and the stored form of the parameters. */
function validatePlan(fields: SlotFields, site: SiteRow, region: ItuRegion): { request: PlanRequest; planParams: SlotPlanParams } {
  const input = slotPlanRequestOf(fields, site, region);
  const parsed = planRequestSchema.safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw planProblem(formatPath(issue.path, ""), issue.message);
  }
  return { request: parsed.data, planParams: slotPlanParamsOf(parsed.data) };
}

/** Runs the engine off the request's event loop and keeps what the site plan needs. */
async function computeSummary(request: PlanRequest, fields: Pick<SlotFields, "bands" | "powerW" | "mode">, region: ItuRegion): Promise<AntennaSummary> {
  try {
    const result = await runPlan(request);
    return antennaSummaryOf(result, { bands: bandRanges(fields.bands, region), powerW: fields.powerW, mode: fields.mode });
  } catch (error) {
    if (error instanceof EngineInputError) {
      const [first] = error.problems;
      const split = first.indexOf(": ");
      throw split > 0 ? planProblem(first.slice(0, split), first.slice(split + 2)) : badInput("planParams", first);
    }
    throw error;
  }
}

async function siteOf(executor: Executor, day: AntennaDayRow): Promise<SiteRow> {
  const site = await executor.query.sites.findFirst({ where: eq(sites.id, day.siteId) });
  if (!site) throw notFound("The day's site");
  return site;
}

async function findSlotRow(executor: Executor, slotId: string, lock = false): Promise<StationSlotRow> {
  const query = executor.select().from(stationSlots).where(eq(stationSlots.id, slotId));
  const [row] = lock ? await query.for("update") : await query;
  if (!row) throw notFound("That station slot");
  return row;
}

function uniqueName<T>(write: () => Promise<T>): Promise<T> {
  return write().catch((error: unknown) => {
    if (pgErrorCode(error) === pgErrorCodes.uniqueViolation) throw badInput("name", "Another station slot of this day has this name.");
    throw error;
  });
}

export async function listSlots(actor: Actor, dayId: string): Promise<SlotDto[]> {
  await findVisibleDay(actor, dayId);
  const rows = await db().select().from(stationSlots).where(eq(stationSlots.dayId, dayId)).orderBy(asc(stationSlots.name));
  return rows.map(toSlotDto);
}

export async function getSlot(actor: Actor, slotId: string): Promise<SlotDto> {
  const row = await findSlotRow(db(), slotId);
  await findVisibleDay(actor, row.dayId);
  return toSlotDto(row);
}

/** Canonical band names (lowest first) for storing, after checking them in the region. */
const canonicalBands = (names: readonly string[], region: ItuRegion) => bandRanges(names, region).map((band) => band.name);

export async function createSlot(actor: Actor, dayId: string, input: SlotInput & { libraryPlanId?: string | null }): Promise<SlotDto> {
  const { ituRegion } = await getClubSettings();
  const region = ituRegion as ItuRegion;
  const day = await findEditableDay(actor, dayId);
  const site = await siteOf(db(), day);
  const fields: SlotFields = { ...input, bands: canonicalBands(input.bands, region), planParams: input.planParams as SlotPlanParamsInput, libraryPlanId: input.libraryPlanId ?? null };
  checkOnSite(fields, site);
  const { request, planParams } = validatePlan(fields, site, region);
  const summary = await computeSummary(request, fields, region);
  const [row] = await uniqueName(() =>
    db().transaction(async (tx) => {
      await findEditableDay(actor, dayId, tx, true);
      return tx.insert(stationSlots).values({ ...fields, planParams, summary, dayId }).returning();
    }),
  );
  return toSlotDto(row);
}

/** Changes a slot; the antenna is recomputed only when what shapes it changed (plan, bands, power, mode). */
export async function updateSlot(actor: Actor, slotId: string, patch: SlotPatch & { libraryPlanId?: string | null }): Promise<SlotDto> {
  const { ituRegion } = await getClubSettings();
  const region = ituRegion as ItuRegion;
  const current = await findSlotRow(db(), slotId);
  const day = await findEditableDay(actor, current.dayId);
  const site = await siteOf(db(), day);
  const fields: SlotFields = {
    name: patch.name ?? current.name,
    bands: canonicalBands(patch.bands ?? current.bands, region),
    powerW: patch.powerW ?? current.powerW,
    mode: patch.mode ?? current.mode,
    planParams: (patch.planParams as SlotPlanParamsInput | undefined) ?? current.planParams,
    libraryPlanId: patch.libraryPlanId !== undefined ? patch.libraryPlanId : patch.planParams ? null : current.libraryPlanId,
    x: patch.x ?? current.x,
    y: patch.y ?? current.y,
    azimuthDeg: patch.azimuthDeg ?? current.azimuthDeg,
    tentX: patch.tentX ?? current.tentX,
    tentY: patch.tentY ?? current.tentY,
    feedlineRunOverrideM: patch.feedlineRunOverrideM !== undefined ? patch.feedlineRunOverrideM : current.feedlineRunOverrideM,
  };
  checkOnSite(fields, site);
  const { request, planParams } = validatePlan(fields, site, region);
  const reshaped = patch.planParams !== undefined || patch.bands !== undefined || patch.powerW !== undefined || patch.mode !== undefined;
  const summary = reshaped ? await computeSummary(request, fields, region) : current.summary;
  const [row] = await uniqueName(() =>
    db().transaction(async (tx) => {
      await findEditableDay(actor, current.dayId, tx, true);
      return tx
        .update(stationSlots)
        .set({ ...fields, planParams, summary, updatedAt: new Date() })
        .where(eq(stationSlots.id, slotId))
        .returning();
    }),
  );
  if (!row) throw notFound("That station slot");
  return toSlotDto(row);
}

export async function deleteSlot(actor: Actor, slotId: string): Promise<void> {
  const current = await findSlotRow(db(), slotId);
  await db().transaction(async (tx) => {
    await findEditableDay(actor, current.dayId, tx, true);
    // Its shifts go with it: tell the people signed up for them.
    await tellSignUpsRemoved(tx, eq(shifts.slotId, slotId));
    await tx.delete(stationSlots).where(eq(stationSlots.id, slotId));
  });
}

export interface SlotContext {
  slot: SlotDto;
  day: DayDto;
  site: SiteDto;
  region: ItuRegion;
  /** The engine's full plan request for the slot as it stands. */
  planRequest: PlanRequestInput;
  /** The slot's shifts with the people signed up. */
  shifts: ShiftDto[];
  /** The person may change the slot and save a plan into it (a coordinator, while the day is editable). */
  canEdit: boolean;
}

/** Everything the plan screen and the station sheet need about a slot. */
export async function getSlotWithContext(actor: Actor, slotId: string): Promise<SlotContext> {
  const slot = await getSlot(actor, slotId);
  const [day, { ituRegion }, shifts] = await Promise.all([getDay(actor, slot.dayId), getClubSettings(), listShifts(actor, slotId)]);
  const region = ituRegion as ItuRegion;
  const siteRow = await db().query.sites.findFirst({ where: eq(sites.id, day.site.id) });
  if (!siteRow) throw notFound("The day's site");
  const planRequest = slotPlanRequestOf(slot, siteRow, region);
  return { slot, day, site: toSiteDto(siteRow), region, planRequest, shifts, canEdit: can(actor, "antennaDays.manage") && isEditable(day.status) };
}

/** Saves a plan into the slot (from the plan screen or the plan library) and refreshes its summary. */
export async function saveSlotPlan(actor: Actor, slotId: string, planParams: SlotPlanParamsInput, libraryPlanId: string | null): Promise<SlotDto> {
  return updateSlot(actor, slotId, { planParams, libraryPlanId });
}

/**
 * The coax runs booked as these slots' feedlines (station kits), by slot. A run approved or out
 * comes first; after the day, a returned (or lost) run still names what the station used.
 */
export async function bookedFeedlines(slotIds: readonly string[], executor: Executor = db()): Promise<Map<string, BookedFeedline>> {
  if (slotIds.length === 0) return new Map();
  const rows = await executor
    .select({
      slotId: gearBookings.stationSlotId,
      bookingId: gearBookings.id,
      itemId: gearItems.id,
      labelCode: gearItems.labelCode,
      name: gearItems.name,
      cableType: gearItems.cableType,
      lengthM: gearItems.lengthM,
    })
    .from(gearBookings)
    .innerJoin(gearItems, eq(gearItems.id, gearBookings.itemId))
    .where(and(inArray(gearBookings.stationSlotId, [...slotIds]), eq(gearBookings.slotFeedline, true), inArray(gearBookings.state, ["approved", "out", "returned", "lost"])))
    .orderBy(desc(sql`${gearBookings.state} in ('approved', 'out')`), desc(gearBookings.createdAt));
  const feedlines = new Map<string, BookedFeedline>();
  for (const { slotId, cableType, lengthM, ...run } of rows) {
    // Coax runs always have a cable type and a length (gear_items_coax_details).
    if (slotId && !feedlines.has(slotId)) feedlines.set(slotId, { ...run, cableType: cableType!, lengthM: lengthM! });
  }
  return feedlines;
}

export interface SlotFeedlineContext extends SlotContext {
  /** The coax run booked as the slot's feedline, if any; `planRequest` is computed with it. */
  feedline: BookedFeedline | null;
}

/**
 * The slot's context with its effective feedline: the booked coax run (its cable type and
 * length) if there is one, else the run the slot computes or the coordinator's override.
 */
export async function getSlotWithFeedline(actor: Actor, slotId: string): Promise<SlotFeedlineContext> {
  const context = await getSlotWithContext(actor, slotId);
  return { ...context, ...(await withBookedFeedline(slotId, context.planRequest)) };
}

/** The request with the coax run booked as the slot's feedline, when there is one. */
async function withBookedFeedline(slotId: string, request: PlanRequestInput): Promise<{ planRequest: PlanRequestInput; feedline: BookedFeedline | null }> {
  const feedline = (await bookedFeedlines([slotId])).get(slotId) ?? null;
  return { planRequest: feedline ? withFeedline(request, { type: feedline.cableType, lengthM: feedline.lengthM }) : request, feedline };
}

export interface SlotPlanRequest {
  dayId: string;
  /** The engine's full request for the slot, with the booked coax run as its feedline when there is one. */
  planRequest: PlanRequestInput;
  feedline: BookedFeedline | null;
}

/**
 * The slot's plan request with its booked feedline, as `getSlotWithFeedline` computes it, without
 * the day, site and shifts the pages need (for comparing the slot with a measurement). Throws 404
 * for a slot the person may not see.
 */
export async function slotPlanRequest(actor: Actor, slotId: string): Promise<SlotPlanRequest> {
  const slot = await findSlotRow(db(), slotId);
  const day = await findVisibleDay(actor, slot.dayId);
  const [site, { ituRegion }] = await Promise.all([siteOf(db(), day), getClubSettings()]);
  return { dayId: day.id, ...(await withBookedFeedline(slotId, slotPlanRequestOf(slot, site, ituRegion as ItuRegion))) };
}
