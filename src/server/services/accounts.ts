// Accounts: sign-in checks, joining with the club's join code, invitations, the members page
// and each person's own settings.
import { createHash, randomBytes } from "node:crypto";
import bcrypt from "bcryptjs";
import { and, asc, eq, gt, isNull } from "drizzle-orm";
import { cache } from "react";
import { db } from "@/server/db";
import { clubSettings, invitations, users, type UserRow } from "@/server/db/schema";
import { PublicError, badInput, forbidden, notFound, pgErrorCode, pgErrorCodes } from "@/server/errors";
import { can, type Actor } from "@/server/policy";
import { clearRateLimit, hitRateLimit, refundRateLimit, type RateLimitRule } from "@/server/rate-limit";
import { roleLabels, type Role } from "@/lib/roles";
import { enqueueMail } from "@/server/mail/outbox";

const BCRYPT_COST = 12;
const INVITATION_DAYS = 14;

// common practice: a handful of failed tries per account and a few dozen per network address
// in a quarter of an hour stop guessing without getting in the way of a forgetful member.
// Every attempt is counted before the password is checked (so a burst of parallel guesses
// cannot slip past the limit); a successful one is then taken back.
export const signInLimits = {
  perEmail: { bucket: "sign-in-email", limit: 8, windowSeconds: 15 * 60 },
  perAddress: { bucket: "sign-in-address", limit: 30, windowSeconds: 15 * 60 },
} satisfies Record<string, RateLimitRule>;

/** What the client may see of a person: never the password hash. */
export interface MemberDto {
  id: string;
  name: string;
  email: string;
  callSign: string | null;
  role: Role;
  isMentor: boolean;
  units: "metric" | "imperial";
  confirmed: boolean;
  createdAt: string;
}

export function toMemberDto(row: UserRow): MemberDto {
  return {
    id: row.id,
    name: row.name,
    email: row.email,
    callSign: row.callSign,
    role: row.role,
    isMentor: row.isMentor,
    units: row.units,
    confirmed: row.confirmedAt !== null,
    createdAt: row.createdAt.toISOString(),
  };
}

export function toActor(row: UserRow): Actor {
  return { id: row.id, role: row.role, isMentor: row.isMentor, confirmed: row.confirmedAt !== null };
}

export const hashPassword = (password: string) => bcrypt.hash(password, BCRYPT_COST);
const hashToken = (token: string) => createHash("sha256").update(token).digest("hex");

export async function findUserById(id: string): Promise<UserRow | undefined> {
  return db().query.users.findFirst({ where: eq(users.id, id) });
}

/** Checks an e-mail and password; only failed attempts stay counted against the rate limits. */
export async function verifyCredentials(input: { email: string; password: string; clientAddress: string }): Promise<UserRow> {
  const [byEmail, byAddress] = await Promise.all([
    hitRateLimit(signInLimits.perEmail, input.email),
    hitRateLimit(signInLimits.perAddress, input.clientAddress),
  ]);
  if (!byEmail.allowed || !byAddress.allowed) {
    const minutes = Math.ceil(Math.max(byEmail.retryAfterSeconds, byAddress.retryAfterSeconds) / 60);
    throw new PublicError("rate-limited", `Too many sign-in attempts. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}.`);
  }
  const user = await db().query.users.findFirst({ where: eq(users.email, input.email) });
  if (!user) {
    throw badInput("email", "No Guyline account uses this e-mail address. Ask a coordinator for an invitation, or join with the club's join code.");
  }
  if (!(await bcrypt.compare(input.password, user.passwordHash))) {
    throw badInput("password", "That password is not right for this account.");
  }
  await Promise.all([clearRateLimit(signInLimits.perEmail, input.email), refundRateLimit(signInLimits.perAddress, input.clientAddress)]);
  return user;
}

async function insertUser(values: typeof users.$inferInsert): Promise<UserRow> {
  try {
    const [row] = await db().insert(users).values(values).returning();
    return row;
  } catch (error) {
    if (pgErrorCode(error) === pgErrorCodes.uniqueViolation) {
      throw badInput("email", "An account with this e-mail address already exists. Sign in instead.");
    }
    throw error;
  }
}

/** Anyone with the club's join code may create an account; it starts as an unconfirmed newcomer. */
export async function joinWithCode(input: { joinCode: string; name: string; email: string; callSign: string | null; password: string }): Promise<MemberDto> {
  const settings = await db().query.clubSettings.findFirst();
  if (!settings || settings.joinCode !== input.joinCode) {
    throw badInput("joinCode", "That join code is not right. Ask a coordinator of the club for the current one.");
  }
  const row = await insertUser({
    name: input.name,
    email: input.email,
    callSign: input.callSign,
    passwordHash: await hashPassword(input.password),
    role: "newcomer",
  });
  return toMemberDto(row);
}

export async function listMembers(actor: Actor): Promise<MemberDto[]> {
  if (!can(actor, "members.manage")) throw forbidden();
  const rows = await db().query.users.findMany({ orderBy: [asc(users.name)] });
  return rows.map(toMemberDto);
}

export interface PendingInvitation {
  id: string;
  name: string;
  email: string;
  role: Role;
  expiresAt: string;
}

export async function listPendingInvitations(actor: Actor): Promise<PendingInvitation[]> {
  if (!can(actor, "members.manage")) throw forbidden();
  const rows = await db()
    .select()
    .from(invitations)
    .where(and(isNull(invitations.acceptedAt), gt(invitations.expiresAt, new Date())))
    .orderBy(asc(invitations.createdAt));
  return rows.map((row) => ({ id: row.id, name: row.name, email: row.email, role: row.role, expiresAt: row.expiresAt.toISOString() }));
}

/** Creates an invitation, e-mails its link, and returns the secret token (shown once to the coordinator too). */
export async function inviteMember(actor: Actor, input: { name: string; email: string; role: Role; isMentor: boolean }): Promise<{ token: string; expiresAt: Date }> {
  if (!can(actor, "members.manage")) throw forbidden();
  const existing = await db().query.users.findFirst({ where: eq(users.email, input.email) });
  if (existing) throw badInput("email", "This person already has an account.");
  const token = randomBytes(32).toString("base64url");
  const expiresAt = new Date(Date.now() + INVITATION_DAYS * 24 * 3600 * 1000);
  await db().transaction(async (tx) => {
    const [inviter] = await tx.select({ name: users.name }).from(users).where(eq(users.id, actor.id));
    const [invitation] = await tx
      .insert(invitations)
      .values({ ...input, tokenHash: hashToken(token), invitedBy: actor.id, expiresAt })
      .returning({ id: invitations.id });
    await enqueueMail(tx, {
      template: "invitation",
      to: { email: input.email, name: input.name },
      key: `invitation:${invitation.id}`,
      data: { inviterName: inviter.name, roleLabel: roleLabels[input.role], isMentor: input.isMentor, acceptPath: `/invite/${token}`, expiresAt: expiresAt.toISOString() },
    });
  });
  return { token, expiresAt };
}

export async function findOpenInvitation(token: string) {
  return db().query.invitations.findFirst({
    where: and(eq(invitations.tokenHash, hashToken(token)), isNull(invitations.acceptedAt), gt(invitations.expiresAt, new Date())),
  });
}

/** Accepting an invitation creates a confirmed account with the invited role. Single use. */
export async function acceptInvitation(input: { token: string; password: string; callSign: string | null }): Promise<MemberDto> {
  const passwordHash = await hashPassword(input.password);
  return db().transaction(async (tx) => {
    const [invitation] = await tx
      .update(invitations)
      .set({ acceptedAt: new Date() })
      .where(and(eq(invitations.tokenHash, hashToken(input.token)), isNull(invitations.acceptedAt), gt(invitations.expiresAt, new Date())))
      .returning();
    if (!invitation) throw badInput("token", "This invitation link has expired or was already used. Ask a coordinator for a new one.");
    try {
      const [row] = await tx
        .insert(users)
        .values({
          name: invitation.name,
          email: invitation.email,
          callSign: input.callSign,
          passwordHash,
          role: invitation.role,
          isMentor: invitation.isMentor,
          confirmedAt: new Date(),
        })
        .returning();
      return toMemberDto(row);
    } catch (error) {
      if (pgErrorCode(error) === pgErrorCodes.uniqueViolation) {
        throw badInput("token", "An account with this e-mail address already exists. Sign in instead.");
      }
      throw error;
    }
  });
}

/** Confirming, changing the role and setting the mentor flag: coordinators only. */
export async function changeMember(actor: Actor, input: { userId: string; role?: Role; isMentor?: boolean; confirm?: boolean }): Promise<MemberDto> {
  if (!can(actor, "members.manage")) throw forbidden();
  return db().transaction(async (tx) => {
    // Lock the coordinators' rows so that two coordinators demoting each other at once
    // cannot leave the club without one.
    const coordinatorRows = await tx.select({ id: users.id }).from(users).where(eq(users.role, "coordinator")).for("update");
    const target = await tx.query.users.findFirst({ where: eq(users.id, input.userId) });
    if (!target) throw notFound("That member");
    const losesCoordinator = target.role === "coordinator" && input.role !== undefined && input.role !== "coordinator";
    if (losesCoordinator && coordinatorRows.length <= 1) {
      throw badInput("role", "The club needs at least one coordinator. Make someone else coordinator first.");
    }
    const role = input.role ?? target.role;
    const [row] = await tx
      .update(users)
      .set({
        role,
        // The mentor flag belongs to experienced members; a newcomer cannot hold it.
        isMentor: role === "newcomer" ? false : (input.isMentor ?? target.isMentor),
        confirmedAt: input.confirm && !target.confirmedAt ? new Date() : target.confirmedAt,
      })
      .where(eq(users.id, target.id))
      .returning();
    return toMemberDto(row);
  });
}

export async function updateProfile(actor: Actor, input: { name: string; callSign: string | null; units: "metric" | "imperial" }): Promise<MemberDto> {
  if (!can(actor, "account.edit")) throw forbidden();
  const [row] = await db().update(users).set(input).where(eq(users.id, actor.id)).returning();
  return toMemberDto(row);
}

export async function changePassword(actor: Actor, input: { currentPassword: string; newPassword: string }): Promise<void> {
  if (!can(actor, "account.edit")) throw forbidden();
  const user = await findUserById(actor.id);
  if (!user) throw notFound("Your account");
  if (!(await bcrypt.compare(input.currentPassword, user.passwordHash))) {
    throw badInput("currentPassword", "Your current password is not right.");
  }
  await db().update(users).set({ passwordHash: await hashPassword(input.newPassword) }).where(eq(users.id, actor.id));
}

/** First run of a new deployment: the club's settings and its first coordinator, together. */
export async function createClub(input: {
  club: Omit<typeof clubSettings.$inferInsert, "id" | "updatedAt">;
  coordinator: { name: string; email: string; password: string };
}): Promise<MemberDto> {
  const passwordHash = await hashPassword(input.coordinator.password);
  return db().transaction(async (tx) => {
    const [created] = await tx.insert(clubSettings).values({ ...input.club, id: 1 }).onConflictDoNothing().returning();
    if (!created) throw badInput("club", "This database already has a club. Sign in as one of its coordinators instead.");
    const [row] = await tx
      .insert(users)
      .values({ name: input.coordinator.name, email: input.coordinator.email, passwordHash, role: "coordinator", isMentor: true, confirmedAt: new Date() })
      .returning();
    return toMemberDto(row);
  });
}

/** The club's settings, read once per page render (React's request memoisation; outside a render each call reads afresh). */
export const getClubSettings = cache(async () => {
  const settings = await db().query.clubSettings.findFirst();
  if (!settings) throw new Error("The club has no settings yet: run the seed or the first-run set-up.");
  return settings;
});

export async function updateClubSettings(actor: Actor, input: Omit<typeof clubSettings.$inferInsert, "id" | "updatedAt">) {
  if (!can(actor, "club.configure")) throw forbidden();
  const [row] = await db().update(clubSettings).set({ ...input, updatedAt: new Date() }).where(eq(clubSettings.id, 1)).returning();
  return row;
}
