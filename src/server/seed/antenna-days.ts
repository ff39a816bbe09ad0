// The demo's antenna days: the club's invented home site with a power line, a footpath, a
// picnic lawn, trees and a hut; two upcoming days with five and four station slots on different
// bands and antenna families, shifts and some sign-ups; and one past day, done. Days fall on
// Saturdays counted from the day the demo is seeded, so the demo stays current.
// Every slot's plan is computed by the engine, as the app does when a slot is saved.
import { eq, sql } from "drizzle-orm";
import { Temporal } from "temporal-polyfill";
import { plan, planRequestSchema, type ItuRegion } from "@/lib/antenna";
import { bandByName } from "@/lib/antenna/bands";
import { antennaSummaryOf } from "@/lib/antenna-days/antenna-outline";
import { planRequestForSlot, slotPlanParamsOf, type SlotMode, type SlotPlanParamsInput } from "@/lib/antenna-days/slot-plan";
import type { Hazard } from "@/lib/site-plan/hazards";
import { wallTimeToInstant } from "@/lib/time";
import type { Transaction } from "@/server/db";
import { antennaDays, shifts, shiftSignups, sites, stationSlots, type SiteRow } from "@/server/db/schema";
import { demoUserId } from "./people";

const HOME_SITE = "Wrenmoor Common, north field";

const homeHazards: Hazard[] = [
  { kind: "power-line", label: "11 kV line on wooden poles", points: [[0, 152], [120, 156], [220, 160]], heightM: 10 },
  { kind: "path", label: "Public footpath", points: [[0, 18], [90, 30], [220, 26]] },
  { kind: "public-area", label: "Picnic lawn", points: [[165, 60], [215, 60], [215, 108], [165, 108]] },
  { kind: "tree", label: "Oak", points: [[42, 128]], heightM: 18 },
  { kind: "tree", label: "Beech", points: [[128, 96]], heightM: 15 },
  { kind: "building", label: "Club hut", points: [[6, 60], [26, 60], [26, 74], [6, 74]], heightM: 4.5 },
];

interface DemoSlot {
  name: string;
  bands: string[];
  powerW: number;
  mode: SlotMode;
  planParams: SlotPlanParamsInput;
  at: [number, number];
  azimuthDeg: number;
  tent: [number, number];
  /** Shifts as club-time hours on the day (`onDay: 1` for a weekend's Sunday), with capacity and the demo people signed up. */
  shifts: { onDay?: number; from: string; to: string; capacity: number; people: string[] }[];
}

interface DemoDay {
  title: string;
  /** The Saturday this many weeks after the coming one (negative: in the past). */
  saturdayInWeeks: number;
  /** 2 for a weekend: it ends on the Sunday. */
  lengthDays?: number;
  from: string;
  to: string;
  status: "published" | "done";
  meetingPoint: string;
  description: string;
  safetyLead: string;
  slots: DemoSlot[];
}

const wire = { wireDiameterMm: 2, feedlineType: "rg213" } as const;

const days: DemoDay[] = [
  {
    title: "Spring antenna day",
    saturdayInWeeks: 19,
    from: "09:00",
    to: "17:00",
    status: "published",
    meetingPoint: "The club hut at the west gate",
    description: "Five stations across the field. Newcomers welcome: bring gloves and a hat. Masts go up at 09:30 after the safety briefing.",
    safetyLead: "hollis@demo.test",
    slots: [
      {
        name: "Forty metres",
        bands: ["40m"],
        powerW: 100,
        mode: "ssb",
        planParams: { family: "dipole", heightM: 10, ...wire },
        at: [60, 96],
        azimuthDeg: 90,
        tent: [60, 80],
        shifts: [
          { from: "09:30", to: "13:00", capacity: 2, people: ["juno@demo.test", "lena@demo.test"] },
          { from: "13:00", to: "17:00", capacity: 2, people: ["milo@demo.test"] },
        ],
      },
      {
        name: "Twenty metres",
        bands: ["20m"],
        powerW: 100,
        mode: "ssb",
        planParams: { family: "inverted-v", heightM: 9, includedAngleDeg: 120, ...wire },
        at: [150, 125],
        azimuthDeg: 90,
        tent: [140, 110],
        shifts: [
          { from: "09:30", to: "13:00", capacity: 2, people: ["nadia@demo.test"] },
          { from: "13:00", to: "17:00", capacity: 2, people: [] },
        ],
      },
      {
        name: "Fifteen vertical",
        bands: ["15m"],
        powerW: 100,
        mode: "cw",
        planParams: { family: "vertical", heightM: 3, radials: 4, radialDroopDeg: 40, ...wire },
        at: [110, 62],
        azimuthDeg: 0,
        tent: [100, 50],
        shifts: [{ from: "10:00", to: "16:00", capacity: 3, people: ["kofi@demo.test", "otto@demo.test"] }],
      },
      {
        name: "End-fed, thirty",
        bands: ["30m"],
        powerW: 50,
        mode: "digital",
        planParams: { family: "end-fed", heightM: 8, unun: "49:1", ...wire, feedlineType: "rg8x" },
        at: [20, 100],
        azimuthDeg: 0,
        tent: [32, 90],
        shifts: [{ from: "09:30", to: "17:00", capacity: 2, people: ["priya@demo.test"] }],
      },
      {
        name: "Two metres",
        bands: ["2m"],
        powerW: 25,
        mode: "fm",
        planParams: { family: "dipole", heightM: 6, wireDiameterMm: 4, feedlineType: "rg213" },
        at: [195, 40],
        azimuthDeg: 0,
        tent: [185, 40],
        shifts: [{ from: "10:00", to: "15:00", capacity: 2, people: ["quentin@demo.test"] }],
      },
    ],
  },
  {
    title: "Midsummer field weekend",
    saturdayInWeeks: 29,
    lengthDays: 2,
    from: "10:00",
    to: "16:00",
    status: "published",
    meetingPoint: "North field car park",
    description: "A weekend on the common with a fan dipole, an off-centre-fed wire and an end-fed half-wave. Tents stay up overnight; the generator runs outdoors, away from the tents.",
    safetyLead: "coordinator@demo.test",
    slots: [
      {
        name: "Fan dipole",
        bands: ["20m", "15m", "10m"],
        powerW: 100,
        mode: "ssb",
        planParams: { family: "fan-dipole", heightM: 10, spreadDeg: 15, ...wire },
        at: [70, 110],
        azimuthDeg: 90,
        tent: [70, 92],
        shifts: [
          { from: "10:00", to: "14:00", capacity: 2, people: ["rosa@demo.test"] },
          { from: "14:00", to: "18:00", capacity: 2, people: [] },
        ],
      },
      {
        name: "Off-centre-fed",
        bands: ["40m"],
        powerW: 100,
        mode: "ssb",
        planParams: { family: "off-centre-fed", heightM: 11, feedPosition: 0.33, ...wire },
        at: [140, 75],
        azimuthDeg: 0,
        tent: [125, 70],
        shifts: [{ from: "10:00", to: "16:00", capacity: 2, people: ["sami@demo.test"] }],
      },
      {
        name: "Seventeen end-fed",
        bands: ["17m"],
        powerW: 100,
        mode: "cw",
        planParams: { family: "end-fed", heightM: 7, unun: "64:1", ...wire },
        at: [25, 45],
        azimuthDeg: 45,
        tent: [20, 35],
        shifts: [{ onDay: 1, from: "09:00", to: "13:00", capacity: 2, people: ["tove@demo.test"] }],
      },
      {
        name: "Six metres",
        bands: ["6m"],
        powerW: 50,
        mode: "ssb",
        planParams: { family: "inverted-v", heightM: 7, includedAngleDeg: 120, ...wire },
        at: [190, 130],
        azimuthDeg: 90,
        tent: [195, 118],
        shifts: [{ onDay: 1, from: "09:00", to: "15:00", capacity: 2, people: [] }],
      },
    ],
  },
  {
    title: "Autumn antenna day",
    saturdayInWeeks: -9,
    from: "09:00",
    to: "16:00",
    status: "done",
    meetingPoint: "The club hut at the west gate",
    description: "Four stations; the end-fed was trimmed by 0.3 m after the first sweep.",
    safetyLead: "hollis@demo.test",
    slots: [
      {
        name: "Forty metres",
        bands: ["40m"],
        powerW: 100,
        mode: "ssb",
        planParams: { family: "inverted-v", heightM: 10, includedAngleDeg: 110, ...wire },
        at: [60, 96],
        azimuthDeg: 90,
        tent: [60, 80],
        shifts: [{ from: "09:30", to: "16:00", capacity: 2, people: ["juno@demo.test", "member@demo.test"] }],
      },
      {
        name: "Twenty end-fed",
        bands: ["20m"],
        powerW: 100,
        mode: "ssb",
        planParams: { family: "end-fed", heightM: 8, unun: "49:1", ...wire },
        at: [150, 120],
        azimuthDeg: 90,
        tent: [140, 108],
        shifts: [{ from: "09:30", to: "16:00", capacity: 2, people: ["lena@demo.test"] }],
      },
      {
        name: "Fifteen vertical",
        bands: ["15m"],
        powerW: 100,
        mode: "cw",
        planParams: { family: "vertical", heightM: 3, radials: 4, radialDroopDeg: 40, ...wire },
        at: [110, 62],
        azimuthDeg: 0,
        tent: [100, 50],
        shifts: [{ from: "10:00", to: "15:00", capacity: 2, people: ["kofi@demo.test"] }],
      },
      {
        name: "Thirty dipole",
        bands: ["30m"],
        powerW: 50,
        mode: "digital",
        planParams: { family: "dipole", heightM: 9, ...wire },
        at: [20, 110],
        azimuthDeg: 0,
        tent: [32, 100],
        shifts: [{ from: "10:00", to: "14:00", capacity: 1, people: ["otto@demo.test"] }],
      },
    ],
  },
];

async function homeSite(tx: Transaction): Promise<SiteRow> {
  const existing = await tx.query.sites.findFirst({ where: eq(sites.name, HOME_SITE) });
  if (existing) return existing;
  const [site] = await tx
    .insert(sites)
    .values({
      name: HOME_SITE,
      widthM: 220,
      depthM: 160,
      groundClass: "average",
      notes: "Grazed grass on clay over chalk. The gate key is in the club hut. The landowner asks for no pegs within 5 m of the footpath.",
      hazards: homeHazards,
    })
    .returning();
  return site;
}

/** The first day of a demo day: a Saturday counted from the seed's own date in club time. */
function firstDateOf(demo: DemoDay, timeZone: string): Temporal.PlainDate {
  const today = Temporal.Now.plainDateISO(timeZone);
  const comingSaturday = today.add({ days: (6 - today.dayOfWeek + 7) % 7 || 7 });
  return comingSaturday.add({ weeks: demo.saturdayInWeeks });
}

export async function seedAntennaDays(tx: Transaction, settings: { timeZone: string; ituRegion: number }): Promise<void> {
  const region = settings.ituRegion as ItuRegion;
  const site = await homeSite(tx);
  const creator = await demoUserId(tx, "coordinator@demo.test");
  for (const demo of days) {
    if (await tx.query.antennaDays.findFirst({ where: eq(antennaDays.title, demo.title) })) continue;
    const firstDate = firstDateOf(demo, settings.timeZone);
    const atClubTime = (onDay: number, time: string) => wallTimeToInstant(`${firstDate.add({ days: onDay })}T${time}`, settings.timeZone);
    const [day] = await tx
      .insert(antennaDays)
      .values({
        title: demo.title,
        siteId: site.id,
        startsAt: atClubTime(0, demo.from),
        endsAt: atClubTime((demo.lengthDays ?? 1) - 1, demo.to),
        meetingPoint: demo.meetingPoint,
        description: demo.description,
        safetyLeadId: await demoUserId(tx, demo.safetyLead),
        status: demo.status,
        sequence: 1,
        createdBy: creator,
      })
      .returning();
    for (const demoSlot of demo.slots) {
      const request = planRequestSchema.parse(
        planRequestForSlot(
          { bands: demoSlot.bands, powerW: demoSlot.powerW, mode: demoSlot.mode, planParams: demoSlot.planParams, position: demoSlot.at, tent: demoSlot.tent, feedlineRunOverrideM: null },
          site,
          region,
        ),
      );
      const bands = demoSlot.bands.map((name) => bandByName(name, region)!).map((band) => ({ name: band.name, lowMHz: band.lowMHz, highMHz: band.highMHz }));
      const [slot] = await tx
        .insert(stationSlots)
        .values({
          dayId: day.id,
          name: demoSlot.name,
          bands: bands.map((band) => band.name),
          powerW: demoSlot.powerW,
          mode: demoSlot.mode,
          planParams: slotPlanParamsOf(request),
          x: demoSlot.at[0],
          y: demoSlot.at[1],
          azimuthDeg: demoSlot.azimuthDeg,
          tentX: demoSlot.tent[0],
          tentY: demoSlot.tent[1],
          summary: antennaSummaryOf(plan(request), { bands, powerW: demoSlot.powerW, mode: demoSlot.mode }),
        })
        .returning();
      for (const demoShift of demoSlot.shifts) {
        const startsAt = atClubTime(demoShift.onDay ?? 0, demoShift.from);
        const endsAt = atClubTime(demoShift.onDay ?? 0, demoShift.to);
        const [shift] = await tx.insert(shifts).values({ slotId: slot.id, startsAt, endsAt, capacity: demoShift.capacity, taken: demoShift.people.length }).returning();
        for (const email of demoShift.people) {
          await tx.insert(shiftSignups).values({
            shiftId: shift.id,
            personId: await demoUserId(tx, email),
            during: sql`tstzrange(${startsAt.toISOString()}::timestamptz, ${endsAt.toISOString()}::timestamptz, '[)')`,
          });
        }
      }
    }
  }
}
