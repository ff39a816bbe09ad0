// npm run db:seed: fills the demo club (see src/server/seed). Safe to run again.
import { pool } from "@/server/db";
import { seedDemo } from "@/server/seed";

seedDemo()
  .then(() => console.log("Demo data is in place."))
  .catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exitCode = 1;
  })
  .finally(() => pool().end());
