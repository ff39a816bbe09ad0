import { eq, inArray } from "drizzle-orm";
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { serverEnv } from "@/env";
import { db } from "@/server/db";
import { mailOutbox } from "@/server/db/schema";
import { startCaptureServer, type CaptureServer } from "@/server/mail/capture-server";
import { enqueueMail } from "@/server/mail/outbox";
import { runReminderSweep } from "@/server/mail/reminders";
import { cancelSignup, signUpForSession } from "@/server/services/build-sessions";
import { readUnsubscribeToken } from "@/server/services/mail-preferences";
import { capturedFor, outboxFor, resolvesToRoute, setAsidePendingMail, smtpPort, startWorkerProcess, waitFor, type WorkerProcess } from "./mail-helpers";
import { clubNoonInDays, createPerson, scheduleSession } from "./helpers";

let capture: CaptureServer | null = null;
let worker: WorkerProcess;

beforeAll(async () => {
  await setAsidePendingMail();
  capture = await startCaptureServer(smtpPort);
  worker = await startWorkerProcess();
});

afterAll(async () => {
  await worker?.stop();
  await capture?.close();
});

describe("messages through the local mail server", () => {
  it("reach the right person with a text part, an HTML part, the .ics and links that resolve", async () => {
    const { id } = await scheduleSession({ capacity: 2, title: "Dipole evening" });
    const person = await createPerson("newcomer", { name: "Nia Newfield" });
    await signUpForSession(person, id);

    const [captured] = await waitFor("the confirmation", async () => (await capturedFor(person.email)).length > 0 && capturedFor(person.email));
    const parsed = await simpleParser(captured.raw);
    expect(parsed.subject).toBe("Your place: Dipole evening");
    expect(parsed.to && !Array.isArray(parsed.to) ? parsed.to.value.map((address) => address.address) : []).toEqual([person.email]);
    expect(parsed.text).toContain("Hello Nia Newfield,");
    expect(typeof parsed.html === "string" && parsed.html.includes("Hello Nia Newfield,")).toBe(true);
    // Source: RFC 2046 §5.1.4 (multipart/alternative: the same content as text and HTML).
    expect(captured.raw).toMatch(/Content-Type: multipart\/alternative/i);
    const ics = parsed.attachments.find((attachment) => attachment.contentType === "text/calendar");
    expect(ics?.content.toString()).toContain(`UID:build-session-${id}@guyline`);

    // Source: RFC 8058 §3.1 (List-Unsubscribe with an HTTPS URI, and List-Unsubscribe-Post).
    const header = (name: string) => parsed.headerLines.find((line) => line.key === name)?.line.replace(/^[^:]+:\s*/, "");
    expect(header("list-unsubscribe-post")).toBe("List-Unsubscribe=One-Click");
    const listUnsubscribe = header("list-unsubscribe") ?? "";
    expect(listUnsubscribe).toMatch(/^<http:\/\/localhost:\d+\/api\/unsubscribe\/[^>]+>$/);
    expect(resolvesToRoute(new URL(listUnsubscribe.slice(1, -1)).pathname)).toBe(true);

    const appUrl = serverEnv().NEXTAUTH_URL.replace(/\/$/, "");
    const links = [...new Set([...(parsed.text ?? "").matchAll(/https?:\/\/\S+/g)].map((match) => match[0]))];
    expect(links.length).toBeGreaterThanOrEqual(3);
    for (const link of links) {
      expect(link.startsWith(appUrl)).toBe(true);
      const path = new URL(link).pathname;
      expect(resolvesToRoute(path), path).toBe(true);
    }
    expect(links).toContain(`${appUrl}/build-sessions/${id}`);
    const unsubscribe = links.find((link) => link.includes("/unsubscribe/"))!;
    expect(await readUnsubscribeToken(unsubscribe.split("/").at(-1)!)).toMatchObject({ userId: person.id, category: "build-sessions" });
  });

  it("tells only the first in line when a place frees up", async () => {
    const { id } = await scheduleSession({ capacity: 1, title: "Full session" });
    const [holder, first, second] = await Promise.all([createPerson("member"), createPerson("newcomer"), createPerson("newcomer")]);
    await signUpForSession(holder, id);
    await signUpForSession(first, id);
    await signUpForSession(second, id);
    await cancelSignup(holder, id);
    const promoted = await waitFor("the promotion", async () => {
      const mails = (await capturedFor(first.email)).filter((mail) => mail.subject.startsWith("A place freed up"));
      return mails.length > 0 && mails;
    });
    expect(promoted).toHaveLength(1);
    await waitFor("everything sent", async () => (await outboxFor([holder.id, first.id, second.id])).every((mail) => mail.status === "sent"));
    expect((await capturedFor(second.email)).map((mail) => mail.subject)).toEqual(["On the waitlist: Full session"]);
  });
});

describe("reminders", () => {
  it("retries a reminder while the mail server is down and delivers it once it is back, once", async () => {
    const { id } = await scheduleSession({ capacity: 3, inDays: 40, title: "Reminder session" });
    const person = await createPerson("newcomer");
    await signUpForSession(person, id);
    await waitFor("the confirmation", async () => (await capturedFor(person.email)).length === 1);

    await capture!.close();
    capture = null;
    // The day before, at noon on the club's clock.
    const dayBefore = clubNoonInDays(39);
    const sweep = await runReminderSweep(dayBefore);
    expect(sweep.queued).toBeGreaterThanOrEqual(1);
    const [reminder] = await outboxFor([person.id], "buildSessionReminder");
    expect(reminder.status).toBe("pending");

    const failed = await waitFor("a failed try", async () => {
      const [row] = await db().select().from(mailOutbox).where(eq(mailOutbox.id, reminder.id));
      return row.attempts >= 1 && row;
    });
    expect(failed.status).toBe("pending");
    expect(failed.lastError).toBeTruthy();

    capture = await startCaptureServer(smtpPort);
    await waitFor("the retry", async () => (await capturedFor(person.email)).some((mail) => mail.subject.startsWith("Tomorrow:")), 60_000);
    // A second sweep and a little time change nothing: one reminder, sent once.
    expect((await runReminderSweep(dayBefore)).queued).toBe(0);
    await new Promise((resolve) => setTimeout(resolve, 3000));
    const reminders = (await capturedFor(person.email)).filter((mail) => mail.subject === "Tomorrow: Reminder session");
    expect(reminders).toHaveLength(1);
    const [sent] = await db().select().from(mailOutbox).where(eq(mailOutbox.id, reminder.id));
    expect(sent.status).toBe("sent");
    expect(sent.attempts).toBeGreaterThanOrEqual(2);
  }, 90_000);
});

describe("a worker killed in the middle of a batch", () => {
  it("leaves nothing sent twice and nothing lost after a restart", async () => {
    await worker.stop();
    await capture!.close();
    capture = null;
    // An SMTP server that takes its time to accept, records each message it accepted by its
    // Message-ID, and kills the worker while it waits for the acceptance of the fourth message.
    const accepted: string[] = [];
    let received = 0;
    let killWorker: () => Promise<void> = async () => {};
    const slow = new SMTPServer({
      disabledCommands: ["STARTTLS", "AUTH"],
      authOptional: true,
      logger: false,
      onData(stream, _session, callback) {
        const chunks: Buffer[] = [];
        stream.on("data", (chunk: Buffer) => chunks.push(chunk));
        stream.on("end", async () => {
          received += 1;
          if (received === 4) {
            // The sender dies before it hears "250 OK": the message is not accepted.
            await killWorker();
            return callback(new Error("The sender went away."));
          }
          await new Promise((resolve) => setTimeout(resolve, 300));
          accepted.push((await simpleParser(Buffer.concat(chunks))).messageId ?? "");
          callback();
        });
      },
    });
    await new Promise<void>((resolve) => slow.listen(smtpPort, "127.0.0.1", () => resolve()));
    try {
      const people = await Promise.all(Array.from({ length: 12 }, () => createPerson("member")));
      await db().transaction(async (tx) => {
        for (const person of people) {
          await enqueueMail(tx, {
            template: "signInHelp",
            to: { userId: person.id },
            key: `restart-test:${person.id}`,
            data: { resetPath: "/reset-password/not-a-real-token", expiresAt: new Date(Date.now() + 3600_000).toISOString() },
          });
        }
      });
      const ids = (await outboxFor(people.map((person) => person.id))).map((row) => row.id);

      const first = await startWorkerProcess();
      killWorker = () => first.stop("SIGKILL");
      await waitFor("the worker to be killed mid-send", async () => first.child.signalCode === "SIGKILL", 60_000);
      expect(accepted.length).toBe(3);
      const [inFlight] = await db().select().from(mailOutbox).where(inArray(mailOutbox.id, ids)).then((rows) => rows.filter((row) => row.status === "pending"));
      expect(inFlight).toBeTruthy();

      worker = await startWorkerProcess();
      const rows = await waitFor(
        "every message sent",
        async () => {
          const current = await db().select().from(mailOutbox).where(inArray(mailOutbox.id, ids));
          return current.every((row) => row.status === "sent") && current;
        },
        120_000,
      );
      expect(rows).toHaveLength(12);
      const ours = accepted.filter((messageId) => ids.some((id) => messageId.includes(id)));
      expect(ours).toHaveLength(12);
      expect(new Set(ours).size).toBe(12);
    } finally {
      await new Promise<void>((resolve) => slow.close(() => resolve()));
    }
    capture = await startCaptureServer(smtpPort);
  }, 180_000);
});
