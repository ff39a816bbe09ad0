// Jobs in PostgreSQL with pg-boss. Services add jobs inside their own transaction (so a job
// exists exactly when the row that caused it does); the worker (scripts/worker.ts) runs them.
import { sql } from "drizzle-orm";
import PgBoss from "pg-boss";
import { serverEnv } from "@/env";
import type { Executor } from "@/server/db";

export const queueNames = {
  /** Sends one outbox message (data: { outboxId }); the job's id is the outbox row's id. */
  deliverMail: "mail-deliver",
  /** Looks for reminders that are due and puts them in the outbox. */
  reminderSweep: "reminder-sweep",
} as const;

// Delivery retries back off exponentially (pg-boss: about delay·2^n, with jitter): 5–10 s,
// 10–20 s, … for about six hours before the message is marked failed. A job that runs longer
// than its expiry (a worker killed mid-batch) is retried after the expiry.
export const queueOptions: Record<(typeof queueNames)[keyof typeof queueNames], PgBoss.Queue> = {
  [queueNames.deliverMail]: { name: queueNames.deliverMail, retryLimit: 11, retryDelay: 5, retryBackoff: true, expireInSeconds: 30 },
  [queueNames.reminderSweep]: { name: queueNames.reminderSweep, policy: "singleton", retryLimit: 3, retryDelay: 30, retryBackoff: true, expireInSeconds: 300 },
};

export const pgBossSchema = "pgboss";

export function newJobQueue(options: Partial<PgBoss.ConstructorOptions> = {}): PgBoss {
  return new PgBoss({ connectionString: serverEnv().DATABASE_URL, schema: pgBossSchema, ...options });
}

/** Installs or upgrades pg-boss's tables and creates Guyline's queues. Run by scripts/migrate.ts. */
export async function installJobQueues(): Promise<void> {
  const boss = newJobQueue({ supervise: false, schedule: false, max: 2 });
  boss.on("error", (error) => console.error(error));
  await boss.start();
  try {
    for (const [name, options] of Object.entries(queueOptions)) {
      if (await boss.getQueue(name)) await boss.updateQueue(name, options);
      else await boss.createQueue(name, options);
    }
  } finally {
    await boss.stop({ graceful: false });
  }
}

/**
 * pg-boss runs its SQL through this adapter on the caller's transaction; it writes `$1…`
 * placeholders, which become Drizzle parameters here (Drizzle drops undefined ones; pg reads them as null).
 */
function executorAdapter(executor: Executor): PgBoss.Db {
  return {
    async executeSql(text: string, values: unknown[] = []) {
      const parts = text.split(/\$(\d+)/);
      const query = sql.join(parts.map((part, index) => (index % 2 === 0 ? sql.raw(part) : sql`${values[Number(part) - 1] ?? null}`)));
      const result = await executor.execute(query);
      return { rows: result.rows };
    },
  };
}

// The app process only adds jobs; it never starts this instance (the worker works them).
const globalForJobs = globalThis as unknown as { guylineJobSender?: PgBoss };

function jobSender(): PgBoss {
  globalForJobs.guylineJobSender ??= newJobQueue({ supervise: false, schedule: false });
  return globalForJobs.guylineJobSender;
}

/** Adds a job in the caller's transaction: it is committed, or rolled back, with the caller's rows. */
export async function sendJob(executor: Executor, name: string, data: object, options: PgBoss.SendOptions = {}): Promise<void> {
  await jobSender().send(name, data, { ...options, db: executorAdapter(executor) });
}
