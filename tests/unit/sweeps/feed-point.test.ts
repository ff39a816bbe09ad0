// A sweep seen at both ends of the feedline: de-embedding a radio-end reading back to the feed
// point, and carrying a feed-point reading to the radio.
import { complex, type Complex } from "mathjs";
import { describe, expect, it } from "vitest";
import { inputGammaMagnitude, inputImpedance, lineSection, gammaFromSwr, swrFromGamma } from "@/lib/antenna/feedline";
import { TRANSFORMERS, feedlineType, type FeedlineType } from "@/lib/antenna/feedline-types";
import { feedPointImpedance, loadSwrFromInputSwr, sweepViews, type FeedChain } from "@/lib/sweeps/feed-point";
import { readSweepText } from "@/lib/sweeps/parse";

/**
 * A 50 Ω line made for the check: at 10 MHz it is exactly a quarter wave (90°) long with
 * `lossDb` of matched loss, as in the worked examples of reference-data.md §4.
 */
function quarterWaveLine(lossDb: number, degrees = 90): { chain: FeedChain; mhz: number } {
  const mhz = 10;
  const velocityFactor = 0.66;
  const lengthM = ((degrees / 360) * velocityFactor * 299.792458) / mhz;
  const line: FeedlineType = { ...feedlineType("rg58"), velocityFactor, k1: (100 * lossDb) / (Math.sqrt(mhz) * lengthM), k2: 0 };
  return { chain: { transformer: TRANSFORMERS["1:1"], line, lengthM }, mhz };
}

const close = (z: Complex, re: number, im: number, tolerance: number) => {
  expect(Math.abs(z.re - re)).toBeLessThan(tolerance);
  expect(Math.abs(z.im - im)).toBeLessThan(tolerance);
};

describe("de-embedding a radio-end reading through a lossy line", () => {
  it("recovers ZL = 100 Ω from Zin = 29.07 Ω on a 90° line with 1 dB matched loss, within 0.05 Ω", () => {
    // Source: reference-data.md §4, Zin examples [C] (lossy-line formula, Pozar, Microwave Engineering §2.7): ZL = 100 Ω, 90°, 1 dB → Zin = 29.07 Ω. Inverted here.
    const { chain, mhz } = quarterWaveLine(1);
    close(feedPointImpedance(complex(29.07, 0), chain, mhz).zAntenna, 100, 0, 0.05);
  });

  it("recovers ZL = 25 − j25 Ω from Zin = 28.01 − j1.03 Ω on a 30° line with 2 dB matched loss, within 0.1 Ω", () => {
    // Source: reference-data.md §4, Zin examples [C]: ZL = 25 − j25 Ω, 30°, 2 dB → Zin = 28.01 − j1.03 Ω. Inverted; the 2 dB each way magnifies the rounding of Zin.
    const { chain, mhz } = quarterWaveLine(2, 30);
    close(feedPointImpedance(complex(28.01, -1.03), chain, mhz).zAntenna, 25, -25, 0.1);
  });

  it("recovers 100 Ω from 25 Ω on a lossless quarter wave, and 40 − j30 Ω on an eighth wave", () => {
    // Source: reference-data.md §4, Zin examples [C]: ZL = 100 Ω lossless 90° → 25.00 Ω; 45° → 40.00 − j30.00 Ω. Inverted.
    close(feedPointImpedance(complex(25, 0), quarterWaveLine(0).chain, 10).zAntenna, 100, 0, 1e-6);
    close(feedPointImpedance(complex(40, -30), quarterWaveLine(0, 45).chain, 10).zAntenna, 100, 0, 1e-6);
  });

  it("multiplies by the unun's ratio: 50 Ω on the coax side of a 49:1 unun is 2450 Ω at the wire", () => {
    const { chain, mhz } = quarterWaveLine(0);
    const unun = { ...chain, transformer: TRANSFORMERS["49:1"] };
    close(feedPointImpedance(complex(50, 0), unun, mhz).zAntenna, 2450, 0, 1e-6);
  });

  it("recovers a dipole's feed-point sweep measured through 30 m of RG-213 and rounded to 0.1 Ω, within 0.3 % of |Z|", () => {
    // The sweep at the radio is computed forward with the lossy-line formula (checked against reference-data.md §4 in
    // the engine's feedline tests); an analyser's 0.1 Ω rounding grows through the line's round trip and the mismatch.
    const chain: FeedChain = { transformer: TRANSFORMERS["1:1"], line: feedlineType("rg213"), lengthM: 30 };
    const feed = Array.from({ length: 31 }, (_, i) => {
      const mhz = 6.9 + i * 0.02;
      return { mhz, z: complex(62 + 40 * (mhz - 7.1), 600 * (mhz - 7.1)) };
    });
    const csv = ["MHz,R,X", ...feed.map(({ mhz, z }) => {
      const zRadio = inputImpedance(z, lineSection(chain.line, mhz, chain.lengthM));
      return `${mhz.toFixed(3)},${zRadio.re.toFixed(1)},${zRadio.im.toFixed(1)}`;
    })].join("\n");
    const reading = readSweepText(csv);
    expect(reading.problems).toEqual([]);
    const views = sweepViews(reading.points, "radio-end", chain);
    expect(views.hasImpedance).toBe(true);
    expect(views.feed).toHaveLength(31);
    views.feed.forEach((point, i) => {
      const error = Math.hypot((point.r as number) - feed[i].z.re, (point.x as number) - feed[i].z.im);
      expect(error).toBeLessThan(0.003 * Math.hypot(feed[i].z.re, feed[i].z.im));
    });
    expect(views.explanation.join(" ")).toMatch(/inverting the lossy-line formula for 30 m of RG-213/);
  });

  it("carries a feed-point reading forward to the radio with the same formula", () => {
    const chain: FeedChain = { transformer: TRANSFORMERS["1:1"], line: feedlineType("rg8x"), lengthM: 25 };
    const reading = readSweepText("MHz,R,X\n14.0,60,-20\n14.1,65,-5\n14.2,70,10\n14.3,75,25\n14.4,80,40");
    const views = sweepViews(reading.points, "feed-point", chain);
    const expected = inputImpedance(complex(70, 10), lineSection(chain.line, 14.2, 25));
    close(complex(views.radio[2].r as number, views.radio[2].x as number), expected.re, expected.im, 1e-9);
    expect(views.feed[2]).toMatchObject({ r: 70, x: 10 });
  });

  it("carries ZL = 100 Ω at the feed point to Zin = 29.07 Ω at the radio through a 90° line with 1 dB matched loss", () => {
    // Source: reference-data.md §4, Zin examples [C] (lossy-line formula, Pozar, Microwave Engineering §2.7): ZL = 100 Ω, 90°, 1 dB → Zin = 29.07 Ω.
    const { chain, mhz } = quarterWaveLine(1);
    const rows = [-0.2, -0.1, 0, 0.1, 0.2].map((offset) => `${mhz + offset},100,0`);
    const views = sweepViews(readSweepText(["MHz,R,X", ...rows].join("\n")).points, "feed-point", chain);
    expect(views.radio).toHaveLength(5);
    expect(views.radio[2].mhz).toBe(mhz);
    close(complex(views.radio[2].r as number, views.radio[2].x as number), 29.07, 0, 0.005);
  });
});

// Source: reference-data.md §4, table "SWR at the input" [C], |Γin| = |ΓL|·10^(−A/10)
// (ARRL Antenna Book (recent editions), Transmission Lines chapter, from memory):
// [SWR at the load, matched loss in dB, SWR at the input].
const SWR_AT_THE_INPUT: [number, number, number][] = [
  [2, 0.5, 1.845],
  [3, 1.0, 2.318],
  [5, 1.0, 3.251],
  [3, 2.0, 1.922],
  [10, 3.0, 2.39],
  [10, 0.2, 8.147],
];

describe("SWR alone through a lossy line", () => {
  it.each(SWR_AT_THE_INPUT)("estimates a load's SWR of %f from %f dB matched loss and the input's %f", (load, lossDb, input) => {
    // The table inverted.
    expect(loadSwrFromInputSwr(input, lossDb)).toBeCloseTo(load, load >= 10 ? 0 : 2);
  });

  it("has no load for an input SWR the loss cannot give, and says so in the sweep's explanation", () => {
    // 3 dB each way: a total reflection at the load reads at most SWR (1 + 0.5)/(1 − 0.5) = 3 at the input.
    expect(loadSwrFromInputSwr(3.2, 3)).toBeNull();
    const chain: FeedChain = { transformer: TRANSFORMERS["1:1"], line: feedlineType("rg174"), lengthM: 24 };
    const reading = readSweepText("MHz,SWR\n14.0,6\n14.1,1.6\n14.2,1.2\n14.3,1.5\n14.4,2.0");
    const views = sweepViews(reading.points, "radio-end", chain);
    expect(views.feed[0].swr).toBeNull();
    expect(views.explanation.join(" ")).toMatch(/R and X at the feed point cannot be recovered from SWR/);
    expect(views.explanation.join(" ")).toMatch(/At 1 frequency the SWR at the radio is higher than any load could give/);
  });

  it.each(SWR_AT_THE_INPUT)("carries a feed-point SWR of %f through %f dB of matched loss to %f at the radio", (load, lossDb, input) => {
    const { chain, mhz } = quarterWaveLine(lossDb);
    const rows = [-0.2, -0.1, 0, 0.1, 0.2].map((offset) => `${mhz + offset},${load}`);
    const views = sweepViews(readSweepText(["MHz,SWR", ...rows].join("\n")).points, "feed-point", chain);
    expect(views.radio).toHaveLength(5);
    expect(views.radio[2].mhz).toBe(mhz);
    expect(views.radio[2].swr).toBeCloseTo(input, 3);
  });

  it("round-trips a feed-point SWR to the radio and back", () => {
    const chain: FeedChain = { transformer: TRANSFORMERS["1:1"], line: feedlineType("rg58"), lengthM: 40 };
    const reading = readSweepText("MHz,SWR\n7.0,2.5\n7.05,1.8\n7.1,1.3\n7.15,1.7\n7.2,2.4");
    const toRadio = sweepViews(reading.points, "feed-point", chain);
    const back = sweepViews(toRadio.radio.map((point) => ({ mhz: point.mhz, swr: point.swr as number })), "radio-end", chain);
    expect(back.feed).toHaveLength(5);
    back.feed.forEach((point, i) => expect(point.swr).toBeCloseTo(reading.points[i].swr, 9));
    expect(toRadio.radio[2].swr).toBeCloseTo(swrFromGamma(inputGammaMagnitude(gammaFromSwr(1.3), (chain.line.k1 * Math.sqrt(7.1) + chain.line.k2 * 7.1) * 0.4)), 12);
  });

  it("does not carry SWR alone through a 75 Ω run: the analyser's reference is not the line's", () => {
    const chain: FeedChain = { transformer: TRANSFORMERS["1:1"], line: feedlineType("rg6"), lengthM: 20 };
    const views = sweepViews(readSweepText("MHz,SWR\n7.0,2.5\n7.05,1.8\n7.1,1.3\n7.15,1.7\n7.2,2.4").points, "radio-end", chain);
    expect(views.feed).toHaveLength(5);
    expect(views.feed.every((point) => point.swr === null)).toBe(true);
    expect(views.explanation[0]).toMatch(/not 50 Ω like the analyser/);
  });
});
