// The demo gear shelf: about forty invented items across the kinds, and bookings in every state
// around the time the seed runs (some overdue, one with a waitlist, a newcomer's analyser request
// waiting for a mentor's co-sign). Runs once: it does nothing when the shelf has items.
import { eq } from "drizzle-orm";
import { Temporal } from "temporal-polyfill";
import { wallTimeToInstant } from "@/lib/time";
import type { Transaction } from "@/server/db";
import { gearBookings, gearHistory, gearItems, gearWaitlist } from "@/server/db/schema";
import { defaultApprovalRule } from "@/lib/gear/kinds";
import type { BookingState } from "@/lib/lending/states";
import { demoUserId } from "./people";

type ItemSeed = Omit<typeof gearItems.$inferInsert, "approvalRule"> & { approvalRule?: "automatic" | "steward" };

const coax = (labelCode: string, name: string, cableType: "rg58" | "rg8x" | "rg213" | "rg174" | "rg6" | "window450", lengthM: number, connectorA: "pl259" | "n" | "bnc" | "sma" | "f" | "bare", connectorB = connectorA, location = "Coax crate A"): ItemSeed => ({
  labelCode,
  name,
  kind: "coax",
  location,
  cableType,
  lengthM,
  connectorA,
  connectorB,
});

export const demoItems: ItemSeed[] = [
  { labelCode: "AN-01", name: "Field analyser, 1–60 MHz", kind: "analyser", location: "Steward's cupboard, shelf 1", minMhz: 1, maxMhz: 60, batteryCheckedOn: "2026-03-02", calibrationCheckedOn: "2026-01-15" },
  { labelCode: "AN-02", name: "Pocket analyser, HF", kind: "analyser", location: "Steward's cupboard, shelf 1", minMhz: 1.8, maxMhz: 30, batteryCheckedOn: "2026-02-20", calibrationCheckedOn: null },
  { labelCode: "AN-03", name: "Bench analyser, 0.1–170 MHz", kind: "analyser", location: "Steward's cupboard, shelf 2", minMhz: 0.1, maxMhz: 170, batteryCheckedOn: "2026-03-10", calibrationCheckedOn: "2025-11-30" },
  { labelCode: "AN-04", name: "Vector analyser, 1–600 MHz", kind: "analyser", condition: "needs_repair", location: "Repair box", minMhz: 1, maxMhz: 600, batteryCheckedOn: null, calibrationCheckedOn: "2025-06-01", notes: "Display flickers below 10 °C." },
  { labelCode: "AN-05", name: "Old HF bridge", kind: "analyser", condition: "retired", retiredAt: new Date("2026-01-20T12:00:00Z"), location: "Loft", minMhz: 1.8, maxMhz: 30, notes: "Kept for spares." },
  coax("CX-01", "RG-213 run, 30 m", "rg213", 30, "pl259"),
  coax("CX-02", "RG-213 run, 20 m", "rg213", 20, "pl259"),
  coax("CX-03", "RG-213 run, 15 m", "rg213", 15, "pl259", "n"),
  coax("CX-04", "RG-8X run, 25 m", "rg8x", 25, "pl259"),
  coax("CX-05", "RG-8X run, 12 m", "rg8x", 12, "pl259"),
  coax("CX-06", "RG-8X run, 8 m", "rg8x", 8, "pl259", "bnc"),
  coax("CX-07", "RG-58 patch run, 5 m", "rg58", 5, "bnc", "pl259", "Coax crate B"),
  coax("CX-08", "RG-58 run, 18 m", "rg58", 18, "bnc", "bnc", "Coax crate B"),
  coax("CX-09", "RG-174 jumper, 1 m", "rg174", 1, "sma", "bnc", "Coax crate B"),
  coax("CX-10", "RG-6 run, 40 m (75 Ω)", "rg6", 40, "f", "f", "Coax crate B"),
  coax("CX-11", "450 Ω window line, 20 m", "window450", 20, "bare", "bare", "Wire drawer"),
  coax("CX-12", "RG-213 run, 50 m", "rg213", 50, "n", "n"),
  // Runs for the station kits of the demo's antenna days (feedline runs of about 19 to 32 m).
  coax("CX-13", "RG-213 run, 35 m", "rg213", 35, "pl259"),
  coax("CX-14", "RG-213 run, 40 m", "rg213", 40, "pl259", "n"),
  coax("CX-15", "RG-8X run, 35 m", "rg8x", 35, "pl259"),
  coax("CX-16", "RG-58 run, 32 m", "rg58", 32, "bnc", "pl259", "Coax crate B"),
  coax("CX-17", "RG-213 run, 25 m", "rg213", 25, "pl259"),
  { labelCode: "MA-01", name: "Fibreglass push-up mast, 10 m", kind: "mast", location: "Mast rack", heightM: 10, guyKit: "2 levels × 3 guys, 6 stakes, guy plates" },
  { labelCode: "MA-02", name: "Fibreglass push-up mast, 12 m", kind: "mast", location: "Mast rack", heightM: 12, guyKit: "3 levels × 3 guys, 9 stakes" },
  { labelCode: "MA-03", name: "Aluminium sectional mast, 6 m", kind: "mast", location: "Mast rack", heightM: 6, guyKit: "1 level × 4 guys, 4 stakes", condition: "worn" },
  { labelCode: "MA-04", name: "Telescopic mast, 18 m", kind: "mast", location: "Trailer", heightM: 18, guyKit: "4 levels × 3 guys, 12 stakes, winch", notes: "Two people to raise; never near overhead lines." },
  { labelCode: "MA-05", name: "Tripod mast, 4 m", kind: "mast", location: "Mast rack", heightM: 4, guyKit: "none (tripod with sandbags)" },
  { labelCode: "BU-01", name: "Current balun 1:1, 1 kW", kind: "balun", location: "Balun box", transformerStyle: "balun", transformerRatio: "1:1", powerRatingW: 1000 },
  { labelCode: "BU-02", name: "Balun 4:1, 500 W", kind: "balun", location: "Balun box", transformerStyle: "balun", transformerRatio: "4:1", powerRatingW: 500 },
  { labelCode: "BU-03", name: "End-fed unun 49:1, 100 W", kind: "balun", location: "Balun box", transformerStyle: "unun", transformerRatio: "49:1", powerRatingW: 100 },
  { labelCode: "BU-04", name: "Unun 9:1, 200 W", kind: "balun", location: "Balun box", transformerStyle: "unun", transformerRatio: "9:1", powerRatingW: 200 },
  { labelCode: "BU-05", name: "Current balun 1:1, 200 W", kind: "balun", location: "Balun box", transformerStyle: "balun", transformerRatio: "1:1", powerRatingW: 200 },
  { labelCode: "TU-01", name: "Manual T-network tuner", kind: "tuner", location: "Radio shelf" },
  { labelCode: "TU-02", name: "Automatic tuner, 100 W", kind: "tuner", location: "Radio shelf" },
  { labelCode: "TU-03", name: "Balanced-line tuner", kind: "tuner", location: "Radio shelf", condition: "worn" },
  { labelCode: "PW-01", name: "Petrol generator, 2 kW", kind: "power", location: "Shed", notes: "Fuel can stored separately. Run outdoors only." },
  { labelCode: "PW-02", name: "Battery box, 100 Ah LiFePO4", kind: "power", location: "Radio shelf" },
  { labelCode: "PW-03", name: "Bench power supply, 30 A", kind: "power", location: "Radio shelf" },
  { labelCode: "PW-04", name: "Folding solar panel, 120 W", kind: "power", location: "Shed" },
  { labelCode: "RA-01", name: "HF portable transceiver, 10 W", kind: "radio", location: "Radio shelf" },
  { labelCode: "RA-02", name: "HF and 6 m transceiver, 100 W", kind: "radio", location: "Radio shelf" },
  { labelCode: "RA-03", name: "2 m / 70 cm handheld pair", kind: "radio", location: "Radio shelf" },
  { labelCode: "TK-01", name: "Antenna build kit: crimpers, solder, heat-shrink", kind: "tools", location: "Tool wall" },
  { labelCode: "TK-02", name: "Guying kit: mallets, spare stakes, marker tape", kind: "tools", location: "Tool wall" },
  { labelCode: "TK-03", name: "Soldering station in a case", kind: "tools", location: "Tool wall" },
  { labelCode: "OT-01", name: "Throw-line launcher and weights", kind: "other", location: "Shed" },
  { labelCode: "OT-02", name: "Wire reel, 100 m hard-drawn copper", kind: "other", location: "Wire drawer" },
];

const HOUR = 3_600_000;

/** Club days from the seed's date and a club wall time, so the demo's times read like times people pick. */
type ClubTime = [days: number, time: string];

interface BookingSeed {
  item: string;
  borrower: string;
  from: ClubTime;
  to: ClubTime;
  state: BookingState;
  note?: string;
  coSignRequired?: boolean;
  coSignedBy?: string;
  declineReason?: string;
  returnCondition?: "good" | "worn" | "needs_repair";
  damageNotes?: string;
}

const steward = "steward@demo.test";

const demoBookings: BookingSeed[] = [
  { item: "AN-02", borrower: "lena@demo.test", from: [5, "09:00"], to: [6, "18:00"], state: "requested", note: "Tuning the club's 40 m inverted-V." },
  { item: "AN-01", borrower: "newcomer@demo.test", from: [8, "09:00"], to: [8, "17:00"], state: "requested", coSignRequired: true, note: "My first dipole, at the build session." },
  { item: "CX-03", borrower: "priya@demo.test", from: [1, "09:00"], to: [2, "12:00"], state: "approved" },
  { item: "MA-01", borrower: "member@demo.test", from: [10, "09:00"], to: [11, "18:00"], state: "approved", note: "Portable station on the hill." },
  { item: "CX-05", borrower: "rosa@demo.test", from: [3, "09:00"], to: [3, "17:00"], state: "approved" },
  { item: "CX-02", borrower: "member@demo.test", from: [-1, "10:00"], to: [1, "18:00"], state: "out" },
  { item: "BU-03", borrower: "milo@demo.test", from: [-5, "10:00"], to: [-3, "18:00"], state: "out" },
  { item: "TU-01", borrower: "otto@demo.test", from: [-3, "10:00"], to: [-1, "18:00"], state: "out" },
  { item: "RA-01", borrower: "kofi@demo.test", from: [-2, "10:00"], to: [4, "18:00"], state: "out" },
  { item: "CX-04", borrower: "juno@demo.test", from: [-9, "10:00"], to: [-7, "18:00"], state: "returned", returnCondition: "worn", damageNotes: "Boot split at the radio end; still fine electrically." },
  { item: "MA-02", borrower: "nadia@demo.test", from: [-20, "10:00"], to: [-18, "18:00"], state: "returned", returnCondition: "good" },
  { item: "RA-02", borrower: "sami@demo.test", from: [2, "09:00"], to: [4, "18:00"], state: "declined", declineReason: "Needed for the club station that weekend." },
  { item: "PW-01", borrower: "tove@demo.test", from: [12, "09:00"], to: [13, "18:00"], state: "cancelled", note: "Plans changed." },
  { item: "OT-01", borrower: "quentin@demo.test", from: [-30, "10:00"], to: [-29, "18:00"], state: "lost", note: "One weight stuck high in an oak." },
];

export async function seedGear(tx: Transaction, club: { timeZone: string }): Promise<void> {
  const existing = await tx.select({ id: gearItems.id }).from(gearItems).limit(1);
  if (existing.length > 0) return;
  const today = Temporal.Now.plainDateISO(club.timeZone);
  const clubTime = ([days, time]: ClubTime) => wallTimeToInstant(`${today.add({ days })}T${time}`, club.timeZone);
  // Whole hours, so the history's request and approval times read like times people act.
  const now = Math.floor(Date.now() / HOUR) * HOUR;
  const inserted = await tx
    .insert(gearItems)
    .values(demoItems.map((item) => ({ ...item, condition: item.condition ?? "good", approvalRule: item.approvalRule ?? defaultApprovalRule(item.kind) })))
    .returning({ id: gearItems.id, labelCode: gearItems.labelCode, condition: gearItems.condition });
  const itemId = new Map(inserted.map((item) => [item.labelCode, item.id]));
  const stewardId = await demoUserId(tx, steward);
  await tx.insert(gearHistory).values(
    inserted.map((item) => ({ itemId: item.id, actorId: stewardId, event: "item-added", toState: item.condition, condition: item.condition, at: new Date(now - 60 * 24 * HOUR) })),
  );

  const people = new Map<string, string>();
  const person = async (email: string) => {
    if (!people.has(email)) people.set(email, await demoUserId(tx, email));
    return people.get(email)!;
  };

  for (const seed of demoBookings) {
    const borrowerId = await person(seed.borrower);
    const startsAt = clubTime(seed.from);
    const endsAt = clubTime(seed.to);
    const requestedAt = new Date(Math.min(now, startsAt.getTime()) - 3 * 24 * HOUR);
    const decidedAt = new Date(requestedAt.getTime() + 4 * HOUR);
    const reached = (state: BookingState) => pathTo(seed.state).includes(state);
    const handedOut = reached("out");
    const [booking] = await tx
      .insert(gearBookings)
      .values({
        itemId: itemId.get(seed.item)!,
        borrowerId,
        startsAt,
        endsAt,
        state: seed.state,
        note: seed.note ?? null,
        coSignRequired: seed.coSignRequired ?? false,
        decidedBy: reached("approved") || seed.state === "declined" ? stewardId : null,
        decidedAt: reached("approved") || seed.state === "declined" ? decidedAt : null,
        declineReason: seed.declineReason ?? null,
        handedOutBy: handedOut ? stewardId : null,
        handedOutAt: handedOut ? startsAt : null,
        handOutCondition: handedOut ? "good" : null,
        returnedAt: seed.state === "returned" ? endsAt : null,
        returnRecordedBy: seed.state === "returned" ? stewardId : null,
        returnCondition: seed.returnCondition ?? null,
        damageNotes: seed.damageNotes ?? null,
        createdAt: requestedAt,
        updatedAt: requestedAt,
      })
      .returning();
    const history: (typeof gearHistory.$inferInsert)[] = [
      { itemId: booking.itemId, bookingId: booking.id, actorId: borrowerId, event: "request", toState: "requested", note: seed.note ?? null, at: requestedAt },
    ];
    if (reached("approved")) history.push({ itemId: booking.itemId, bookingId: booking.id, actorId: stewardId, event: "approve", fromState: "requested", toState: "approved", at: decidedAt });
    if (seed.state === "declined") history.push({ itemId: booking.itemId, bookingId: booking.id, actorId: stewardId, event: "decline", fromState: "requested", toState: "declined", note: seed.declineReason, at: decidedAt });
    if (seed.state === "cancelled") history.push({ itemId: booking.itemId, bookingId: booking.id, actorId: borrowerId, event: "cancel", fromState: "requested", toState: "cancelled", note: seed.note ?? null, at: decidedAt });
    if (handedOut) history.push({ itemId: booking.itemId, bookingId: booking.id, actorId: stewardId, event: "hand-out", fromState: "approved", toState: "out", condition: "good", at: startsAt });
    if (seed.state === "returned") history.push({ itemId: booking.itemId, bookingId: booking.id, actorId: stewardId, event: "return", fromState: "out", toState: "returned", condition: seed.returnCondition, note: seed.damageNotes ?? null, at: endsAt });
    if (seed.state === "lost") history.push({ itemId: booking.itemId, bookingId: booking.id, actorId: stewardId, event: "mark-lost", fromState: "out", toState: "lost", note: seed.note ?? null, at: endsAt });
    await tx.insert(gearHistory).values(history);
  }
  // CX-04 came back worn.
  await tx.update(gearItems).set({ condition: "worn" }).where(eq(gearItems.labelCode, "CX-04"));

  // Nadia waits for CX-05 on the day Rosa has it.
  const nadia = await person("nadia@demo.test");
  await tx.insert(gearWaitlist).values({
    itemId: itemId.get("CX-05")!,
    userId: nadia,
    startsAt: clubTime([3, "11:00"]),
    endsAt: clubTime([3, "15:00"]),
    createdAt: new Date(now - 24 * HOUR),
  });
  await tx.insert(gearHistory).values({ itemId: itemId.get("CX-05")!, actorId: nadia, event: "waitlist-joined", toState: "waiting", at: new Date(now - 24 * HOUR) });
}

function pathTo(state: BookingState): BookingState[] {
  const paths: Record<BookingState, BookingState[]> = {
    requested: ["requested"],
    approved: ["requested", "approved"],
    out: ["requested", "approved", "out"],
    returned: ["requested", "approved", "out", "returned"],
    lost: ["requested", "approved", "out", "lost"],
    declined: ["requested", "declined"],
    cancelled: ["requested", "cancelled"],
  };
  return paths[state];
}
