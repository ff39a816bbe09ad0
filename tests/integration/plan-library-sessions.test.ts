// The plan library and build sessions together: a session built from a library plan shows where
// the plan is used, keeps the plan from being deleted, and a plan that is not in the library is
// refused by name.
import { randomUUID } from "node:crypto";
import { describe, expect, it } from "vitest";
import { createBuildSession, getBuildSession, updateBuildSession } from "@/server/services/build-sessions";
import { deleteLibraryPlan, getLibraryPlan, listLibraryPlans, saveLibraryPlan } from "@/server/services/plans";
import { buildSessionSchema } from "@/validations/build-sessions";
import { libraryPlanSchema } from "@/validations/plans";
import { createPerson, publicErrorOf, testPlan, wallTimeInDays } from "./helpers";

async function sessionFrom(libraryPlanId: string | null) {
  const coordinator = await createPerson("coordinator");
  const mentor = await createPerson("member", { isMentor: true });
  const input = buildSessionSchema.parse({
    title: `Library dipole ${randomUUID().slice(0, 6)}`,
    plan: testPlan,
    libraryPlanId,
    startsAt: wallTimeInDays(21, "10:00"),
    endsAt: wallTimeInDays(21, "13:00"),
    place: "Test hall",
    capacity: 4,
    mentorIds: [mentor.id],
  });
  return { coordinator, input };
}

describe("a library plan built at a build session", () => {
  it("lists the session where the plan is used, and cannot be deleted until the session lets go of it", async () => {
    const { coordinator, input } = await sessionFrom(null);
    const plan = await saveLibraryPlan(coordinator, libraryPlanSchema.parse({ name: `Session plan ${randomUUID().slice(0, 8)}`, parameters: testPlan }));
    const { id } = await createBuildSession(coordinator, { ...input, libraryPlanId: plan.id });
    expect((await getBuildSession(coordinator, id)).libraryPlan).toEqual({ id: plan.id, name: plan.name });

    const member = await createPerson("member");
    const detail = await getLibraryPlan(member, plan.id);
    expect(detail.buildSessions).toEqual([expect.objectContaining({ sessionId: id, title: input.title, status: "scheduled" })]);
    expect(detail.usageCount).toBe(1);
    expect((await listLibraryPlans(member)).find((listed) => listed.id === plan.id)?.usageCount).toBe(1);

    const refused = await publicErrorOf(deleteLibraryPlan(coordinator, plan.id));
    expect(refused.status).toBe(409);
    expect(refused.message).toMatch(/build sessions/);

    await updateBuildSession(coordinator, id, { libraryPlanId: null });
    await deleteLibraryPlan(coordinator, plan.id);
    expect((await publicErrorOf(getLibraryPlan(member, plan.id))).status).toBe(404);
  });

  it("refuses a plan that is not in the library, naming the field", async () => {
    const { coordinator, input } = await sessionFrom(randomUUID());
    const refused = await publicErrorOf(createBuildSession(coordinator, input));
    expect(refused.status).toBe(400);
    expect(refused.field).toBe("libraryPlanId");
  });
});
