// Station kits and requests tied to antenna days, against the real PostgreSQL and the engine's
// worker pool: the coax runs suggested for a slot (type, length, availability) with the loss and
// SWR the engine computes for each actual run, booking one (the slot's plan then uses it), and
// the database keeping one booking per coax run and time, and one feedline per slot, under
// concurrent keepers.
// Source: Guyline issue 5 ("Gear shelf and lending desk"), item 4 "Station kits" and its "Tests".
import { and, eq, isNull } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { plan } from "@/lib/antenna/plan";
import { runFigures, withFeedline } from "@/lib/station-kits/run-figures";
import { db } from "@/server/db";
import { gearBookings, gearItems } from "@/server/db/schema";
import { PublicError } from "@/server/errors";
import { createDay, updateDay } from "@/server/services/antenna-days";
import { retireItem } from "@/server/services/gear";
import { requestBooking, stepBooking } from "@/server/services/lending";
import { createSite } from "@/server/services/sites";
import { antennaDayLabels, bookKit, dayKit, requestForAntennaDay, slotKit, upcomingDayChoices } from "@/server/services/station-kits";
import { createSlot, getSlotWithFeedline } from "@/server/services/station-slots";
import { createPerson, publicErrorOf } from "./helpers";
import { addAnalyser, addCoaxRun, testSteward } from "./gear-helpers";

let dayCounter = 0;

/**
 * A published day on a long field with one 20 m dipole slot (10 m high) whose tent is `tentDistanceM`
 * east of the mast, so its feedline run is 1.1 × distance + 12 m. Each test picks a distance whose
 * run no other test's coax suits, so the suggestions hold only its own runs.
 */
async function dayWithSlot(tentDistanceM: number, options: { slots?: number; date?: string } = {}) {
  dayCounter += 1;
  const coordinator = await createPerson("coordinator");
  const site = await createSite(coordinator, {
    name: `Kit field ${Date.now()}-${dayCounter}`,
    widthM: 800,
    depthM: 100,
    groundClass: "average",
    groundConductivitySm: null,
    groundRelativePermittivity: null,
    notes: "",
    hazards: [],
  });
  const date = options.date ?? `2032-05-${String(dayCounter).padStart(2, "0")}`;
  const day = await createDay(coordinator, {
    title: `Kit day ${dayCounter}`,
    siteId: site.id,
    startsAtLocal: `${date}T09:00`,
    endsAtLocal: `${date}T17:00`,
    meetingPoint: "",
    description: "",
    safetyLeadId: coordinator.id,
  });
  const slots = [];
  for (let index = 0; index < (options.slots ?? 1); index++) {
    slots.push(
      await createSlot(coordinator, day.id, {
        name: `Twenty ${index + 1}`,
        bands: ["20m"],
        powerW: 100,
        mode: "ssb",
        planParams: { family: "dipole", heightM: 10, wireDiameterMm: 2, feedlineType: "rg213" },
        x: 10,
        y: 20 + 30 * index,
        azimuthDeg: 0,
        tentX: 10 + tentDistanceM,
        tentY: 20 + 30 * index,
        feedlineRunOverrideM: null,
      }),
    );
  }
  const published = await updateDay(coordinator, day.id, { status: "published" });
  return { coordinator, day: published, slots, slot: slots[0], runM: slots[0].feedlineRun.lengthM };
}

describe("coax runs suggested for a station slot", () => {
  it("offers free runs of a fitting type and length, best first, each with the engine's loss and SWR for that run", async () => {
    const { slot, day, runM } = await dayWithSlot(90);
    expect(runM).toBeCloseTo(111, 6);
    const steward = await testSteward();
    // The shelf holds only this test's runs, also on a test database used before.
    await db().update(gearItems).set({ condition: "retired", retiredAt: new Date() }).where(and(eq(gearItems.kind, "coax"), isNull(gearItems.retiredAt)));
    const add = (cableType: "rg213" | "rg8x" | "rg6", lengthM: number, condition: "good" | "needs_repair" = "good") => addCoaxRun({ cableType, lengthM, condition });
    const best = await add("rg213", 113);
    const longer = await add("rg213", 131);
    const lossier = await add("rg8x", 116);
    const tooShort = await add("rg213", 108);
    const tooLong = await add("rg213", 170);
    const wrongImpedance = await add("rg6", 113);
    const taken = await add("rg213", 112);
    const broken = await add("rg213", 114, "needs_repair");
    const retired = await add("rg213", 115);
    await retireItem(steward, retired.id, "Jacket cracked");
    // A member has the 112 m run for the afternoon of the day: it is not free for the whole day.
    const member = await createPerson("member");
    await requestBooking(member, { itemId: taken.id, startsAt: `${day.startsAtLocal.slice(0, 10)}T13:00`, endsAt: `${day.startsAtLocal.slice(0, 10)}T15:00` });

    const kit = await slotKit(steward, slot.id);
    expect(kit.need).toMatchObject({ runM, plannedLine: "rg213", transformer: "1:1", powerW: 100 });
    // common practice: at most half as long again as the run.
    expect(kit.need.longestRunM).toBeCloseTo(166.5, 6);
    expect(kit.coax.map((candidate) => candidate.item.id)).toEqual([best.id, longer.id, lossier.id]);
    for (const excluded of [tooShort, tooLong, wrongImpedance, taken, broken, retired]) {
      expect(kit.coax.map((candidate) => candidate.item.id)).not.toContain(excluded.id);
    }

    // Each candidate's figures are the engine's plan of the slot with that actual run.
    const { planRequest } = await getSlotWithFeedline(steward, slot.id);
    for (const candidate of kit.coax) {
      const direct = runFigures(plan(withFeedline(planRequest, { type: candidate.item.cableType!, lengthM: candidate.item.lengthM! })));
      expect(candidate.figures).toEqual(direct);
      expect(candidate.figures.feedline).toEqual({ type: candidate.item.cableType, label: expect.any(String), lengthM: candidate.item.lengthM });
    }
    const [bestBand] = kit.coax[0].figures.bands;
    // Source: reference-data.md §5 (ARRL Antenna Book (recent editions), Transmission Lines chapter, from memory, ±20 %):
    // RG-213 loses about 0.6 dB per 100 ft at 10 MHz, × √(14.175/10) at the band's centre: 2.34 dB per 100 m, so 113 m lose about 2.65 dB.
    expect(Math.abs(bestBand.matchedLossDb - 2.65) / 2.65).toBeLessThan(0.2);
    expect(bestBand.totalLossDb).toBeGreaterThanOrEqual(bestBand.matchedLossDb);
    // More line, more loss; and a lossier line hides more of the antenna's mismatch from the radio.
    // Source: ARRL Antenna Book (recent editions), Transmission Lines chapter (SWR at the input from the load's SWR and the line's loss).
    const losses = kit.coax.map((candidate) => candidate.figures.bands[0].matchedLossDb);
    expect(losses).toEqual([...losses].sort((a, b) => a - b));
    const radioSwr = kit.coax.map((candidate) => candidate.figures.bands[0].swrAtRadio);
    expect(radioSwr[2]).toBeLessThanOrEqual(radioSwr[0]);

    // The run in use is the slot's own, as the engine computes it.
    expect(kit.current.feedline).toBeNull();
    expect(kit.current.figures).toEqual(runFigures(plan(planRequest)));
  });

  it("is for keepers: a member may neither see nor book a slot's kit", async () => {
    const { slot } = await dayWithSlot(95);
    const member = await createPerson("member");
    expect((await publicErrorOf(slotKit(member, slot.id))).status).toBe(403);
    const item = await addCoaxRun({ lengthM: 120 });
    expect((await publicErrorOf(bookKit(member, slot.id, { itemId: item.id }))).status).toBe(403);
    expect((await publicErrorOf(slotKit(await testSteward(), "00000000-0000-4000-8000-00000000abcd"))).status).toBe(404);
  });
});

describe("booking a coax run for a station slot", () => {
  it("books it for the day, approved at once, and the slot's plan uses that run from then on", async () => {
    const { slot, day, runM, coordinator } = await dayWithSlot(160);
    expect(runM).toBeCloseTo(188, 6);
    const steward = await testSteward();
    const run = await addCoaxRun({ cableType: "rg213", lengthM: 195, name: "RG-213 run, 195 m" });
    const other = await addCoaxRun({ cableType: "rg213", lengthM: 200 });

    const { booking, outcome } = await bookKit(steward, slot.id, { itemId: run.id });
    expect(outcome).toBe("approved");
    expect(booking).toMatchObject({ state: "approved", itemId: run.id, antennaDayId: day.id, stationSlotId: slot.id, slotFeedline: true, startsAt: day.startsAt, endsAt: day.endsAt });

    const context = await getSlotWithFeedline(coordinator, slot.id);
    expect(context.feedline).toMatchObject({ bookingId: booking.id, labelCode: run.labelCode, name: "RG-213 run, 195 m", cableType: "rg213", lengthM: 195 });
    expect(context.planRequest.feedline).toEqual({ type: "rg213", lengthM: 195 });

    const kit = await slotKit(steward, slot.id);
    expect(kit.current.feedline?.labelCode).toBe(run.labelCode);
    expect(kit.current.figures.feedline.lengthM).toBe(195);
    expect(kit.coax).toEqual([]);
    expect(kit.booked.map((entry) => entry.id)).toEqual([booking.id]);
    const overview = await dayKit(steward, day.id);
    expect(overview.slots[0].feedline?.labelCode).toBe(run.labelCode);

    // One feedline per slot: another run waits until this booking is cancelled.
    const second = await publicErrorOf(bookKit(steward, slot.id, { itemId: other.id }));
    expect(second.code).toBe("conflict");
    expect(second.message).toContain(`already has a coax run booked as its feedline (${run.labelCode})`);

    await stepBooking(steward, booking.id, { action: "cancel" });
    const after = await getSlotWithFeedline(coordinator, slot.id);
    expect(after.feedline).toBeNull();
    expect(after.planRequest.feedline).toEqual({ type: "rg213", lengthM: runM });
    expect((await bookKit(steward, slot.id, { itemId: other.id })).booking.slotFeedline).toBe(true);
  });

  it("refuses a run that does not suit the slot, naming why", async () => {
    const { slot } = await dayWithSlot(165);
    const short = await addCoaxRun({ cableType: "rg213", lengthM: 150 });
    const refused = await publicErrorOf(bookKit(await testSteward(), slot.id, { itemId: short.id }));
    expect(refused.code).toBe("bad-input");
    expect(refused.field).toBe("itemId");
    expect(refused.message).toMatch(/shorter than the slot's feedline run of 193.5 m/);
  });

  it("is refused with the next free time when another booking holds the run", async () => {
    const { slot, day, runM } = await dayWithSlot(260);
    expect(runM).toBeCloseTo(298, 6);
    const run = await addCoaxRun({ cableType: "rg213", lengthM: 300 });
    const member = await createPerson("member");
    // Coax runs are approved at once when free: the member's morning booking holds it.
    const date = day.startsAtLocal.slice(0, 10);
    const held = await requestBooking(member, { itemId: run.id, startsAt: `${date}T08:00`, endsAt: `${date}T12:00` });
    expect(held.outcome).toBe("approved");

    const refused = await publicErrorOf(bookKit(await testSteward(), slot.id, { itemId: run.id }));
    expect(refused.code).toBe("conflict");
    expect(refused.message).toMatch(/already booked for part of that time/);
    expect(refused.details?.nextFreeStart).toBe(held.booking.endsAt);
    const rows = await db().select().from(gearBookings).where(eq(gearBookings.itemId, run.id));
    expect(rows.map((row) => row.state)).toEqual(["approved"]);
  });

  it("gives one coax run to exactly one of two keepers booking it for two slots at once", async () => {
    const { slots, coordinator } = await dayWithSlot(420, { slots: 2 });
    expect(slots[1].feedlineRun.lengthM).toBeCloseTo(474, 6);
    const run = await addCoaxRun({ cableType: "rg213", lengthM: 480 });
    const results = await Promise.allSettled([bookKit(await testSteward(), slots[0].id, { itemId: run.id }), bookKit(coordinator, slots[1].id, { itemId: run.id })]);
    expect(results.filter((result) => result.status === "fulfilled")).toHaveLength(1);
    const [loser] = results.filter((result): result is PromiseRejectedResult => result.status === "rejected");
    expect((loser.reason as PublicError).code).toBe("conflict");
    expect((loser.reason as PublicError).details?.nextFreeStart).toBeDefined();
    const rows = await db().select().from(gearBookings).where(eq(gearBookings.itemId, run.id));
    expect(rows.filter((row) => row.state === "approved")).toHaveLength(1);
  });

  it("gives a slot exactly one feedline when two keepers book two runs for it at once", async () => {
    const { slot, coordinator, runM } = await dayWithSlot(650);
    expect(runM).toBeCloseTo(727, 6);
    const [one, two] = await Promise.all([addCoaxRun({ cableType: "rg213", lengthM: 730 }), addCoaxRun({ cableType: "rg213", lengthM: 740 })]);
    const results = await Promise.allSettled([bookKit(await testSteward(), slot.id, { itemId: one.id }), bookKit(coordinator, slot.id, { itemId: two.id })]);
    expect(results.filter((result) => result.status === "fulfilled")).toHaveLength(1);
    const [loser] = results.filter((result): result is PromiseRejectedResult => result.status === "rejected");
    expect((loser.reason as PublicError).message).toMatch(/already has a coax run booked as its feedline/);
    const rows = await db().select().from(gearBookings).where(eq(gearBookings.stationSlotId, slot.id));
    expect(rows.filter((row) => row.state === "approved" && row.slotFeedline)).toHaveLength(1);
  });
});

describe("requests tied to an antenna day", () => {
  it("run from the day's start to its end and name the day and the slot", async () => {
    const { day, slot } = await dayWithSlot(20, { slots: 1 });
    const member = await createPerson("member");
    const analyser = await addAnalyser();
    const choices = await upcomingDayChoices(member);
    expect(choices.find((choice) => choice.id === day.id)).toMatchObject({ title: day.title, startsAt: day.startsAt, endsAt: day.endsAt, slots: [{ id: slot.id, name: slot.name }] });

    const { booking, outcome } = await requestForAntennaDay(member, { itemId: analyser.id, antennaDayId: day.id, stationSlotId: slot.id, note: "Tuning the dipole" });
    expect(outcome).toBe("requested");
    expect(booking).toMatchObject({ startsAt: day.startsAt, endsAt: day.endsAt, antennaDayId: day.id, stationSlotId: slot.id, note: "Tuning the dipole", slotFeedline: false });
    expect((await antennaDayLabels([booking])).get(booking.id)).toBe(`${day.title} · ${slot.name}`);
  });

  it("refuses a slot of another day, a day the member cannot see, and a cancelled day", async () => {
    const first = await dayWithSlot(25);
    const second = await dayWithSlot(30);
    const member = await createPerson("member");
    const analyser = await addAnalyser();
    const wrongSlot = await publicErrorOf(requestForAntennaDay(member, { itemId: analyser.id, antennaDayId: first.day.id, stationSlotId: second.slot.id }));
    expect(wrongSlot.field).toBe("stationSlotId");

    const draft = await createDay(first.coordinator, { title: "Draft day", siteId: first.day.site.id, startsAtLocal: "2032-07-01T09:00", endsAtLocal: "2032-07-01T17:00", meetingPoint: "", description: "", safetyLeadId: first.coordinator.id });
    expect((await publicErrorOf(requestForAntennaDay(member, { itemId: analyser.id, antennaDayId: draft.id }))).status).toBe(404);
    expect((await upcomingDayChoices(first.coordinator)).map((choice) => choice.id)).not.toContain(draft.id);

    await updateDay(second.coordinator, second.day.id, { status: "cancelled" });
    expect((await publicErrorOf(requestForAntennaDay(member, { itemId: analyser.id, antennaDayId: second.day.id }))).code).toBe("conflict");
  });
});
