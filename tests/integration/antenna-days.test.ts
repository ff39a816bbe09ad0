// Antenna days, station slots and shifts against the real PostgreSQL: the rules the database
// keeps under concurrent requests (shift capacity, one sign-up per person and shift, one shift at
// a time per person), the life of a day, its visibility, and copying a past day.
import { eq, sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/server/db";
import { antennaDays, shifts } from "@/server/db/schema";
import { PublicError } from "@/server/errors";
import { copyDay, deleteDay, getDay, listDays, updateDay } from "@/server/services/antenna-days";
import { cancelSignUp, createShift, listShifts, signUp, updateShift } from "@/server/services/shifts";
import { createSlot, getSlotWithContext, listSlots, saveSlotPlan, updateSlot } from "@/server/services/station-slots";
import { dipoleSlot, newDay } from "./antenna-day-helpers";
import { createPerson, publicErrorOf } from "./helpers";

async function publishedDayWithShift(capacity: number, times = { startsAtLocal: "2031-06-14T09:00", endsAtLocal: "2031-06-14T13:00" }) {
  const coordinator = await createPerson("coordinator");
  const day = await newDay(coordinator);
  const slot = await createSlot(coordinator, day.id, dipoleSlot("Twenty", 50, 60));
  const shift = await createShift(coordinator, slot.id, { ...times, capacity });
  await updateDay(coordinator, day.id, { status: "published" });
  return { coordinator, day, slot, shift };
}

describe("shift sign-ups", () => {
  it("gives the last place to exactly one of 20 members signing up at once", async () => {
    const { shift } = await publishedDayWithShift(3);
    const early = await Promise.all([createPerson("member"), createPerson("member")]);
    for (const person of early) await signUp(person, shift.id);
    const racers = await Promise.all(Array.from({ length: 20 }, () => createPerson("member")));
    const results = await Promise.allSettled(racers.map((person) => signUp(person, shift.id)));
    const winners = results.filter((result) => result.status === "fulfilled");
    const losers = results.filter((result): result is PromiseRejectedResult => result.status === "rejected");
    expect(winners).toHaveLength(1);
    expect(losers).toHaveLength(19);
    for (const loser of losers) expect((loser.reason as PublicError).message).toBe("This shift is full.");
    const [row] = await db().select().from(shifts).where(eq(shifts.id, shift.id));
    expect(row.taken).toBe(3);
    const { rows } = await db().execute<{ n: number }>(sql`select count(*)::int as n from shift_signups where shift_id = ${shift.id}`);
    expect(rows[0].n).toBe(3);
  });

  it("lets a person hold one shift at a time, even when both sign-ups arrive together", async () => {
    const { coordinator, day } = await publishedDayWithShift(5);
    const other = await createSlot(coordinator, day.id, dipoleSlot("Twenty two", 150, 60));
    const overlapping = await createShift(coordinator, other.id, { startsAtLocal: "2031-06-14T12:00", endsAtLocal: "2031-06-14T15:00", capacity: 5 });
    const [first] = (await listSlots(coordinator, day.id)).filter((slot) => slot.name === "Twenty");
    const [firstShift] = await listShifts(coordinator, first.id);
    const member = await createPerson("member");
    const results = await Promise.allSettled([signUp(member, firstShift.id), signUp(member, overlapping.id)]);
    expect(results.filter((result) => result.status === "fulfilled")).toHaveLength(1);
    const refused = results.find((result): result is PromiseRejectedResult => result.status === "rejected")!;
    expect((refused.reason as PublicError).message).toMatch(/another shift at that time/);
    // A later, non-overlapping shift is fine; the refused attempt left no place taken.
    const later = await createShift(coordinator, other.id, { startsAtLocal: "2031-06-14T15:00", endsAtLocal: "2031-06-14T17:00", capacity: 1 });
    await signUp(member, later.id);
    const taken = (await listShifts(coordinator, other.id)).map((shift) => shift.taken);
    expect(taken.reduce((sum, n) => sum + n, 0)).toBe(results[1].status === "fulfilled" ? 2 : 1);
  });

  it("refuses a second sign-up for the same shift and counts a cancelled place free again", async () => {
    const { shift } = await publishedDayWithShift(1);
    const member = await createPerson("member");
    const results = await Promise.allSettled([signUp(member, shift.id), signUp(member, shift.id)]);
    expect(results.filter((result) => result.status === "fulfilled")).toHaveLength(1);
    const after = await cancelSignUp(member, shift.id);
    expect(after.taken).toBe(0);
    const other = await createPerson("steward");
    expect((await signUp(other, shift.id)).people.map((person) => person.id)).toEqual([other.id]);
  });

  it("keeps newcomers out of shifts (policy shifts.signUp) and sign-ups closed while a day is a draft", async () => {
    const { shift } = await publishedDayWithShift(2);
    const newcomer = await createPerson("newcomer");
    expect((await publicErrorOf(signUp(newcomer, shift.id))).status).toBe(403);
    const coordinator = await createPerson("coordinator");
    const draft = await newDay(coordinator);
    const slot = await createSlot(coordinator, draft.id, dipoleSlot("Draft station", 50, 60));
    const draftShift = await createShift(coordinator, slot.id, { startsAtLocal: "2031-06-14T10:00", endsAtLocal: "2031-06-14T12:00", capacity: 2 });
    expect((await publicErrorOf(signUp(coordinator, draftShift.id))).message).toMatch(/only while the day is published/);
    const member = await createPerson("member");
    expect((await publicErrorOf(signUp(member, draftShift.id))).status).toBe(404);
  });

  it("moves sign-ups with their shift and refuses a capacity below the people signed up", async () => {
    const { coordinator, shift } = await publishedDayWithShift(2);
    const [a, b] = await Promise.all([createPerson("member"), createPerson("member")]);
    await signUp(a, shift.id);
    await signUp(b, shift.id);
    const tooSmall = await publicErrorOf(updateShift(coordinator, shift.id, { startsAtLocal: "2031-06-14T09:00", endsAtLocal: "2031-06-14T13:00", capacity: 1 }));
    expect(tooSmall.field).toBe("capacity");
    await updateShift(coordinator, shift.id, { startsAtLocal: "2031-06-14T14:00", endsAtLocal: "2031-06-14T16:00", capacity: 2 });
    const { rows } = await db().execute<{ lower: Date }>(sql`select lower(during) as lower from shift_signups where shift_id = ${shift.id}`);
    expect(rows.map((row) => new Date(row.lower).toISOString())).toEqual(["2031-06-14T13:00:00.000Z", "2031-06-14T13:00:00.000Z"]);
    expect((await publicErrorOf(createShift(coordinator, shift.slotId, { startsAtLocal: "2031-06-14T18:00", endsAtLocal: "2031-06-14T19:00", capacity: 1 }))).message).toMatch(/within its day/);
  });
});

describe("the life of an antenna day", () => {
  it("goes draft → published → cancelled, raising the sequence on every change", async () => {
    const coordinator = await createPerson("coordinator");
    const day = await newDay(coordinator);
    expect(day).toMatchObject({ status: "draft", sequence: 0, nextStatuses: ["published", "cancelled"] });
    const edited = await updateDay(coordinator, day.id, { title: "Renamed day" });
    expect(edited.sequence).toBe(1);
    const published = await updateDay(coordinator, day.id, { status: "published" });
    expect(published).toMatchObject({ status: "published", sequence: 2 });
    expect(published.updatedAt > day.updatedAt).toBe(true);
    expect((await publicErrorOf(updateDay(coordinator, day.id, { status: "done" }))).message).toMatch(/only after it has ended/);
    expect((await publicErrorOf(deleteDay(coordinator, day.id))).message).toMatch(/Only drafts can be deleted/);
    const cancelled = await updateDay(coordinator, day.id, { status: "cancelled" });
    expect(cancelled.sequence).toBe(3);
    expect((await publicErrorOf(updateDay(coordinator, day.id, { status: "published" }))).message).toMatch(/cannot change any more/);
    expect((await publicErrorOf(updateDay(coordinator, day.id, { title: "Again" }))).status).toBe(409);
  });

  it("is marked done once it has ended", async () => {
    const coordinator = await createPerson("coordinator");
    const day = await newDay(coordinator);
    await updateDay(coordinator, day.id, { status: "published" });
    await db()
      .update(antennaDays)
      .set({ startsAt: new Date("2020-05-01T08:00:00Z"), endsAt: new Date("2020-05-01T16:00:00Z") })
      .where(eq(antennaDays.id, day.id));
    expect((await updateDay(coordinator, day.id, { status: "done" })).status).toBe("done");
  });

  it("shows drafts to coordinators only; members get not found", async () => {
    const coordinator = await createPerson("coordinator");
    const draft = await newDay(coordinator);
    const member = await createPerson("member");
    expect((await publicErrorOf(getDay(member, draft.id))).status).toBe(404);
    expect((await listDays(member)).some((day) => day.id === draft.id)).toBe(false);
    expect((await listDays(coordinator)).some((day) => day.id === draft.id)).toBe(true);
    expect((await publicErrorOf(updateDay(member, draft.id, { title: "Mine" }))).status).toBe(403);
  });

  it("deletes a draft with its slots and shifts", async () => {
    const coordinator = await createPerson("coordinator");
    const day = await newDay(coordinator);
    const slot = await createSlot(coordinator, day.id, dipoleSlot("Gone", 60, 60));
    await createShift(coordinator, slot.id, { startsAtLocal: "2031-06-14T10:00", endsAtLocal: "2031-06-14T12:00", capacity: 1 });
    await deleteDay(coordinator, day.id);
    expect((await publicErrorOf(getDay(coordinator, day.id))).status).toBe(404);
  });
});

describe("copying a past day", () => {
  it("brings the site, the slots with their plans and places, but not the shifts or sign-ups", async () => {
    const { coordinator, day, slot, shift } = await publishedDayWithShift(2);
    const member = await createPerson("member");
    await signUp(member, shift.id);
    await updateSlot(coordinator, slot.id, { feedlineRunOverrideM: 44, x: 70 });
    await db()
      .update(antennaDays)
      .set({ startsAt: new Date("2021-06-12T08:00:00Z"), endsAt: new Date("2021-06-12T16:00:00Z") })
      .where(eq(antennaDays.id, day.id));
    await updateDay(coordinator, day.id, { status: "done" });

    const copy = await copyDay(coordinator, day.id, { title: "Next year", startsAtLocal: "2032-06-12T09:00", endsAtLocal: "2032-06-12T17:00" });
    expect(copy).toMatchObject({ title: "Next year", status: "draft", copiedFromId: day.id, meetingPoint: "The gate", startsAtLocal: "2032-06-12T09:00" });
    expect(copy.site.id).toBe(day.site.id);
    const [copied] = await listSlots(coordinator, copy.id);
    expect(copied).toMatchObject({ name: "Twenty", x: 70, feedlineRunOverrideM: 44, planParams: slot.planParams, bands: ["20m"] });
    expect(copied.summary).toEqual(slot.summary);
    expect(copied.id).not.toBe(slot.id);
    expect(await listShifts(coordinator, copied.id)).toEqual([]);
  });
});

describe("station slots", () => {
  it("keeps a computed summary and refuses bad plans with the slot's own field named", async () => {
    const coordinator = await createPerson("coordinator");
    const day = await newDay(coordinator);
    const slot = await createSlot(coordinator, day.id, { ...dipoleSlot("Forty", 60, 60), bands: ["40m", "20m"] });
    expect(slot.bands).toEqual(["40m", "20m"]);
    // Cut for 40 m: a half-wave near 20 m long, reaching about 10 m either side of the mast.
    // Source: reference-data.md §2, resonant length table [C] (thin-wire method of moments): K = L_res/(λ0/2) ≈ 0.96–0.97
    // for a 2 mm wire; λ0/2 is 21.1 m at 7.1 MHz, so about 20.3 m in free space; ground and insulators shorten a real
    // wire by a few per cent (common practice). The bounds allow both.
    expect(slot.summary.wireSpanM).toBeGreaterThan(19);
    expect(slot.summary.wireSpanM).toBeLessThan(21.5);
    // common practice (reference-data.md §8): the fall zone is the mast height + the longest wire reach (10 m + half the span).
    expect(slot.summary.fallZoneRadiusM).toBeCloseTo(10 + slot.summary.wireSpanM / 2, 1);
    // common practice: the run is the tent distance (20 m) + the mast height (10 m) + slack of 2 m plus 10 % of the ground run.
    expect(slot.feedlineRun.lengthM).toBeCloseTo(20 + 10 + 2 + 2, 6);

    expect((await publicErrorOf(createSlot(coordinator, day.id, { ...dipoleSlot("Low", 60, 60), planParams: { family: "dipole", heightM: -1, wireDiameterMm: 2, feedlineType: "rg213" } }))).field).toBe("planParams.heightM");
    expect((await publicErrorOf(createSlot(coordinator, day.id, { ...dipoleSlot("CB", 60, 60), bands: ["11m"] }))).field).toBe("bands");
    expect((await publicErrorOf(createSlot(coordinator, day.id, dipoleSlot("Off site", 250, 60)))).field).toBe("x");
    expect((await publicErrorOf(createSlot(coordinator, day.id, dipoleSlot("Forty", 80, 60)))).field).toBe("name");
    const member = await createPerson("member");
    await updateDay(coordinator, day.id, { status: "published" });
    expect((await publicErrorOf(createSlot(member, day.id, dipoleSlot("Mine", 60, 60)))).status).toBe(403);
  });

  it("saves a plan from the plan screen and gives its context", async () => {
    const coordinator = await createPerson("coordinator");
    const day = await newDay(coordinator);
    const slot = await createSlot(coordinator, day.id, dipoleSlot("Twenty", 60, 60));
    const saved = await saveSlotPlan(coordinator, slot.id, { family: "inverted-v", heightM: 12, wireDiameterMm: 2, feedlineType: "rg8x", includedAngleDeg: 100 }, null);
    expect(saved.planParams).toMatchObject({ family: "inverted-v", heightM: 12, includedAngleDeg: 100, conductor: "copper" });
    expect(saved.summary.family).toBe("inverted-v");
    expect(saved.summary.mastHeightM).toBe(12);
    const context = await getSlotWithContext(coordinator, slot.id);
    expect(context.planRequest).toMatchObject({ family: "inverted-v", band: "20m", region: 1, ground: "average", feedline: { type: "rg8x" }, transmitter: { powerW: 100, mode: "ssb" } });
    expect(context.canEdit).toBe(true);
    const member = await createPerson("member");
    await updateDay(coordinator, day.id, { status: "published" });
    expect((await getSlotWithContext(member, slot.id)).canEdit).toBe(false);
    expect((await publicErrorOf(saveSlotPlan(member, slot.id, saved.planParams, null))).status).toBe(403);
  });
});
