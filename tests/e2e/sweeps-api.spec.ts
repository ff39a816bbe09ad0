// Role rules of the measured-sweep routes against the real server: signed-out 401, a person
// who does not take part in the day (or a newcomer) 403, a missing slot or sweep 404, a bad
// file or bad fields 400 with the line named. Source: Guyline issue 7, item 5, and the product
// brief's role table (shared/design/product.md, "Roles").
import { expect, test, type APIRequestContext } from "@playwright/test";
import { roleContexts } from "./fixtures";

const missing = "00000000-0000-4000-8000-00000000beef";

const { as, disposeAll } = roleContexts();
test.afterAll(disposeAll);

/** A demo day's slots by name (the member operated on the past autumn day, and takes no part in the spring one). */
async function slotsOf(context: APIRequestContext, title: string): Promise<Record<string, string>> {
  const { days } = await (await context.get("/api/antenna-days")).json();
  const day = days.find((candidate: { title: string }) => candidate.title === title);
  const { slots } = await (await context.get(`/api/antenna-days/${day.id}/slots`)).json();
  return Object.fromEntries(slots.map((slot: { name: string; id: string }) => [slot.name, slot.id]));
}

/** A feed-point sweep of a 40 m antenna resonating at 7.05 MHz. */
const goodCsv = ["Freq (MHz),R (ohm),X (ohm)", ...Array.from({ length: 41 }, (_, i) => {
  const mhz = 6.85 + i * 0.01;
  return `${mhz.toFixed(2)},${(55 + 60 * (mhz - 7.05)).toFixed(1)},${(480 * (mhz - 7.05)).toFixed(1)}`;
})].join("\n");

const upload = (csv: string, fields: Record<string, string> = { place: "feed-point" }) => ({
  multipart: { ...fields, file: { name: "sweep.csv", mimeType: "text/csv", buffer: Buffer.from(csv) } },
});

test("the sweep routes answer 401, 403, 404 and 400 by role and input", async ({ baseURL }) => {
  const anonymous = await as(null, baseURL!);
  const member = await as("member", baseURL!);
  const newcomer = await as("newcomer", baseURL!);
  const steward = await as("steward", baseURL!);
  const autumn = await slotsOf(member, "Autumn antenna day");
  const mine = autumn["Forty metres"];
  const notMine = (await slotsOf(member, "Spring antenna day"))["Twenty metres"];

  expect((await anonymous.get(`/api/slots/${mine}/sweeps`)).status()).toBe(401);
  expect((await anonymous.post(`/api/slots/${mine}/sweeps`, upload(goodCsv))).status()).toBe(401);
  expect((await anonymous.get(`/api/sweeps/${missing}`)).status()).toBe(401);
  expect((await anonymous.delete(`/api/sweeps/${missing}`)).status()).toBe(401);

  // The demo's two sweeps of the end-fed: the member took a shift that day, so may upload to any of its slots.
  const listed = await member.get(`/api/slots/${autumn["Twenty end-fed"]}/sweeps`);
  expect(listed.status()).toBe(200);
  expect(await listed.json()).toMatchObject({ sweeps: [{ note: expect.stringMatching(/^After taking/) }, { note: expect.stringMatching(/^As cut/) }], canUpload: true });
  const refused = await member.get(`/api/slots/${notMine}/sweeps`);
  expect(await refused.json()).toMatchObject({ sweeps: [], canUpload: false });
  expect((await member.post(`/api/slots/${notMine}/sweeps`, upload(goodCsv))).status()).toBe(403);
  expect((await newcomer.post(`/api/slots/${mine}/sweeps`, upload(goodCsv))).status()).toBe(403);

  expect((await member.get(`/api/slots/${missing}/sweeps`)).status()).toBe(404);
  expect((await member.post(`/api/slots/${missing}/sweeps`, upload(goodCsv))).status()).toBe(404);
  expect((await member.get(`/api/sweeps/${missing}`)).status()).toBe(404);
  expect((await member.get(`/api/sweeps/${missing}/file`)).status()).toBe(404);
  expect((await member.get("/api/sweeps/not-an-id")).status()).toBe(400);

  const bad = await member.post(`/api/slots/${mine}/sweeps`, upload(goodCsv.replace("6.87,", "6.80,")));
  expect(bad.status()).toBe(400);
  expect((await bad.json()).problems).toEqual([{ path: "file", message: "line 4: the frequency 6.8 MHz is not above 6.86 MHz on line 3; a sweep goes up in frequency, one row per frequency." }]);
  const noPlace = await member.post(`/api/slots/${mine}/sweeps`, upload(goodCsv, {}));
  expect(noPlace.status()).toBe(400);
  expect((await noPlace.json()).problems[0].path).toBe("place");
  expect((await member.post(`/api/slots/${mine}/sweeps`, upload(goodCsv, { place: "feed-point", mapping: "{not json" }))).status()).toBe(400);

  const preview = await member.post(`/api/slots/${mine}/sweeps`, upload(goodCsv, { preview: "true" }));
  expect(preview.status()).toBe(200);
  expect((await preview.json()).preview).toMatchObject({ detected: { frequencyUnit: "MHz", quantity: "impedance", rColumn: 1, xColumn: 2 }, pointCount: 41, problems: [] });

  const created = await member.post(`/api/slots/${mine}/sweeps`, upload(goodCsv));
  expect(created.status()).toBe(201);
  const { sweep } = await created.json();
  expect(sweep.analysis.bands[0]).toMatchObject({ band: "40m", method: "reactance-zero" });
  expect(sweep.analysis.bands[0].measuredMHz).toBeCloseTo(7.05, 3);
  expect((await member.get(`/api/sweeps/${sweep.id}`)).status()).toBe(200);
  const file = await member.get(`/api/sweeps/${sweep.id}/file`);
  expect(file.status()).toBe(200);
  expect(file.headers()["content-type"]).toContain("text/plain");
  expect(await file.text()).toBe(goodCsv);

  expect((await steward.delete(`/api/sweeps/${sweep.id}`)).status()).toBe(403);
  expect((await member.delete(`/api/sweeps/${sweep.id}`)).status()).toBe(200);
  expect((await member.get(`/api/sweeps/${sweep.id}`)).status()).toBe(404);
});
