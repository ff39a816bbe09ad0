// The engine contract's two calls over HTTP against the production build: numbers for a good
// request, 400 naming the field for every kind of bad input the contract lists, 401 signed out.
// Source: Guyline antenna engine contract (shared/design/engine-contract.md), "Errors".
import { expect, test, type APIRequestContext } from "@playwright/test";
import { signInApi } from "./fixtures";
import { DIPOLE_20M as dipolePlan } from "../fixtures/plan-requests";

const dipole = {
  wires: [{ from: [0, -5, 10], to: [0, 5, 10], diameterMm: 2, segments: 21 }],
  feed: { wire: 0, at: 0.5 },
  ground: { kind: "free" },
  frequenciesMHz: [14.0, 14.2, 14.4],
  referenceOhms: 50,
};

const realGround = { kind: "real", conductivitySm: 0.005, relativePermittivity: 13 };

/** Each kind of bad input the contract names, and the field the answer must name. */
const badEvaluateRequests: { kind: string; body: unknown; path: string }[] = [
  { kind: "no wires", body: { ...dipole, wires: [] }, path: "wires" },
  { kind: "a feed on a wire that does not exist", body: { ...dipole, feed: { wire: 3, at: 0.5 } }, path: "feed.wire" },
  { kind: "at outside 0..1", body: { ...dipole, feed: { wire: 0, at: 1.2 } }, path: "feed.at" },
  { kind: "a zero-length wire", body: { ...dipole, wires: [{ from: [0, 0, 10], to: [0, 0, 10], diameterMm: 2 }] }, path: "wires[0].to" },
  { kind: "a wire below ground", body: { ...dipole, ground: realGround, wires: [{ from: [0, -5, -1], to: [0, 5, -1], diameterMm: 2 }] }, path: "wires[0].from" },
  { kind: "a frequency of zero", body: { ...dipole, frequenciesMHz: [0] }, path: "frequenciesMHz[0]" },
  { kind: "a frequency above 3000 MHz", body: { ...dipole, frequenciesMHz: [14, 3001] }, path: "frequenciesMHz[1]" },
  {
    kind: "more than 2000 segments in all",
    body: { ...dipole, wires: [{ ...dipole.wires[0], diameterMm: 0.1, segments: 1500 }, { from: [0, 6, 10], to: [0, 16, 10], diameterMm: 0.1, segments: 600 }] },
    path: "wires",
  },
  { kind: "a non-numeric value", body: { ...dipole, wires: [{ ...dipole.wires[0], diameterMm: "two" }] }, path: "wires[0].diameterMm" },
  { kind: "a zero diameter on the second wire", body: { ...dipole, wires: [dipole.wires[0], { from: [0, 6, 10], to: [0, 7, 10], diameterMm: 0 }] }, path: "wires[1].diameterMm" },
];

async function expectProblem(request: APIRequestContext, url: string, body: unknown, path: string) {
  const response = await request.post(url, { data: body });
  expect(response.status()).toBe(400);
  const answer = await response.json();
  expect(answer.error).toBe("bad-input");
  expect(answer.problems.map((problem: { path: string }) => problem.path)).toContain(path);
  return answer;
}

test.describe("signed out", () => {
  test("both calls answer 401", async ({ request }) => {
    expect((await request.post("/api/antenna/evaluate", { data: dipole })).status()).toBe(401);
    expect((await request.post("/api/antenna/plan", { data: dipolePlan })).status()).toBe(401);
  });
});

test.describe("POST /api/antenna/evaluate", () => {
  test.beforeEach(async ({ request }) => signInApi(request, "member"));

  test("answers the feed-point impedance and SWR at every frequency", async ({ request }) => {
    const response = await request.post("/api/antenna/evaluate", { data: dipole });
    expect(response.status()).toBe(200);
    const answer = await response.json();
    expect(answer.segments).toBe(21);
    expect(answer.points.map((point: { mhz: number }) => point.mhz)).toEqual([14.0, 14.2, 14.4]);
    // A 10 m dipole is a little under a half wave at 14 MHz (0.467 λ): R somewhat below the
    // half-wave dipole's 73 Ω, and X below zero (shorter than resonance), rising with frequency.
    // Source: S. J. Orfanidis, Electromagnetic Waves and Antennas (imped.m: Z(λ/2) = 73.079 +
    // j42.515 Ω) and reference-data.md §2, R_in against length (34 Ω at 0.375 λ, 73 Ω at 0.5 λ).
    const [low, , high] = answer.points;
    expect(low.r).toBeGreaterThan(34);
    expect(low.r).toBeLessThan(73);
    expect(low.x).toBeLessThan(0);
    expect(low.x).toBeLessThan(high.x);
    expect(low.swr).toBeGreaterThan(1);
  });

  for (const bad of badEvaluateRequests) {
    test(`refuses ${bad.kind} with 400 naming ${bad.path}`, async ({ request }) => {
      await expectProblem(request, "/api/antenna/evaluate", bad.body, bad.path);
    });
  }

  test("names the contract's example field and message", async ({ request }) => {
    const answer = await expectProblem(request, "/api/antenna/evaluate", badEvaluateRequests.at(-1)!.body, "wires[1].diameterMm");
    expect(answer.message).toContain("wires[1].diameterMm: must be greater than 0");
  });

  test("refuses malformed JSON with 400", async ({ request }) => {
    const response = await request.post("/api/antenna/evaluate", { data: '{"wires": [', headers: { "content-type": "application/json" } });
    expect(response.status()).toBe(400);
    expect((await response.json()).error).toBe("bad-input");
  });
});

test.describe("POST /api/antenna/plan", () => {
  test.beforeEach(async ({ request }) => signInApi(request, "newcomer"));

  test("answers a plan with cut lengths, impedance, a sweep at both ends and exposure distances (newcomers too)", async ({ request }) => {
    const response = await request.post("/api/antenna/plan", { data: dipolePlan });
    expect(response.status()).toBe(200);
    const answer = await response.json();
    const [element] = answer.elements;
    // Source: reference-data.md §2, the "468/f" rule (common practice): 143/14.175 = 10.09 m;
    // the model's length over real ground stays within a few per cent of it.
    expect(Math.abs(element.lengthM - 143 / 14.175) / (143 / 14.175)).toBeLessThan(0.06);
    const [band] = answer.bands;
    expect(band.sweep.length).toBeGreaterThanOrEqual(21);
    expect(band.sweep[0]).toMatchObject({ feed: { swr: expect.any(Number) }, radio: { swr: expect.any(Number) } });
    expect(band.loss.totalDb).toBeGreaterThan(band.loss.matchedDb * 0.99);
    expect(band.exposure.distances.length).toBeGreaterThan(0);
    expect(answer.cutSheet.lines.length).toBeGreaterThan(0);
  });

  test("refuses bad plan input naming each field", async ({ request }) => {
    await expectProblem(request, "/api/antenna/plan", { ...dipolePlan, heightM: -3 }, "heightM");
    await expectProblem(request, "/api/antenna/plan", { ...dipolePlan, family: "rhombic" }, "family");
    await expectProblem(request, "/api/antenna/plan", { ...dipolePlan, band: "11m" }, "band");
    await expectProblem(request, "/api/antenna/plan", { ...dipolePlan, feedline: { type: "rg58", lengthM: "long" } }, "feedline.lengthM");
  });

  test("refuses malformed JSON with 400", async ({ request }) => {
    const response = await request.post("/api/antenna/plan", { data: "family=dipole", headers: { "content-type": "application/json" } });
    expect(response.status()).toBe(400);
  });
});
