// The demo's plan library: two plans saved from last autumn's antenna day (the slots that
// used them point at them, as reuse would leave them) and one plan nobody has used yet.
// Each plan is the engine's whole request for the antenna as it stood on the day.
import { and, eq, isNull } from "drizzle-orm";
import type { ItuRegion } from "@/lib/antenna/bands";
import { planRequestSchema, type PlanRequestInput } from "@/lib/antenna/plan-schema";
import { planRequestForSlot } from "@/lib/antenna-days/slot-plan";
import type { Transaction } from "@/server/db";
import { antennaDays, antennaPlans, sites, stationSlots } from "@/server/db/schema";
import { demoUserId } from "./people";

const PAST_DAY = "Autumn antenna day";

/** Library plans taken from a slot of the past day, saved by a demo member. */
const fromPastDay = [
  {
    name: "Club 40 m inverted-V",
    slot: "Forty metres",
    savedBy: "coordinator@demo.test",
    notes: "Apex on the 10 m mast at the west end of the north field. It came up resonant about 40 kHz low; trim 5 cm off each leg before the next day.",
  },
  {
    name: "Portable 20 m end-fed",
    slot: "Twenty end-fed",
    savedBy: "lena@demo.test",
    notes: "49:1 unun at the mast foot bracket, the far end on a throw line in the beech. Counterpoise laid along the ground toward the tent.",
  },
];

/** A plan on the shelf, not used by any slot yet. */
const unused = (region: ItuRegion): { name: string; savedBy: string; notes: string; parameters: PlanRequestInput } => ({
  name: "Low 80 m dipole for the hut",
  savedBy: "member@demo.test",
  notes: "For a winter evening net from the club hut: the hut's 8 m pole is all we have, so expect a narrow band.",
  parameters: {
    family: "dipole",
    band: "80m",
    region,
    heightM: 8,
    wireDiameterMm: 1.5,
    ground: "average",
    feedline: { type: "rg8x", lengthM: 15 },
    transmitter: { powerW: 50, mode: "ssb" },
  },
});

async function savePlan(tx: Transaction, plan: { name: string; savedBy: string; notes: string; parameters: PlanRequestInput }): Promise<string> {
  const existing = await tx.query.antennaPlans.findFirst({ where: eq(antennaPlans.name, plan.name) });
  if (existing) return existing.id;
  const parameters = planRequestSchema.parse(plan.parameters);
  const [row] = await tx
    .insert(antennaPlans)
    .values({ name: plan.name, family: parameters.family, parameters, notes: plan.notes, createdBy: await demoUserId(tx, plan.savedBy) })
    .returning();
  return row.id;
}

export async function seedPlanLibrary(tx: Transaction, settings: { ituRegion: number }): Promise<void> {
  const region = settings.ituRegion as ItuRegion;
  await savePlan(tx, unused(region));
  const day = await tx.query.antennaDays.findFirst({ where: eq(antennaDays.title, PAST_DAY) });
  if (!day) return;
  const site = await tx.query.sites.findFirst({ where: eq(sites.id, day.siteId) });
  if (!site) return;
  for (const saved of fromPastDay) {
    const slot = await tx.query.stationSlots.findFirst({ where: and(eq(stationSlots.dayId, day.id), eq(stationSlots.name, saved.slot)) });
    if (!slot) continue;
    const parameters = planRequestForSlot(
      { bands: slot.bands, powerW: slot.powerW, mode: slot.mode, planParams: slot.planParams, position: [slot.x, slot.y], tent: [slot.tentX, slot.tentY], feedlineRunOverrideM: slot.feedlineRunOverrideM },
      { groundClass: site.groundClass, groundConductivitySm: site.groundConductivitySm, groundRelativePermittivity: site.groundRelativePermittivity },
      region,
    );
    const planId = await savePlan(tx, { ...saved, parameters });
    await tx.update(stationSlots).set({ libraryPlanId: planId }).where(and(eq(stationSlots.id, slot.id), isNull(stationSlots.libraryPlanId)));
  }
}
