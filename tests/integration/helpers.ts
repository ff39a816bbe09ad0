// Each test makes its own data: people get unique e-mail addresses, so tests never collide.
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { db } from "@/server/db";
import { users } from "@/server/db/schema";
import type { Role } from "@/lib/roles";
import type { Actor } from "@/server/policy";
import { toActor } from "@/server/services/accounts";

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
