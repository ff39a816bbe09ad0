// Comparing a measured sweep with the engine's plan: the resonance (X crossing zero, or the
// SWR dip), its shift, the 2:1 bandwidth, the band fit, the trim request and the learned offset.
import { complex } from "mathjs";
import { beforeAll, describe, expect, it } from "vitest";
import { inputImpedance, lineSection } from "@/lib/antenna/feedline";
import { TRANSFORMERS, feedlineType } from "@/lib/antenna/feedline-types";
import { plan, type PlanResult } from "@/lib/antenna/plan";
import { trim } from "@/lib/antenna/trim";
import { compareWithPlan, measuredOffsets, trimRequestOf, type TrimOutcome } from "@/lib/sweeps/analysis";
import { sweepViews, type FeedChain, type SweepPlace } from "@/lib/sweeps/feed-point";
import { meanOffsets, nextCut } from "@/lib/sweeps/next-cut";
import type { MeasuredPoint } from "@/lib/sweeps/parse";
import { DIPOLE_14_2 } from "../../fixtures/plan-requests";

let dipole: PlanResult;
let chain: FeedChain;
beforeAll(() => {
  dipole = plan(DIPOLE_14_2);
  chain = { transformer: TRANSFORMERS["1:1"], line: feedlineType("rg213"), lengthM: 20 };
});

const frequencies = (from: number, to: number, step: number) => Array.from({ length: Math.round((to - from) / step) + 1 }, (_, i) => from + i * step);

/** A feed point whose reactance rises through zero at `resonanceMHz` (a dipole near its first resonance). */
const feedPoint = (mhz: number, resonanceMHz: number) => complex(68 + 30 * (mhz - resonanceMHz), 480 * (mhz - resonanceMHz));

function measured(points: { mhz: number; r: number; x: number }[]): MeasuredPoint[] {
  return points.map(({ mhz, r, x }) => ({ mhz, r, x, swr: 1 }));
}

const compare = (points: MeasuredPoint[], place: SweepPlace) => compareWithPlan(sweepViews(points, place, chain), dipole, "zero-reactance");

describe("the measured resonance and its shift from the plan", () => {
  it("reads the resonance where X crosses zero and states the shift in kHz and per cent", () => {
    const points = measured(frequencies(13.6, 14.4, 0.02).map((mhz) => ({ mhz, r: feedPoint(mhz, 13.9).re, x: feedPoint(mhz, 13.9).im })));
    const [band] = compare(points, "feed-point");
    expect(band.band).toBe("20m");
    expect(band.method).toBe("reactance-zero");
    expect(band.measuredMHz).toBeCloseTo(13.9, 9);
    expect(band.predictedMHz).toBe(dipole.bands[0].zeroReactanceMHz);
    expect(band.shiftKHz).toBeCloseTo((13.9 - (band.predictedMHz as number)) * 1000, 6);
    expect(band.shiftPercent).toBeCloseTo((13.9 / (band.predictedMHz as number) - 1) * 100, 6);
    expect(band.verdict).toBe("low");
  });

  it("finds a resonance 2.1 % low when the plan's own sweep is measured 2.1 % low", () => {
    const points = measured(dipole.bands[0].sweep.map((point) => ({ mhz: point.mhz * 0.979, r: point.feed.r, x: point.feed.x })));
    const [band] = compare(points, "feed-point");
    // The plan's figures carry six significant digits.
    expect(band.shiftPercent).toBeCloseTo(-2.1, 3);
    expect(band.verdict).toBe("low");
    const onTarget = compare(measured(dipole.bands[0].sweep.map((point) => ({ mhz: point.mhz, r: point.feed.r, x: point.feed.x }))), "feed-point");
    expect(onTarget[0].verdict).toBe("on-target");
  });

  it("de-embeds a radio-end sweep before reading X: the resonance at the feed point, not the radio's X crossing", () => {
    const points = measured(
      frequencies(13.6, 14.4, 0.01).map((mhz) => {
        const zRadio = inputImpedance(feedPoint(mhz, 13.9), lineSection(chain.line, mhz, chain.lengthM));
        return { mhz, r: zRadio.re, x: zRadio.im };
      }),
    );
    const [band] = compare(points, "radio-end");
    expect(band.measuredMHz).toBeCloseTo(13.9, 6);
  });

  it("reads an SWR-only sweep at its dip, and hands the trim the zero-reactance frequency by the model's own ratio", () => {
    const points = frequencies(13.9, 14.5, 0.01).map((mhz) => ({ mhz, swr: 1.3 + 40 * (mhz - 14.12) ** 2 }));
    const [band] = compare(points, "radio-end");
    expect(band.method).toBe("swr-minimum");
    // The dip is read at the feed point, after the line's loss is taken out: within 0.1 kHz of the radio's.
    expect(band.measuredMHz).toBeCloseTo(14.12, 4);
    expect(band.predictedMHz).toBe(dipole.bands[0].minimumSwr.feed.mhz);
    expect(band.trimMHz).toBeCloseTo((band.measuredMHz as number) * ((dipole.bands[0].zeroReactanceMHz as number) / dipole.bands[0].minimumSwr.feed.mhz), 9);
  });

  it("says when the dip lies beyond the sweep, and leaves out a sweep that reaches no band", () => {
    const falling = frequencies(13.0, 13.6, 0.02).map((mhz) => ({ mhz, swr: 1.2 + 10 * (mhz - 13.8) ** 2 }));
    const [band] = compare(falling, "radio-end");
    expect(band.measuredMHz).toBeNull();
    expect(band.verdict).toBe("not-found");
    expect(band.notes.join(" ")).toMatch(/keeps falling toward the sweep's high end.*Sweep wider/);
    expect(compare(frequencies(7.0, 7.3, 0.05).map((mhz) => ({ mhz, swr: 1.5 })), "radio-end")).toEqual([]);
  });
});

describe("the measured 2:1 bandwidth and the band fit", () => {
  it("finds the 2:1 edges of SWR = 1 + 100·(f − 14.15)²: 14.05 to 14.25 MHz, 200 kHz, and the band does not fit", () => {
    // SWR = 2 where 100·(f − 14.15)² = 1, i.e. f = 14.15 ± 0.1 MHz (edges interpolated between 10 kHz steps).
    const points = frequencies(13.9, 14.5, 0.01).map((mhz) => ({ mhz, swr: 1 + 100 * (mhz - 14.15) ** 2 }));
    const [band] = compare(points, "radio-end");
    expect(band.bandwidth?.lowMHz).toBeCloseTo(14.05, 3);
    expect(band.bandwidth?.highMHz).toBeCloseTo(14.25, 3);
    expect(band.bandwidth?.widthKHz).toBeCloseTo(200, 0);
    expect(band.bandFits).toBe("no");
  });

  it("says the band fits when the whole band is swept under 2:1, and that it is not covered when the sweep stops inside it", () => {
    const wide = frequencies(13.9, 14.5, 0.01).map((mhz) => ({ mhz, swr: 1 + 4 * (mhz - 14.175) ** 2 }));
    expect(compare(wide, "radio-end")[0].bandFits).toBe("yes");
    const part = wide.filter((point) => point.mhz >= 14.1);
    expect(compare(part, "radio-end")[0].bandFits).toBe("not-covered");
  });
});

describe("trim advice from a measured sweep", () => {
  it("asks the engine's trim for 10.20 m resonant at 13.90 MHz and gets 9.985 m for 14.20 MHz by the rule, cutting half first", () => {
    // common practice: L_new = L × f_measured / f_target (reference-data.md §8 worked example: 10.20 m at 13.90 → 9.985 m at 14.20).
    const points = measured(frequencies(13.6, 14.4, 0.02).map((mhz) => ({ mhz, r: feedPoint(mhz, 13.9).re, x: feedPoint(mhz, 13.9).im })));
    const bands = compare(points, "feed-point");
    const request = trimRequestOf(dipole.request, dipole, bands, [10.2]);
    expect(request.ok).toBe(true);
    if (!request.ok) return;
    expect(request.input.measuredMHz[0]).toBeCloseTo(13.9, 9);
    const result = trim(request.input);
    expect(result.elements[0].ruleLengthM).toBeCloseTo(9.985, 3);
    expect(result.rule[0].count * result.rule[0].changeM).toBeCloseTo(-0.215, 3);
    expect(result.advice.join(" ")).toMatch(/Cut half the change first and measure again/);

    const outcome: TrimOutcome = { ok: true, result, builtLengthsM: [10.2], builtFrom: "uploader" };
    const [offset] = measuredOffsets(bands, outcome, false);
    expect(offset.offsetPercent).toBeCloseTo((13.9 / (result.elements[0].modelMHz as number) - 1) * 100, 9);
  });

  it("asks for every band of a fan dipole, as its elements pull on each other", () => {
    const fan = { ...dipole, elements: [...dipole.elements, { ...dipole.elements[0], band: "15m" }] };
    const bands = compare(measured(frequencies(13.6, 14.4, 0.02).map((mhz) => ({ mhz, r: feedPoint(mhz, 13.9).re, x: feedPoint(mhz, 13.9).im }))), "feed-point");
    const request = trimRequestOf(dipole.request, fan, bands, null);
    expect(request).toEqual({ ok: false, reason: expect.stringMatching(/^No resonance was found for 15m: sweep every band/) });
  });

  it("learns the shift from the plan as the offset when the antenna was cut to the plan and the engine gave no answer", () => {
    const points = measured(dipole.bands[0].sweep.map((point) => ({ mhz: point.mhz * 0.979, r: point.feed.r, x: point.feed.x })));
    const bands = compare(points, "feed-point");
    expect(measuredOffsets(bands, { ok: false, reason: "no engine" }, true)[0].offsetPercent).toBeCloseTo(-2.1, 3);
    expect(measuredOffsets(bands, { ok: false, reason: "no engine" }, false)).toEqual([]);
  });
});

describe("starting the next cut from the measured offset", () => {
  it("averages the antennas' offsets per band", () => {
    expect(meanOffsets([{ band: "20m", offsetPercent: -2.1 }, { band: "20m", offsetPercent: -1.5 }, { band: "40m", offsetPercent: 0.4 }])).toEqual([
      { band: "20m", meanPercent: expect.closeTo(-1.8, 9), samples: 2 },
      { band: "40m", meanPercent: 0.4, samples: 1 },
    ]);
  });

  it("shortens a dipole that came up 2.1 % low by 2.1 %, half from each leg", () => {
    // common practice: the length scales with 1/f (reference-data.md §8).
    const planned = dipole.elements[0].lengthM;
    const cut = nextCut(dipole.request, [{ band: "20m", lengthM: planned }], [{ band: "20m", meanPercent: -2.1, samples: 1 }]);
    expect(cut.elements[0].suggestedM).toBeCloseTo(planned * 0.979, 9);
    expect(cut.pieces).toHaveLength(1);
    expect(cut.pieces[0].count).toBe(2);
    expect(cut.pieces[0].changeM).toBeCloseTo((-0.021 * planned) / 2, 9);
  });
});
