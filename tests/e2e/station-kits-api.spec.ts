// The station-kit routes against the real server: signed-out 401, members 403, a missing slot
// 404, bad input 400 naming the field, a booking 201 and a clash 409 with the next free time.
// Source: Guyline issue 5, item 4 "Station kits", and the product brief's role table
// (shared/design/product.md, "Roles": the gear steward and the coordinator keep the lending desk).
import { expect, test, type APIRequestContext } from "@playwright/test";
import { roleContexts } from "./fixtures";

const missing = "00000000-0000-4000-8000-00000000beef";

const { as, disposeAll } = roleContexts();
test.afterAll(disposeAll);

async function idOf(context: APIRequestContext, path: string, key: string, field: string, value: string): Promise<string> {
  const rows: Record<string, string>[] = (await (await context.get(path)).json())[key];
  const row = rows.find((candidate) => candidate[field] === value);
  expect(row, `${value} in ${path}`).toBeDefined();
  return row!.id;
}

test("the station-kit routes answer by role, refuse bad input and book a slot's kit", async ({ baseURL }) => {
  const anonymous = await as(null, baseURL!);
  const member = await as("member", baseURL!);
  const steward = await as("steward", baseURL!);
  const dayId = await idOf(steward, "/api/antenna-days", "days", "title", "Spring antenna day");
  const slotId = await idOf(steward, `/api/antenna-days/${dayId}/slots`, "slots", "name", "Two metres");
  const gear = async (labelCode: string) => idOf(steward, `/api/gear?q=${labelCode}`, "rows", "labelCode", labelCode);

  expect((await anonymous.get(`/api/slots/${slotId}/kit`)).status()).toBe(401);
  expect((await anonymous.post(`/api/slots/${slotId}/kit`, { data: { itemId: missing } })).status()).toBe(401);
  expect((await member.get(`/api/slots/${slotId}/kit`)).status()).toBe(403);
  expect((await member.post(`/api/slots/${slotId}/kit`, { data: { itemId: await gear("MA-03") } })).status()).toBe(403);
  expect((await steward.get(`/api/slots/${missing}/kit`)).status()).toBe(404);
  expect((await steward.post(`/api/slots/${missing}/kit`, { data: { itemId: await gear("MA-03") } })).status()).toBe(404);
  expect((await steward.post(`/api/slots/${slotId}/kit`, { data: { itemId: missing } })).status()).toBe(404);

  const badId = await steward.get("/api/slots/not-a-slot/kit");
  expect(badId.status()).toBe(400);
  expect((await badId.json()).problems[0].path).toBe("id");
  const badBody = await steward.post(`/api/slots/${slotId}/kit`, { data: { itemId: "CX-09" } });
  expect(badBody.status()).toBe(400);
  expect((await badBody.json()).problems[0].path).toBe("itemId");
  // A 1 m jumper cannot reach from the mast to the tent.
  const tooShort = await steward.post(`/api/slots/${slotId}/kit`, { data: { itemId: await gear("CX-09") } });
  expect(tooShort.status()).toBe(400);
  expect((await tooShort.json()).problems[0]).toMatchObject({ path: "itemId", message: expect.stringMatching(/shorter than the slot's feedline run/) });

  const answer = await steward.get(`/api/slots/${slotId}/kit`);
  expect(answer.status()).toBe(200);
  const { kit } = await answer.json();
  expect(kit).toMatchObject({ slotId, dayId, slotName: "Two metres", bookable: true, need: { transformer: "1:1", plannedLine: "rg213" } });
  expect(kit.coax.length).toBeGreaterThan(0);
  for (const candidate of kit.coax) {
    expect(candidate.item.lengthM).toBeGreaterThanOrEqual(kit.need.runM);
    expect(candidate.item.lengthM).toBeLessThanOrEqual(kit.need.longestRunM);
    expect(candidate.figures.bands[0]).toMatchObject({ band: "2m", totalLossDb: expect.any(Number), swrAtRadio: expect.any(Number) });
  }
  expect(kit.mast.map((mast: { labelCode: string }) => mast.labelCode)).toContain("MA-03");

  const booked = await steward.post(`/api/slots/${slotId}/kit`, { data: { itemId: await gear("MA-03") } });
  expect(booked.status()).toBe(201);
  expect((await booked.json())).toMatchObject({ outcome: "approved", booking: { itemLabelCode: "MA-03", state: "approved", antennaDayId: dayId, stationSlotId: slotId, slotFeedline: false } });
  const again = await steward.post(`/api/slots/${slotId}/kit`, { data: { itemId: await gear("MA-03") } });
  expect(again.status()).toBe(409);
  expect(await again.json()).toMatchObject({ error: "conflict", nextFreeStart: expect.any(String) });
  expect((await (await steward.get(`/api/slots/${slotId}/kit`)).json()).kit.mast).toEqual([]);
});
