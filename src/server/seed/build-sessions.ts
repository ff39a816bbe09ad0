// Demo build sessions: an open dipole session, a full end-fed session with a waitlist, and an
// inverted-V session nobody has joined yet. Dates follow the day the demo is seeded; a session
// whose title exists is left alone.
import { eq } from "drizzle-orm";
import { Temporal } from "temporal-polyfill";
import { planRequestSchema } from "@/lib/antenna";
import { wallTimeToInstant } from "@/lib/time";
import type { Transaction } from "@/server/db";
import { buildSessionMentors, buildSessionSignups, buildSessions } from "@/server/db/schema";
import { demoUserId } from "./people";

interface DemoSession {
  title: string;
  inDays: number;
  from: string;
  to: string;
  place: string;
  capacity: number;
  raisesMast: boolean;
  plan: unknown;
  mentors: string[];
  confirmed: string[];
  waitlisted: string[];
  notes: string | null;
}

const site = { region: 1, wireDiameterMm: 1.6, ground: "average", transmitter: { powerW: 100, mode: "ssb" } };

const demoSessions: DemoSession[] = [
  {
    title: "Your first dipole: 20 m",
    inDays: 9,
    from: "10:00",
    to: "13:00",
    place: "Wrenmoor village hall, back room",
    capacity: 6,
    raisesMast: false,
    plan: { ...site, family: "dipole", band: "20m", heightM: 8, feedline: { type: "rg58", lengthM: 15 } },
    mentors: ["coordinator@demo.test", "juno@demo.test"],
    confirmed: ["umar@demo.test", "vera@demo.test", "priya@demo.test"],
    waitlisted: [],
    notes: "Tea and soldering irons are on the club. Bring a packed lunch if you stay for the afternoon test on the green.",
  },
  {
    title: "End-fed for 40 m, raised on the field",
    inDays: 16,
    from: "09:30",
    to: "15:00",
    place: "Hollow Lane field, by the north gate",
    capacity: 4,
    raisesMast: true,
    plan: { ...site, family: "end-fed", band: "40m", heightM: 7, feedline: { type: "rg8x", lengthM: 20 } },
    mentors: ["kofi@demo.test", "nadia@demo.test"],
    confirmed: ["wes@demo.test", "xena@demo.test", "yusuf@demo.test", "zoe@demo.test"],
    waitlisted: ["lena@demo.test", "milo@demo.test"],
    notes: "Sturdy shoes: the field is uneven. The mast goes up only if the wind allows.",
  },
  {
    title: "Inverted-V for 40 m",
    inDays: 23,
    from: "14:00",
    to: "17:30",
    place: "Wrenmoor village hall, back room",
    capacity: 8,
    raisesMast: false,
    plan: { ...site, family: "inverted-v", band: "40m", heightM: 9, includedAngleDeg: 110, feedline: { type: "rg213", lengthM: 25 } },
    mentors: ["steward@demo.test"],
    confirmed: [],
    waitlisted: [],
    notes: null,
  },
];

export async function seedBuildSessions(tx: Transaction, club: { timeZone: string }): Promise<void> {
  const today = Temporal.Now.plainDateISO(club.timeZone);
  for (const demo of demoSessions) {
    const existing = await tx.query.buildSessions.findFirst({ where: eq(buildSessions.title, demo.title) });
    if (existing) continue;
    const date = today.add({ days: demo.inDays }).toString();
    const [session] = await tx
      .insert(buildSessions)
      .values({
        title: demo.title,
        plan: planRequestSchema.parse(demo.plan),
        startsAt: wallTimeToInstant(`${date}T${demo.from}`, club.timeZone),
        endsAt: wallTimeToInstant(`${date}T${demo.to}`, club.timeZone),
        place: demo.place,
        capacity: demo.capacity,
        taken: demo.confirmed.length,
        raisesMast: demo.raisesMast,
        notes: demo.notes,
        createdBy: await demoUserId(tx, "coordinator@demo.test"),
      })
      .returning({ id: buildSessions.id });
    for (const email of demo.mentors) {
      await tx.insert(buildSessionMentors).values({ sessionId: session.id, userId: await demoUserId(tx, email) });
    }
    // Sign-ups in order: the confirmed places first, then the waitlist in line.
    for (const [status, emails] of [["confirmed", demo.confirmed], ["waitlisted", demo.waitlisted]] as const) {
      for (const email of emails) {
        await tx.insert(buildSessionSignups).values({ sessionId: session.id, userId: await demoUserId(tx, email), status });
      }
    }
  }
}
