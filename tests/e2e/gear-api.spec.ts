// Role rules on every gear and lending route, against the real server: signed-out 401, a role
// that may not act 403, a missing resource 404. Source: Guyline issue 5, item 7, and the
// product brief's role table (shared/design/product.md, "Roles").
import { expect, test } from "@playwright/test";
import { roleContexts } from "./fixtures";

const missing = "00000000-0000-4000-8000-00000000dead";
// Source: W3C PNG Specification (Third Edition), §5.2 PNG signature.
const png = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52]);

const { as, disposeAll } = roleContexts();
test.afterAll(disposeAll);

const label = (prefix: string) => `${prefix}-${Date.now().toString(36).slice(-6).toUpperCase()}`;
const inDays = (days: number, hour: number) => `${new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10)}T${String(hour).padStart(2, "0")}:00`;

test("the gear routes answer 401, 403 and 404 by role", async ({ baseURL }) => {
  const anonymous = await as(null, baseURL!);
  const member = await as("member", baseURL!);
  const steward = await as("steward", baseURL!);
  const newItem = { kind: "coax", labelCode: label("RT"), name: "Route test run", condition: "good", location: "Crate", cableType: "rg58", lengthM: 10, connectorA: "bnc", connectorB: "bnc" };

  expect((await anonymous.get("/api/gear")).status()).toBe(401);
  expect((await anonymous.post("/api/gear", { data: newItem })).status()).toBe(401);
  expect((await member.post("/api/gear", { data: newItem })).status()).toBe(403);
  const created = await steward.post("/api/gear", { data: newItem });
  expect(created.status()).toBe(201);
  const { item } = await created.json();
  expect((await steward.post("/api/gear", { data: { ...newItem, kind: "quantum" } })).status()).toBe(400);

  const list = await member.get(`/api/gear?q=${item.labelCode}&sort=name&dir=desc&page=1&pageSize=5`);
  expect(list.status()).toBe(200);
  expect((await list.json()).rows.map((row: { id: string }) => row.id)).toEqual([item.id]);
  const csv = await member.get(`/api/gear?q=${item.labelCode}&format=csv`);
  expect(csv.headers()["content-type"]).toContain("text/csv");
  expect(await csv.text()).toContain(item.labelCode);

  expect((await anonymous.get(`/api/gear/${item.id}`)).status()).toBe(401);
  expect((await member.get(`/api/gear/${item.id}`)).status()).toBe(200);
  expect((await member.get(`/api/gear/${missing}`)).status()).toBe(404);

  expect((await anonymous.patch(`/api/gear/${item.id}`, { data: { location: "Shed" } })).status()).toBe(401);
  expect((await member.patch(`/api/gear/${item.id}`, { data: { location: "Shed" } })).status()).toBe(403);
  expect((await steward.patch(`/api/gear/${missing}`, { data: { location: "Shed" } })).status()).toBe(404);
  const patched = await steward.patch(`/api/gear/${item.id}`, { data: { location: "Shed", lengthM: 12 } });
  expect(patched.status()).toBe(200);
  expect((await patched.json()).item).toMatchObject({ location: "Shed", lengthM: 12, kind: "coax" });

  const form = (purpose: string, name: string, buffer: Buffer, mimeType: string) => ({ multipart: { purpose, file: { name, mimeType, buffer } } });
  expect((await anonymous.post(`/api/gear/${item.id}/files`, form("photo", "p.png", png, "image/png"))).status()).toBe(401);
  expect((await member.post(`/api/gear/${item.id}/files`, form("photo", "p.png", png, "image/png"))).status()).toBe(403);
  expect((await steward.post(`/api/gear/${missing}/files`, form("photo", "p.png", png, "image/png"))).status()).toBe(404);
  const disguised = await steward.post(`/api/gear/${item.id}/files`, form("photo", "p.png", Buffer.from("<html><script></script>"), "image/png"));
  expect(disguised.status()).toBe(400);
  const uploaded = await steward.post(`/api/gear/${item.id}/files`, form("photo", "p.png", png, "image/png"));
  expect(uploaded.status()).toBe(201);
  const { file } = await uploaded.json();

  expect((await anonymous.get(file.url)).status()).toBe(401);
  const download = await member.get(file.url);
  expect(download.status()).toBe(200);
  expect(download.headers()["content-type"]).toBe("image/png");
  expect(download.headers()["cache-control"]).toContain("immutable");
  expect(Buffer.from(await download.body())).toEqual(png);
  expect((await member.get(`/api/gear/${item.id}/files/${missing}`)).status()).toBe(404);
  expect((await member.delete(file.url)).status()).toBe(403);
  expect((await steward.delete(file.url)).status()).toBe(200);
  expect((await member.get(file.url)).status()).toBe(404);

  expect((await anonymous.delete(`/api/gear/${item.id}?reason=Worn out`)).status()).toBe(401);
  expect((await member.delete(`/api/gear/${item.id}?reason=Worn out`)).status()).toBe(403);
  expect((await steward.delete(`/api/gear/${missing}?reason=Worn out`)).status()).toBe(404);
  const retired = await steward.delete(`/api/gear/${item.id}?reason=Worn out`);
  expect((await retired.json()).item.condition).toBe("retired");
});

test("the import route previews, refuses a bad commit whole, and is for keepers", async ({ baseURL }) => {
  const anonymous = await as(null, baseURL!);
  const member = await as("member", baseURL!);
  const steward = await as("steward", baseURL!);
  const code = label("IM");
  const csv = `label_code,name,kind,condition,location\n${code},Import test,tools,good,Shed\nBAD CODE,Broken,tools,good,Shed\n`;
  expect((await anonymous.post("/api/gear/import", { data: { mode: "preview", csv } })).status()).toBe(401);
  expect((await member.post("/api/gear/import", { data: { mode: "preview", csv } })).status()).toBe(403);
  const preview = await steward.post("/api/gear/import", { data: { mode: "preview", csv } });
  expect(preview.status()).toBe(200);
  expect((await preview.json()).problems).toEqual([{ line: 3, field: "label_code", message: expect.stringMatching(/label code has 2–12/) }]);
  const commit = await steward.post("/api/gear/import", { data: { mode: "commit", csv } });
  expect(commit.status()).toBe(400);
  expect((await commit.json()).imported).toBe(0);
  expect((await (await steward.get(`/api/gear?q=${code}`)).json()).rowCount).toBe(0);
});

test("the booking and waitlist routes answer by role", async ({ baseURL }) => {
  const anonymous = await as(null, baseURL!);
  const member = await as("member", baseURL!);
  const newcomer = await as("newcomer", baseURL!);
  const steward = await as("steward", baseURL!);
  const { item } = await (
    await steward.post("/api/gear", { data: { kind: "tools", labelCode: label("BK"), name: "Booking route kit", condition: "good", location: "Shed" } })
  ).json();
  const wanted = { itemId: item.id, startsAt: inDays(40, 9), endsAt: inDays(40, 17) };

  expect((await anonymous.get("/api/bookings")).status()).toBe(401);
  expect((await anonymous.post("/api/bookings", { data: wanted })).status()).toBe(401);
  expect((await member.post("/api/bookings", { data: { ...wanted, itemId: missing } })).status()).toBe(404);
  const made = await member.post("/api/bookings", { data: wanted });
  expect(made.status()).toBe(201);
  const { booking, outcome } = await made.json();
  expect(outcome).toBe("approved");

  const clash = await newcomer.post("/api/bookings", { data: { ...wanted, startsAt: inDays(40, 10) } });
  expect(clash.status()).toBe(409);
  const clashBody = await clash.json();
  expect(clashBody).toMatchObject({ error: "conflict", nextFreeStart: booking.endsAt, canJoinWaitlist: true });

  expect((await anonymous.get(`/api/bookings/${booking.id}`)).status()).toBe(401);
  expect((await newcomer.get(`/api/bookings/${booking.id}`)).status()).toBe(404);
  expect((await member.get(`/api/bookings/${booking.id}`)).status()).toBe(200);
  expect((await steward.get(`/api/bookings/${missing}`)).status()).toBe(404);
  const mine = await (await newcomer.get("/api/bookings?pageSize=100")).json();
  expect(mine.rows.every((row: { borrowerId: string }) => row.borrowerId !== booking.borrowerId)).toBe(true);

  expect((await anonymous.patch(`/api/bookings/${booking.id}`, { data: { action: "hand-out", condition: "good" } })).status()).toBe(401);
  expect((await member.patch(`/api/bookings/${booking.id}`, { data: { action: "hand-out", condition: "good" } })).status()).toBe(403);
  expect((await steward.patch(`/api/bookings/${missing}`, { data: { action: "approve" } })).status()).toBe(404);
  expect((await steward.patch(`/api/bookings/${booking.id}`, { data: { action: "decline" } })).status()).toBe(400);

  expect((await anonymous.post("/api/waitlist", { data: wanted })).status()).toBe(401);
  const joined = await newcomer.post("/api/waitlist", { data: { ...wanted, startsAt: inDays(40, 10) } });
  expect(joined.status()).toBe(201);
  const { entry } = await joined.json();
  expect((await anonymous.patch(`/api/waitlist/${entry.id}`, { data: { action: "withdraw" } })).status()).toBe(401);
  expect((await member.patch(`/api/waitlist/${entry.id}`, { data: { action: "withdraw" } })).status()).toBe(404);

  // The member cancels; the newcomer is offered the time and accepts it.
  const cancelled = await member.patch(`/api/bookings/${booking.id}`, { data: { action: "cancel" } });
  expect(cancelled.status()).toBe(200);
  expect((await cancelled.json()).offeredTo).toEqual([entry.id]);
  const accepted = await newcomer.patch(`/api/waitlist/${entry.id}`, { data: { action: "accept" } });
  expect(accepted.status()).toBe(200);
  expect((await accepted.json()).booking.state).toBe("approved");
});
