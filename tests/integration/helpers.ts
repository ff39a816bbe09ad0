// Each test makes its own data: people get unique e-mail addresses, so tests never collide.
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { expect } from "vitest";
import { Temporal } from "temporal-polyfill";
import { db } from "@/server/db";
import { PublicError } from "@/server/errors";
import { users } from "@/server/db/schema";
import type { Role } from "@/lib/roles";
import type { Actor } from "@/server/policy";
import { toActor } from "@/server/services/accounts";
import { createBuildSession } from "@/server/services/build-sessions";
import { buildSessionSchema } from "@/validations/build-sessions";

// A bcrypt hash of "correct horse battery staple" at cost 4: fast, and only for tests.
export const testPassword = "correct horse battery staple";
const testPasswordHash = "$2b$04$sqbOjNy/FMmLlg.wTKzB.efskPmmXQ.XkGovpxiimzfzYmR5esvnu";

export const uniqueEmail = (label = "person") => `${label}-${randomUUID().slice(0, 8)}@example.org`;

export async function createPerson(role: Role, options: { isMentor?: boolean; confirmed?: boolean; name?: string } = {}): Promise<Actor & { email: string }> {
  const [row] = await db()
    .insert(users)
    .values({
      name: options.name ?? `Test ${role}`,
      email: uniqueEmail(role),
      passwordHash: testPasswordHash,
      role,
      isMentor: options.isMentor ?? false,
      confirmedAt: options.confirmed === false ? null : new Date(),
    })
    .returning();
  return { ...toActor(row), email: row.email };
}

export async function reloadPerson(id: string) {
  return db().query.users.findFirst({ where: eq(users.id, id) });
}

/** A wall-clock time `days` from today in the test club's zone (Europe/London), e.g. "2026-07-01T10:00". */
export function wallTimeInDays(days: number, time: string): string {
  return `${Temporal.Now.plainDateISO("Europe/London").add({ days }).toString()}T${time}`;
}

/** Noon on the test club's clock (Europe/London), `days` from today: a time the reminder sweep runs. */
export function clubNoonInDays(days: number): Date {
  return new Date(Temporal.PlainDateTime.from(wallTimeInDays(days, "12:00")).toZonedDateTime("Europe/London").epochMilliseconds);
}

export const testPlan = {
  family: "dipole",
  band: "20m",
  region: 1,
  heightM: 8,
  wireDiameterMm: 1.6,
  ground: "average",
  feedline: { type: "rg58", lengthM: 15 },
  transmitter: { powerW: 100, mode: "ssb" },
} as const;

/** Schedules a build session through the service, with a fresh coordinator and mentor. */
export async function scheduleSession(options: { capacity: number; inDays?: number; from?: string; to?: string; title?: string }) {
  const coordinator = await createPerson("coordinator");
  const mentor = await createPerson("member", { isMentor: true, name: "Mentor Mo" });
  const input = buildSessionSchema.parse({
    title: options.title ?? `Test session ${randomUUID().slice(0, 6)}`,
    plan: testPlan,
    startsAt: wallTimeInDays(options.inDays ?? 30, options.from ?? "10:00"),
    endsAt: wallTimeInDays(options.inDays ?? 30, options.to ?? "13:00"),
    place: "Test hall",
    capacity: options.capacity,
    mentorIds: [mentor.id],
  });
  const { id } = await createBuildSession(coordinator, input);
  return { id, coordinator, mentor, input };
}

/** The PublicError a service call is expected to throw (fails the test when it resolves). */
export async function publicErrorOf(promise: Promise<unknown>): Promise<PublicError> {
  const error = await promise.then(
    () => null,
    (thrown: unknown) => thrown,
  );
  expect(error).toBeInstanceOf(PublicError);
  return error as PublicError;
}
