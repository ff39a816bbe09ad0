// Role rules of the antenna-day routes against the real server: coordinators edit, members
// read and sign up, newcomers read but may not sign up, signed-out requests get 401 and
// missing resources 404. Source: Guyline product brief (shared/design/product.md), "Roles".
import { expect, test, type APIRequestContext } from "@playwright/test";
import { roleContexts, type DemoRole } from "./fixtures";

const baseURL = `http://localhost:${process.env.GUYLINE_TEST_APP_PORT ?? 3100}`;
const missing = "00000000-0000-4000-8000-000000000000";

// A date no other run of this file used, so that repeated runs against one database never overlap.
const dayOffset = 400 + (Date.now() % 2000);
const date = new Date(Date.UTC(2030, 0, 1) + dayOffset * 86_400_000).toISOString().slice(0, 10);

const siteBody = (name: string) => ({
  name,
  widthM: 120,
  depthM: 90,
  groundClass: "poor",
  notes: "",
  hazards: [{ kind: "power-line", label: "Line", points: [[0, 85], [120, 85]], heightM: 9 }],
});
const slotBody = (name: string) => ({
  name,
  bands: ["20m"],
  powerW: 100,
  mode: "ssb",
  planParams: { family: "dipole", heightM: 8, wireDiameterMm: 2, feedlineType: "rg213" },
  x: 40,
  y: 40,
  azimuthDeg: 90,
  tentX: 40,
  tentY: 25,
});
const shiftBody = { startsAtLocal: `${date}T10:00`, endsAtLocal: `${date}T12:00`, capacity: 2 };

interface Fixture {
  siteId: string;
  publishedDayId: string;
  draftDayId: string;
  slotId: string;
  shiftId: string;
}
let fixture: Fixture;
const contexts: Partial<Record<DemoRole | "anonymous", APIRequestContext>> = {};
const { as, disposeAll } = roleContexts();
test.afterAll(disposeAll);

test.beforeAll(async () => {
  const coordinator = await as("coordinator", baseURL);
  contexts.coordinator = coordinator;
  contexts.member = await as("member", baseURL);
  contexts.newcomer = await as("newcomer", baseURL);
  contexts.steward = await as("steward", baseURL);
  contexts.anonymous = await as(null, baseURL);
  const site = await (await coordinator.post("/api/sites", { data: siteBody(`API field ${dayOffset}-${Math.random().toString(36).slice(2, 7)}`) })).json();
  const session = await (await coordinator.get("/api/auth/session")).json();
  const dayBody = { title: "API day", siteId: site.site.id, startsAtLocal: `${date}T09:00`, endsAtLocal: `${date}T17:00`, meetingPoint: "Gate", description: "", safetyLeadId: session.user.id };
  const published = await (await coordinator.post("/api/antenna-days", { data: dayBody })).json();
  const draft = await (await coordinator.post("/api/antenna-days", { data: { ...dayBody, title: "API draft" } })).json();
  const slot = await (await coordinator.post(`/api/antenna-days/${published.day.id}/slots`, { data: slotBody("API station") })).json();
  const shift = await (await coordinator.post(`/api/slots/${slot.slot.id}/shifts`, { data: shiftBody })).json();
  await coordinator.patch(`/api/antenna-days/${published.day.id}`, { data: { status: "published" } });
  fixture = { siteId: site.site.id, publishedDayId: published.day.id, draftDayId: draft.day.id, slotId: slot.slot.id, shiftId: shift.shift.id };
});

test("signed-out requests get 401 on every route", async () => {
  const anonymous = contexts.anonymous!;
  const { publishedDayId: day, slotId: slot, shiftId: shift, siteId: site } = fixture;
  const calls: [string, string][] = [
    ["GET", "/api/antenna-days"],
    ["POST", "/api/antenna-days"],
    ["GET", `/api/antenna-days/${day}`],
    ["PATCH", `/api/antenna-days/${day}`],
    ["DELETE", `/api/antenna-days/${day}`],
    ["POST", `/api/antenna-days/${day}/copy`],
    ["GET", `/api/antenna-days/${day}/slots`],
    ["POST", `/api/antenna-days/${day}/slots`],
    ["GET", `/api/antenna-days/${day}/ics`],
    ["GET", "/api/sites"],
    ["POST", "/api/sites"],
    ["GET", `/api/sites/${site}`],
    ["PATCH", `/api/sites/${site}`],
    ["GET", `/api/slots/${slot}`],
    ["PATCH", `/api/slots/${slot}`],
    ["DELETE", `/api/slots/${slot}`],
    ["GET", `/api/slots/${slot}/shifts`],
    ["POST", `/api/slots/${slot}/shifts`],
    ["GET", `/api/shifts/${shift}`],
    ["PATCH", `/api/shifts/${shift}`],
    ["DELETE", `/api/shifts/${shift}`],
    ["POST", `/api/shifts/${shift}/signup`],
    ["DELETE", `/api/shifts/${shift}/signup`],
    ["GET", "/api/calendar-entries?from=2030-01-01&to=2030-02-01"],
  ];
  for (const [method, url] of calls) {
    const response = await anonymous.fetch(url, { method, data: method === "GET" || method === "DELETE" ? undefined : {} });
    expect(response.status(), `${method} ${url}`).toBe(401);
  }
});

test("members and newcomers read published days, sites, slots, shifts and the calendar", async () => {
  for (const role of ["member", "newcomer", "steward"] as const) {
    const context = contexts[role]!;
    const list = await (await context.get("/api/antenna-days")).json();
    expect(list.days.some((day: { id: string }) => day.id === fixture.publishedDayId)).toBe(true);
    expect(list.days.some((day: { id: string }) => day.id === fixture.draftDayId)).toBe(false);
    expect((await context.get(`/api/antenna-days/${fixture.publishedDayId}`)).status()).toBe(200);
    expect((await context.get(`/api/antenna-days/${fixture.draftDayId}`)).status()).toBe(404);
    const ics = await context.get(`/api/antenna-days/${fixture.publishedDayId}/ics`);
    expect(ics.status()).toBe(200);
    expect(ics.headers()["content-type"]).toBe("text/calendar; charset=utf-8");
    expect(await ics.text()).toContain(`UID:antenna-day-${fixture.publishedDayId}@guyline`);
    expect((await context.get(`/api/antenna-days/${fixture.draftDayId}/ics`)).status()).toBe(404);
    const slots = await (await context.get(`/api/antenna-days/${fixture.publishedDayId}/slots`)).json();
    expect(slots.slots[0]).toMatchObject({ name: "API station", bands: ["20m"] });
    expect((await context.get(`/api/slots/${fixture.slotId}`)).status()).toBe(200);
    expect((await context.get(`/api/slots/${fixture.slotId}/shifts`)).status()).toBe(200);
    expect((await context.get(`/api/shifts/${fixture.shiftId}`)).status()).toBe(200);
    expect((await context.get("/api/sites")).status()).toBe(200);
    expect((await context.get(`/api/sites/${fixture.siteId}`)).status()).toBe(200);
    const calendar = await (await context.get(`/api/calendar-entries?from=${date}&to=${date}T23:59:00Z`)).json();
    expect(calendar.kinds.map((kind: { kind: string }) => kind.kind)).toEqual(expect.arrayContaining(["antenna-day", "my-shift"]));
    expect(calendar.entries).toContainEqual(expect.objectContaining({ id: `antenna-day:${fixture.publishedDayId}`, href: `/antenna-days/${fixture.publishedDayId}` }));
  }
});

test("only coordinators change days, sites, slots and shifts (403 for the other roles)", async () => {
  const { publishedDayId: day, slotId: slot, shiftId: shift, siteId: site } = fixture;
  for (const role of ["member", "newcomer", "steward"] as const) {
    const context = contexts[role]!;
    const refused: [string, string, unknown][] = [
      ["POST", "/api/antenna-days", { title: "Mine", siteId: site, startsAtLocal: `${date}T09:00`, endsAtLocal: `${date}T10:00`, safetyLeadId: missing }],
      ["PATCH", `/api/antenna-days/${day}`, { title: "Mine" }],
      ["DELETE", `/api/antenna-days/${day}`, undefined],
      ["POST", `/api/antenna-days/${day}/copy`, { title: "Mine", startsAtLocal: `${date}T09:00`, endsAtLocal: `${date}T10:00` }],
      ["POST", `/api/antenna-days/${day}/slots`, slotBody("Mine")],
      ["POST", "/api/sites", siteBody("Mine")],
      ["PATCH", `/api/sites/${site}`, siteBody("Mine")],
      ["PATCH", `/api/slots/${slot}`, { x: 10 }],
      ["DELETE", `/api/slots/${slot}`, undefined],
      ["POST", `/api/slots/${slot}/shifts`, shiftBody],
      ["PATCH", `/api/shifts/${shift}`, shiftBody],
      ["DELETE", `/api/shifts/${shift}`, undefined],
    ];
    for (const [method, url, data] of refused) {
      const response = await context.fetch(url, { method, data });
      expect(response.status(), `${role} ${method} ${url}`).toBe(403);
    }
  }
});

test("a member signs up for a shift and cancels; a newcomer may not sign up", async () => {
  const member = contexts.member!;
  const signedUp = await member.post(`/api/shifts/${fixture.shiftId}/signup`);
  expect(signedUp.status()).toBe(200);
  expect((await signedUp.json()).shift).toMatchObject({ taken: 1, signedUp: true, people: [expect.objectContaining({ name: "Cleo Marchetti-Vane" })] });
  const twice = await member.post(`/api/shifts/${fixture.shiftId}/signup`);
  expect(twice.status()).toBe(409);
  const mine = await (await member.get(`/api/calendar-entries?from=${date}&to=${date}T23:59:00Z`)).json();
  expect(mine.entries).toContainEqual(expect.objectContaining({ id: `my-shift:${fixture.shiftId}`, kind: "my-shift" }));
  const cancelled = await member.delete(`/api/shifts/${fixture.shiftId}/signup`);
  expect(cancelled.status()).toBe(200);
  expect((await cancelled.json()).shift).toMatchObject({ taken: 0, signedUp: false });
  expect((await member.delete(`/api/shifts/${fixture.shiftId}/signup`)).status()).toBe(404);

  const newcomer = contexts.newcomer!;
  const refused = await newcomer.post(`/api/shifts/${fixture.shiftId}/signup`);
  expect(refused.status()).toBe(403);
  expect((await refused.json()).message).toMatch(/Newcomers/);
});

test("a coordinator edits, copies, moves and deletes; bad input names the field", async () => {
  const coordinator = contexts.coordinator!;
  const patched = await coordinator.patch(`/api/antenna-days/${fixture.draftDayId}`, { data: { meetingPoint: "North gate" } });
  expect(patched.status()).toBe(200);
  expect((await patched.json()).day).toMatchObject({ meetingPoint: "North gate", sequence: 1, status: "draft" });
  const moved = await coordinator.patch(`/api/slots/${fixture.slotId}`, { data: { x: 45, y: 35 } });
  expect((await moved.json()).slot).toMatchObject({ x: 45, y: 35 });
  const offSite = await coordinator.patch(`/api/slots/${fixture.slotId}`, { data: { x: 500 } });
  expect(offSite.status()).toBe(400);
  expect((await offSite.json()).problems).toEqual([expect.objectContaining({ path: "x" })]);
  const badPlan = await coordinator.patch(`/api/slots/${fixture.slotId}`, { data: { planParams: { family: "dipole", heightM: 0, wireDiameterMm: 2, feedlineType: "rg213" } } });
  expect(badPlan.status()).toBe(400);
  expect((await badPlan.json()).problems[0].path).toBe("planParams.heightM");
  const copy = await coordinator.post(`/api/antenna-days/${fixture.publishedDayId}/copy`, { data: { title: "API copy", startsAtLocal: `${date}T09:00`, endsAtLocal: `${date}T17:00` } });
  expect(copy.status()).toBe(201);
  const copied = (await copy.json()).day;
  expect(copied).toMatchObject({ status: "draft", copiedFromId: fixture.publishedDayId });
  expect((await coordinator.delete(`/api/antenna-days/${copied.id}`)).status()).toBe(200);
  expect((await coordinator.delete(`/api/antenna-days/${fixture.publishedDayId}`)).status()).toBe(409);
  const badDay = await coordinator.post("/api/antenna-days", { data: { title: "", siteId: "nope", startsAtLocal: "tomorrow" } });
  expect(badDay.status()).toBe(400);
  expect((await badDay.json()).problems.map((problem: { path: string }) => problem.path)).toEqual(expect.arrayContaining(["title", "siteId", "startsAtLocal"]));
});

test("missing resources get 404", async () => {
  const coordinator = contexts.coordinator!;
  const member = contexts.member!;
  const calls: [APIRequestContext, string, string, unknown?][] = [
    [coordinator, "GET", `/api/antenna-days/${missing}`],
    [coordinator, "PATCH", `/api/antenna-days/${missing}`, { title: "X" }],
    [coordinator, "DELETE", `/api/antenna-days/${missing}`],
    [coordinator, "POST", `/api/antenna-days/${missing}/copy`, { title: "X", startsAtLocal: `${date}T09:00`, endsAtLocal: `${date}T10:00` }],
    [coordinator, "GET", `/api/antenna-days/${missing}/slots`],
    [coordinator, "GET", `/api/antenna-days/${missing}/ics`],
    [coordinator, "POST", `/api/antenna-days/${missing}/slots`, slotBody("X")],
    [coordinator, "GET", `/api/sites/${missing}`],
    [coordinator, "PATCH", `/api/sites/${missing}`, siteBody("X")],
    [coordinator, "GET", `/api/slots/${missing}`],
    [coordinator, "PATCH", `/api/slots/${missing}`, { x: 1 }],
    [coordinator, "DELETE", `/api/slots/${missing}`],
    [coordinator, "GET", `/api/slots/${missing}/shifts`],
    [coordinator, "POST", `/api/slots/${missing}/shifts`, shiftBody],
    [coordinator, "GET", `/api/shifts/${missing}`],
    [coordinator, "PATCH", `/api/shifts/${missing}`, shiftBody],
    [coordinator, "DELETE", `/api/shifts/${missing}`],
    [member, "POST", `/api/shifts/${missing}/signup`],
    [member, "DELETE", `/api/shifts/${missing}/signup`],
  ];
  for (const [context, method, url, data] of calls) {
    const response = await context.fetch(url, { method, data });
    expect(response.status(), `${method} ${url}`).toBe(404);
  }
});
