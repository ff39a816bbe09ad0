// The worker: delivers queued mail and runs the reminder sweep. scripts/worker.ts starts it
// beside the app; several workers may run at once (each message is claimed by one).
import type PgBoss from "pg-boss";
import { smtpSettings } from "@/env";
import { deliverOutboxMessage, recordDeliveryFailure } from "@/server/mail/delivery";
import { runReminderSweep } from "@/server/mail/reminders";
import { createMailTransport } from "@/server/mail/transport";
import { newJobQueue, queueNames } from "./queue";

/** How often the sweep looks for due reminders (cron, UTC; the sweep itself reads the club's clock). */
export const reminderSweepCron = "*/10 * * * *";

export interface RunningWorker {
  stop(): Promise<void>;
}

export async function startWorker(log: (line: string) => void = console.log): Promise<RunningWorker> {
  const settings = smtpSettings();
  const transport = createMailTransport(settings);
  // Short maintenance cycles: a job left active by a killed worker is retried within a minute.
  const boss = newJobQueue({ maintenanceIntervalSeconds: 15, max: 4 });
  boss.on("error", (error) => console.error("job queue:", error));
  await boss.start();

  await boss.work<{ outboxId: string }>(
    queueNames.deliverMail,
    { batchSize: 5, pollingIntervalSeconds: 1, includeMetadata: true },
    async (jobs: PgBoss.JobWithMetadata<{ outboxId: string }>[]) => {
      // Each message on its own: one the server refuses does not hold back the others.
      for (const job of jobs) {
        try {
          const outcome = await deliverOutboxMessage(job.data.outboxId, transport, settings.from);
          if (outcome === "sent") log(`sent ${job.data.outboxId}`);
        } catch (error) {
          const lastTry = job.retryCount >= job.retryLimit;
          await recordDeliveryFailure(job.data.outboxId, error, lastTry);
          await boss.fail(queueNames.deliverMail, job.id, { message: error instanceof Error ? error.message : String(error) });
          log(`could not send ${job.data.outboxId} (try ${job.retryCount + 1}): ${error instanceof Error ? error.message : error}`);
        }
      }
    },
  );

  await boss.work(queueNames.reminderSweep, { pollingIntervalSeconds: 5 }, async () => {
    const { window, queued } = await runReminderSweep();
    if (window) log(`reminder sweep for ${window.date}: ${queued} queued`);
  });
  await boss.schedule(queueNames.reminderSweep, reminderSweepCron);
  // Catch up at once: reminders the worker missed while it was down go out now.
  await boss.send(queueNames.reminderSweep, {});

  log(`worker running: mail through ${settings.host}:${settings.port}`);
  return {
    async stop() {
      await boss.stop({ graceful: true, timeout: 10_000 });
      transport.close();
    },
  };
}
