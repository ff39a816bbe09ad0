// Antenna days for integration tests: a site with a power line, a day on it, a dipole slot.
import { createDay } from "@/server/services/antenna-days";
import { createSite } from "@/server/services/sites";
import type { Actor } from "@/server/policy";
import type { SlotInput } from "@/validations/antenna-days";

let siteCounter = 0;
export async function newSite(coordinator: Actor) {
  siteCounter += 1;
  return createSite(coordinator, {
    name: `Test field ${Date.now()}-${siteCounter}`,
    widthM: 200,
    depthM: 150,
    groundClass: "average",
    groundConductivitySm: null,
    groundRelativePermittivity: null,
    notes: "",
    hazards: [{ kind: "power-line", label: "Line", points: [[0, 140], [200, 140]], heightM: 10 }],
  });
}

/** A day in 2031 (club time Europe/London), 09:00–17:00. */
export async function newDay(coordinator: Actor, options: { date?: string } = {}) {
  const site = await newSite(coordinator);
  const date = options.date ?? "2031-06-14";
  return createDay(coordinator, {
    title: "Test antenna day",
    siteId: site.id,
    startsAtLocal: `${date}T09:00`,
    endsAtLocal: `${date}T17:00`,
    meetingPoint: "The gate",
    description: "",
    safetyLeadId: coordinator.id,
  });
}

export const dipoleSlot = (name: string, x: number, y: number): SlotInput => ({
  name,
  bands: ["20m"],
  powerW: 100,
  mode: "ssb",
  planParams: { family: "dipole", heightM: 10, wireDiameterMm: 2, feedlineType: "rg213" },
  x,
  y,
  azimuthDeg: 90,
  tentX: x,
  tentY: y - 20,
  feedlineRunOverrideM: null,
});

