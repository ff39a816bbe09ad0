// The lending desk against the real PostgreSQL: concurrency, roles, co-signs and the waitlist.
// Source: Guyline issue 5 ("Gear shelf and lending desk"), its "Tests" section.
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db, pool } from "@/server/db";
import { gearBookings } from "@/server/db/schema";
import { PublicError, pgErrorCodes } from "@/server/errors";
import { bookForStation, getBooking, itemHistory, itemWaitlist as itemWaitlistOf, joinWaitlist, listBookings, requestBooking, settleLapsedOffers, stepBooking, stepWaitlist } from "@/server/services/lending";
import { createDay } from "@/server/services/antenna-days";
import { createSite } from "@/server/services/sites";
import { createSlot } from "@/server/services/station-slots";
import { bookingListQuerySchema } from "@/validations/lending";
import { createPerson, publicErrorOf } from "./helpers";
import { addAnalyser, addCoaxRun, clubTime, testSteward } from "./gear-helpers";

describe("no double-booking", () => {
  it("gives exactly one of 20 concurrent requests for the same time, and the others the next free time", async () => {
    const item = await addCoaxRun();
    const members = await Promise.all(Array.from({ length: 20 }, () => createPerson("member")));
    const results = await Promise.allSettled(
      members.map((member, index) =>
        // Overlapping ranges: each starts a few minutes later than the one before.
        requestBooking(member, { itemId: item.id, startsAt: clubTime(3, 9).replace(":00", `:${String(index).padStart(2, "0")}`), endsAt: clubTime(3, 17) }),
      ),
    );
    const won = results.filter((result) => result.status === "fulfilled");
    expect(won).toHaveLength(1);
    const approved = await db().select().from(gearBookings).where(eq(gearBookings.itemId, item.id));
    expect(approved.filter((booking) => booking.state === "approved")).toHaveLength(1);
    const winnerEnd = approved[0].endsAt.toISOString();
    for (const result of results.filter((result) => result.status === "rejected")) {
      const error = result.reason as PublicError;
      expect(error.code).toBe("conflict");
      expect(error.message).toMatch(/free again from/);
      expect(error.details?.nextFreeStart).toBe(winnerEnd);
      expect(error.details?.canJoinWaitlist).toBe(true);
    }
  });

  it("lets only one of many concurrent approvals of overlapping requests win", async () => {
    const item = await addAnalyser();
    const steward = await testSteward();
    const members = await Promise.all(Array.from({ length: 8 }, () => createPerson("member")));
    const requests = [];
    for (const member of members) {
      const result = await requestBooking(member, { itemId: item.id, startsAt: clubTime(4, 10), endsAt: clubTime(4, 12) });
      expect(result.outcome).toBe("requested");
      requests.push(result.booking.id);
    }
    const approvals = await Promise.allSettled(requests.map((id) => stepBooking(steward, id, { action: "approve" })));
    expect(approvals.filter((result) => result.status === "fulfilled")).toHaveLength(1);
    const rows = await db().select().from(gearBookings).where(eq(gearBookings.itemId, item.id));
    expect(rows.filter((booking) => booking.state === "approved")).toHaveLength(1);
  });

  it("is enforced by PostgreSQL itself: an overlapping approved row cannot be inserted even around the services", async () => {
    const item = await addCoaxRun();
    const member = await createPerson("member");
    const insert = (start: string, end: string) =>
      pool().query("insert into gear_bookings (item_id, borrower_id, starts_at, ends_at, state) values ($1, $2, $3, $4, 'approved')", [item.id, member.id, start, end]);
    await insert("2030-01-01T09:00Z", "2030-01-01T12:00Z");
    // Half-open periods: ending at 12:00 and starting at 12:00 do not overlap.
    // Source: PostgreSQL 15 documentation, §8.17 Range Types (inclusive and exclusive bounds, the && operator).
    await insert("2030-01-01T12:00Z", "2030-01-01T15:00Z");
    await expect(insert("2030-01-01T11:00Z", "2030-01-01T13:00Z")).rejects.toMatchObject({ code: pgErrorCodes.exclusionViolation, constraint: "gear_bookings_no_overlap" });
    // A mere request may overlap: requests do not hold time.
    await pool().query("insert into gear_bookings (item_id, borrower_id, starts_at, ends_at, state) values ($1, $2, $3, $4, 'requested')", [item.id, member.id, "2030-01-01T11:00Z", "2030-01-01T13:00Z"]);
  });
});

describe("who may approve", () => {
  it("refuses a member and lets a steward approve, keeping both in the history", async () => {
    const item = await addAnalyser();
    const member = await createPerson("member");
    const other = await createPerson("member");
    const { booking, outcome } = await requestBooking(member, { itemId: item.id, startsAt: clubTime(5, 9), endsAt: clubTime(5, 18) });
    expect(outcome).toBe("requested");
    expect((await publicErrorOf(stepBooking(member, booking.id, { action: "approve" }))).status).toBe(403);
    // Someone else's booking is not even visible to another member.
    expect((await publicErrorOf(stepBooking(other, booking.id, { action: "approve" }))).status).toBe(404);
    const steward = await testSteward();
    const approved = await stepBooking(steward, booking.id, { action: "approve", note: "Enjoy" });
    expect(approved.booking.state).toBe("approved");
    const history = await itemHistory(steward, item.id);
    expect(history.map((entry) => entry.event)).toEqual(expect.arrayContaining(["request", "approve"]));
  });
});

describe("a newcomer's analyser request", () => {
  it("cannot be approved without a mentor's co-sign, and can after it", async () => {
    const item = await addAnalyser();
    const newcomer = await createPerson("newcomer");
    const steward = await testSteward();
    const { booking, outcome } = await requestBooking(newcomer, { itemId: item.id, startsAt: clubTime(6, 9), endsAt: clubTime(6, 17) });
    expect(outcome).toBe("awaiting-co-sign");
    const refused = await publicErrorOf(stepBooking(steward, booking.id, { action: "approve" }));
    expect(refused.code).toBe("conflict");
    expect(refused.message).toMatch(/mentor has to co-sign/);

    const notAMentor = await createPerson("member");
    expect((await publicErrorOf(stepBooking(notAMentor, booking.id, { action: "co-sign" }))).status).toBe(404);
    const mentor = await createPerson("member", { isMentor: true });
    // A mentor sees the request while it waits for a co-sign.
    expect((await getBooking(mentor, booking.id)).awaitingCoSign).toBe(true);
    const coSigned = await stepBooking(mentor, booking.id, { action: "co-sign" });
    expect(coSigned.booking.state).toBe("requested");
    expect(coSigned.booking.awaitingCoSign).toBe(false);
    const approved = await stepBooking(steward, booking.id, { action: "approve" });
    expect(approved.booking.state).toBe("approved");
  });

  it("is also refused by the database if a row skips the co-sign", async () => {
    const item = await addAnalyser();
    const newcomer = await createPerson("newcomer");
    await expect(
      pool().query("insert into gear_bookings (item_id, borrower_id, starts_at, ends_at, state, co_sign_required) values ($1, $2, now() + interval '1 day', now() + interval '2 days', 'approved', true)", [item.id, newcomer.id]),
    ).rejects.toMatchObject({ constraint: "gear_bookings_co_sign_before_approval" });
  });
});

describe("the waitlist", () => {
  it("offers the item to the next in line when a booking is cancelled, and the offer becomes a booking", async () => {
    const item = await addCoaxRun();
    const [first, second, third] = await Promise.all([createPerson("member"), createPerson("member"), createPerson("member")]);
    const { booking } = await requestBooking(first, { itemId: item.id, startsAt: clubTime(7, 9), endsAt: clubTime(7, 17) });
    expect(booking.state).toBe("approved");

    const taken = await publicErrorOf(requestBooking(second, { itemId: item.id, startsAt: clubTime(7, 10), endsAt: clubTime(7, 12) }));
    expect(taken.details?.canJoinWaitlist).toBe(true);
    const secondEntry = await joinWaitlist(second, { itemId: item.id, startsAt: clubTime(7, 10), endsAt: clubTime(7, 12) });
    const thirdEntry = await joinWaitlist(third, { itemId: item.id, startsAt: clubTime(7, 11), endsAt: clubTime(7, 13) });
    expect(secondEntry.state).toBe("waiting");

    const cancelled = await stepBooking(first, booking.id, { action: "cancel" });
    expect(cancelled.booking.state).toBe("cancelled");
    // The second in line is offered it; the third's time overlaps the offer, so they keep waiting.
    expect(cancelled.offered.map((offer) => offer.userId)).toEqual([second.id]);

    // While the offer is open, the time is held for the person offered.
    const held = await publicErrorOf(requestBooking(third, { itemId: item.id, startsAt: clubTime(7, 11), endsAt: clubTime(7, 13) }));
    expect(held.code).toBe("conflict");

    const accepted = await stepWaitlist(second, secondEntry.id, "accept");
    expect(accepted.entry.state).toBe("accepted");
    expect(accepted.booking?.state).toBe("approved");
    expect(accepted.booking?.borrowerId).toBe(second.id);
    expect((await itemWaitlistOf(third, item.id)).find((entry) => entry.id === thirdEntry.id)?.state).toBe("waiting");
  });

  it("passes a lapsed offer on to the next in line", async () => {
    const item = await addCoaxRun();
    const [holder, second, third] = await Promise.all([createPerson("member"), createPerson("member"), createPerson("member")]);
    const { booking } = await requestBooking(holder, { itemId: item.id, startsAt: clubTime(9, 9), endsAt: clubTime(9, 17) });
    const secondEntry = await joinWaitlist(second, { itemId: item.id, startsAt: clubTime(9, 9), endsAt: clubTime(9, 12) });
    const thirdEntry = await joinWaitlist(third, { itemId: item.id, startsAt: clubTime(9, 10), endsAt: clubTime(9, 11) });
    const { offered } = await stepBooking(holder, booking.id, { action: "cancel" });
    expect(offered.map((offer) => offer.userId)).toEqual([second.id]);
    // Two days later the offer has lapsed unanswered; settling passes the time on to the third.
    const later = new Date(Date.now() + 2 * 86_400_000);
    const passedOn = await settleLapsedOffers(later);
    expect(passedOn.filter((offer) => offer.itemId === item.id).map((offer) => offer.userId)).toEqual([third.id]);
    const lapsed = await publicErrorOf(stepWaitlist(second, secondEntry.id, "accept", later));
    expect(lapsed.message).toMatch(/lapsed/);
    const entry = await stepWaitlist(third, thirdEntry.id, "accept", later);
    expect(entry.booking?.state).toBe("approved");
  });
});

/** A real antenna day with one station slot: bookings name them through foreign keys. */
async function dayWithSlot(): Promise<{ dayId: string; slotId: string }> {
  const coordinator = await createPerson("coordinator");
  const site = await createSite(coordinator, { name: `Loan field ${randomUUID()}`, widthM: 100, depthM: 100, groundClass: "average", groundConductivitySm: null, groundRelativePermittivity: null, notes: "", hazards: [] });
  const day = await createDay(coordinator, { title: "Loan day", siteId: site.id, startsAtLocal: clubTime(10, 8), endsAtLocal: clubTime(10, 18), meetingPoint: "", description: "", safetyLeadId: coordinator.id });
  const slot = await createSlot(coordinator, day.id, {
    name: "Twenty",
    bands: ["20m"],
    powerW: 100,
    mode: "ssb",
    planParams: { family: "dipole", heightM: 10, wireDiameterMm: 2, feedlineType: "rg213" },
    x: 50,
    y: 50,
    azimuthDeg: 0,
    tentX: 50,
    tentY: 30,
    feedlineRunOverrideM: null,
  });
  return { dayId: day.id, slotId: slot.id };
}

describe("a whole loan", () => {
  it("goes from request to return, and a station booking is approved at once for a keeper", async () => {
    const item = await addCoaxRun();
    const member = await createPerson("member");
    const steward = await testSteward();
    const { booking } = await requestBooking(member, { itemId: item.id, startsAt: clubTime(0, 0), endsAt: clubTime(2, 12) });
    const out = await stepBooking(steward, booking.id, { action: "hand-out", condition: "good" });
    expect(out.booking).toMatchObject({ state: "out", handedOutByName: "Test steward", handOutCondition: "good" });
    const returned = await stepBooking(member, booking.id, { action: "return", condition: "worn", damageNotes: "Boot split at one end" });
    expect(returned.booking).toMatchObject({ state: "returned", returnCondition: "worn", damageNotes: "Boot split at one end" });
    const again = await publicErrorOf(stepBooking(member, booking.id, { action: "cancel" }));
    expect(again.code).toBe("conflict");

    const { dayId, slotId } = await dayWithSlot();
    const kit = await bookForStation(steward, { itemId: item.id, startsAt: clubTime(10, 8), endsAt: clubTime(10, 18), antennaDayId: dayId, stationSlotId: slotId });
    expect(kit.booking).toMatchObject({ state: "approved", antennaDayId: dayId, stationSlotId: slotId });
    expect((await publicErrorOf(bookForStation(member, { itemId: item.id, startsAt: clubTime(11, 8), endsAt: clubTime(11, 18), antennaDayId: dayId }))).status).toBe(403);
  });

  it("shows members only their own bookings in the loans table", async () => {
    const item = await addCoaxRun();
    const [one, two] = await Promise.all([createPerson("member"), createPerson("member")]);
    await requestBooking(one, { itemId: item.id, startsAt: clubTime(12, 9), endsAt: clubTime(12, 10) });
    await requestBooking(two, { itemId: item.id, startsAt: clubTime(12, 11), endsAt: clubTime(12, 12) });
    const query = bookingListQuerySchema.parse({ itemId: item.id });
    expect((await listBookings(one, query)).rows.map((row) => row.borrowerId)).toEqual([one.id]);
    expect((await listBookings(await testSteward(), query)).rowCount).toBe(2);
  });
});
