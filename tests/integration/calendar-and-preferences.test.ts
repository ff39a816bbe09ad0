import { eq } from "drizzle-orm";
import ICAL from "ical.js";
import { describe, expect, it } from "vitest";
import { db } from "@/server/db";
import { mailOutbox, passwordResets } from "@/server/db/schema";
import { PublicError } from "@/server/errors";
import { calendarForToken, renewFeed, revokeFeed } from "@/server/calendar/feeds";
import { enqueueMail } from "@/server/mail/outbox";
import { verifyCredentials } from "@/server/services/accounts";
import { buildSessionIcs, cancelBuildSession, signUpForSession, updateBuildSession } from "@/server/services/build-sessions";
import { applyUnsubscribeToken, getMailChoices, setMailChoices } from "@/server/services/mail-preferences";
import { findOpenReset, requestSignInHelp, resetPassword, signInHelpLimits } from "@/server/services/sign-in-help";
import { outboxFor, parseCalendar } from "./mail-helpers";
import { createPerson, scheduleSession, testPassword } from "./helpers";

const tokenOf = (url: string) => url.split("/").at(-1)!;

describe("calendar files and feeds", () => {
  it("give each session a stable UID, a UTC DTSTAMP and the club's time zone", async () => {
    const { id, coordinator } = await scheduleSession({ capacity: 2 });
    const calendar = parseCalendar((await buildSessionIcs(coordinator, id)).content);
    const vevent = calendar.getFirstSubcomponent("vevent")!;
    // Source: RFC 5545 §3.8.4.7 (UID: globally unique and persistent).
    expect(vevent.getFirstPropertyValue("uid")).toBe(`build-session-${id}@guyline`);
    // Source: RFC 5545 §3.8.7.2 (DTSTAMP is a UTC DATE-TIME).
    const stamp = vevent.getFirstPropertyValue("dtstamp") as ICAL.Time;
    expect(stamp.zone?.tzid).toBe("UTC");
    // Source: RFC 5545 §3.2.19 (a TZID parameter names a VTIMEZONE in the same object) and §3.6.5.
    expect(vevent.getFirstProperty("dtstart")!.getParameter("tzid")).toBe("Europe/London");
    expect(calendar.getAllSubcomponents("vtimezone").map((zone) => zone.getFirstPropertyValue("tzid"))).toEqual(["Europe/London"]);
    // Source: RFC 5545 §3.7.3 (PRODID) and §3.7.4 (VERSION:2.0) are required.
    expect(calendar.getFirstPropertyValue("version")).toBe("2.0");
    expect(calendar.getFirstPropertyValue("prodid")).toBeTruthy();
  });

  it("raise the SEQUENCE on every change and keep the UID", async () => {
    const { id, coordinator } = await scheduleSession({ capacity: 2 });
    const read = async () => parseCalendar((await buildSessionIcs(coordinator, id)).content).getFirstSubcomponent("vevent")!;
    const before = await read();
    const sequenceBefore = Number(before.getFirstPropertyValue("sequence"));
    await updateBuildSession(coordinator, id, { startsAt: "2030-05-04T11:00", endsAt: "2030-05-04T14:00" });
    const after = await read();
    // Source: RFC 5545 §3.8.7.4 (SEQUENCE is incremented each time the event is revised).
    expect(after.getFirstPropertyValue("sequence")).toBe(sequenceBefore + 1);
    expect(after.getFirstPropertyValue("uid")).toBe(before.getFirstPropertyValue("uid"));
    expect((after.getFirstPropertyValue("dtstart") as ICAL.Time).toString()).toBe("2030-05-04T11:00:00");
    await updateBuildSession(coordinator, id, { place: "Elsewhere" });
    expect((await read()).getFirstPropertyValue("sequence")).toBe(sequenceBefore + 2);
  });

  it("keep a session's wall-clock time across a daylight-saving change", async () => {
    // Source: IANA Time Zone Database, Europe/London (GMT until the last Sunday of March 2030, BST after).
    const { id, coordinator } = await scheduleSession({ capacity: 2 });
    await updateBuildSession(coordinator, id, { startsAt: "2030-03-30T10:00", endsAt: "2030-04-06T10:00" });
    const event = new ICAL.Event(parseCalendar((await buildSessionIcs(coordinator, id)).content).getFirstSubcomponent("vevent")!);
    expect(event.startDate.toString()).toBe("2030-03-30T10:00:00");
    expect(event.endDate.toString()).toBe("2030-04-06T10:00:00");
    expect(event.startDate.toJSDate().toISOString()).toBe("2030-03-30T10:00:00.000Z");
    expect(event.endDate.toJSDate().toISOString()).toBe("2030-04-06T09:00:00.000Z");
  });

  it("mark a cancelled session CANCELLED in the file and in the feed, and tell everyone signed up", async () => {
    const { id, coordinator } = await scheduleSession({ capacity: 2 });
    const person = await createPerson("newcomer");
    await signUpForSession(person, id);
    const feed = tokenOf(await renewFeed(person));
    await setMailChoices(person, { "antenna-days": true, shifts: true, "build-sessions": false, lending: true });
    await cancelBuildSession(coordinator, id, "The hall is flooded");
    // Source: RFC 5545 §3.8.1.11 (STATUS:CANCELLED for a VEVENT).
    const file = parseCalendar((await buildSessionIcs(coordinator, id)).content).getFirstSubcomponent("vevent")!;
    expect(file.getFirstPropertyValue("status")).toBe("CANCELLED");
    const fromFeed = parseCalendar((await calendarForToken(feed))!).getAllSubcomponents("vevent").find((vevent) => vevent.getFirstPropertyValue("uid") === `build-session-${id}@guyline`);
    expect(fromFeed?.getFirstPropertyValue("status")).toBe("CANCELLED");
    // Turned off build-session mail, yet the cancellation is always sent.
    const [cancelled] = await outboxFor([person.id], "buildSessionCancelled");
    expect(cancelled).toMatchObject({ status: "pending" });
    expect(cancelled.textBody).toContain("The hall is flooded");
  });

  it("serve a person's feed only through their current token", async () => {
    const { id } = await scheduleSession({ capacity: 2 });
    const person = await createPerson("member");
    await signUpForSession(person, id);
    const first = tokenOf(await renewFeed(person));
    expect(await calendarForToken(first)).toContain(`UID:build-session-${id}@guyline`);
    const second = tokenOf(await renewFeed(person));
    expect(await calendarForToken(first)).toBeNull();
    expect(await calendarForToken(second)).toContain(`UID:build-session-${id}@guyline`);
    expect(await calendarForToken("a-token-that-was-never-issued-to-anyone")).toBeNull();
    await revokeFeed(person);
    expect(await calendarForToken(second)).toBeNull();
  });
});

describe("e-mail choices", () => {
  it("skip a category the member turned off, and a one-click unsubscribe turns it off", async () => {
    const person = await createPerson("member");
    expect(await getMailChoices(person)).toEqual({ "antenna-days": true, shifts: true, "build-sessions": true, lending: true });
    const outcome = await db().transaction((tx) =>
      enqueueMail(tx, {
        template: "itemOverdue",
        to: { userId: person.id },
        key: `overdue-test-1:${person.id}`,
        data: { itemName: "Analyser A", dueAt: new Date().toISOString(), daysOverdue: 1, path: "/lending" },
      }),
    );
    expect(outcome).toBe("queued");
    const [queued] = await outboxFor([person.id], "itemOverdue");
    const token = queued.headers["List-Unsubscribe"].match(/\/api\/unsubscribe\/([^>]+)>/)![1];
    expect(await applyUnsubscribeToken(token, false)).toEqual({ userId: person.id, category: "lending" });
    expect((await getMailChoices(person)).lending).toBe(false);
    const again = await db().transaction((tx) =>
      enqueueMail(tx, {
        template: "itemOverdue",
        to: { userId: person.id },
        key: `overdue-test-2:${person.id}`,
        data: { itemName: "Analyser A", dueAt: new Date().toISOString(), daysOverdue: 2, path: "/lending" },
      }),
    );
    expect(again).toBe("turned-off");
    expect(await applyUnsubscribeToken(`${token}x`, false)).toBeNull();
  });
});

describe("sign-in help", () => {
  it("e-mails a single-use link that sets a new password", async () => {
    const person = await createPerson("member");
    await requestSignInHelp({ email: person.email, clientAddress: "198.51.100.40" });
    const [mail] = await outboxFor([person.id], "signInHelp");
    expect(mail.headers).toEqual({});
    const token = mail.textBody.match(/\/reset-password\/([A-Za-z0-9_-]+)/)![1];
    expect(await findOpenReset(token)).toEqual({ email: person.email });
    const stored = await db().select().from(passwordResets).where(eq(passwordResets.userId, person.id));
    expect(stored[0].tokenHash).not.toContain(token);

    const newPassword = "a brand new passphrase here";
    await resetPassword({ token, password: newPassword });
    expect((await verifyCredentials({ email: person.email, password: newPassword, clientAddress: "198.51.100.41" })).id).toBe(person.id);
    await expect(verifyCredentials({ email: person.email, password: testPassword, clientAddress: "198.51.100.41" })).rejects.toThrow(/not right/);
    await expect(resetPassword({ token, password: "yet another passphrase x" })).rejects.toThrow(/expired or was already used/);
  });

  it("refuses an expired link and says nothing about unknown addresses", async () => {
    const person = await createPerson("member");
    await requestSignInHelp({ email: person.email, clientAddress: "198.51.100.42" });
    const [mail] = await outboxFor([person.id], "signInHelp");
    const token = mail.textBody.match(/\/reset-password\/([A-Za-z0-9_-]+)/)![1];
    await db().update(passwordResets).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(passwordResets.userId, person.id));
    expect(await findOpenReset(token)).toBeNull();
    await expect(requestSignInHelp({ email: "nobody-at-all@example.org", clientAddress: "198.51.100.42" })).resolves.toBeUndefined();
    const none = await db().select().from(mailOutbox).where(eq(mailOutbox.toAddress, "nobody-at-all@example.org"));
    expect(none).toHaveLength(0);
  });

  it("limits requests per address", async () => {
    const person = await createPerson("member");
    for (let attempt = 0; attempt < signInHelpLimits.perEmail.limit; attempt++) {
      await requestSignInHelp({ email: person.email, clientAddress: `203.0.113.${60 + attempt}` });
    }
    const error = await requestSignInHelp({ email: person.email, clientAddress: "203.0.113.99" }).catch((thrown: unknown) => thrown);
    expect(error).toBeInstanceOf(PublicError);
    expect((error as PublicError).code).toBe("rate-limited");
    expect(await outboxFor([person.id], "signInHelp")).toHaveLength(signInHelpLimits.perEmail.limit);
  });
});
