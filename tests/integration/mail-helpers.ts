// Mail in integration tests: the real local mail server (in this process), the real worker (a
// child process, so it can be stopped and killed like in production), and waiting for both.
import { spawn, type ChildProcess } from "node:child_process";
import { existsSync, readdirSync } from "node:fs";
import { join } from "node:path";
import { and, eq, inArray } from "drizzle-orm";
import ICAL from "ical.js";
import { simpleParser, type ParsedMail } from "mailparser";
import { db } from "@/server/db";
import { capturedMail, mailOutbox } from "@/server/db/schema";
import { newJobQueue, queueNames } from "@/server/jobs/queue";
import { deliverOutboxMessage } from "@/server/mail/delivery";
import { createMailTransport } from "@/server/mail/transport";

export const smtpPort = Number(process.env.GUYLINE_SMTP_INTEGRATION_PORT ?? 2725);

export interface WorkerProcess {
  child: ChildProcess;
  output: string[];
  stop(signal?: NodeJS.Signals): Promise<void>;
}

/**
 * Sets aside the mail earlier test files left pending (publishing a day writes to every member
 * of the test database: thousands of messages), so a worker started next sends only what its
 * own file's tests cause. The set-aside rows are `skipped`, which delivery leaves alone.
 */
export async function setAsidePendingMail(): Promise<void> {
  const boss = newJobQueue({ supervise: false, schedule: false, max: 1 });
  await boss.start();
  try {
    await boss.purgeQueue(queueNames.deliverMail);
  } finally {
    await boss.stop({ graceful: false });
  }
  await db().update(mailOutbox).set({ status: "skipped" }).where(eq(mailOutbox.status, "pending"));
}

/** Starts scripts/worker.ts against the test database and the given SMTP port; resolves once it runs. */
export async function startWorkerProcess(port = smtpPort): Promise<WorkerProcess> {
  const child = spawn(process.execPath, ["--import", "tsx", "scripts/worker.ts"], {
    env: { ...process.env, SMTP_HOST: "127.0.0.1", SMTP_PORT: String(port) },
    stdio: ["ignore", "pipe", "pipe"],
  });
  const output: string[] = [];
  const exited = new Promise<void>((resolve) => child.once("exit", () => resolve()));
  await new Promise<void>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`The worker did not start:\n${output.join("")}`)), 60_000);
    const onData = (chunk: Buffer) => {
      output.push(chunk.toString());
      if (chunk.toString().includes("worker running")) {
        clearTimeout(timer);
        resolve();
      }
    };
    child.stdout!.on("data", onData);
    child.stderr!.on("data", (chunk: Buffer) => output.push(chunk.toString()));
    child.once("exit", (code) => {
      clearTimeout(timer);
      reject(new Error(`The worker exited (${code}):\n${output.join("")}`));
    });
  });
  return {
    child,
    output,
    async stop(signal: NodeJS.Signals = "SIGTERM") {
      if (child.exitCode === null && child.signalCode === null) child.kill(signal);
      await exited;
    },
  };
}

export async function waitFor<T>(what: string, probe: () => Promise<T | null | undefined | false>, timeoutMs = 30_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await probe();
    if (value) return value;
    if (Date.now() > deadline) throw new Error(`Timed out waiting for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}

export async function capturedFor(address: string) {
  return db()
    .select()
    .from(capturedMail)
    .where(eq(capturedMail.envelopeTo, [address]))
    .orderBy(capturedMail.receivedAt);
}

/**
 * Sends outbox rows at once through the real delivery code and SMTP to the local mail server on
 * `port`, and returns what it captured, parsed by mailparser. Tests that only need their own
 * messages use it instead of the worker, whose queue may hold every other test's mail.
 */
export async function deliverNow(outboxIds: string[], port = smtpPort): Promise<(ParsedMail & { envelopeTo: string[] })[]> {
  const transport = createMailTransport({ host: "127.0.0.1", port, from: "Guyline <guyline@localhost>" });
  try {
    for (const id of outboxIds) await deliverOutboxMessage(id, transport, "Guyline <guyline@localhost>");
  } finally {
    transport.close();
  }
  const ids = outboxIds.map((id) => `<${id}@localhost>`);
  const captured = outboxIds.length === 0 ? [] : await db().select().from(capturedMail).where(inArray(capturedMail.messageId, ids));
  return Promise.all(captured.map(async (row) => Object.assign(await simpleParser(row.raw), { envelopeTo: row.envelopeTo })));
}

export async function outboxFor(userIds: string[], template?: string) {
  return db()
    .select()
    .from(mailOutbox)
    .where(and(inArray(mailOutbox.userId, userIds), template ? eq(mailOutbox.template, template) : undefined));
}

/**
 * Whether a Guyline URL path is served by a page or route handler in src/app: static
 * segments match folders, dynamic ones match [param] folders, (group) folders are skipped.
 */
export function resolvesToRoute(pathname: string): boolean {
  const walk = (dir: string, segments: string[]): boolean => {
    const entries = readdirSync(dir, { withFileTypes: true }).filter((entry) => entry.isDirectory());
    for (const group of entries.filter((entry) => /^\(.+\)$/.test(entry.name))) {
      if (walk(join(dir, group.name), segments)) return true;
    }
    if (segments.length === 0) return existsSync(join(dir, "page.tsx")) || existsSync(join(dir, "route.ts"));
    const [head, ...rest] = segments;
    const exact = entries.find((entry) => entry.name === head);
    if (exact && walk(join(dir, exact.name), rest)) return true;
    return entries.some((entry) => /^\[[^.\]]+\]$/.test(entry.name) && walk(join(dir, entry.name), rest));
  };
  return walk(join(process.cwd(), "src/app"), pathname.split("/").filter(Boolean));
}

/** An iCalendar text parsed by ical.js, with its VTIMEZONEs registered so times resolve. */
export function parseCalendar(ics: string) {
  const calendar = new ICAL.Component(ICAL.parse(ics));
  for (const zone of calendar.getAllSubcomponents("vtimezone")) ICAL.TimezoneService.register(zone);
  return calendar;
}
