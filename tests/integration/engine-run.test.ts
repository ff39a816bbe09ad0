// The antenna engine through the server's worker pool (src/server/engine/run.ts): several
// calls at once each get their own answer, identical to the engine run inline, bad input
// comes back as the engine's `path: message` problems, and one bad call spoils no other.
import { describe, expect, it } from "vitest";
import { evaluate } from "@/lib/antenna/evaluate";
import { plan } from "@/lib/antenna/plan";
import type { PlanRequestInput } from "@/lib/antenna/plan-schema";
import { EngineInputError } from "@/lib/antenna/problems";
import { runEvaluate, runPlan } from "@/server/engine/run";
import { TEST_SITE } from "../fixtures/plan-requests";

const requests: PlanRequestInput[] = [
  { ...TEST_SITE, family: "dipole", band: "20m" },
  { ...TEST_SITE, family: "inverted-v", band: "17m", includedAngleDeg: 110 },
  { ...TEST_SITE, family: "vertical", band: "15m", heightM: 5, radials: 4 },
  { ...TEST_SITE, family: "end-fed", band: "20m", unun: "49:1" },
  { ...TEST_SITE, family: "off-centre-fed", band: "20m" },
  { ...TEST_SITE, family: "fan-dipole", bands: ["20m", "15m"] },
];

async function problemsOf(promise: Promise<unknown>): Promise<string[]> {
  const error = await promise.then(
    () => null,
    (thrown: unknown) => thrown,
  );
  expect(error).toBeInstanceOf(EngineInputError);
  return (error as EngineInputError).problems;
}

describe("runPlan and runEvaluate in worker threads", () => {
  it("answers six plans sent at once, each exactly as the engine computes it inline", async () => {
    const answers = await Promise.all(requests.map((request) => runPlan(request)));
    answers.forEach((answer, index) => {
      expect(answer.family).toBe(requests[index].family);
      expect(answer).toEqual(plan(requests[index]));
    });
  }, 120_000);

  it("finds the resonant length of a thin dipole in free space through the worker", async () => {
    const answer = await runPlan({ ...TEST_SITE, family: "dipole", band: "20m", ground: "free-space", conductor: "perfect" });
    const halfWave = 299.792458 / answer.elements[0].centreMHz / 2;
    // Source: reference-data.md §2, resonant length against length-to-diameter ratio (thin-wire
    // Galerkin method of moments, computed): K = 0.971 at l/d = 5000, R about 72 Ω at resonance;
    // the ARRL Antenna Book's K-factor chart agrees within about 0.01 (from memory). ±1.5 %.
    expect(answer.elements[0].lengthM / halfWave).toBeCloseTo(0.971, 1);
    expect(Math.abs(answer.elements[0].lengthM / halfWave - 0.971)).toBeLessThan(0.015 * 0.971);
    expect(answer.bands[0].feedImpedanceAtCentre.r).toBeGreaterThan(72 * 0.95);
    expect(answer.bands[0].feedImpedanceAtCentre.r).toBeLessThan(72 * 1.05);
  });

  it("returns the engine's problems for bad input, naming the field, while good calls beside it succeed", async () => {
    const [good, bad, alsoGood] = await Promise.allSettled([
      runPlan(requests[0]),
      runPlan({ ...TEST_SITE, family: "dipole", band: "20m", heightM: -2, wireDiameterMm: 0 }),
      runPlan(requests[1]),
    ]);
    expect(good.status).toBe("fulfilled");
    expect(alsoGood.status).toBe("fulfilled");
    expect(bad.status).toBe("rejected");
    expect(await problemsOf(runPlan({ ...TEST_SITE, family: "dipole", band: "20m", heightM: -2, wireDiameterMm: 0 }))).toEqual(
      expect.arrayContaining([expect.stringMatching(/^heightM: /), expect.stringMatching(/^wireDiameterMm: /)]),
    );
    expect(await problemsOf(runPlan({ ...TEST_SITE, family: "rhombic", band: "20m" }))).toEqual([expect.stringMatching(/^family: must be one of/)]);
  });

  it("evaluates several structures at once, as the engine does inline, and refuses a bad wire by its path", async () => {
    const dipole = (half: number) => ({
      wires: [{ from: [0, -half, 10], to: [0, half, 10], diameterMm: 2, segments: 21 }],
      feed: { wire: 0, at: 0.5 },
      ground: { kind: "free" },
      frequenciesMHz: [14, 14.2, 14.4],
      referenceOhms: 50,
    });
    const structures = [5, 5.1, 5.2, 5.3].map(dipole);
    const answers = await Promise.all(structures.map((structure) => runEvaluate(structure)));
    answers.forEach((answer, index) => expect(answer).toEqual(evaluate(structures[index])));
    const badWire = { ...dipole(5), wires: [dipole(5).wires[0], { from: [0, 0, 10], to: [0, 0, 12], diameterMm: 0 }] };
    expect(await problemsOf(runEvaluate(badWire))).toContain("wires[1].diameterMm: must be greater than 0");
  });
});
