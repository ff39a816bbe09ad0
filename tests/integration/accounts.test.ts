import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/server/db";
import { rateLimitCounters } from "@/server/db/schema";
import { PublicError } from "@/server/errors";
import {
  acceptInvitation,
  changeMember,
  createClub,
  inviteMember,
  joinWithCode,
  listMembers,
  signInLimits,
  verifyCredentials,
} from "@/server/services/accounts";
import { joinSchema } from "@/validations/accounts";
import { createPerson, publicErrorOf, reloadPerson, testPassword, uniqueEmail } from "./helpers";

describe("joining with the club's join code", () => {
  it("creates an unconfirmed newcomer who can then sign in", async () => {
    const email = uniqueEmail("joiner");
    const input = joinSchema.parse({ joinCode: "TEST-JOIN-CODE", name: "Jo Joiner", email: email.toUpperCase(), password: testPassword });
    const member = await joinWithCode(input);
    expect(member).toMatchObject({ role: "newcomer", confirmed: false, isMentor: false, email });
    expect(member).not.toHaveProperty("passwordHash");
    const user = await verifyCredentials({ email, password: testPassword, clientAddress: "198.51.100.1" });
    expect(user.id).toBe(member.id);
  });

  it("refuses a wrong join code, naming the field, and stores nothing", async () => {
    const email = uniqueEmail("wrong-code");
    const error = await publicErrorOf(joinWithCode({ joinCode: "NOT-THE-CODE", name: "X", email, callSign: null, password: testPassword }));
    expect(error.field).toBe("joinCode");
    expect(error.message).toMatch(/join code is not right/);
    await expect(verifyCredentials({ email, password: testPassword, clientAddress: "198.51.100.2" })).rejects.toThrow(/No Guyline account/);
  });

  it("refuses a second account for the same address, whatever its case", async () => {
    const email = uniqueEmail("twice");
    await joinWithCode({ joinCode: "TEST-JOIN-CODE", name: "Once", email, callSign: null, password: testPassword });
    const second = joinSchema.parse({ joinCode: "TEST-JOIN-CODE", name: "Twice", email: email.toUpperCase(), password: testPassword });
    const error = await publicErrorOf(joinWithCode(second));
    expect(error.field).toBe("email");
  });

  it("refuses a too-short password before anything is written", () => {
    // Source: NIST SP 800-63B-4, Digital Identity Guidelines: Authentication and Authenticator
    // Management, §3.1.1.2 (at least 15 characters for a single-factor password).
    const result = joinSchema.safeParse({ joinCode: "TEST-JOIN-CODE", name: "Short", email: uniqueEmail(), password: "fourteen-chars" });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]).toMatchObject({ path: ["password"], message: expect.stringMatching(/at least 15 characters/) });
  });
});

describe("signing in", () => {
  it("tells a wrong password apart from an unknown e-mail", async () => {
    const person = await createPerson("member");
    const wrong = await publicErrorOf(verifyCredentials({ email: person.email, password: "not the password at all", clientAddress: "198.51.100.3" }));
    expect(wrong.field).toBe("password");
    const unknown = await publicErrorOf(verifyCredentials({ email: uniqueEmail("nobody"), password: testPassword, clientAddress: "198.51.100.3" }));
    expect(unknown.field).toBe("email");
  });

  it("limits failed attempts per e-mail, refusing even the right password, until the window passes", async () => {
    const person = await createPerson("member");
    const limit = signInLimits.perEmail.limit;
    for (let attempt = 0; attempt < limit; attempt++) {
      await expect(verifyCredentials({ email: person.email, password: "wrong password guess", clientAddress: `203.0.113.${attempt}` })).rejects.toThrow(/not right/);
    }
    const limited = await publicErrorOf(verifyCredentials({ email: person.email, password: testPassword, clientAddress: "203.0.113.200" }));
    expect(limited.code).toBe("rate-limited");
    expect(limited.message).toMatch(/Try again in \d+ minutes?/);

    // Once the window has passed the counter starts again.
    await db()
      .update(rateLimitCounters)
      .set({ windowStart: new Date(Date.now() - (signInLimits.perEmail.windowSeconds + 1) * 1000) })
      .where(eq(rateLimitCounters.key, person.email));
    const user = await verifyCredentials({ email: person.email, password: testPassword, clientAddress: "203.0.113.201" });
    expect(user.id).toBe(person.id);
  });

  it("limits attempts per network address across different e-mails", async () => {
    const address = `192.0.2.${Math.floor(Math.random() * 250)}`;
    const people = await Promise.all(Array.from({ length: 4 }, () => createPerson("member")));
    const outcomes: string[] = [];
    for (let attempt = 0; attempt <= signInLimits.perAddress.limit; attempt++) {
      const person = people[attempt % people.length];
      const error = await publicErrorOf(verifyCredentials({ email: person.email, password: "a wrong password here", clientAddress: address }));
      outcomes.push(error.code);
    }
    expect(outcomes.at(-1)).toBe("rate-limited");
    expect(outcomes.slice(0, signInLimits.perAddress.limit).every((code) => code === "bad-input")).toBe(true);
  });

  it("does not count successful sign-ins against the limit", async () => {
    const person = await createPerson("member");
    for (let attempt = 0; attempt < signInLimits.perEmail.limit + 3; attempt++) {
      await verifyCredentials({ email: person.email, password: testPassword, clientAddress: "203.0.113.250" });
    }
  });

  it("counts concurrent attempts from several app instances exactly", async () => {
    const email = uniqueEmail("burst");
    const attempts = 40;
    const results = await Promise.allSettled(
      Array.from({ length: attempts }, (_, i) => verifyCredentials({ email, password: "x".repeat(15), clientAddress: `198.18.0.${i}` })),
    );
    const limited = results.filter((result) => result.status === "rejected" && (result.reason as PublicError).code === "rate-limited");
    expect(limited).toHaveLength(attempts - signInLimits.perEmail.limit);
  });
});

describe("setting up a new club", () => {
  it("refuses a second club in the same database and adds nobody", async () => {
    const email = uniqueEmail("second-club");
    const error = await publicErrorOf(
      createClub({
        club: { clubName: "Another club", ituRegion: 2, timeZone: "America/Denver", defaultUnits: "imperial", joinCode: "ANOTHER-CODE" },
        coordinator: { name: "Second Coordinator", email, password: testPassword },
      }),
    );
    expect(error.field).toBe("club");
    await expect(verifyCredentials({ email, password: testPassword, clientAddress: "198.51.100.9" })).rejects.toThrow(/No Guyline account/);
  });
});

describe("the members page", () => {
  it("lets a coordinator confirm, change roles and set the mentor flag", async () => {
    const coordinator = await createPerson("coordinator");
    const joiner = await createPerson("newcomer", { confirmed: false });
    const confirmed = await changeMember(coordinator, { userId: joiner.id, confirm: true });
    expect(confirmed.confirmed).toBe(true);
    const promoted = await changeMember(coordinator, { userId: joiner.id, role: "member", isMentor: true });
    expect(promoted).toMatchObject({ role: "member", isMentor: true });
    const demoted = await changeMember(coordinator, { userId: joiner.id, role: "newcomer" });
    expect(demoted.isMentor).toBe(false);
  });

  it("refuses every other role", async () => {
    const target = await createPerson("member");
    for (const role of ["steward", "member", "newcomer"] as const) {
      const actor = await createPerson(role);
      const error = await publicErrorOf(changeMember(actor, { userId: target.id, role: "coordinator" }));
      expect(error.status).toBe(403);
      await expect(listMembers(actor)).rejects.toThrow(PublicError);
    }
    expect((await reloadPerson(target.id))?.role).toBe("member");
  });

  it("never lets the last coordinator go, even when two demote each other at once", async () => {
    const [first, second] = await Promise.all([createPerson("coordinator"), createPerson("coordinator")]);
    // Other tests' coordinators exist too; demote them all but these two to test the last one.
    const all = await listMembers(first);
    for (const other of all.filter((member) => member.role === "coordinator" && member.id !== first.id && member.id !== second.id)) {
      await changeMember(first, { userId: other.id, role: "member" });
    }
    const results = await Promise.allSettled([
      changeMember(first, { userId: second.id, role: "member" }),
      changeMember(second, { userId: first.id, role: "member" }),
    ]);
    const coordinatorsLeft = (await listMembers(first).catch(() => listMembers(second))).filter((member) => member.role === "coordinator");
    expect(coordinatorsLeft).toHaveLength(1);
    expect(results.filter((result) => result.status === "rejected")).toHaveLength(1);
  });

  it("turns an invitation into a confirmed account once", async () => {
    const coordinator = await createPerson("coordinator");
    const email = uniqueEmail("invited");
    const { token } = await inviteMember(coordinator, { name: "Ivy Invited", email, role: "steward", isMentor: true });
    const member = await acceptInvitation({ token, password: testPassword, callSign: "Q9IVY" });
    expect(member).toMatchObject({ email, role: "steward", isMentor: true, confirmed: true, callSign: "Q9IVY" });
    const again = await publicErrorOf(acceptInvitation({ token, password: testPassword, callSign: null }));
    expect(again.field).toBe("token");
  });
});
