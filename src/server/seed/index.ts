// The demo: an invented club with its people, sites, antenna days, gear, build sessions and measured sweeps.
// Idempotent: each area seeds only what is not there yet. It refuses to touch a database
// that holds real (non-demo) accounts.
import { sql } from "drizzle-orm";
import { hashPassword } from "@/server/services/accounts";
import { db } from "@/server/db";
import { seedAntennaDays } from "./antenna-days";
import { seedBuildSessions } from "./build-sessions";
import { seedGear } from "./gear";
import { demoEmailDomain, demoPassword, seedClubAndPeople } from "./people";
import { seedPlanLibrary } from "./plans";
import { seedStationKits } from "./station-kits";
import { seedSweeps } from "./sweeps";

export async function seedDemo(): Promise<void> {
  const realAccounts = await db().execute<{ n: number }>(
    sql`select count(*)::int as n from users where email not like ${"%@" + demoEmailDomain}`,
  );
  if (realAccounts.rows[0].n > 0) {
    throw new Error("This database has accounts that are not demo accounts; the demo seed will not touch it.");
  }
  const passwordHash = await hashPassword(demoPassword);
  await db().transaction(async (tx) => {
    await seedClubAndPeople(tx, passwordHash);
    const settings = await tx.query.clubSettings.findFirst();
    await seedAntennaDays(tx, { timeZone: settings!.timeZone, ituRegion: settings!.ituRegion });
    await seedPlanLibrary(tx, { ituRegion: settings!.ituRegion });
    await seedBuildSessions(tx, { timeZone: settings!.timeZone });
    await seedGear(tx, { timeZone: settings!.timeZone });
    await seedStationKits(tx);
    await seedSweeps(tx, { timeZone: settings!.timeZone, ituRegion: settings!.ituRegion });
  });
}
