import { describe, expect, it } from "vitest";
import { plan } from "@/lib/antenna";
import { bookedFeedlineText, formatRunLength } from "@/lib/station-kits/booked-feedline";
import { runFigures, withFeedline } from "@/lib/station-kits/run-figures";

const dipole = {
  family: "dipole",
  band: "20m",
  region: 1,
  heightM: 10,
  wireDiameterMm: 2,
  ground: "average",
  feedline: { type: "rg8x", lengthM: 20 },
  transmitter: { powerW: 100, mode: "ssb" },
} as const;

describe("a coax run's figures from the engine's plan", () => {
  const request = withFeedline(dipole, { type: "rg213", lengthM: 30 });
  const result = plan(request);
  const figures = runFigures(result);

  it("computes the plan with the run instead of the slot's own line", () => {
    expect(request).toEqual({ ...dipole, feedline: { type: "rg213", lengthM: 30 } });
    expect(figures.feedline).toEqual({ type: "rg213", label: "RG-213", lengthM: 30 });
  });

  it("gives the run's matched loss as the handbook's cable figures", () => {
    const [band] = figures.bands;
    expect(band.band).toBe("20m");
    // Source: reference-data.md §5 (ARRL Antenna Book (recent editions), Transmission Lines chapter, from memory, ±20 %):
    // RG-213 loses about 0.6 dB per 100 ft at 10 MHz, growing as √f: 0.714 dB per 100 ft at 14.175 MHz,
    // so 30 m (98.4 ft) lose about 0.70 dB.
    expect(Math.abs(band.matchedLossDb - 0.703) / 0.703).toBeLessThan(0.2);
    // The fit itself: (0.586·√14.175 + 0.0111·14.175) dB per 100 m × 0.3 = 0.709 dB.
    expect(band.matchedLossDb).toBeCloseTo(0.709, 2);
  });

  it("adds the antenna's mismatch to the loss and reads the SWR at the radio across the band", () => {
    const [band] = figures.bands;
    const planBand = result.bands[0];
    // Source: ARRL Antenna Book (recent editions), Transmission Lines chapter: a mismatched line loses more than a matched one.
    expect(band.totalLossDb).toBeGreaterThanOrEqual(band.matchedLossDb);
    expect(band.totalLossDb).toBe(planBand.loss.totalDb);
    expect(band.swrAtRadio).toBe(planBand.swrAtCentre.radio);
    expect(band.worstSwrAtRadio).toBeGreaterThanOrEqual(band.swrAtRadio);
    expect(band.fitsUnder2to1).toBe(band.worstSwrAtRadio <= 2);
  });
});

describe("the booked feedline's words", () => {
  it("names the item, its cable type and its length", () => {
    const run = { labelCode: "CX-13", name: "RG-213 run, 35 m", cableType: "rg213", lengthM: 35 } as const;
    expect(bookedFeedlineText(run, "metric")).toBe("CX-13 RG-213 run, 35 m, RG-213, 35 m");
    // Source: the international foot, 0.3048 m exactly (international yard and pound agreement, 1959): 35 m is 114.8 ft.
    expect(bookedFeedlineText(run, "imperial")).toBe("CX-13 RG-213 run, 35 m, RG-213, 115 ft");
    expect(formatRunLength(12.5, "metric")).toBe("12.5 m");
  });
});
