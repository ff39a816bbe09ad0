// The plan library against the real PostgreSQL: who may save, change and delete a plan, the
// unique name, where a plan is used (drafts only for coordinators), and a plan in use kept
// from deletion by the service and by the foreign key.
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import type { PlanRequestInput } from "@/lib/antenna/plan-schema";
import type { SlotPlanParams } from "@/lib/antenna-days/slot-plan";
import type { AntennaSummary } from "@/lib/site-plan/footprint";
import { db } from "@/server/db";
import { antennaDays, antennaPlans, sites, stationSlots } from "@/server/db/schema";
import { pgErrorCode, pgErrorCodes } from "@/server/errors";
import type { Actor } from "@/server/policy";
import { deleteLibraryPlan, getLibraryPlan, listLibraryPlans, saveLibraryPlan, updateLibraryPlan } from "@/server/services/plans";
import { libraryPlanPatchSchema, libraryPlanSchema } from "@/validations/plans";
import { createPerson, publicErrorOf } from "./helpers";
import { DIPOLE_20M as dipole } from "../fixtures/plan-requests";

const uniqueName = (label: string) => `${label} ${randomUUID().slice(0, 8)}`;

async function save(actor: Actor, name = uniqueName("Plan"), parameters: PlanRequestInput = dipole) {
  return saveLibraryPlan(actor, libraryPlanSchema.parse({ name, parameters }));
}

/** A station slot on a new day pointing at the plan (rows written directly: the slot service is Days' to test). */
async function slotUsing(planId: string, status: "draft" | "published", lead: Actor) {
  const [site] = await db().insert(sites).values({ name: uniqueName("Field"), widthM: 100, depthM: 80, groundClass: "average" }).returning();
  const startsAt = new Date(Date.now() + 30 * 86_400_000);
  const [day] = await db()
    .insert(antennaDays)
    .values({ title: uniqueName("Antenna day"), siteId: site.id, startsAt, endsAt: new Date(startsAt.getTime() + 8 * 3_600_000), safetyLeadId: lead.id, status })
    .returning();
  const summary: AntennaSummary = { family: "dipole", familyLabel: "Half-wave dipole", feedHeightM: 10, mastHeightM: 10, arms: [], exposureDistanceM: 3, wireSpanM: 10, fallZoneRadiusM: 15, guyRadiusM: 8 };
  const planParams = { family: "dipole", heightM: 10, wireDiameterMm: 2, conductor: "copper", feedlineType: "rg213" } as SlotPlanParams;
  const [slot] = await db()
    .insert(stationSlots)
    .values({ dayId: day.id, name: "Station A", bands: ["20m"], powerW: 100, mode: "ssb", planParams, libraryPlanId: planId, x: 20, y: 20, tentX: 30, tentY: 20, summary })
    .returning();
  return { day, slot };
}

describe("saving plans to the library", () => {
  it("lets a member save a plan that everyone, newcomers too, can list and open", async () => {
    const member = await createPerson("member", { name: "Morgan Member" });
    const newcomer = await createPerson("newcomer");
    const name = uniqueName("Field-day dipole");
    const saved = await save(member, name);
    expect(saved).toMatchObject({ name, family: "dipole", usageCount: 0, canEdit: true, createdBy: { id: member.id, name: "Morgan Member" } });
    // Stored with the engine's defaults filled in, so the plan is complete on its own.
    expect(saved.parameters).toMatchObject({ ...dipole, conductor: "copper" });
    const seen = (await listLibraryPlans(newcomer)).find((plan) => plan.id === saved.id);
    expect(seen).toMatchObject({ name, canEdit: false });
    expect(await getLibraryPlan(newcomer, saved.id)).toMatchObject({ id: saved.id, usage: [] });
  });

  it("refuses newcomers and unconfirmed accounts a save", async () => {
    const newcomer = await createPerson("newcomer");
    const unconfirmed = await createPerson("member", { confirmed: false });
    expect((await publicErrorOf(save(newcomer))).status).toBe(403);
    expect((await publicErrorOf(save(unconfirmed))).status).toBe(403);
    expect((await publicErrorOf(listLibraryPlans(unconfirmed))).status).toBe(403);
  });

  it("keeps names unique whatever their letter case, naming the field", async () => {
    const steward = await createPerson("steward");
    const name = uniqueName("Hilltop vertical");
    await save(steward, name);
    const error = await publicErrorOf(save(steward, name.toUpperCase()));
    expect(error).toMatchObject({ status: 400, field: "name" });
  });

  it("checks the parameters with the engine's own schema, paths under parameters", () => {
    const result = libraryPlanSchema.safeParse({ name: "Too low", parameters: { ...dipole, heightM: -1, feedline: { type: "rg58", lengthM: -3 } } });
    expect(result.success).toBe(false);
    const paths = result.error!.issues.map((issue) => issue.path.join("."));
    expect(paths).toEqual(expect.arrayContaining(["parameters.heightM", "parameters.feedline.lengthM"]));
  });

  it("refuses a row whose family disagrees with its parameters (check constraint)", async () => {
    const error = await db()
      .insert(antennaPlans)
      .values({ name: uniqueName("Mismatch"), family: "vertical", parameters: libraryPlanSchema.parse({ name: "x", parameters: dipole }).parameters })
      .then(
        () => null,
        (thrown: unknown) => thrown,
      );
    expect(pgErrorCode(error)).toBe(pgErrorCodes.checkViolation);
  });
});

describe("changing and deleting library plans", () => {
  it("lets the person who saved it, or a coordinator, change it; nobody else", async () => {
    const owner = await createPerson("member");
    const other = await createPerson("member");
    const coordinator = await createPerson("coordinator");
    const plan = await save(owner);
    expect((await publicErrorOf(updateLibraryPlan(other, plan.id, { notes: "mine now" }))).status).toBe(403);
    const renamed = uniqueName("Renamed");
    expect(await updateLibraryPlan(owner, plan.id, libraryPlanPatchSchema.parse({ name: renamed }))).toMatchObject({ name: renamed });
    const inverted = await updateLibraryPlan(coordinator, plan.id, libraryPlanPatchSchema.parse({ parameters: { ...dipole, family: "inverted-v", band: "40m" } }));
    expect(inverted).toMatchObject({ family: "inverted-v", parameters: { family: "inverted-v", includedAngleDeg: 120, band: "40m" } });
    expect((await publicErrorOf(deleteLibraryPlan(other, plan.id))).status).toBe(403);
  });

  it("answers 404 for a plan that does not exist", async () => {
    const member = await createPerson("member");
    expect((await publicErrorOf(getLibraryPlan(member, randomUUID()))).status).toBe(404);
    expect((await publicErrorOf(deleteLibraryPlan(member, randomUUID()))).status).toBe(404);
  });
});

describe("where a library plan is used", () => {
  it("lists the slots that use it; slots of draft days only for coordinators", async () => {
    const coordinator = await createPerson("coordinator");
    const member = await createPerson("member");
    const plan = await save(member);
    const published = await slotUsing(plan.id, "published", coordinator);
    const draft = await slotUsing(plan.id, "draft", coordinator);

    const forCoordinator = await getLibraryPlan(coordinator, plan.id);
    expect(forCoordinator.usageCount).toBe(2);
    expect(forCoordinator.usage.map((use) => use.slotId).sort()).toEqual([published.slot.id, draft.slot.id].sort());

    const forMember = await getLibraryPlan(member, plan.id);
    expect(forMember.usage).toEqual([
      { slotId: published.slot.id, slotName: "Station A", dayId: published.day.id, dayTitle: published.day.title, dayStartsAt: published.day.startsAt.toISOString(), dayStatus: "published" },
    ]);
    expect((await listLibraryPlans(member)).find((listed) => listed.id === plan.id)?.usageCount).toBe(1);
  });

  it("refuses to delete a plan any slot uses, drafts included, and deletes it once unused", async () => {
    const coordinator = await createPerson("coordinator");
    const member = await createPerson("member");
    const plan = await save(member);
    const { slot } = await slotUsing(plan.id, "draft", coordinator);
    expect((await publicErrorOf(deleteLibraryPlan(member, plan.id))).status).toBe(409);

    // The foreign key (restrict) holds even for a write that skips the service.
    const raw = await db()
      .delete(antennaPlans)
      .where(eq(antennaPlans.id, plan.id))
      .then(
        () => null,
        (thrown: unknown) => thrown,
      );
    expect(pgErrorCode(raw)).toBe(pgErrorCodes.foreignKeyViolation);

    await db().update(stationSlots).set({ libraryPlanId: null }).where(eq(stationSlots.id, slot.id));
    await deleteLibraryPlan(member, plan.id);
    expect((await publicErrorOf(getLibraryPlan(member, plan.id))).status).toBe(404);
  });
});
