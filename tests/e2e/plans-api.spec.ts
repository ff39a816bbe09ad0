// /api/plans and /api/plans/:id against the production build with the demo seeded: who may
// list, save, change and delete library plans, and the answers for missing, bad and in-use.
import { randomUUID } from "node:crypto";
import { expect, test, type APIRequestContext } from "@playwright/test";
import { signInApi, type DemoRole } from "./fixtures";

const parameters = {
  family: "inverted-v",
  band: "40m",
  region: 1,
  heightM: 9,
  wireDiameterMm: 2,
  ground: "average",
  feedline: { type: "rg8x", lengthM: 25 },
  transmitter: { powerW: 100, mode: "cw" },
};

const uniqueName = (label: string) => `${label} ${randomUUID().slice(0, 8)}`;

async function as(role: DemoRole, request: APIRequestContext) {
  await signInApi(request, role);
  return request;
}

async function savePlan(request: APIRequestContext, name = uniqueName("API plan")) {
  const response = await request.post("/api/plans", { data: { name, parameters, notes: "From the API test." } });
  expect(response.status()).toBe(201);
  return (await response.json()).plan as { id: string; name: string } & Record<string, unknown>;
}

test("signed out: 401 on every plan route", async ({ request }) => {
  const id = randomUUID();
  expect((await request.get("/api/plans")).status()).toBe(401);
  expect((await request.post("/api/plans", { data: { name: "x", parameters } })).status()).toBe(401);
  expect((await request.get(`/api/plans/${id}`)).status()).toBe(401);
  expect((await request.patch(`/api/plans/${id}`, { data: { notes: "x" } })).status()).toBe(401);
  expect((await request.delete(`/api/plans/${id}`)).status()).toBe(401);
});

test("a newcomer lists and opens plans but may not save one", async ({ request }) => {
  await as("newcomer", request);
  const list = await request.get("/api/plans");
  expect(list.status()).toBe(200);
  const { plans } = await list.json();
  const seeded = plans.find((plan: { name: string }) => plan.name === "Club 40 m inverted-V");
  expect(seeded).toMatchObject({ family: "inverted-v", canEdit: false });
  const detail = await (await request.get(`/api/plans/${seeded.id}`)).json();
  expect(detail.plan.usage).toEqual([expect.objectContaining({ slotName: "Forty metres", dayTitle: "Autumn antenna day", dayStatus: "done" })]);
  expect((await request.post("/api/plans", { data: { name: uniqueName("Newcomer plan"), parameters } })).status()).toBe(403);
});

test("a member saves a plan, is refused a duplicate name and bad parameters, changes and deletes it", async ({ request }) => {
  await as("member", request);
  const plan = await savePlan(request);
  expect(plan).toMatchObject({ canEdit: true, usageCount: 0, parameters: { ...parameters, includedAngleDeg: 120, conductor: "copper" } });

  const duplicate = await request.post("/api/plans", { data: { name: plan.name.toUpperCase(), parameters } });
  expect(duplicate.status()).toBe(400);
  expect((await duplicate.json()).problems).toEqual([expect.objectContaining({ path: "name" })]);

  const bad = await request.post("/api/plans", { data: { name: uniqueName("Bad"), parameters: { ...parameters, heightM: 0 } } });
  expect(bad.status()).toBe(400);
  expect((await bad.json()).problems.map((problem: { path: string }) => problem.path)).toContain("parameters.heightM");

  const renamed = uniqueName("Renamed plan");
  const patched = await request.patch(`/api/plans/${plan.id}`, { data: { name: renamed } });
  expect(patched.status()).toBe(200);
  expect((await patched.json()).plan.name).toBe(renamed);

  expect((await request.delete(`/api/plans/${plan.id}`)).status()).toBe(204);
  expect((await request.get(`/api/plans/${plan.id}`)).status()).toBe(404);
});

test("only the person who saved a plan, or a coordinator, changes or deletes it", async ({ playwright, baseURL }) => {
  const member = await as("member", await playwright.request.newContext({ baseURL }));
  const steward = await as("steward", await playwright.request.newContext({ baseURL }));
  const coordinator = await as("coordinator", await playwright.request.newContext({ baseURL }));
  const plan = await savePlan(member);

  expect((await steward.patch(`/api/plans/${plan.id}`, { data: { notes: "Not mine." } })).status()).toBe(403);
  expect((await steward.delete(`/api/plans/${plan.id}`)).status()).toBe(403);
  const byCoordinator = await coordinator.patch(`/api/plans/${plan.id}`, { data: { notes: "Checked by the coordinator." } });
  expect(byCoordinator.status()).toBe(200);
  expect((await byCoordinator.json()).plan.notes).toBe("Checked by the coordinator.");
  expect((await coordinator.delete(`/api/plans/${plan.id}`)).status()).toBe(204);
  await Promise.all([member.dispose(), steward.dispose(), coordinator.dispose()]);
});

test("a plan a station slot uses cannot be deleted; missing and malformed ids", async ({ request }) => {
  await as("coordinator", request);
  const { plans } = await (await request.get("/api/plans")).json();
  const used = plans.find((plan: { name: string }) => plan.name === "Club 40 m inverted-V");
  expect(used.usageCount).toBeGreaterThan(0);
  const refused = await request.delete(`/api/plans/${used.id}`);
  expect(refused.status()).toBe(409);
  expect((await refused.json()).message).toMatch(/used by station slots/);

  expect((await request.get(`/api/plans/${randomUUID()}`)).status()).toBe(404);
  expect((await request.get("/api/plans/not-an-id")).status()).toBe(400);
  expect((await request.patch(`/api/plans/${used.id}`, { data: {} })).status()).toBe(400);
});
