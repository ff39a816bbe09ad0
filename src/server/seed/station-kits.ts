// The demo's station kits: the Midsummer field weekend already has kit booked by the steward
// for two of its slots (a coax run as the fan dipole's feedline, a mast, baluns and an analyser),
// approved for the whole weekend; the Spring antenna day has none yet. Runs once: it does
// nothing when a feedline is booked, or when the day or the items are missing.
import { eq, inArray } from "drizzle-orm";
import type { Transaction } from "@/server/db";
import { antennaDays, gearBookings, gearHistory, gearItems, stationSlots } from "@/server/db/schema";
import { demoUserId } from "./people";

const DAY = "Midsummer field weekend";

const kits: { slot: string; items: string[] }[] = [
  { slot: "Fan dipole", items: ["CX-13", "MA-02", "BU-01"] },
  { slot: "Off-centre-fed", items: ["BU-02", "AN-01"] },
];

export async function seedStationKits(tx: Transaction): Promise<void> {
  if ((await tx.select({ id: gearBookings.id }).from(gearBookings).where(eq(gearBookings.slotFeedline, true)).limit(1)).length > 0) return;
  const day = await tx.query.antennaDays.findFirst({ where: eq(antennaDays.title, DAY) });
  if (!day) return;
  const slots = await tx.select().from(stationSlots).where(eq(stationSlots.dayId, day.id));
  const items = await tx
    .select()
    .from(gearItems)
    .where(inArray(gearItems.labelCode, kits.flatMap((kit) => kit.items)));
  if (items.length < kits.flatMap((kit) => kit.items).length) return;
  const steward = await demoUserId(tx, "steward@demo.test");
  // Booked three weeks before the weekend (or now, if that is sooner).
  const bookedAt = new Date(Math.min(Date.now(), day.startsAt.getTime() - 21 * 86_400_000));
  for (const kit of kits) {
    const slot = slots.find((candidate) => candidate.name === kit.slot);
    if (!slot) continue;
    for (const labelCode of kit.items) {
      const item = items.find((candidate) => candidate.labelCode === labelCode)!;
      const note = `Station kit for ${slot.name}.`;
      const [booking] = await tx
        .insert(gearBookings)
        .values({
          itemId: item.id,
          borrowerId: steward,
          startsAt: day.startsAt,
          endsAt: day.endsAt,
          state: "approved",
          note,
          decidedBy: steward,
          decidedAt: bookedAt,
          antennaDayId: day.id,
          stationSlotId: slot.id,
          slotFeedline: item.kind === "coax",
          createdAt: bookedAt,
          updatedAt: bookedAt,
        })
        .returning();
      await tx.insert(gearHistory).values([
        { itemId: item.id, bookingId: booking.id, actorId: steward, event: "request", toState: "requested", note, at: bookedAt },
        { itemId: item.id, bookingId: booking.id, actorId: steward, event: "approve", fromState: "requested", toState: "approved", at: bookedAt },
      ]);
    }
  }
}

