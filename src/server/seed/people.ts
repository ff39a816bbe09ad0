// The invented club and its people. No real people, call signs, clubs or places: call signs
// use the Q prefix, which the ITU does not allocate to any country (it is kept for Q codes).
import { eq } from "drizzle-orm";
import type { Transaction } from "@/server/db";
import { clubSettings, users } from "@/server/db/schema";
import type { Role } from "@/lib/roles";

export const demoPassword = "demo-antenna-day";
export const demoEmailDomain = "demo.test";

interface DemoPerson {
  email: string;
  name: string;
  callSign: string | null;
  role: Role;
  isMentor?: boolean;
  units?: "metric" | "imperial";
  confirmed?: boolean;
}

export const demoPeople: DemoPerson[] = [
  { email: "coordinator@demo.test", name: "Ada Ferreira-Quill", callSign: "Q9ADA", role: "coordinator", isMentor: true },
  { email: "steward@demo.test", name: "Bram Oakhollow", callSign: "Q9BRM", role: "steward", isMentor: true },
  { email: "member@demo.test", name: "Cleo Marchetti-Vane", callSign: "Q9CLV", role: "member" },
  { email: "newcomer@demo.test", name: "Dev Anand-Rowe", callSign: null, role: "newcomer" },
  { email: "hollis@demo.test", name: "Hollis Penwarden", callSign: "Q9HOL", role: "coordinator", isMentor: true },
  { email: "ines@demo.test", name: "Ines Calloway", callSign: "Q9INC", role: "steward" },
  { email: "juno@demo.test", name: "Juno Ashgrove", callSign: "Q9JUN", role: "member", isMentor: true },
  { email: "kofi@demo.test", name: "Kofi Brightwater", callSign: "Q9KOF", role: "member", isMentor: true, units: "imperial" },
  { email: "lena@demo.test", name: "Lena Thistlewood", callSign: "Q9LEN", role: "member" },
  { email: "milo@demo.test", name: "Milo Featherstone", callSign: "Q9MIL", role: "member", units: "imperial" },
  { email: "nadia@demo.test", name: "Nadia Rookwell", callSign: "Q9NAD", role: "member", isMentor: true },
  { email: "otto@demo.test", name: "Otto Vasquez-Lind", callSign: "Q9OTT", role: "member" },
  { email: "priya@demo.test", name: "Priya Hallowmere", callSign: "Q9PRI", role: "member" },
  { email: "quentin@demo.test", name: "Quentin Draycott", callSign: "Q9QUE", role: "member" },
  { email: "rosa@demo.test", name: "Rosa Windermoor", callSign: "Q9ROS", role: "member" },
  { email: "sami@demo.test", name: "Sami Okonkwo-Pell", callSign: "Q9SAM", role: "member" },
  { email: "tove@demo.test", name: "Tove Langstrand", callSign: "Q9TOV", role: "member" },
  { email: "umar@demo.test", name: "Umar Fairbairn", callSign: null, role: "newcomer" },
  { email: "vera@demo.test", name: "Vera Kestrelton", callSign: null, role: "newcomer" },
  { email: "wes@demo.test", name: "Wes Ambleside-Cho", callSign: null, role: "newcomer" },
  { email: "xena@demo.test", name: "Xena Pollard-Ruiz", callSign: null, role: "newcomer" },
  { email: "yusuf@demo.test", name: "Yusuf Merriweather", callSign: null, role: "newcomer" },
  { email: "zoe@demo.test", name: "Zoe Hartigan", callSign: null, role: "newcomer" },
  { email: "arlo@demo.test", name: "Arlo Penhaligon", callSign: null, role: "newcomer", confirmed: false },
  { email: "bea@demo.test", name: "Bea Wintergreen", callSign: "Q9BEA", role: "member", confirmed: false },
];

export async function seedClubAndPeople(tx: Transaction, passwordHash: string): Promise<void> {
  await tx
    .insert(clubSettings)
    .values({ id: 1, clubName: "Wrenmoor Radio Circle", ituRegion: 1, timeZone: "Europe/London", defaultUnits: "metric", joinCode: "WREN-ANTENNA-26" })
    .onConflictDoNothing();
  for (const person of demoPeople) {
    await tx
      .insert(users)
      .values({
        email: person.email,
        name: person.name,
        callSign: person.callSign,
        passwordHash,
        role: person.role,
        isMentor: person.isMentor ?? false,
        units: person.units ?? "metric",
        confirmedAt: person.confirmed === false ? null : new Date("2026-01-10T10:00:00Z"),
      })
      .onConflictDoNothing();
  }
}

export async function demoUserId(tx: Transaction, email: string): Promise<string> {
  const row = await tx.query.users.findFirst({ where: eq(users.email, email) });
  if (!row) throw new Error(`The demo person ${email} is missing.`);
  return row.id;
}
