// The gear shelf against the real PostgreSQL: the all-or-nothing CSV import, uploads checked by
// size and by their bytes, files streamed back, and retired items that cannot be booked.
// Source: Guyline issue 5 ("Gear shelf and lending desk"), items 1, 5 and its "Tests" section.
import { eq, inArray } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/server/db";
import { gearItems } from "@/server/db/schema";
import { addItemFile, findItemFile, importItems, listItems, patchItem, retireItem, updateItem } from "@/server/services/gear";
import { itemHistory, requestBooking, stepBooking } from "@/server/services/lending";
import { fileResponse, uploadRules } from "@/server/storage/files";
import { gearItemSchema, gearListQuerySchema } from "@/validations/gear";
import { createPerson, publicErrorOf } from "./helpers";
import { addAnalyser, addCoaxRun, clubTime, testSteward, uniqueLabel } from "./gear-helpers";

// Source: W3C PNG Specification (Third Edition), §5.2 PNG signature; a 1×1 PNG's first bytes.
const pngBytes = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52, 0, 0, 0, 1, 0, 0, 0, 1, 8, 6, 0, 0, 0]);

describe("CSV import", () => {
  it("rejects a file with one bad row, naming line and column, and imports nothing", async () => {
    const steward = await testSteward();
    const codes = [uniqueLabel("IM"), uniqueLabel("IM"), uniqueLabel("IM")];
    const csv = [
      "label_code,name,kind,condition,location,cable_type,length_m,connector_a,connector_b",
      `${codes[0]},Good run,coax,good,Crate,rg213,10,pl259,pl259`,
      `${codes[1]},Bad run,coax,good,Crate,rg213,ten,pl259,pl259`,
      `${codes[2]},Good run too,coax,worn,Crate,rg58,5,bnc,bnc`,
    ].join("\n");
    const preview = await importItems(steward, { mode: "preview", csv });
    expect(preview.problems).toEqual([{ line: 3, field: "length_m", message: "The length must be a number." }]);
    expect(preview.rows.map((row) => row.line)).toEqual([2, 4]);

    const commit = await importItems(steward, { mode: "commit", csv });
    expect(commit.imported).toBe(0);
    expect(commit.problems).toHaveLength(1);
    expect(await db().select().from(gearItems).where(inArray(gearItems.labelCode, codes))).toEqual([]);

    const fixed = await importItems(steward, { mode: "commit", csv: csv.replace(",ten,", ",10,") });
    expect(fixed.imported).toBe(3);
    expect(await db().select().from(gearItems).where(inArray(gearItems.labelCode, codes))).toHaveLength(3);
    // Importing the same file again clashes with the label codes now on the shelf.
    const again = await importItems(steward, { mode: "commit", csv: csv.replace(",ten,", ",10,") });
    expect(again.problems.map((problem) => [problem.line, problem.field])).toEqual([
      [2, "label_code"],
      [3, "label_code"],
      [4, "label_code"],
    ]);
  });

  it("is for keepers only", async () => {
    const member = await createPerson("member");
    expect((await publicErrorOf(importItems(member, { mode: "preview", csv: "label_code\n" }))).status).toBe(403);
  });
});

describe("uploads", () => {
  it("keeps a photo whose bytes are an image and streams it back with caching headers", async () => {
    const item = await addCoaxRun();
    const steward = await testSteward();
    const stored = await addItemFile(steward, item.id, { purpose: "photo", fileName: "../../crate photo.png", bytes: pngBytes });
    expect(stored).toMatchObject({ contentType: "image/png", byteSize: pngBytes.length, fileName: "crate photo.png" });

    const file = await findItemFile(steward, item.id, stored.id);
    const response = fileResponse(file, new Request("http://localhost/x"));
    expect(response.headers.get("content-type")).toBe("image/png");
    expect(response.headers.get("cache-control")).toBe("private, max-age=31536000, immutable");
    expect(response.headers.get("x-content-type-options")).toBe("nosniff");
    expect(new Uint8Array(await response.arrayBuffer())).toEqual(pngBytes);
    const etag = response.headers.get("etag")!;
    expect(fileResponse(file, new Request("http://localhost/x", { headers: { "if-none-match": etag } })).status).toBe(304);
  });

  it("refuses a file whose contents are not what its name says, a wrong type, an oversized file and a member's photo", async () => {
    const item = await addCoaxRun();
    const steward = await testSteward();
    const script = new TextEncoder().encode("<svg onload=alert(1)></svg>");
    const renamed = await publicErrorOf(addItemFile(steward, item.id, { purpose: "photo", fileName: "photo.png", bytes: script }));
    expect(renamed.message).toMatch(/must be a JPEG, PNG, WebP file/);
    const pdfAsPhoto = await publicErrorOf(addItemFile(steward, item.id, { purpose: "photo", fileName: "manual.png", bytes: new TextEncoder().encode("%PDF-1.4\n") }));
    expect(pdfAsPhoto.field).toBe("file");
    const imageAsManual = await publicErrorOf(addItemFile(steward, item.id, { purpose: "manual", fileName: "manual.pdf", bytes: pngBytes }));
    expect(imageAsManual.message).toMatch(/must be a PDF file/);
    const huge = new Uint8Array(uploadRules.photo.maxBytes + 1);
    huge.set(pngBytes);
    const tooBig = await publicErrorOf(addItemFile(steward, item.id, { purpose: "photo", fileName: "big.png", bytes: huge }));
    expect(tooBig.message).toMatch(/at most 8 MB/);
    const member = await createPerson("member");
    expect((await publicErrorOf(addItemFile(member, item.id, { purpose: "photo", fileName: "p.png", bytes: pngBytes }))).status).toBe(403);
  });

  it("takes a return photo from the borrower only while the loan is out", async () => {
    const item = await addCoaxRun();
    const member = await createPerson("member");
    const { booking } = await requestBooking(member, { itemId: item.id, startsAt: clubTime(20, 9), endsAt: clubTime(20, 17) });
    const early = await publicErrorOf(addItemFile(member, item.id, { purpose: "return", bookingId: booking.id, fileName: "r.png", bytes: pngBytes }));
    expect(early.code).toBe("conflict");
    const stranger = await createPerson("member");
    expect((await publicErrorOf(addItemFile(stranger, item.id, { purpose: "return", bookingId: booking.id, fileName: "r.png", bytes: pngBytes }))).status).toBe(404);

    const steward = await testSteward();
    await stepBooking(steward, booking.id, { action: "hand-out", condition: "good" });
    const photo = await addItemFile(member, item.id, { purpose: "return", bookingId: booking.id, fileName: "kinked.png", bytes: pngBytes });
    const returned = await stepBooking(member, booking.id, { action: "return", condition: "needs_repair", damageNotes: "Kinked near the far end", photoFileId: photo.id });
    expect(returned.booking.returnPhotoUrl).toBe(photo.url);
    const history = await itemHistory(steward, item.id);
    expect(history[0]).toMatchObject({ event: "return", note: "Kinked near the far end", condition: "needs_repair", fileUrl: photo.url });
    expect((await findItemFile(member, item.id, photo.id)).contentType).toBe("image/png");
  });
});

describe("items", () => {
  it("keeps each kind's details on its own kind, in the schema and in the database", async () => {
    const parsed = gearItemSchema.safeParse({ kind: "analyser", labelCode: "an-77", name: "X", condition: "good", location: "Y", minMhz: "50", maxMhz: "10" });
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues[0]).toMatchObject({ path: ["maxMhz"], message: "The highest frequency must be above the lowest." });
    const item = await addCoaxRun();
    await expect(db().update(gearItems).set({ minMhz: 1, maxMhz: 30 }).where(eq(gearItems.id, item.id))).rejects.toMatchObject({ cause: { constraint: "gear_items_analyser_details" } });
  });

  it("lists with server-side filters: kind, condition and free on a date", async () => {
    const steward = await testSteward();
    const analyser = await addAnalyser({ condition: "worn" });
    const member = await createPerson("member");
    const free = await listItems(steward, gearListQuerySchema.parse({ kind: "analyser", condition: "worn", q: analyser.labelCode }));
    expect(free.rows.map((row) => row.id)).toEqual([analyser.id]);
    const { booking } = await requestBooking(member, { itemId: analyser.id, startsAt: clubTime(21, 9), endsAt: clubTime(21, 17) });
    await stepBooking(steward, booking.id, { action: "approve" });
    const day = clubTime(21, 9).slice(0, 10);
    const busy = await listItems(steward, gearListQuerySchema.parse({ q: analyser.labelCode, availableOn: day }));
    expect(busy.rowCount).toBe(0);
    expect((await listItems(steward, gearListQuerySchema.parse({ q: analyser.labelCode }))).rows[0].availability.status).toBe("booked");
  });

  it("refuses to book a retired item and brings it back when edited", async () => {
    const steward = await testSteward();
    const item = await addCoaxRun();
    await retireItem(steward, item.id, "Jacket cracked along its length");
    const member = await createPerson("member");
    const refused = await publicErrorOf(requestBooking(member, { itemId: item.id, startsAt: clubTime(22, 9), endsAt: clubTime(22, 17) }));
    expect(refused.message).toMatch(/retired/);
    const input = gearItemSchema.parse({ ...item, condition: "worn" });
    expect((await updateItem(steward, item.id, input)).retiredAt).toBeNull();
    expect((await requestBooking(member, { itemId: item.id, startsAt: clubTime(22, 9), endsAt: clubTime(22, 17) })).outcome).toBe("approved");
  });

  it("patches some fields under the row lock: two edits at once keep both, a bad field is named", async () => {
    const steward = await testSteward();
    const item = await addCoaxRun();
    await Promise.all([patchItem(steward, item.id, { location: "Shed" }), patchItem(steward, item.id, { lengthM: 12 })]);
    const [row] = await db().select().from(gearItems).where(eq(gearItems.id, item.id));
    expect(row).toMatchObject({ location: "Shed", lengthM: 12, kind: "coax" });
    const refused = await publicErrorOf(patchItem(steward, item.id, { lengthM: -3, name: "" }));
    expect(refused.code).toBe("bad-input");
    expect((refused.details?.problems as { path: string }[]).map((problem) => problem.path).sort()).toEqual(["lengthM", "name"]);
    expect((await publicErrorOf(patchItem(await createPerson("member"), item.id, { location: "Loft" }))).code).toBe("forbidden");
  });
});
