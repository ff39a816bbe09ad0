import { spawnSync } from "node:child_process";
import { describe, expect, it } from "vitest";
import { evaluate } from "@/lib/antenna/evaluate";
import { EngineInputError } from "@/lib/antenna/problems";

const EXAMPLE = {
  wires: [{ from: [0, -5.0, 10], to: [0, 5.0, 10], diameterMm: 2.0, segments: 41 }],
  feed: { wire: 0, at: 0.5 },
  ground: { kind: "free" },
  frequenciesMHz: [14.0, 14.2, 14.4],
  referenceOhms: 50,
};

/** The example request with some fields replaced (a shallow merge of the top level). */
function request(changes: Record<string, unknown>): unknown {
  return { ...structuredClone(EXAMPLE), ...changes };
}

function problemsOf(input: unknown): string[] {
  try {
    evaluate(input);
  } catch (error) {
    if (error instanceof EngineInputError) return error.problems;
    throw error;
  }
  throw new Error("evaluate accepted the request");
}

describe("evaluate (engine-contract.md §1)", () => {
  it("answers the contract's example with one point per frequency, SWR and the segment count", () => {
    const response = evaluate(EXAMPLE);
    expect(response.segments).toBe(41);
    expect(response.points.map((p) => p.mhz)).toEqual([14.0, 14.2, 14.4]);
    for (const point of response.points) {
      // Source: reference-data.md §2, R_in versus length from C. A. Balanis, Antenna Theory: Analysis and Design, 3rd ed.,
      // Wiley 2005, eq. (4-70), (4-79) (from memory; values computed): 34.0 Ω at 0.375 λ, 73.08 Ω at 0.5 λ, and about 72 Ω
      // at resonance. This 10 m wire is 0.467–0.480 λ long across 14.0–14.4 MHz, close to resonance, so 40–90 Ω.
      expect(point.r).toBeGreaterThan(40);
      expect(point.r).toBeLessThan(90);
      // Source: D. M. Pozar, Microwave Engineering, 4th ed., Wiley 2012, §2.3 (from memory): Γ = (Z − Z0)/(Z + Z0),
      // SWR = (1 + |Γ|)/(1 − |Γ|) (reference-data.md §4).
      const gamma = Math.hypot(point.r - 50, point.x) / Math.hypot(point.r + 50, point.x);
      expect(point.swr).toBeCloseTo((1 + gamma) / (1 - gamma), 2);
    }
    // A 10 m dipole of 2 mm wire is short of resonance at 14.0 MHz and its reactance rises with frequency.
    expect(response.points[0].x).toBeLessThan(response.points[2].x);
  });

  it("leaves out swr without referenceOhms", () => {
    expect(evaluate(request({ referenceOhms: undefined })).points[0]).not.toHaveProperty("swr");
  });

  it.each<[string, unknown, string]>([
    ["no wires", request({ wires: [] }), "wires: must list at least one wire"],
    ["a feed on a wire that does not exist", request({ feed: { wire: 1, at: 0.5 } }), "feed.wire: wire 1 does not exist (wires are numbered 0 to 0)"],
    ["at below 0", request({ feed: { wire: 0, at: -0.1 } }), "feed.at: must be between 0 and 1"],
    ["at above 1", request({ feed: { wire: 0, at: 1.5 } }), "feed.at: must be between 0 and 1"],
    ["a zero diameter", request({ wires: [{ from: [0, -5, 10], to: [0, 5, 10], diameterMm: 0 }] }), "wires[0].diameterMm: must be greater than 0"],
    ["a zero-length wire", request({ wires: [{ from: [0, 5, 10], to: [0, 5, 10], diameterMm: 2 }] }), "wires[0].to: must differ from `from` (the wire has zero length)"],
    [
      "a wire below ground",
      request({ ground: { kind: "real", conductivitySm: 0.005, relativePermittivity: 13 }, wires: [{ from: [0, -5, 10], to: [0, 5, -0.5], diameterMm: 2 }] }),
      "wires[0].to: z = -0.5 m is not above the ground; with real ground every wire must stay above z = 0",
    ],
    ["a frequency of zero", request({ frequenciesMHz: [14, 0] }), "frequenciesMHz[1]: must be greater than 0"],
    ["a frequency above 3000 MHz", request({ frequenciesMHz: [3000.5] }), "frequenciesMHz[0]: must be at most 3000 MHz"],
    ["no frequencies", request({ frequenciesMHz: [] }), "frequenciesMHz: must list at least one frequency"],
    [
      "more than 2000 segments in all",
      request({ wires: [0, 1, 2].map((x) => ({ from: [x, -5, 10], to: [x, 5, 10], diameterMm: 0.5, segments: 700 })) }),
      "wires: 2100 segments in all, more than the 2000 allowed; use fewer or shorter wires or a lower frequency",
    ],
    ["a non-numeric coordinate", request({ wires: [{ from: [0, "-5", 10], to: [0, 5, 10], diameterMm: 2 }] }), "wires[0].from[1]: expected number, received string"],
    ["a non-numeric frequency", request({ frequenciesMHz: ["14.2"] }), "frequenciesMHz[0]: expected number, received string"],
    ["a negative reference impedance", request({ referenceOhms: -50 }), "referenceOhms: must be greater than 0"],
    ["an unknown ground", request({ ground: { kind: "wet" } }), 'ground.kind: must be {"kind":"free"}, {"kind":"perfect"} or {"kind":"real", conductivitySm, relativePermittivity}'],
    ["a request that is not an object", "wires", "request: expected object, received string"],
  ])("refuses %s", (_, input, expected) => {
    expect(problemsOf(input)).toContain(expected);
  });

  it("names only the missing wires when there are none, not the feed", () => {
    expect(problemsOf(request({ wires: [] }))).toEqual(["wires: must list at least one wire"]);
  });
});

describe("the command line (npm run --silent antenna:evaluate)", () => {
  function run(stdin: string) {
    return spawnSync("npm", ["run", "--silent", "antenna:evaluate"], { input: stdin, encoding: "utf8", timeout: 60_000 });
  }

  it("prints the response as JSON and exits 0", () => {
    const result = run(JSON.stringify(EXAMPLE));
    expect(result.status).toBe(0);
    expect(JSON.parse(result.stdout).segments).toBe(41);
  }, 60_000);

  it.each([
    ["bad input", JSON.stringify(request({ wires: [{ from: [0, -5, 10], to: [0, 5, 10], diameterMm: -2 }] })), /^wires\[0\]\.diameterMm: must be greater than 0$/],
    ["malformed JSON", '{"wires": [', /^request: malformed JSON \(.+\)$/],
  ])("exits 2 on %s with one line naming the field and nothing else", (_, stdin, line) => {
    const result = run(stdin);
    expect(result.status).toBe(2);
    expect(result.stdout).toBe("");
    const lines = result.stderr.split("\n").filter((l) => l !== "");
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(line);
  }, 60_000);
});
