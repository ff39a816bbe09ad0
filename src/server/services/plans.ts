// The plan library: antenna plans saved under a name, listed with where they are used (the
// station slots and build sessions that point at them), changed or deleted by whoever saved
// them or a coordinator, and deleted only while nothing uses them.
import { and, asc, count, eq, inArray, sql } from "drizzle-orm";
import type { PlanRequest } from "@/lib/antenna/plan-schema";
import { db } from "@/server/db";
import { antennaDays, antennaPlans, buildSessions, stationSlots, users, type AntennaPlanRow } from "@/server/db/schema";
import { badInput, conflict, forbidden, notFound, pgConstraint, pgErrorCode, pgErrorCodes } from "@/server/errors";
import { can, canEditLibraryPlan, type Actor } from "@/server/policy";
import { visibleStatuses } from "@/server/services/antenna-days";
import type { LibraryPlanInput, LibraryPlanPatch } from "@/validations/plans";

export interface LibraryPlanDto {
  id: string;
  name: string;
  family: PlanRequest["family"];
  /** The engine's whole plan request: computable on its own. */
  parameters: PlanRequest;
  notes: string;
  createdBy: { id: string; name: string } | null;
  createdAt: string;
  updatedAt: string;
  /** Station slots (on days the person may see) and build sessions using the plan. */
  usageCount: number;
  /** Whether the person asking may change or delete it. */
  canEdit: boolean;
}

export interface PlanUsage {
  slotId: string;
  slotName: string;
  dayId: string;
  dayTitle: string;
  dayStartsAt: string;
  dayStatus: string;
}

export interface PlanSessionUsage {
  sessionId: string;
  title: string;
  startsAt: string;
  status: string;
}

export interface LibraryPlanDetail extends LibraryPlanDto {
  usage: PlanUsage[];
  buildSessions: PlanSessionUsage[];
}

type PlanJoinRow = { plan: AntennaPlanRow; creatorName: string | null };

function toDto(actor: Actor, { plan, creatorName }: PlanJoinRow, usageCount: number): LibraryPlanDto {
  return {
    id: plan.id,
    name: plan.name,
    family: plan.family,
    parameters: plan.parameters,
    notes: plan.notes,
    createdBy: plan.createdBy && creatorName !== null ? { id: plan.createdBy, name: creatorName } : null,
    createdAt: plan.createdAt.toISOString(),
    updatedAt: plan.updatedAt.toISOString(),
    usageCount,
    canEdit: canEditLibraryPlan(actor, plan.createdBy),
  };
}

const selectPlans = () =>
  db().select({ plan: antennaPlans, creatorName: users.name }).from(antennaPlans).leftJoin(users, eq(users.id, antennaPlans.createdBy));

/** Uses per plan: slots on days the person may see (drafts are the coordinators') and build sessions. */
async function usageCounts(actor: Actor, planIds: string[]): Promise<Map<string, number>> {
  if (planIds.length === 0) return new Map();
  const [slots, sessions] = await Promise.all([
    db()
      .select({ planId: stationSlots.libraryPlanId, uses: count() })
      .from(stationSlots)
      .innerJoin(antennaDays, eq(antennaDays.id, stationSlots.dayId))
      .where(and(inArray(stationSlots.libraryPlanId, planIds), inArray(antennaDays.status, visibleStatuses(actor))))
      .groupBy(stationSlots.libraryPlanId),
    can(actor, "buildSessions.view")
      ? db()
          .select({ planId: buildSessions.libraryPlanId, uses: count() })
          .from(buildSessions)
          .where(inArray(buildSessions.libraryPlanId, planIds))
          .groupBy(buildSessions.libraryPlanId)
      : [],
  ]);
  const counts = new Map<string, number>();
  for (const row of [...slots, ...sessions]) counts.set(row.planId as string, (counts.get(row.planId as string) ?? 0) + row.uses);
  return counts;
}

async function findPlan(id: string): Promise<PlanJoinRow> {
  const [row] = await selectPlans().where(eq(antennaPlans.id, id));
  if (!row) throw notFound("That plan");
  return row;
}

function uniqueName<T>(write: () => Promise<T>): Promise<T> {
  return write().catch((error: unknown) => {
    if (pgErrorCode(error) === pgErrorCodes.uniqueViolation && pgConstraint(error) === "antenna_plans_name_key") {
      throw badInput("name", "The plan library already has a plan with this name. Choose another name.");
    }
    throw error;
  });
}

export async function listLibraryPlans(actor: Actor): Promise<LibraryPlanDto[]> {
  if (!can(actor, "plans.view")) throw forbidden();
  const rows = await selectPlans().orderBy(asc(sql`lower(${antennaPlans.name})`));
  const counts = await usageCounts(actor, rows.map((row) => row.plan.id));
  return rows.map((row) => toDto(actor, row, counts.get(row.plan.id) ?? 0));
}

export async function getLibraryPlan(actor: Actor, id: string): Promise<LibraryPlanDetail> {
  if (!can(actor, "plans.view")) throw forbidden();
  const row = await findPlan(id);
  const usage = await db()
    .select({
      slotId: stationSlots.id,
      slotName: stationSlots.name,
      dayId: antennaDays.id,
      dayTitle: antennaDays.title,
      dayStartsAt: antennaDays.startsAt,
      dayStatus: antennaDays.status,
    })
    .from(stationSlots)
    .innerJoin(antennaDays, eq(antennaDays.id, stationSlots.dayId))
    .where(and(eq(stationSlots.libraryPlanId, id), inArray(antennaDays.status, visibleStatuses(actor))))
    .orderBy(asc(antennaDays.startsAt), asc(stationSlots.name));
  const sessions = can(actor, "buildSessions.view")
    ? await db()
        .select({ sessionId: buildSessions.id, title: buildSessions.title, startsAt: buildSessions.startsAt, status: buildSessions.status })
        .from(buildSessions)
        .where(eq(buildSessions.libraryPlanId, id))
        .orderBy(asc(buildSessions.startsAt))
    : [];
  return {
    ...toDto(actor, row, usage.length + sessions.length),
    usage: usage.map((use) => ({ ...use, dayStartsAt: use.dayStartsAt.toISOString() })),
    buildSessions: sessions.map((session) => ({ ...session, startsAt: session.startsAt.toISOString() })),
  };
}

export async function saveLibraryPlan(actor: Actor, input: LibraryPlanInput): Promise<LibraryPlanDto> {
  if (!can(actor, "plans.save")) throw forbidden();
  const [plan] = await uniqueName(() =>
    db()
      .insert(antennaPlans)
      .values({ name: input.name, family: input.parameters.family, parameters: input.parameters, notes: input.notes, createdBy: actor.id })
      .returning(),
  );
  return getLibraryPlan(actor, plan.id);
}

export async function updateLibraryPlan(actor: Actor, id: string, patch: LibraryPlanPatch): Promise<LibraryPlanDto> {
  if (!can(actor, "plans.save")) throw forbidden();
  const { plan } = await findPlan(id);
  if (!canEditLibraryPlan(actor, plan.createdBy)) throw forbidden("Only the person who saved this plan, or a coordinator, may change it.");
  // A slot keeps its own copy of the parameters it took from the plan: changing the library
  // plan does not change any slot's antenna behind the coordinator's back.
  await uniqueName(() =>
    db()
      .update(antennaPlans)
      .set({
        ...(patch.name === undefined ? {} : { name: patch.name }),
        ...(patch.parameters === undefined ? {} : { parameters: patch.parameters, family: patch.parameters.family }),
        ...(patch.notes === undefined ? {} : { notes: patch.notes }),
        updatedAt: new Date(),
      })
      .where(eq(antennaPlans.id, id)),
  );
  return getLibraryPlan(actor, id);
}

/** Deletes a plan that no station slot (on any day, drafts included) and no build session uses. */
export async function deleteLibraryPlan(actor: Actor, id: string): Promise<void> {
  if (!can(actor, "plans.save")) throw forbidden();
  const { plan } = await findPlan(id);
  if (!canEditLibraryPlan(actor, plan.createdBy)) throw forbidden("Only the person who saved this plan, or a coordinator, may delete it.");
  const inUse = () =>
    conflict("This plan is used by station slots or build sessions (see where it is used). Point them at another plan first, or keep this one.");
  const [[{ slots }], [{ sessions }]] = await Promise.all([
    db().select({ slots: count() }).from(stationSlots).where(eq(stationSlots.libraryPlanId, id)),
    db().select({ sessions: count() }).from(buildSessions).where(eq(buildSessions.libraryPlanId, id)),
  ]);
  if (slots > 0 || sessions > 0) throw inUse();
  try {
    await db().delete(antennaPlans).where(eq(antennaPlans.id, id));
  } catch (error) {
    // A slot or a session took the plan between the count and the delete: the foreign keys refuse.
    if (pgErrorCode(error) === pgErrorCodes.foreignKeyViolation) throw inUse();
    throw error;
  }
}
