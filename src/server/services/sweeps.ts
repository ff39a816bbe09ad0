// Measured sweeps: a member uploads an analyser's export for a station slot (or for a plan in
// the plan library); Guyline reads it, compares it with the plan (the engine's prediction and
// the feedline between), works out the trim, and keeps the file, the points and the comparison.
// The plan library learns the measured offsets of the antennas built from a plan.
//
// Who may upload to a slot (canUploadSweep): coordinators always; members and stewards who
// take part in the slot's antenna day, which means any of: signed up for a shift of any slot
// of that day, the day's safety lead, or holding gear booked for that day (approved, out or
// returned). Newcomers cannot upload. Any confirmed member and up may upload to a library plan.
import { and, asc, desc, eq, inArray, isNull, or, sql } from "drizzle-orm";
import { timeInputToInstant } from "@/lib/lending/time-input";
import { instantToWallTime } from "@/lib/time";
import { TRANSFORMERS, feedlineType } from "@/lib/antenna/feedline-types";
import { planModel, significant, type PlanResult } from "@/lib/antenna/plan";
import { planRequestSchema, type PlanRequest } from "@/lib/antenna/plan-schema";
import { EngineInputError } from "@/lib/antenna/problems";
import { analysisOf, compareSweep, trimRequestOf, type BandComparison, type SweepAnalysis, type TrimOutcome } from "@/lib/sweeps/analysis";
import { chainOf, sweepViews, type SweepPlace, type SweepViews } from "@/lib/sweeps/feed-point";
import { meanOffsets, nextCut, type BandOffset, type NextCut } from "@/lib/sweeps/next-cut";
import { problemText, readSweepFile, type MeasuredPoint, type SweepColumn, type SweepMapping, type SweepQuantity } from "@/lib/sweeps/parse";
import type { Problem } from "@/server/api";
import { db, type Executor } from "@/server/db";
import {
  antennaDays,
  antennaPlans,
  gearBookings,
  gearItems,
  measuredSweeps,
  shiftSignups,
  shifts,
  stationSlots,
  storedFiles,
  users,
  type MeasuredSweepRow,
} from "@/server/db/schema";
import { runPlan, runTrim } from "@/server/engine/run";
import { PublicError, badInput, forbidden, notFound } from "@/server/errors";
import { can, canDeleteSweep, canUploadSweep, type Actor } from "@/server/policy";
import { getClubSettings } from "@/server/services/accounts";
import { visibleStatuses } from "@/server/services/antenna-days";
import { slotPlanRequest } from "@/server/services/station-slots";
import { storeFile, uploadRules } from "@/server/storage/files";
import type { SweepUploadFields } from "@/validations/sweeps";

export type SweepTarget = { kind: "slot"; id: string } | { kind: "plan"; id: string };

export interface SweepSummaryDto {
  id: string;
  slotId: string | null;
  libraryPlanId: string | null;
  measuredAt: string;
  uploadedBy: { id: string; name: string } | null;
  place: SweepPlace;
  quantity: SweepQuantity;
  analyser: { id: string; labelCode: string; name: string } | null;
  fileName: string;
  /** The raw file as uploaded. */
  fileUrl: string;
  pointCount: number;
  minMHz: number;
  maxMHz: number;
  note: string;
  createdAt: string;
  bands: { band: string; measuredMHz: number | null; shiftKHz: number | null; shiftPercent: number | null; verdict: string }[];
  canDelete: boolean;
}

export interface SweepDetailDto extends SweepSummaryDto {
  mapping: SweepMapping;
  points: MeasuredPoint[];
  /** Each element's length as built, when the uploader gave it; null means the plan's cut lengths. */
  builtLengthsM: number[] | null;
  /** The engine's request the sweep was compared with. */
  planRequest: PlanRequest;
  analysis: SweepAnalysis;
  /** The sweep at the feed point and at the radio end, one of them computed through the feedline. */
  views: SweepViews;
}

export interface AnalyserChoice {
  id: string;
  labelCode: string;
  name: string;
  minMhz: number;
  maxMhz: number;
}

/** What the person may do with a target's sweeps, and why not. */
export interface SweepAccess {
  canUpload: boolean;
  reason: string;
}

interface TargetContext {
  /** The plan the sweep is compared with. */
  planRequest: PlanRequest;
  /** The antenna day of a slot, for who takes part. */
  dayId: string | null;
}

/** Someone takes part in a day when signed up for a shift of it, its safety lead, or holding gear booked for it. */
export async function takesPartInDay(executor: Executor, personId: string, dayId: string): Promise<boolean> {
  const result = await executor.execute<{ takes_part: boolean }>(sql`
    select exists (
      select 1 from ${shiftSignups}
        join ${shifts} on ${shifts.id} = ${shiftSignups.shiftId}
        join ${stationSlots} on ${stationSlots.id} = ${shifts.slotId}
        where ${stationSlots.dayId} = ${dayId} and ${shiftSignups.personId} = ${personId}
    ) or exists (
      select 1 from ${antennaDays} where ${antennaDays.id} = ${dayId} and ${antennaDays.safetyLeadId} = ${personId}
    ) or exists (
      select 1 from ${gearBookings}
        where ${gearBookings.antennaDayId} = ${dayId} and ${gearBookings.borrowerId} = ${personId}
          and ${gearBookings.state} in ('approved', 'out', 'returned')
    ) as takes_part`);
  return result.rows[0]?.takes_part === true;
}

/** The target's plan as the engine's request; throws 404 for what the person may not see. */
async function targetContext(actor: Actor, target: SweepTarget): Promise<TargetContext> {
  if (target.kind === "plan") {
    if (!can(actor, "plans.view")) throw forbidden();
    const plan = await db().query.antennaPlans.findFirst({ where: eq(antennaPlans.id, target.id) });
    if (!plan) throw notFound("That plan");
    return { planRequest: plan.parameters, dayId: null };
  }
  // A coax run booked as the slot's feedline is the line a sweep at the radio end came through.
  const { planRequest, dayId } = await slotPlanRequest(actor, target.id);
  return { planRequest: planRequestSchema.parse(planRequest), dayId };
}

async function accessFor(actor: Actor, context: TargetContext): Promise<SweepAccess> {
  if (!can(actor, "sweeps.upload")) return { canUpload: false, reason: "Newcomers cannot upload sweeps: ask your mentor to upload it." };
  if (context.dayId === null) return { canUpload: true, reason: "" };
  const takesPart = await takesPartInDay(db(), actor.id, context.dayId);
  return canUploadSweep(actor, takesPart)
    ? { canUpload: true, reason: "" }
    : { canUpload: false, reason: "Only people who take part in this antenna day (a shift, the safety lead, or gear booked for it) and coordinators upload its sweeps." };
}

/** Whether the person may upload to the target (for the page), after checking they may see it. */
export async function sweepAccess(actor: Actor, target: SweepTarget): Promise<SweepAccess> {
  return accessFor(actor, await targetContext(actor, target));
}

async function requireUpload(actor: Actor, target: SweepTarget): Promise<TargetContext> {
  const context = await targetContext(actor, target);
  const access = await accessFor(actor, context);
  if (!access.canUpload) throw forbidden(access.reason);
  return context;
}

const summaryColumns = {
  sweep: measuredSweeps,
  fileName: storedFiles.fileName,
  uploaderName: users.name,
  analyserLabel: gearItems.labelCode,
  analyserName: gearItems.name,
};

type SummaryRow = { sweep: MeasuredSweepRow; fileName: string; uploaderName: string | null; analyserLabel: string | null; analyserName: string | null };

function selectSweeps() {
  return db()
    .select(summaryColumns)
    .from(measuredSweeps)
    .innerJoin(storedFiles, eq(storedFiles.id, measuredSweeps.fileId))
    .leftJoin(users, eq(users.id, measuredSweeps.uploadedBy))
    .leftJoin(gearItems, eq(gearItems.id, measuredSweeps.analyserId));
}

function toSummary(actor: Actor, row: SummaryRow): SweepSummaryDto {
  const { sweep } = row;
  return {
    id: sweep.id,
    slotId: sweep.slotId,
    libraryPlanId: sweep.libraryPlanId,
    measuredAt: sweep.measuredAt.toISOString(),
    uploadedBy: sweep.uploadedBy && row.uploaderName !== null ? { id: sweep.uploadedBy, name: row.uploaderName } : null,
    place: sweep.place,
    quantity: sweep.quantity,
    analyser: sweep.analyserId && row.analyserLabel && row.analyserName ? { id: sweep.analyserId, labelCode: row.analyserLabel, name: row.analyserName } : null,
    fileName: row.fileName,
    fileUrl: `/api/sweeps/${sweep.id}/file`,
    pointCount: sweep.pointCount,
    minMHz: sweep.minMhz,
    maxMHz: sweep.maxMhz,
    note: sweep.note,
    createdAt: sweep.createdAt.toISOString(),
    bands: sweep.analysis.bands.map((band) => ({ band: band.band, measuredMHz: band.measuredMHz, shiftKHz: band.shiftKHz, shiftPercent: band.shiftPercent, verdict: band.verdict })),
    canDelete: canDeleteSweep(actor, sweep.uploadedBy),
  };
}

function toDetail(actor: Actor, row: SummaryRow): SweepDetailDto {
  const { sweep } = row;
  return {
    ...toSummary(actor, row),
    mapping: sweep.mapping,
    points: sweep.points,
    builtLengthsM: sweep.builtLengthsM,
    planRequest: sweep.planRequest,
    analysis: sweep.analysis,
    views: sweepViews(sweep.points, sweep.place, chainOf(sweep.analysis.chain)),
  };
}

/** A target's sweeps, newest measurement first. */
export async function listSweeps(actor: Actor, target: SweepTarget): Promise<SweepSummaryDto[]> {
  await targetContext(actor, target);
  const rows = await selectSweeps()
    .where(target.kind === "slot" ? eq(measuredSweeps.slotId, target.id) : eq(measuredSweeps.libraryPlanId, target.id))
    .orderBy(desc(measuredSweeps.measuredAt), desc(measuredSweeps.createdAt));
  return rows.map((row) => toSummary(actor, row));
}

/** The sweep's row, if the person may see what it belongs to. */
async function findSweep(actor: Actor, id: string): Promise<SummaryRow> {
  const [row] = await selectSweeps().where(eq(measuredSweeps.id, id));
  if (!row) throw notFound("That sweep");
  try {
    await targetContext(actor, row.sweep.slotId ? { kind: "slot", id: row.sweep.slotId } : { kind: "plan", id: row.sweep.libraryPlanId as string });
  } catch (error) {
    // A sweep of a draft day is as hidden as the day.
    if (error instanceof PublicError && error.code === "not-found") throw notFound("That sweep");
    throw error;
  }
  return row;
}

export async function getSweep(actor: Actor, id: string): Promise<SweepDetailDto> {
  return toDetail(actor, await findSweep(actor, id));
}

/** The stored raw file of a sweep the person may see. */
export async function sweepFile(actor: Actor, id: string) {
  const { sweep } = await findSweep(actor, id);
  const file = await db().query.storedFiles.findFirst({ where: eq(storedFiles.id, sweep.fileId) });
  if (!file) throw notFound("That sweep's file");
  return file;
}

/** Deletes a sweep; its raw file goes with it (a trigger, see the schema). */
export async function deleteSweep(actor: Actor, id: string): Promise<void> {
  const { sweep } = await findSweep(actor, id);
  if (!canDeleteSweep(actor, sweep.uploadedBy)) throw forbidden("Only the person who uploaded this sweep, or a coordinator, may delete it.");
  await db().delete(measuredSweeps).where(eq(measuredSweeps.id, id));
}

/** Analysers on the gear shelf (not retired), for the upload form. */
export async function listAnalysers(): Promise<AnalyserChoice[]> {
  const rows = await db()
    .select({ id: gearItems.id, labelCode: gearItems.labelCode, name: gearItems.name, minMhz: gearItems.minMhz, maxMhz: gearItems.maxMhz })
    .from(gearItems)
    .where(and(eq(gearItems.kind, "analyser"), isNull(gearItems.retiredAt)))
    .orderBy(asc(gearItems.labelCode));
  return rows.map((row) => ({ ...row, minMhz: row.minMhz as number, maxMhz: row.maxMhz as number }));
}

export interface SweepPreview {
  columns: (SweepColumn & { sample: number[] })[];
  /** The first rows of numbers, with their lines. */
  rows: { line: number; values: number[] }[];
  rowCount: number;
  detected: SweepMapping | null;
  notes: string[];
  mapping: SweepMapping | null;
  pointCount: number;
  rangeMHz: [number, number] | null;
  problems: Problem[];
}

const PREVIEW_ROWS = 8;

const fileProblems = (problems: { line: number | null; message: string }[]): Problem[] => problems.map((problem) => ({ path: "file", message: problemText(problem) }));

/** Reads a file without storing anything: what Guyline detected, and what it reads with the mapping given. */
export async function previewSweep(actor: Actor, target: SweepTarget, bytes: Uint8Array, mapping?: SweepMapping): Promise<SweepPreview> {
  await requireUpload(actor, target);
  const reading = readSweepFile(bytes, mapping);
  const { table } = reading;
  return {
    columns: (table?.columns ?? []).map((column) => ({ ...column, sample: table!.rows.slice(0, 3).map((row) => row.values[column.index]) })),
    rows: (table?.rows ?? []).slice(0, PREVIEW_ROWS),
    rowCount: table?.rows.length ?? 0,
    detected: reading.detected?.mapping ?? null,
    notes: reading.detected?.notes ?? [],
    mapping: reading.mapping,
    pointCount: reading.points.length,
    rangeMHz: reading.points.length > 0 ? [reading.points[0].mhz, reading.points[reading.points.length - 1].mhz] : null,
    problems: fileProblems(reading.problems),
  };
}

export type UploadOutcome = { ok: true; sweep: SweepDetailDto } | { ok: false; problems: Problem[] };

const mhz = (value: number) => `${Number(value.toFixed(3))} MHz`;

/** The engine's trim for the comparison, or why there is none. */
async function trimFor(plan: PlanResult, bands: BandComparison[], built: number[] | null, builtFrom: "plan" | "uploader"): Promise<TrimOutcome> {
  const trimRequest = trimRequestOf(plan.request, plan, bands, built);
  if (!trimRequest.ok) return { ok: false, reason: trimRequest.reason };
  try {
    const result = await runTrim(trimRequest.input);
    return { ok: true, result, builtLengthsM: result.elements.map((element) => element.builtLengthM), builtFrom };
  } catch (error) {
    if (error instanceof EngineInputError) return { ok: false, reason: error.problems.join("; ") };
    throw error;
  }
}

/**
 * Reads, checks and compares an upload, then stores the raw file and the sweep in one
 * transaction. A file that cannot be read stores nothing and answers its problems by line.
 */
export async function uploadSweep(actor: Actor, target: SweepTarget, upload: { fileName: string; bytes: Uint8Array; fields: SweepUploadFields }): Promise<UploadOutcome> {
  const context = await requireUpload(actor, target);
  const { fields } = upload;
  const reading = readSweepFile(upload.bytes, fields.mapping);
  if (reading.problems.length > 0 || !reading.mapping) return { ok: false, problems: fileProblems(reading.problems) };
  const points = reading.points;
  const range: [number, number] = [points[0].mhz, points[points.length - 1].mhz];

  if (fields.analyserId) {
    const analyser = await db().query.gearItems.findFirst({ where: eq(gearItems.id, fields.analyserId) });
    if (!analyser || analyser.kind !== "analyser") throw badInput("analyserId", "That is not an analyser on the gear shelf.");
    const [low, high] = [analyser.minMhz as number, analyser.maxMhz as number];
    if (range[0] < low * 0.999 || range[1] > high * 1.001) {
      throw badInput("analyserId", `The sweep runs ${mhz(range[0])} to ${mhz(range[1])}, beyond what ${analyser.labelCode} measures (${mhz(low)} to ${mhz(high)}): check the analyser or the frequency unit.`);
    }
  }
  const { timeZone } = await getClubSettings();
  const measuredAt = fields.measuredAt ? timeInputToInstant(fields.measuredAt, timeZone) : new Date();
  if (Number.isNaN(measuredAt.getTime())) throw badInput("measuredAt", "That is not a date and time.");
  if (measuredAt.getTime() > Date.now() + 5 * 60_000) throw badInput("measuredAt", "A sweep cannot be measured in the future.");

  const plan = await runPlan(context.planRequest);
  const comparison = compareSweep(points, fields.place, plan);
  if (comparison.bands.length === 0) {
    const bandList = plan.bands.map((band) => `${band.band.name}, ${mhz(band.band.lowMHz)} to ${mhz(band.band.highMHz)}`).join("; ");
    throw badInput("file", `The sweep runs ${mhz(range[0])} to ${mhz(range[1])} and reaches none of this antenna's bands (${bandList}). Check the frequency unit.`);
  }

  const given = fields.builtLengthsM ?? null;
  if (given && given.length !== plan.elements.length) {
    throw badInput("builtLengthsM", `Give ${plan.elements.length} length${plan.elements.length === 1 ? "" : "s"}, one per element (${plan.elements.map((element) => element.band).join(", ")}).`);
  }
  const builtFrom = given?.some((length) => length !== null) ? "uploader" : "plan";
  const built = builtFrom === "uploader" ? plan.elements.map((element, k) => given![k] ?? element.lengthM) : null;
  const trim = await trimFor(plan, comparison.bands, built, builtFrom);
  const analysis = analysisOf(comparison, trim, builtFrom === "plan");

  const id = await db().transaction(async (tx) => {
    const file = await storeFile(tx, uploadRules.sweep, { bytes: upload.bytes, fileName: upload.fileName, uploadedBy: actor.id });
    const [row] = await tx
      .insert(measuredSweeps)
      .values({
        slotId: target.kind === "slot" ? target.id : null,
        libraryPlanId: target.kind === "plan" ? target.id : null,
        fileId: file.id,
        uploadedBy: actor.id,
        analyserId: fields.analyserId ?? null,
        place: fields.place,
        quantity: reading.mapping!.quantity,
        measuredAt,
        mapping: reading.mapping!,
        points,
        pointCount: points.length,
        minMhz: range[0],
        maxMhz: range[1],
        builtLengthsM: built,
        planRequest: plan.request,
        analysis,
        note: fields.note,
      })
      .returning({ id: measuredSweeps.id });
    return row.id;
  });
  return { ok: true, sweep: await getSweep(actor, id) };
}

export interface OffsetEntry {
  sweepId: string;
  measuredAt: string;
  /** The antenna measured: a station slot on a day, or the library plan itself. */
  slot: { id: string; name: string; dayId: string; dayTitle: string } | null;
  band: string;
  offsetPercent: number;
}

export interface PlanOffsets {
  entries: OffsetEntry[];
  /** Per band, the mean over the antennas (the latest sweep of each). */
  means: BandOffset[];
  /** The plan's cut corrected by the means; null until something was measured. */
  nextCut: NextCut | null;
}

/**
 * What the sweeps of antennas built from a library plan say: the slots that point at it (on days
 * the person may see) and the sweeps uploaded to the plan itself.
 */
export async function planOffsets(actor: Actor, planId: string): Promise<PlanOffsets> {
  if (!can(actor, "plans.view")) throw forbidden();
  const plan = await db().query.antennaPlans.findFirst({ where: eq(antennaPlans.id, planId) });
  if (!plan) throw notFound("That plan");
  const rows = await db()
    .select({
      sweepId: measuredSweeps.id,
      measuredAt: measuredSweeps.measuredAt,
      analysis: measuredSweeps.analysis,
      slotId: stationSlots.id,
      slotName: stationSlots.name,
      dayId: antennaDays.id,
      dayTitle: antennaDays.title,
    })
    .from(measuredSweeps)
    .leftJoin(stationSlots, eq(stationSlots.id, measuredSweeps.slotId))
    .leftJoin(antennaDays, eq(antennaDays.id, stationSlots.dayId))
    .where(
      or(
        eq(measuredSweeps.libraryPlanId, planId),
        and(eq(stationSlots.libraryPlanId, planId), inArray(antennaDays.status, visibleStatuses(actor))),
      ),
    )
    .orderBy(desc(measuredSweeps.measuredAt));
  const entries: OffsetEntry[] = rows.flatMap((row) =>
    row.analysis.offsets.map((offset) => ({
      sweepId: row.sweepId,
      measuredAt: row.measuredAt.toISOString(),
      slot: row.slotId && row.slotName && row.dayId && row.dayTitle ? { id: row.slotId, name: row.slotName, dayId: row.dayId, dayTitle: row.dayTitle } : null,
      band: offset.band,
      offsetPercent: offset.offsetPercent,
    })),
  );
  // One sample per antenna and band: its latest sweep (the rows come newest first).
  const latest = new Map<string, OffsetEntry>();
  for (const entry of entries) {
    const key = `${entry.slot?.id ?? "plan"}:${entry.band}`;
    if (!latest.has(key)) latest.set(key, entry);
  }
  const means = meanOffsets([...latest.values()]);
  if (means.length === 0) return { entries, means, nextCut: null };
  const result = await runPlan(plan.parameters);
  return { entries, means, nextCut: nextCut(result.request, result.elements.map((element) => ({ band: element.band, lengthM: element.lengthM })), means) };
}

export interface SweepPageData {
  sweeps: SweepSummaryDto[];
  access: SweepAccess;
  /** The sweep to show: the one asked for, or the newest. */
  selected: SweepDetailDto | null;
  /** The target's plan changed since the selected sweep was compared with it. */
  planChanged: boolean;
  analysers: AnalyserChoice[];
  /** One label per element of the plan (its band). */
  elements: string[];
  /** The balun or unun and the feedline run, in words. */
  feedline: string;
  /** Now in club time, for the form's default. */
  nowLocal: string;
}

/** Equal as JSON values, whatever the order of their keys (jsonb keeps its own order). */
function sameValue(a: unknown, b: unknown): boolean {
  if (typeof a !== "object" || typeof b !== "object" || a === null || b === null) return a === b;
  if (Array.isArray(a) !== Array.isArray(b)) return false;
  const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
  return [...keys].every((key) => sameValue((a as Record<string, unknown>)[key], (b as Record<string, unknown>)[key]));
}

/** Everything a page with a sweeps section needs, in one call. */
export async function sweepPageData(actor: Actor, target: SweepTarget, selectedId?: string): Promise<SweepPageData> {
  const context = await targetContext(actor, target);
  const [sweeps, access, analysers, { timeZone }] = await Promise.all([listSweeps(actor, target), accessFor(actor, context), listAnalysers(), getClubSettings()]);
  const chosen = sweeps.find((sweep) => sweep.id === selectedId) ?? sweeps[0];
  const selected = chosen ? await getSweep(actor, chosen.id) : null;
  const request = context.planRequest;
  const model = planModel(request);
  const transformer = TRANSFORMERS[model.transformer];
  return {
    sweeps,
    access,
    selected,
    planChanged: selected !== null && !sameValue(selected.planRequest, significant(request)),
    analysers,
    elements: model.elements.map((element) => element.band.name),
    feedline: `${request.feedline.lengthM.toFixed(1)} m of ${feedlineType(request.feedline.type).label} from the ${transformer.label}`,
    nowLocal: instantToWallTime(new Date(), timeZone).slice(0, 16),
  };
}
