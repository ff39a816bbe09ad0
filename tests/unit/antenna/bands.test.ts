import { describe, expect, it } from "vitest";
import { bandAt, bandByName, bandCentreMHz, bandsForRegion } from "@/lib/antenna/bands";

const RR = "ITU Radio Regulations, Art. 5 (Table of Frequency Allocations, 2020 ed., includes WRC-15/-19)";

function edges(name: string, region: 1 | 2 | 3) {
  const band = bandByName(name, region);
  return band ? [band.lowMHz, band.highMHz] : undefined;
}

describe("band edges per ITU Region", () => {
  // Source: ITU Radio Regulations, Art. 5 (Table of Frequency Allocations, 2020 ed., includes WRC-15/-19)
  it.each([
    ["160m", 1, [1.81, 1.85]],
    ["160m", 2, [1.8, 2.0]],
    ["160m", 3, [1.8, 2.0]],
    ["80m", 1, [3.5, 3.8]],
    ["80m", 2, [3.5, 4.0]],
    ["80m", 3, [3.5, 3.9]],
    ["60m", 1, [5.3515, 5.3665]],
    ["60m", 3, [5.3515, 5.3665]],
    ["40m", 1, [7.0, 7.2]],
    ["40m", 2, [7.0, 7.3]],
    ["40m", 3, [7.0, 7.2]],
    ["30m", 2, [10.1, 10.15]],
    ["20m", 1, [14.0, 14.35]],
    ["17m", 3, [18.068, 18.168]],
    ["15m", 2, [21.0, 21.45]],
    ["12m", 1, [24.89, 24.99]],
    ["10m", 3, [28.0, 29.7]],
    ["6m", 1, [50, 52]],
    ["6m", 2, [50, 54]],
    ["2m", 1, [144, 146]],
    ["2m", 2, [144, 148]],
    ["2m", 3, [144, 148]],
    ["70cm", 1, [430, 440]],
    ["2200m", 2, [0.1357, 0.1378]],
    ["630m", 1, [0.472, 0.479]],
  ] as const)(`${RR}: %s in Region %i`, (name, region, expected) => {
    expect(edges(name, region)).toEqual(expected);
  });

  it("has no 1.25 m band outside Region 2 (ITU Radio Regulations, Art. 5; the Region 2 edges are from memory)", () => {
    // Source: ITU Radio Regulations, Art. 5 (Table of Frequency Allocations, 2020 ed., includes WRC-15/-19)
    expect(bandByName("1.25m", 1)).toBeUndefined();
    expect(bandByName("1.25m", 3)).toBeUndefined();
    // from memory
    expect(bandByName("1.25m", 2)).toMatchObject({ lowMHz: 220, highMHz: 225, fromMemory: true });
  });

  it("marks the secondary allocations", () => {
    // Source: ITU Radio Regulations, Art. 5 (Table of Frequency Allocations, 2020 ed., includes WRC-15/-19)
    expect(bandByName("30m", 1)?.status).toBe("secondary");
    expect(bandByName("60m", 2)?.status).toBe("secondary");
    expect(bandByName("6m", 1)?.status).toBe("secondary");
    // from memory: primary/secondary status is recalled unless reference-data.md §1 marks it verified
    expect(bandByName("6m", 2)?.status).toBe("primary");
  });
});

describe("band lookup", () => {
  it("finds a band by a frequency inside it, per region", () => {
    // Source: ITU Radio Regulations, Art. 5 (Table of Frequency Allocations, 2020 ed., includes WRC-15/-19)
    expect(bandAt(7.25, 2)?.name).toBe("40m");
    expect(bandAt(7.25, 1)).toBeUndefined();
    expect(bandAt(3.85, 3)?.name).toBe("80m");
    expect(bandAt(3.85, 1)).toBeUndefined();
    expect(bandAt(14.35, 1)?.name).toBe("20m");
    expect(bandAt(14.351, 1)).toBeUndefined();
  });

  it("accepts names with a space or in capitals", () => {
    expect(bandByName("20 m", 1)?.name).toBe("20m");
    expect(bandByName("70CM", 3)?.name).toBe("70cm");
    expect(bandByName("11m", 1)).toBeUndefined();
  });

  it("gives the arithmetic centre", () => {
    // Source: ITU Radio Regulations, Art. 5 (Table of Frequency Allocations, 2020 ed., includes WRC-15/-19): 20 m is
    // 14.000–14.350 MHz, so its centre is 14.175 MHz.
    const band = bandByName("20m", 1);
    expect(band && bandCentreMHz(band)).toBeCloseTo(14.175, 6);
  });

  it("lists bands from the lowest frequency up", () => {
    // Source: ITU Radio Regulations, Art. 5 (Table of Frequency Allocations, 2020 ed., includes WRC-15/-19), as tabled in
    // reference-data.md §1: 2200 m to 70 cm is 16 bands in Region 2; Region 1 has no 1.25 m band (Region 2's 1.25 m
    // edges are from memory).
    const lows = bandsForRegion(2).map((band) => band.lowMHz);
    expect(lows).toEqual([...lows].sort((a, b) => a - b));
    expect(bandsForRegion(2)).toHaveLength(16);
    expect(bandsForRegion(1)).toHaveLength(15);
  });
});
