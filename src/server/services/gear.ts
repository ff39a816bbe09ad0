// The gear shelf: items, their photos and manuals, the shelf table, CSV import and export.
import { and, asc, count, desc, eq, ilike, inArray, isNull, or, sql, type SQL } from "drizzle-orm";
import { db, type Executor, type Transaction } from "@/server/db";
import { zodProblems } from "@/server/api";
import { gearBookings, gearHistory, gearItemFiles, gearItems, storedFiles, users, type GearItemRow } from "@/server/db/schema";
import { badInput, badInputs, conflict, forbidden, notFound, pgConstraint, pgErrorCode, pgErrorCodes } from "@/server/errors";
import { can, canReturnLoan, type Actor } from "@/server/policy";
import { findStoredFile, storeFile, uploadRules } from "@/server/storage/files";
import { getClubSettings } from "@/server/services/accounts";
import { defaultApprovalRule } from "@/lib/gear/kinds";
import { csvColumns, readGearCsv, writeGearCsv, type CsvField, type ImportProblem } from "@/lib/gear/csv";
import { isOverdue } from "@/lib/lending/availability";
import { wallTimeToInstant } from "@/lib/time";
import { Temporal } from "temporal-polyfill";
import { gearItemSchema, type GearItemInput, type GearListQuery } from "@/validations/gear";

/** What the client sees of an item: every column, dates as ISO strings. */
export interface GearItemDto {
  id: string;
  labelCode: string;
  name: string;
  kind: GearItemRow["kind"];
  condition: GearItemRow["condition"];
  location: string;
  notes: string | null;
  approvalRule: GearItemRow["approvalRule"];
  minMhz: number | null;
  maxMhz: number | null;
  batteryCheckedOn: string | null;
  calibrationCheckedOn: string | null;
  cableType: GearItemRow["cableType"];
  lengthM: number | null;
  connectorA: GearItemRow["connectorA"];
  connectorB: GearItemRow["connectorB"];
  heightM: number | null;
  guyKit: string | null;
  transformerStyle: GearItemRow["transformerStyle"];
  transformerRatio: GearItemRow["transformerRatio"];
  powerRatingW: number | null;
  retiredAt: string | null;
  updatedAt: string;
}

export function toItemDto(row: GearItemRow): GearItemDto {
  return {
    id: row.id,
    labelCode: row.labelCode,
    name: row.name,
    kind: row.kind,
    condition: row.condition,
    location: row.location,
    notes: row.notes,
    approvalRule: row.approvalRule,
    minMhz: row.minMhz,
    maxMhz: row.maxMhz,
    batteryCheckedOn: row.batteryCheckedOn,
    calibrationCheckedOn: row.calibrationCheckedOn,
    cableType: row.cableType,
    lengthM: row.lengthM,
    connectorA: row.connectorA,
    connectorB: row.connectorB,
    heightM: row.heightM,
    guyKit: row.guyKit,
    transformerStyle: row.transformerStyle,
    transformerRatio: row.transformerRatio,
    powerRatingW: row.powerRatingW,
    retiredAt: row.retiredAt?.toISOString() ?? null,
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** The columns an item input sets: its kind's details, and null for every other kind's. */
function itemColumns(input: GearItemInput) {
  return {
    labelCode: input.labelCode,
    name: input.name,
    kind: input.kind,
    condition: input.condition,
    location: input.location,
    notes: input.notes,
    approvalRule: input.approvalRule ?? defaultApprovalRule(input.kind),
    minMhz: input.kind === "analyser" ? input.minMhz : null,
    maxMhz: input.kind === "analyser" ? input.maxMhz : null,
    batteryCheckedOn: input.kind === "analyser" ? input.batteryCheckedOn : null,
    calibrationCheckedOn: input.kind === "analyser" ? input.calibrationCheckedOn : null,
    cableType: input.kind === "coax" ? input.cableType : null,
    lengthM: input.kind === "coax" ? input.lengthM : null,
    connectorA: input.kind === "coax" ? input.connectorA : null,
    connectorB: input.kind === "coax" ? input.connectorB : null,
    heightM: input.kind === "mast" ? input.heightM : null,
    guyKit: input.kind === "mast" ? input.guyKit : null,
    transformerStyle: input.kind === "balun" ? input.transformerStyle : null,
    transformerRatio: input.kind === "balun" ? input.transformerRatio : null,
    powerRatingW: input.kind === "balun" ? input.powerRatingW : null,
  };
}

export async function recordHistory(executor: Executor, entry: typeof gearHistory.$inferInsert): Promise<void> {
  await executor.insert(gearHistory).values(entry);
}

function labelCodeTaken(error: unknown, labelCode: string): never {
  if (pgErrorCode(error) === pgErrorCodes.uniqueViolation && pgConstraint(error) === "gear_items_label_code_key") {
    throw badInput("labelCode", `Another item already has the label code ${labelCode}.`);
  }
  throw error;
}

export async function createItem(actor: Actor, input: GearItemInput): Promise<GearItemDto> {
  if (!can(actor, "gear.manage")) throw forbidden();
  return db().transaction(async (tx) => {
    const [row] = await tx
      .insert(gearItems)
      .values(itemColumns(input))
      .returning()
      .catch((error: unknown) => labelCodeTaken(error, input.labelCode));
    await recordHistory(tx, { itemId: row.id, actorId: actor.id, event: "item-added", toState: row.condition, condition: row.condition });
    return toItemDto(row);
  });
}

const editedFieldLabels: Partial<Record<keyof GearItemRow, string>> = {
  labelCode: "label code",
  name: "name",
  kind: "kind",
  location: "storage location",
  notes: "notes",
  approvalRule: "approval",
};

/** Edits an item; a retired item given a shelf condition comes back onto the shelf. */
export async function updateItem(actor: Actor, id: string, input: GearItemInput): Promise<GearItemDto> {
  if (!can(actor, "gear.manage")) throw forbidden();
  return db().transaction(async (tx) => writeItem(tx, actor, await lockItemRow(tx, id), input));
}

/**
 * A partial edit (the HTTP API's PATCH): the given fields over the item as it is under the row
 * lock, checked as a whole item, so two edits at once never undo each other's fields.
 */
export async function patchItem(actor: Actor, id: string, patch: Record<string, unknown>): Promise<GearItemDto> {
  if (!can(actor, "gear.manage")) throw forbidden();
  return db().transaction(async (tx) => {
    const before = await lockItemRow(tx, id);
    const parsed = gearItemSchema.safeParse({ ...toItemDto(before), ...patch });
    if (!parsed.success) {
      const [first, ...rest] = zodProblems(parsed.error);
      throw badInputs([first, ...rest]);
    }
    return writeItem(tx, actor, before, parsed.data);
  });
}

async function lockItemRow(tx: Transaction, id: string): Promise<GearItemRow> {
  const [row] = await tx.select().from(gearItems).where(eq(gearItems.id, id)).for("update");
  if (!row) throw notFound("That item");
  return row;
}

/** Writes an edit over the locked row and records what changed in the item's history. */
async function writeItem(tx: Transaction, actor: Actor, before: GearItemRow, input: GearItemInput): Promise<GearItemDto> {
  const id = before.id;
  const columns = itemColumns(input);
  const [row] = await tx
    .update(gearItems)
    .set({ ...columns, retiredAt: null, updatedAt: new Date() })
    .where(eq(gearItems.id, id))
    .returning()
    .catch((error: unknown) => labelCodeTaken(error, input.labelCode));
  const changed = Object.entries(editedFieldLabels)
    .filter(([field]) => before[field as keyof GearItemRow] !== row[field as keyof GearItemRow])
    .map(([, label]) => label);
  const detailsChanged = (Object.keys(columns) as (keyof typeof columns)[]).some(
    (field) => !(field in editedFieldLabels) && field !== "condition" && before[field] !== row[field],
  );
  if (detailsChanged) changed.push("details");
  if (before.condition !== row.condition) {
    await recordHistory(tx, {
      itemId: id,
      actorId: actor.id,
      event: before.condition === "retired" ? "item-restored" : "condition-changed",
      fromState: before.condition,
      toState: row.condition,
      condition: row.condition,
    });
  }
  if (changed.length > 0) {
    await recordHistory(tx, { itemId: id, actorId: actor.id, event: "item-edited", note: `Changed: ${changed.join(", ")}.` });
  }
  return toItemDto(row);
}

/** Retires an item: it stays on record with its history but can no longer be booked. */
export async function retireItem(actor: Actor, id: string, reason: string): Promise<GearItemDto> {
  if (!can(actor, "gear.manage")) throw forbidden();
  return db().transaction(async (tx) => {
    const before = await lockItemRow(tx, id);
    if (before.condition === "retired") throw conflict("This item is already retired.");
    const [holding] = await tx
      .select({ state: gearBookings.state })
      .from(gearBookings)
      .where(and(eq(gearBookings.itemId, id), inArray(gearBookings.state, ["approved", "out", "lost"]), sql`(${gearBookings.state} <> 'approved' or ${gearBookings.endsAt} > now())`))
      .limit(1);
    if (holding) {
      throw conflict(
        holding.state === "approved"
          ? "This item has approved bookings to come. Decline or cancel them first."
          : "This item is out on loan. Take it back (or mark it lost) first.",
      );
    }
    const [row] = await tx.update(gearItems).set({ condition: "retired", retiredAt: new Date(), updatedAt: new Date() }).where(eq(gearItems.id, id)).returning();
    await recordHistory(tx, { itemId: id, actorId: actor.id, event: "item-retired", fromState: before.condition, toState: "retired", condition: "retired", note: reason });
    return toItemDto(row);
  });
}

export async function getItem(actor: Actor, id: string): Promise<GearItemDto> {
  if (!can(actor, "gear.view")) throw forbidden();
  const [row] = await db().select().from(gearItems).where(eq(gearItems.id, id));
  if (!row) throw notFound("That item");
  return toItemDto(row);
}

/** Where an item is now, for the shelf table. */
export interface ItemAvailability {
  /** "out": on loan now; "booked": an approved booking to come; "free": neither; "retired". */
  status: "out" | "booked" | "free" | "retired";
  borrowerName?: string;
  startsAt?: string;
  endsAt?: string;
  overdue?: boolean;
}

export interface GearListRow extends GearItemDto {
  availability: ItemAvailability;
}

export interface GearPage {
  rows: GearListRow[];
  rowCount: number;
  page: number;
  pageSize: number;
}

const sortColumns = {
  labelCode: gearItems.labelCode,
  name: gearItems.name,
  kind: gearItems.kind,
  condition: gearItems.condition,
  location: gearItems.location,
  updatedAt: gearItems.updatedAt,
} as const;

const likePattern = (text: string) => `%${text.replace(/[\\%_]/g, (char) => `\\${char}`)}%`;

async function listConditions(query: GearListQuery): Promise<SQL | undefined> {
  const conditions: (SQL | undefined)[] = [];
  if (!query.includeRetired && query.condition !== "retired") conditions.push(isNull(gearItems.retiredAt));
  if (query.kind) conditions.push(eq(gearItems.kind, query.kind));
  if (query.condition) conditions.push(eq(gearItems.condition, query.condition));
  if (query.q) {
    const pattern = likePattern(query.q);
    conditions.push(or(ilike(gearItems.name, pattern), ilike(gearItems.labelCode, pattern), ilike(gearItems.location, pattern)));
  }
  if (query.availableOn) {
    const { timeZone } = await getClubSettings();
    const dayStart = wallTimeToInstant(`${query.availableOn}T00:00`, timeZone);
    const dayEnd = wallTimeToInstant(`${Temporal.PlainDate.from(query.availableOn).add({ days: 1 }).toString()}T00:00`, timeZone);
    conditions.push(isNull(gearItems.retiredAt));
    conditions.push(sql`not exists (select 1 from ${gearBookings} where ${gearBookings.itemId} = ${gearItems.id}
      and ${gearBookings.state} in ('approved', 'out')
      and ${gearBookings.period} && tstzrange(${dayStart.toISOString()}::timestamptz, ${dayEnd.toISOString()}::timestamptz, '[)'))`);
  }
  return and(...conditions);
}

export async function listItems(actor: Actor, query: GearListQuery): Promise<GearPage> {
  if (!can(actor, "gear.view")) throw forbidden();
  const where = await listConditions(query);
  const order = query.dir === "asc" ? asc : desc;
  const [{ total }] = await db().select({ total: count() }).from(gearItems).where(where);
  const rows = await db()
    .select()
    .from(gearItems)
    .where(where)
    .orderBy(order(sortColumns[query.sort]), asc(gearItems.labelCode))
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  const availability = await availabilityOf(rows);
  return {
    rows: rows.map((row) => ({ ...toItemDto(row), availability: availability.get(row.id) ?? { status: "free" } })),
    rowCount: total,
    page: query.page,
    pageSize: query.pageSize,
  };
}

async function availabilityOf(rows: GearItemRow[]): Promise<Map<string, ItemAvailability>> {
  const result = new Map<string, ItemAvailability>();
  const now = new Date();
  for (const row of rows) if (row.retiredAt) result.set(row.id, { status: "retired" });
  const ids = rows.filter((row) => !row.retiredAt).map((row) => row.id);
  if (ids.length === 0) return result;
  const holding = await db()
    .select({ itemId: gearBookings.itemId, state: gearBookings.state, startsAt: gearBookings.startsAt, endsAt: gearBookings.endsAt, borrowerName: users.name })
    .from(gearBookings)
    .innerJoin(users, eq(users.id, gearBookings.borrowerId))
    .where(and(inArray(gearBookings.itemId, ids), or(eq(gearBookings.state, "out"), and(eq(gearBookings.state, "approved"), sql`${gearBookings.endsAt} > now()`))))
    .orderBy(asc(gearBookings.startsAt));
  for (const booking of holding) {
    const known = result.get(booking.itemId);
    if (known?.status === "out") continue;
    if (booking.state === "out") {
      result.set(booking.itemId, {
        status: "out",
        borrowerName: booking.borrowerName,
        startsAt: booking.startsAt.toISOString(),
        endsAt: booking.endsAt.toISOString(),
        overdue: isOverdue(booking, now),
      });
    } else if (!known) {
      result.set(booking.itemId, { status: "booked", borrowerName: booking.borrowerName, startsAt: booking.startsAt.toISOString(), endsAt: booking.endsAt.toISOString() });
    }
  }
  return result;
}

const EXPORT_LIMIT = 10_000;

/** The filtered shelf (every page) as CSV with the import's columns. */
export async function exportItemsCsv(actor: Actor, query: GearListQuery): Promise<string> {
  if (!can(actor, "gear.view")) throw forbidden();
  const where = await listConditions(query);
  const order = query.dir === "asc" ? asc : desc;
  const rows = await db().select().from(gearItems).where(where).orderBy(order(sortColumns[query.sort]), asc(gearItems.labelCode)).limit(EXPORT_LIMIT);
  return writeGearCsv(rows.map((row) => toCsvRecord(row)));
}

function toCsvRecord(row: GearItemRow): Partial<Record<CsvField, string | number | null>> {
  return Object.fromEntries(csvColumns.map(([, field]) => [field, row[field]]));
}

export interface ImportPreviewRow {
  line: number;
  labelCode: string;
  name: string;
  kind: string;
}

export interface ImportOutcome {
  mode: "preview" | "commit";
  rows: ImportPreviewRow[];
  problems: ImportProblem[];
  /** How many items were added: 0 unless committing a file with no problems. */
  imported: number;
}

/** Reads a CSV file of items; commits only a file without a single problem, all in one transaction. */
export async function importItems(actor: Actor, input: { mode: "preview" | "commit"; csv: string }): Promise<ImportOutcome> {
  if (!can(actor, "gear.manage")) throw forbidden();
  const reading = readGearCsv(input.csv);
  const problems = [...reading.problems];
  const codes = reading.rows.map((row) => row.item.labelCode);
  if (codes.length > 0) {
    const existing = await db().select({ labelCode: gearItems.labelCode }).from(gearItems).where(inArray(gearItems.labelCode, codes));
    const taken = new Set(existing.map((row) => row.labelCode));
    for (const row of reading.rows) {
      if (taken.has(row.item.labelCode)) problems.push({ line: row.line, field: "label_code", message: `An item with the label code ${row.item.labelCode} is already on the shelf.` });
    }
  }
  problems.sort((a, b) => a.line - b.line);
  const rows = reading.rows.map(({ line, item }) => ({ line, labelCode: item.labelCode, name: item.name, kind: item.kind }));
  if (input.mode === "preview" || problems.length > 0) return { mode: input.mode, rows, problems, imported: 0 };

  try {
    await db().transaction(async (tx) => {
      const inserted = await tx.insert(gearItems).values(reading.rows.map((row) => itemColumns(row.item))).returning({ id: gearItems.id, condition: gearItems.condition });
      await tx.insert(gearHistory).values(
        inserted.map((row) => ({ itemId: row.id, actorId: actor.id, event: "item-added", toState: row.condition, condition: row.condition, note: "Imported from a CSV file." })),
      );
    });
  } catch (error) {
    // Someone added one of these label codes between the check and the insert: nothing was imported.
    if (pgErrorCode(error) === pgErrorCodes.uniqueViolation) {
      return { mode: "commit", rows, problems: [{ line: 1, field: "label_code", message: "Another item with one of these label codes was just added. Nothing was imported; check the file again." }], imported: 0 };
    }
    throw error;
  }
  return { mode: "commit", rows, problems: [], imported: rows.length };
}

export interface ItemFileDto {
  id: string;
  purpose: "photo" | "manual" | "return";
  fileName: string;
  contentType: string;
  byteSize: number;
  bookingId: string | null;
  createdAt: string;
  url: string;
}

export const itemFileUrl = (itemId: string, fileId: string) => `/api/gear/${itemId}/files/${fileId}`;

export async function listItemFiles(actor: Actor, itemId: string): Promise<ItemFileDto[]> {
  if (!can(actor, "gear.view")) throw forbidden();
  const rows = await db()
    .select({ file: storedFiles, purpose: gearItemFiles.purpose, bookingId: gearItemFiles.bookingId })
    .from(gearItemFiles)
    .innerJoin(storedFiles, eq(storedFiles.id, gearItemFiles.fileId))
    .where(eq(gearItemFiles.itemId, itemId))
    .orderBy(asc(storedFiles.createdAt));
  return rows.map(({ file, purpose, bookingId }) => ({
    id: file.id,
    purpose,
    fileName: file.fileName,
    contentType: file.contentType,
    byteSize: file.byteSize,
    bookingId,
    createdAt: file.createdAt.toISOString(),
    url: itemFileUrl(itemId, file.id),
  }));
}

export type ItemFilePurpose = "photo" | "manual" | "return";

/**
 * Attaches an uploaded file to an item. Photos and manuals are the keepers'; a return photo
 * belongs to a booking that is out (or lost) and may be added by its borrower too.
 */
export async function addItemFile(
  actor: Actor,
  itemId: string,
  upload: { purpose: ItemFilePurpose; bookingId?: string; fileName: string; bytes: Uint8Array },
): Promise<ItemFileDto> {
  return db().transaction(async (tx) => {
    const [item] = await tx.select({ id: gearItems.id }).from(gearItems).where(eq(gearItems.id, itemId));
    if (!item) throw notFound("That item");
    let bookingId: string | null = null;
    if (upload.purpose === "return") {
      if (!upload.bookingId) throw badInput("bookingId", "Say which loan the return photo belongs to.");
      const [booking] = await tx.select().from(gearBookings).where(and(eq(gearBookings.id, upload.bookingId), eq(gearBookings.itemId, itemId)));
      if (!booking || !canReturnLoan(actor, booking.borrowerId)) {
        if (!booking || !can(actor, "loans.viewAll")) throw notFound("That loan");
        throw forbidden();
      }
      if (booking.state !== "out" && booking.state !== "lost") throw conflict("Return photos are added while the item is out, before it is taken back.");
      bookingId = booking.id;
    } else if (!can(actor, "gear.manage")) {
      throw forbidden();
    }
    const rule = upload.purpose === "manual" ? uploadRules.manual : uploadRules.photo;
    const file = await storeFile(tx, rule, { bytes: upload.bytes, fileName: upload.fileName, uploadedBy: actor.id });
    await tx.insert(gearItemFiles).values({ fileId: file.id, itemId, purpose: upload.purpose, bookingId });
    if (upload.purpose !== "return") {
      await recordHistory(tx, { itemId, actorId: actor.id, event: `${upload.purpose}-added`, note: file.fileName, fileId: file.id });
    }
    return {
      id: file.id,
      purpose: upload.purpose,
      fileName: file.fileName,
      contentType: file.contentType,
      byteSize: file.byteSize,
      bookingId,
      createdAt: file.createdAt.toISOString(),
      url: itemFileUrl(itemId, file.id),
    };
  });
}

/** Removes a photo or manual (return photos stay: they are part of a loan's record). */
export async function removeItemFile(actor: Actor, itemId: string, fileId: string): Promise<void> {
  if (!can(actor, "gear.manage")) throw forbidden();
  await db().transaction(async (tx) => {
    const [link] = await tx.select().from(gearItemFiles).where(and(eq(gearItemFiles.fileId, fileId), eq(gearItemFiles.itemId, itemId)));
    if (!link) throw notFound("That file");
    if (link.purpose === "return") throw conflict("A return photo is part of the loan's record and stays.");
    const file = await findStoredFile(tx, fileId);
    await tx.delete(storedFiles).where(eq(storedFiles.id, fileId));
    await recordHistory(tx, { itemId, actorId: actor.id, event: `${link.purpose}-removed`, note: file?.fileName ?? null });
  });
}

/** A file of the item, for the download route; anyone who may see the shelf may see its files. */
export async function findItemFile(actor: Actor, itemId: string, fileId: string) {
  if (!can(actor, "gear.view")) throw forbidden();
  const [link] = await db().select().from(gearItemFiles).where(and(eq(gearItemFiles.fileId, fileId), eq(gearItemFiles.itemId, itemId)));
  const file = link && (await findStoredFile(db(), fileId));
  if (!file) throw notFound("That file");
  return file;
}
