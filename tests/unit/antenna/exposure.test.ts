import { describe, expect, it } from "vitest";
import { FREE_SPACE_IMPEDANCE_OHMS, exposureDistances, type ExposureRequest } from "@/lib/antenna/exposure";

const DIPOLE_DBI = 10 * Math.log10(1.641);
const EXAMPLE: ExposureRequest = { mhz: 14.0, pepW: 100, mode: "ssb", gainDbi: DIPOLE_DBI, transmitTimeFraction: 1 };

function distance(request: ExposureRequest, limit: string) {
  const found = exposureDistances(request).distances.find((d) => d.limit === limit);
  if (!found) throw new Error(`no ${limit}`);
  return found;
}

describe("RF-exposure worked example: 100 W PEP SSB into a dipole on 14.0 MHz", () => {
  // Source: FCC OET Bulletin 65, Ed. 97-01 (Aug 1997), and its Supplement B (amateur stations), Ed. 97-01 (Nov 1997) — method and duty factors from memory; worked numbers computed
  it("averages 20 W and radiates 32.8 W EIRP", () => {
    const result = exposureDistances(EXAMPLE);
    expect(result.averagePowerW).toBeCloseTo(20, 9);
    expect(result.eirpW).toBeCloseTo(32.8, 1);
  });

  // Source: 47 CFR 1.1310 Table 1 (78 FR 33650, 2013; page notes the 85 FR 18145 amendment of 2020)
  it("uncontrolled limit 180/f² = 9.18 W/m²: 0.85 m with the ground factor, 0.53 m without", () => {
    const d = distance(EXAMPLE, "fcc-uncontrolled");
    expect(d.powerDensityLimitWm2).toBeCloseTo(9.18, 2);
    expect(d.distanceM).toBeCloseTo(0.85, 2);
    expect(d.freeSpaceDistanceM).toBeCloseTo(0.53, 2);
  });

  // Source: 47 CFR 1.1310 Table 1 (78 FR 33650, 2013; page notes the 85 FR 18145 amendment of 2020)
  it("controlled limit 900/f² = 45.9 W/m²: 0.38 m with the ground factor, 0.24 m without", () => {
    const d = distance(EXAMPLE, "fcc-controlled");
    expect(d.powerDensityLimitWm2).toBeCloseTo(45.9, 1);
    expect(d.distanceM).toBeCloseTo(0.38, 2);
    expect(d.freeSpaceDistanceM).toBeCloseTo(0.24, 2);
  });

  // Source: ICNIRP (2020) guidelines, Health Phys. 118(5):483–524 — Table 5 from memory
  it("ICNIRP 2020 general public, E = 47.3 V/m → 5.94 W/m²: 1.06 m with the ground factor, 0.66 m without", () => {
    const d = distance(EXAMPLE, "icnirp-2020-public");
    expect(Math.sqrt(d.powerDensityLimitWm2 * FREE_SPACE_IMPEDANCE_OHMS)).toBeCloseTo(47.3, 1);
    expect(d.powerDensityLimitWm2).toBeCloseTo(5.94, 2);
    expect(d.distanceM).toBeCloseTo(1.06, 2);
    expect(d.freeSpaceDistanceM).toBeCloseTo(0.66, 2);
  });

  // Source: FCC OET Bulletin 65, Ed. 97-01 (Aug 1997), and its Supplement B (amateur stations), Ed. 97-01 (Nov 1997) — duty factors from memory
  it.each([
    ["SSB, 50 % transmit time", { transmitTimeFraction: 0.5 }, 0.6],
    ["CW 40 %", { mode: "cw" }, 1.21],
    ["FM 100 %", { mode: "fm" }, 1.91],
    ["digital 100 %, transmitting all the time", { mode: "digital", transmitTimeFraction: 1 }, 1.91],
  ] as const)("variant %s: %f m (uncontrolled, ground factor)", (_name, change, expected) => {
    expect(distance({ ...EXAMPLE, ...change }, "fcc-uncontrolled").distanceM).toBeCloseTo(expected, 2);
  });

  it("digital with 15 s transmit/receive cycles defaults to half the time (common practice)", () => {
    // common practice
    const result = exposureDistances({ mhz: 14, pepW: 100, mode: "digital", gainDbi: DIPOLE_DBI });
    expect(result.transmitTimeFraction).toBe(0.5);
    expect(distance({ ...EXAMPLE, mode: "digital", transmitTimeFraction: undefined }, "fcc-uncontrolled").distanceM)
      .toBeCloseTo(1.91 / Math.SQRT2, 2);
  });

  it("warns that every distance is inside the reactive near field, λ/2π = 3.41 m", () => {
    // Source: FCC OET Bulletin 65, Ed. 97-01 (Aug 1997), and its Supplement B (amateur stations), Ed. 97-01 (Nov 1997) — near-field caution from memory
    const result = exposureDistances(EXAMPLE);
    expect(result.reactiveNearFieldM).toBeCloseTo(3.41, 2);
    expect(result.cautions.join(" ")).toMatch(/reactive near field/);
    expect(result.cautions.join(" ")).toMatch(/Local rules prevail/);
  });
});

describe("limit table edges", () => {
  // Source: 47 CFR 1.1310 Table 1 (78 FR 33650, 2013; page notes the 85 FR 18145 amendment of 2020)
  it("uses the flat VHF limits and the f/300, f/1500 UHF limits", () => {
    const vhf = { ...EXAMPLE, mhz: 145 };
    expect(distance(vhf, "fcc-controlled").powerDensityLimitWm2).toBeCloseTo(10, 9);
    expect(distance(vhf, "fcc-uncontrolled").powerDensityLimitWm2).toBeCloseTo(2, 9);
    const uhf = { ...EXAMPLE, mhz: 435 };
    expect(distance(uhf, "fcc-controlled").powerDensityLimitWm2).toBeCloseTo(14.5, 9);
    expect(distance(uhf, "fcc-uncontrolled").powerDensityLimitWm2).toBeCloseTo(2.9, 9);
  });

  it("uses the flat 100 mW/cm² below 1.34 MHz (uncontrolled) and 3 MHz (controlled)", () => {
    // Source: 47 CFR 1.1310 Table 1 (78 FR 33650, 2013; page notes the 85 FR 18145 amendment of 2020)
    const mf = { ...EXAMPLE, mhz: 0.475 };
    expect(distance(mf, "fcc-uncontrolled").powerDensityLimitWm2).toBe(1000);
    expect(distance({ ...EXAMPLE, mhz: 1.9 }, "fcc-controlled").powerDensityLimitWm2).toBe(1000);
    expect(distance({ ...EXAMPLE, mhz: 1.9 }, "fcc-uncontrolled").powerDensityLimitWm2).toBeCloseTo(1800 / 1.9 ** 2, 9);
  });

  it("leaves out the FCC limits below 0.3 MHz and says so", () => {
    // Source: 47 CFR 1.1310 Table 1 (78 FR 33650, 2013; page notes the 85 FR 18145 amendment of 2020)
    const result = exposureDistances({ ...EXAMPLE, mhz: 0.1365 });
    expect(result.distances.map((d) => d.limit)).toEqual(["icnirp-2020-public"]);
    expect(result.cautions.join(" ")).toMatch(/do not cover/);
  });
});
