import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/server/db";
import { buildSessionSignups, buildSessions, mailOutbox } from "@/server/db/schema";
import { pgErrorCode, pgErrorCodes } from "@/server/errors";
import { cancelSignup, createBuildSession, getBuildSession, signUpForSession, updateBuildSession } from "@/server/services/build-sessions";
import { buildSessionSchema } from "@/validations/build-sessions";
import { outboxFor } from "./mail-helpers";
import { createPerson, publicErrorOf, scheduleSession, testPlan, wallTimeInDays } from "./helpers";

const sessionRow = async (id: string) => (await db().select().from(buildSessions).where(eq(buildSessions.id, id)))[0];

describe("build-session capacity", () => {
  it("gives the last place to exactly one of 20 people signing up at once; the rest wait in line", async () => {
    const { id } = await scheduleSession({ capacity: 3 });
    const early = await Promise.all([createPerson("member"), createPerson("newcomer")]);
    for (const person of early) await signUpForSession(person, id);

    const crowd = await Promise.all(Array.from({ length: 20 }, (_, i) => createPerson(i % 2 ? "member" : "newcomer")));
    const outcomes = await Promise.all(crowd.map((person) => signUpForSession(person, id)));

    expect(outcomes.filter((outcome) => outcome.status === "confirmed")).toHaveLength(1);
    const waiting = outcomes.filter((outcome) => outcome.status === "waitlisted");
    expect(waiting).toHaveLength(19);
    expect(waiting.map((outcome) => outcome.position).sort((a, b) => a! - b!)).toEqual(Array.from({ length: 19 }, (_, i) => i + 1));
    const row = await sessionRow(id);
    expect(row.taken).toBe(3);
    const signups = await db().select().from(buildSessionSignups).where(eq(buildSessionSignups.sessionId, id));
    expect(signups.filter((signup) => signup.status === "confirmed")).toHaveLength(3);
  });

  it("keeps the capacity in the database even against a direct write", async () => {
    const { id } = await scheduleSession({ capacity: 1 });
    const error = await db()
      .update(buildSessions)
      .set({ taken: 2 })
      .where(eq(buildSessions.id, id))
      .then(() => null, (thrown: unknown) => thrown);
    expect(pgErrorCode(error)).toBe(pgErrorCodes.checkViolation);
  });

  it("refuses a second sign-up by the same person, and a mentor signing up for their own session", async () => {
    const { id, mentor } = await scheduleSession({ capacity: 5 });
    const person = await createPerson("newcomer");
    await signUpForSession(person, id);
    expect((await publicErrorOf(signUpForSession(person, id))).status).toBe(409);
    expect((await publicErrorOf(signUpForSession(mentor, id))).message).toMatch(/mentor this session/);
    expect((await sessionRow(id)).taken).toBe(1);
  });
});

describe("the waitlist", () => {
  it("promotes the first in line when a place frees up and sends one message, to that person", async () => {
    const { id } = await scheduleSession({ capacity: 1 });
    const [holder, first, second] = await Promise.all([createPerson("member"), createPerson("newcomer"), createPerson("newcomer")]);
    await signUpForSession(holder, id);
    expect(await signUpForSession(first, id)).toEqual({ status: "waitlisted", position: 1 });
    expect(await signUpForSession(second, id)).toEqual({ status: "waitlisted", position: 2 });

    await cancelSignup(holder, id);

    const promoted = await outboxFor([holder.id, first.id, second.id], "buildSessionPromoted");
    expect(promoted).toHaveLength(1);
    expect(promoted[0]).toMatchObject({ userId: first.id, toAddress: first.email, status: "pending" });
    expect(promoted[0].attachments[0]).toMatchObject({ contentType: "text/calendar; charset=utf-8" });
    const detail = await getBuildSession(second, id);
    expect(detail.myPlace).toEqual({ status: "waitlisted", position: 1 });
    expect((await getBuildSession(first, id)).myPlace).toEqual({ status: "confirmed", position: null });
    expect((await sessionRow(id)).taken).toBe(1);
  });

  it("frees the place without promotion when nobody waits, and does not promote on leaving the waitlist", async () => {
    const { id } = await scheduleSession({ capacity: 1 });
    const [holder, waiting] = await Promise.all([createPerson("member"), createPerson("newcomer")]);
    await signUpForSession(holder, id);
    await signUpForSession(waiting, id);
    await cancelSignup(waiting, id);
    expect((await sessionRow(id)).taken).toBe(1);
    await cancelSignup(holder, id);
    expect((await sessionRow(id)).taken).toBe(0);
    expect(await outboxFor([holder.id, waiting.id], "buildSessionPromoted")).toHaveLength(0);
  });

  it("promotes as many as a raised capacity allows, in order, and refuses a capacity below the places taken", async () => {
    const { id, coordinator } = await scheduleSession({ capacity: 1 });
    const people = await Promise.all([createPerson("member"), createPerson("member"), createPerson("member"), createPerson("member")]);
    for (const person of people) await signUpForSession(person, id);
    await updateBuildSession(coordinator, id, { capacity: 3 });
    expect((await getBuildSession(people[1], id)).myPlace?.status).toBe("confirmed");
    expect((await getBuildSession(people[2], id)).myPlace?.status).toBe("confirmed");
    expect((await getBuildSession(people[3], id)).myPlace).toEqual({ status: "waitlisted", position: 1 });
    const error = await publicErrorOf(updateBuildSession(coordinator, id, { capacity: 2 }));
    expect(error.field).toBe("capacity");
  });
});

describe("who may do what", () => {
  it("lets only coordinators schedule, and only the person or a coordinator give up a place", async () => {
    const { id, input } = await scheduleSession({ capacity: 2 });
    for (const role of ["steward", "member", "newcomer"] as const) {
      expect((await publicErrorOf(createBuildSession(await createPerson(role), input))).status).toBe(403);
    }
    const [holder, other] = await Promise.all([createPerson("newcomer"), createPerson("member")]);
    await signUpForSession(holder, id);
    expect((await publicErrorOf(cancelSignup(other, id, holder.id))).status).toBe(403);
    expect((await publicErrorOf(signUpForSession(await createPerson("newcomer", { confirmed: false }), id))).status).toBe(403);
  });

  it("checks the plan with the antenna engine and the mentors against the mentor flag", async () => {
    const coordinator = await createPerson("coordinator");
    const notMentor = await createPerson("member");
    const base = { title: "Bad plan", startsAt: wallTimeInDays(30, "10:00"), endsAt: wallTimeInDays(30, "12:00"), place: "Hall", capacity: 3 };
    const mentorError = await publicErrorOf(createBuildSession(coordinator, buildSessionSchema.parse({ ...base, plan: testPlan, mentorIds: [notMentor.id] })));
    expect(mentorError.field).toBe("mentorIds");
    const mentor = await createPerson("member", { isMentor: true });
    const vertical = { ...testPlan, family: "vertical", heightM: 1, radialDroopDeg: 60 };
    const planError = await publicErrorOf(createBuildSession(coordinator, buildSessionSchema.parse({ ...base, plan: vertical, mentorIds: [mentor.id] })));
    expect(planError.field).toBe("plan.heightM");
    expect(buildSessionSchema.safeParse({ ...base, plan: { ...testPlan, band: "11m" }, mentorIds: [mentor.id] }).success).toBe(false);
  });

  it("tells everyone signed up when the time or place changes, once per change", async () => {
    const { id, coordinator } = await scheduleSession({ capacity: 2 });
    const person = await createPerson("newcomer");
    await signUpForSession(person, id);
    await updateBuildSession(coordinator, id, { place: "Scout hut" });
    await updateBuildSession(coordinator, id, { notes: "Bring lunch" });
    const changed = await db().select().from(mailOutbox).where(eq(mailOutbox.userId, person.id));
    const changeMails = changed.filter((mail) => mail.template === "buildSessionChanged");
    expect(changeMails).toHaveLength(1);
    expect(changeMails[0].textBody).toContain("New place: Scout hut (was Test hall)");
  });
});
