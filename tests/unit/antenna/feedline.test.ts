import { complex, type Complex } from "mathjs";
import { describe, expect, it } from "vitest";
import { FEEDLINE_TYPES, TRANSFORMERS, feedlineType } from "@/lib/antenna/feedline-types";
import {
  DB_PER_NEPER,
  gammaFromSwr,
  inputGammaMagnitude,
  inputImpedance,
  lineSection,
  loadImpedance,
  matchedLossDb,
  mismatchLossDb,
  reflectedPowerFraction,
  returnLossDb,
  swr,
  swrFromGamma,
  throughFeedChain,
  throughTransformer,
  totalLossDb,
  type LineSection,
} from "@/lib/antenna/feedline";

const POZAR = "D. M. Pozar, Microwave Engineering, 4th ed., Wiley 2012, §2.3 and §2.7";
const ANTENNA_BOOK = "ARRL Antenna Book (recent editions), Transmission Lines chapter";

/** A 50 Ω line of the given one-way matched loss (dB) and electrical length (degrees). */
function section(lossDb: number, degrees: number): LineSection {
  return { z0Ohms: 50, lossNepers: lossDb / DB_PER_NEPER, phaseRadians: (degrees * Math.PI) / 180 };
}

function expectImpedance(actual: Complex, re: number, im: number, tolerance = 0.01) {
  expect(Math.abs(actual.re - re)).toBeLessThan(tolerance);
  expect(Math.abs(actual.im - im)).toBeLessThan(tolerance);
}

describe("SWR, return loss and mismatch loss", () => {
  // Source: D. M. Pozar, Microwave Engineering, 4th ed., Wiley 2012, §2.3 and §2.7 (formula numbering from memory; table computed)
  it.each([
    [1.1, 0.0476, 26.44, 0.23, 0.01],
    [1.2, 0.0909, 20.83, 0.83, 0.036],
    [1.5, 0.2, 13.98, 4.0, 0.177],
    [2.0, 0.3333, 9.54, 11.11, 0.512],
    [3.0, 0.5, 6.02, 25.0, 1.249],
    [5.0, 0.6667, 3.52, 44.44, 2.553],
    [10, 0.8182, 1.74, 66.94, 4.807],
  ])(`${POZAR}: SWR %f → |Γ| %f, RL %f dB, %f %% reflected, ML %f dB`, (s, gamma, rl, reflectedPercent, ml) => {
    const g = gammaFromSwr(s);
    expect(g).toBeCloseTo(gamma, 4);
    expect(returnLossDb(g)).toBeCloseTo(rl, 2);
    expect(reflectedPowerFraction(g) * 100).toBeCloseTo(reflectedPercent, 2);
    expect(mismatchLossDb(g)).toBeCloseTo(ml, 3);
    expect(swrFromGamma(g)).toBeCloseTo(s, 9);
  });

  it("computes the SWR of an impedance against its reference", () => {
    // Source: D. M. Pozar, Microwave Engineering, 4th ed., Wiley 2012, §2.3 and §2.7
    expect(swr(complex(100, 0), 50)).toBeCloseTo(2, 9);
    expect(swr(complex(25, 0), 50)).toBeCloseTo(2, 9);
    expect(swr(complex(50, 0), 50)).toBeCloseTo(1, 9);
    expect(swr(complex(0, 50), 50)).toBe(Infinity);
  });
});

describe("lossy-line input impedance (tanh form)", () => {
  // Source: D. M. Pozar, Microwave Engineering, 4th ed., Wiley 2012, §2.3 and §2.7 (worked values computed from the formula)
  it("ZL = 100 Ω, lossless, 90°: 25 Ω", () => {
    expectImpedance(inputImpedance(complex(100, 0), section(0, 90)), 25, 0);
  });
  it("ZL = 100 Ω, lossless, 45°: 40 − j30 Ω", () => {
    expectImpedance(inputImpedance(complex(100, 0), section(0, 45)), 40, -30);
  });
  it("ZL = 100 Ω, 90°, 1 dB matched loss: 29.07 Ω", () => {
    expectImpedance(inputImpedance(complex(100, 0), section(1, 90)), 29.07, 0);
  });
  it("open end, 90°, 0.5 dB: 2.875 Ω; shorted end: 869.6 Ω", () => {
    expectImpedance(inputImpedance(complex(1e15, 0), section(0.5, 90)), 2.875, 0, 0.001);
    expectImpedance(inputImpedance(complex(0, 0), section(0.5, 90)), 869.6, 0, 0.1);
  });
  it("ZL = 25 − j25 Ω, 30°, 2 dB: 28.01 − j1.03 Ω", () => {
    expectImpedance(inputImpedance(complex(25, -25), section(2, 30)), 28.01, -1.03);
  });
  it("refers an impedance back through the line (the inverse transformation)", () => {
    for (const line of [section(1.3, 137), section(0.2, 90), section(0, 45)]) {
      expectImpedance(loadImpedance(inputImpedance(complex(37, 21), line), line), 37, 21, 1e-9);
    }
  });
  it("input |Γ| is |ΓL|·10^(−A/10), the same as the tanh form gives", () => {
    // Source: ARRL Antenna Book (recent editions), Transmission Lines chapter (from memory; checked against the tanh form)
    const line = section(1, 63);
    const zIn = inputImpedance(complex(150, 0), line);
    expect(gammaFromSwr(swr(zIn, 50))).toBeCloseTo(inputGammaMagnitude(0.5, 1), 9);
  });
});

describe("total loss and input SWR with a mismatched load", () => {
  // Source: ARRL Antenna Book (recent editions), Transmission Lines chapter (formula from memory; table computed)
  it.each([
    [0.5, 2, 0.61, 1.845],
    [1.0, 3, 1.504, 2.318],
    [1.0, 5, 2.123, 3.251],
    [2.0, 3, 2.794, 1.922],
    [3.0, 10, 7.008, 2.39],
    [0.2, 10, 0.912, 8.147],
  ])(`${ANTENNA_BOOK}: A = %f dB, SWR %f at the load → total %f dB, SWR %f at the input`, (a, s, total, sIn) => {
    const g = gammaFromSwr(s);
    expect(totalLossDb(a, g)).toBeCloseTo(total, 3);
    expect(swrFromGamma(inputGammaMagnitude(g, a))).toBeCloseTo(sIn, 3);
  });

  it("ZL = 150 Ω on a 1 dB line loses 1.5038 dB", () => {
    // Source: ARRL Antenna Book (recent editions), Transmission Lines chapter (checked by direct power flow)
    expect(totalLossDb(1, gammaFromSwr(3))).toBeCloseTo(1.5038, 3);
  });
});

describe("coax types", () => {
  // Source: ARRL Antenna Book (recent editions), Transmission Lines chapter — typical matched loss, from memory (±20 %, RG-174 ±30 %)
  it.each([
    ["rg58", [0.4, 1.4, 2.5, 4.9], 0.2],
    ["rg8x", [0.3, 1.0, 1.9, 3.7], 0.2],
    ["rg213", [0.18, 0.6, 1.1, 2.1], 0.2],
    ["rg174", [1.1, 3.3, 5.7, 9.5], 0.3],
    ["rg6", [0.2, 0.6, 1.1, 2.0], 0.2],
  ] as const)("%s matched loss per 100 ft at 1/10/30/100 MHz", (id, dbPer100Ft, tolerance) => {
    const type = feedlineType(id);
    [1, 10, 30, 100].forEach((mhz, i) => {
      const loss = matchedLossDb(type, mhz, 30.48);
      expect(Math.abs(loss / dbPer100Ft[i] - 1)).toBeLessThan(tolerance);
    });
  });

  it("has the nominal impedances and velocity factors", () => {
    // Source: ARRL Antenna Book (recent editions), Transmission Lines chapter (from memory)
    expect(FEEDLINE_TYPES.map((type) => [type.id, type.z0Ohms])).toEqual([
      ["rg58", 50],
      ["rg8x", 50],
      ["rg213", 50],
      ["rg174", 50],
      ["rg6", 75],
      ["window450", 450],
    ]);
    // VF = 1/√εr with εr = 2.25 for solid polyethylene
    expect(Math.abs(feedlineType("rg213").velocityFactor - 1 / Math.sqrt(2.25))).toBeLessThan(0.01);
    expect(feedlineType("rg8x").velocityFactor).toBeGreaterThanOrEqual(0.78);
  });

  it("is a quarter wave long at the length VF·λ/4", () => {
    // Source: ARRL Antenna Book (recent editions), Transmission Lines chapter (from memory): VF 0.66 for solid PE
    // coax such as RG-213 (reference-data.md §5).
    const rg213 = feedlineType("rg213");
    const quarterWave = (0.66 * 299.792458) / 14 / 4;
    expect(lineSection(rg213, 14, quarterWave).phaseRadians).toBeCloseTo(Math.PI / 2, 9);
  });
});

describe("baluns, ununs and the feed chain", () => {
  it("an ideal transformer divides the impedance by its ratio", () => {
    expectImpedance(throughTransformer(complex(2450, 0), TRANSFORMERS["49:1"]), 50, 0, 1e-9);
    expectImpedance(throughTransformer(complex(3200, -640), TRANSFORMERS["64:1"]), 50, -10, 1e-9);
    expectImpedance(throughTransformer(complex(200, 40), TRANSFORMERS["4:1"]), 50, 10, 1e-9);
  });

  it("a matched load sees only the matched loss", () => {
    const chain = throughFeedChain(complex(50, 0), TRANSFORMERS["1:1"], feedlineType("rg58"), 30, 14.2);
    expect(chain.swrFeed).toBeCloseTo(1, 9);
    expect(chain.swrRadio).toBeCloseTo(1, 9);
    expect(chain.totalLossDb).toBeCloseTo(chain.matchedLossDb, 9);
  });

  it("a mismatched load shows a lower SWR at the radio than at the feed point", () => {
    // Source: ARRL Antenna Book (recent editions), Transmission Lines chapter (from memory)
    const chain = throughFeedChain(complex(150, 0), TRANSFORMERS["1:1"], feedlineType("rg58"), 30, 14.2);
    expect(chain.swrFeed).toBeCloseTo(3, 9);
    expect(chain.swrRadio).toBeCloseTo(swrFromGamma(inputGammaMagnitude(0.5, chain.matchedLossDb)), 6);
    expect(chain.totalLossDb).toBeGreaterThan(chain.matchedLossDb);
  });
});
