// Measured sweeps against the real PostgreSQL and the engine's worker pool: a bad file stores
// nothing, only people who take part in the day (and coordinators) upload, the raw file lives
// and dies with its sweep, and a library plan learns the offsets of the antennas built from it.
import { count, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { plan } from "@/lib/antenna/plan";
import { db } from "@/server/db";
import { measuredSweeps, storedFiles } from "@/server/db/schema";
import type { Actor } from "@/server/policy";
import { createDay, updateDay } from "@/server/services/antenna-days";
import { bookForStation } from "@/server/services/lending";
import { saveLibraryPlan } from "@/server/services/plans";
import { createShift, signUp } from "@/server/services/shifts";
import { createSite } from "@/server/services/sites";
import { createSlot, deleteSlot, getSlotWithContext, getSlotWithFeedline, saveSlotPlan } from "@/server/services/station-slots";
import { deleteSweep, getSweep, listSweeps, planOffsets, sweepFile, uploadSweep, type SweepTarget } from "@/server/services/sweeps";
import { sweepUploadFieldsSchema } from "@/validations/sweeps";
import { addAnalyser, addCoaxRun } from "./gear-helpers";
import { createPerson, publicErrorOf } from "./helpers";

/** A published day in 2031 with one 20 m dipole slot and a shift. */
async function dayWithSlot() {
  const coordinator = await createPerson("coordinator");
  const site = await createSite(coordinator, {
    name: `Sweep field ${Date.now()}-${Math.random().toString(36).slice(2, 6)}`,
    widthM: 200,
    depthM: 150,
    groundClass: "average",
    groundConductivitySm: null,
    groundRelativePermittivity: null,
    notes: "",
    hazards: [],
  });
  const safetyLead = await createPerson("member");
  const day = await createDay(coordinator, {
    title: "Sweep test day",
    siteId: site.id,
    startsAtLocal: "2031-06-14T09:00",
    endsAtLocal: "2031-06-14T17:00",
    meetingPoint: "Gate",
    description: "",
    safetyLeadId: safetyLead.id,
  });
  const slot = await createSlot(coordinator, day.id, {
    name: "Twenty",
    bands: ["20m"],
    powerW: 100,
    mode: "ssb",
    planParams: { family: "dipole", heightM: 10, wireDiameterMm: 2, feedlineType: "rg213" },
    x: 60,
    y: 70,
    azimuthDeg: 90,
    tentX: 60,
    tentY: 50,
    feedlineRunOverrideM: null,
  });
  const shift = await createShift(coordinator, slot.id, { startsAtLocal: "2031-06-14T09:00", endsAtLocal: "2031-06-14T13:00", capacity: 4 });
  await updateDay(coordinator, day.id, { status: "published" });
  return { coordinator, safetyLead, day, slot, shift };
}

/** The slot's own predicted feed-point sweep, measured 2 % low: a CSV as an analyser at the feed point would give. */
async function sweepCsvFor(actor: Actor, slotId: string): Promise<string> {
  const { planRequest } = await getSlotWithContext(actor, slotId);
  const [band] = plan(planRequest).bands;
  return ["Freq (MHz),R,X", ...band.sweep.map((point) => `${(point.mhz * 0.98).toFixed(4)},${point.feed.r.toFixed(1)},${point.feed.x.toFixed(1)}`)].join("\n");
}

const bytes = (text: string) => new TextEncoder().encode(text);
const fields = (extra: Record<string, string> = {}) => sweepUploadFieldsSchema.parse({ place: "feed-point", ...extra });

async function counts() {
  const [[sweeps], [files]] = await Promise.all([db().select({ n: count() }).from(measuredSweeps), db().select({ n: count() }).from(storedFiles)]);
  return { sweeps: sweeps.n, files: files.n };
}

describe("uploading a sweep", () => {
  it("stores nothing for a malformed file, and names the line of the problem", async () => {
    const { coordinator, slot } = await dayWithSlot();
    const target: SweepTarget = { kind: "slot", id: slot.id };
    const before = await counts();
    const outcome = await uploadSweep(coordinator, target, { fileName: "bad.csv", bytes: bytes("Freq,SWR\n14.0,2.1\n14.1,1.6\n14.1,1.4\n14.3,1.8\n14.4,2.4"), fields: fields() });
    expect(outcome).toEqual({ ok: false, problems: [{ path: "file", message: expect.stringMatching(/^line 4: the frequency 14\.1 MHz is not above 14\.1 MHz on line 3/) }] });
    const binary = await uploadSweep(coordinator, target, { fileName: "photo.csv", bytes: new Uint8Array([0xff, 0xd8, 0xff, 0xe0, 0, 0x10]), fields: fields() });
    expect(binary.ok).toBe(false);
    // A readable file that reaches none of the slot's bands, or an analyser that cannot measure it, is refused too.
    const offBand = await publicErrorOf(uploadSweep(coordinator, target, { fileName: "40m.csv", bytes: bytes("MHz,SWR\n7.0,2\n7.05,1.5\n7.1,1.2\n7.15,1.5\n7.2,2"), fields: fields() }));
    expect(offBand.field).toBe("file");
    expect(offBand.message).toMatch(/reaches none of this antenna's bands \(20m, 14 MHz to 14\.35 MHz\)/);
    const narrow = await addAnalyser({ minMhz: 1.8, maxMhz: 10 });
    const outOfRange = await publicErrorOf(uploadSweep(coordinator, target, { fileName: "s.csv", bytes: bytes(await sweepCsvFor(coordinator, slot.id)), fields: fields({ analyserId: narrow.id }) }));
    expect(outOfRange.field).toBe("analyserId");
    expect(await counts()).toEqual(before);
    expect(await listSweeps(coordinator, target)).toEqual([]);
  });

  it("lets a member upload only for a day they take part in: a shift, the safety lead, or gear booked for the day", async () => {
    const { coordinator, safetyLead, day, slot, shift } = await dayWithSlot();
    const target: SweepTarget = { kind: "slot", id: slot.id };
    const csv = bytes(await sweepCsvFor(coordinator, slot.id));
    const upload = (actor: Actor) => uploadSweep(actor, target, { fileName: "sweep.csv", bytes: csv, fields: fields() });

    const operator = await createPerson("member");
    expect((await publicErrorOf(upload(operator))).status).toBe(403);
    await signUp(operator, shift.id);
    expect((await upload(operator)).ok).toBe(true);

    expect((await upload(safetyLead)).ok).toBe(true);

    const borrower = await createPerson("member");
    expect((await publicErrorOf(upload(borrower))).status).toBe(403);
    const analyser = await addAnalyser();
    await bookForStation(coordinator, { itemId: analyser.id, antennaDayId: day.id, stationSlotId: slot.id, startsAt: "2031-06-14T08:00", endsAt: "2031-06-14T18:00", borrowerId: borrower.id });
    expect((await upload(borrower)).ok).toBe(true);

    expect((await upload(coordinator)).ok).toBe(true);
    const newcomer = await createPerson("newcomer");
    expect((await publicErrorOf(upload(newcomer))).status).toBe(403);
    expect(await listSweeps(coordinator, target)).toHaveLength(4);
  });

  it("keeps the raw file with the points and the comparison, and deletes the file with the sweep or the slot", async () => {
    const { coordinator, safetyLead, slot } = await dayWithSlot();
    const target: SweepTarget = { kind: "slot", id: slot.id };
    const analyser = await addAnalyser();
    const csv = await sweepCsvFor(coordinator, slot.id);
    const outcome = await uploadSweep(safetyLead, target, {
      fileName: "forty/../sweep before trim.csv",
      bytes: bytes(csv),
      fields: fields({ analyserId: analyser.id, measuredAt: "2026-10-03T10:40", note: "Before trimming" }),
    });
    if (!outcome.ok) throw new Error(JSON.stringify(outcome.problems));
    const sweep = outcome.sweep;
    expect(sweep).toMatchObject({ place: "feed-point", quantity: "impedance", pointCount: 41, analyser: { id: analyser.id }, uploadedBy: { id: safetyLead.id }, note: "Before trimming", fileName: "sweep before trim.csv" });
    expect(sweep.measuredAt).toBe("2026-10-03T09:40:00.000Z");
    const [band] = sweep.analysis.bands;
    expect(band.method).toBe("reactance-zero");
    expect(band.shiftPercent).toBeCloseTo(-2, 1);
    expect(sweep.analysis.trim.ok).toBe(true);
    expect(sweep.analysis.offsets[0].offsetPercent).toBeCloseTo(-2, 0);
    expect(sweep.views.radio).toHaveLength(41);

    const file = await sweepFile(coordinator, sweep.id);
    expect(file).toMatchObject({ contentType: "text/plain", byteSize: bytes(csv).length });

    const other = await createPerson("member");
    expect((await publicErrorOf(deleteSweep(other, sweep.id))).status).toBe(403);
    await deleteSweep(safetyLead, sweep.id);
    expect(await db().query.storedFiles.findFirst({ where: eq(storedFiles.id, file.id) })).toBeUndefined();
    expect((await publicErrorOf(getSweep(coordinator, sweep.id))).status).toBe(404);

    const again = await uploadSweep(coordinator, target, { fileName: "s.csv", bytes: bytes(csv), fields: fields() });
    if (!again.ok) throw new Error("upload failed");
    const againFile = await sweepFile(coordinator, again.sweep.id);
    await deleteSlot(coordinator, slot.id);
    expect(await db().query.measuredSweeps.findFirst({ where: eq(measuredSweeps.id, again.sweep.id) })).toBeUndefined();
    expect(await db().query.storedFiles.findFirst({ where: eq(storedFiles.id, againFile.id) })).toBeUndefined();
  });

  it("de-embeds a radio-end sweep through the slot's coax run and trims from the feed point", async () => {
    const { coordinator, slot } = await dayWithSlot();
    const { planRequest } = await getSlotWithContext(coordinator, slot.id);
    const [band] = plan(planRequest).bands;
    // The plan's own radio-end prediction, 2 % low: de-embedded, it is the feed-point sweep 2 % low.
    const csv = ["Frequency (kHz)\tR\tX", ...band.sweep.map((point) => `${(point.mhz * 980).toFixed(2)}\t${point.radio.r.toFixed(2)}\t${point.radio.x.toFixed(2)}`)].join("\n");
    const outcome = await uploadSweep(coordinator, { kind: "slot", id: slot.id }, { fileName: "radio.txt", bytes: bytes(csv), fields: fields({ place: "radio-end" }) });
    if (!outcome.ok) throw new Error(JSON.stringify(outcome.problems));
    expect(outcome.sweep.analysis.bands[0].shiftPercent).toBeCloseTo(-2, 1);
    expect(outcome.sweep.analysis.explanation.join(" ")).toMatch(/inverting the lossy-line formula/);
  });

  it("de-embeds through the coax run booked as the slot's feedline, not the slot's planned run", async () => {
    const { coordinator, day, slot } = await dayWithSlot();
    // Source: Guyline issue 7, item 3 (de-embed "using the slot's actual coax run") and issue 5, item 4 (a booked
    // coax run is the slot's feedline). 60 m of RG-58 instead of the planned RG-213: the wrong line would show.
    const run = await addCoaxRun({ cableType: "rg58", lengthM: 60 });
    await bookForStation(coordinator, { itemId: run.id, startsAt: "2031-06-14T09:00", endsAt: "2031-06-14T17:00", antennaDayId: day.id, stationSlotId: slot.id, slotFeedline: true });
    const { planRequest } = await getSlotWithFeedline(coordinator, slot.id);
    expect(planRequest.feedline).toEqual({ type: "rg58", lengthM: 60 });
    const [band] = plan(planRequest).bands;
    // The prediction at the radio end of the booked run, 2 % low, as the analyser there would read it.
    const csv = ["Frequency (MHz),R,X", ...band.sweep.map((point) => `${(point.mhz * 0.98).toFixed(5)},${point.radio.r.toFixed(2)},${point.radio.x.toFixed(2)}`)].join("\n");
    const outcome = await uploadSweep(coordinator, { kind: "slot", id: slot.id }, { fileName: "radio.csv", bytes: bytes(csv), fields: fields({ place: "radio-end" }) });
    if (!outcome.ok) throw new Error(JSON.stringify(outcome.problems));
    expect(outcome.sweep.planRequest.feedline).toEqual({ type: "rg58", lengthM: 60 });
    expect(outcome.sweep.analysis.bands[0].shiftPercent).toBeCloseTo(-2, 1);
  });
});

describe("what a library plan learns", () => {
  it("shows the measured offset of a slot built from it and suggests the next cut", async () => {
    const { coordinator, slot } = await dayWithSlot();
    const { planRequest } = await getSlotWithContext(coordinator, slot.id);
    const saved = await saveLibraryPlan(coordinator, { name: `Twenty ${Date.now()}`, parameters: plan(planRequest).request, notes: "" });
    await saveSlotPlan(coordinator, slot.id, slot.planParams, saved.id);
    expect((await planOffsets(coordinator, saved.id)).nextCut).toBeNull();

    const outcome = await uploadSweep(coordinator, { kind: "slot", id: slot.id }, { fileName: "s.csv", bytes: bytes(await sweepCsvFor(coordinator, slot.id)), fields: fields() });
    expect(outcome.ok).toBe(true);
    const learned = await planOffsets(coordinator, saved.id);
    expect(learned.entries).toHaveLength(1);
    expect(learned.entries[0].slot).toMatchObject({ id: slot.id, name: "Twenty" });
    expect(learned.means[0]).toMatchObject({ band: "20m", samples: 1 });
    expect(learned.means[0].meanPercent).toBeCloseTo(-2, 0);
    const cut = learned.nextCut!;
    expect(cut.elements[0].suggestedM).toBeCloseTo(cut.elements[0].plannedM * (1 + learned.means[0].meanPercent / 100), 9);
    expect(cut.pieces[0].changeM).toBeLessThan(0);
  });
});
