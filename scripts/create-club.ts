// First run of a real deployment: creates the club's settings and its first coordinator.
//   GUYLINE_CLUB_NAME="..." GUYLINE_ITU_REGION=1 GUYLINE_TIME_ZONE=Europe/Lisbon \
//   GUYLINE_COORDINATOR_NAME="..." GUYLINE_COORDINATOR_EMAIL=... GUYLINE_COORDINATOR_PASSWORD=... \
//   npm run club:create
import { randomBytes } from "node:crypto";
import { z } from "zod";
import { pool } from "@/server/db";
import { createClub } from "@/server/services/accounts";
import { clubSettingsSchema, emailField, nameField, passwordField } from "@/validations/accounts";

const inputSchema = z.object({
  GUYLINE_CLUB_NAME: nameField,
  GUYLINE_ITU_REGION: clubSettingsSchema.shape.ituRegion,
  GUYLINE_TIME_ZONE: clubSettingsSchema.shape.timeZone,
  GUYLINE_DEFAULT_UNITS: clubSettingsSchema.shape.defaultUnits.default("metric"),
  GUYLINE_COORDINATOR_NAME: nameField,
  GUYLINE_COORDINATOR_EMAIL: emailField,
  GUYLINE_COORDINATOR_PASSWORD: passwordField,
});

async function main() {
  const parsed = inputSchema.safeParse(process.env);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) console.error(`${issue.path.join(".")}: ${issue.message}`);
    process.exitCode = 2;
    return;
  }
  const env = parsed.data;
  const coordinator = await createClub({
    club: {
      clubName: env.GUYLINE_CLUB_NAME,
      ituRegion: env.GUYLINE_ITU_REGION,
      timeZone: env.GUYLINE_TIME_ZONE,
      defaultUnits: env.GUYLINE_DEFAULT_UNITS,
      joinCode: randomBytes(6).toString("base64url").toUpperCase(),
    },
    coordinator: { name: env.GUYLINE_COORDINATOR_NAME, email: env.GUYLINE_COORDINATOR_EMAIL, password: env.GUYLINE_COORDINATOR_PASSWORD },
  });
  console.log(`The club is set up. ${coordinator.name} (${coordinator.email}) can sign in as its coordinator; the join code is on the settings page.`);
}

main()
  .catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exitCode = 1;
  })
  .finally(() => pool().end());
