// The site-plan checks on constructed layouts. Band edges are ITU Region 1's.
// Source: ITU Radio Regulations, Art. 5 (Table of Frequency Allocations), via reference-data.md §1.
import { describe, expect, it } from "vitest";
import { bandByName } from "@/lib/antenna/bands";
import { antennaGapM, checkSitePlan, harmonicNumber, requiredSeparationM, type BandRange, type StationForChecks } from "@/lib/site-plan/checks";
import { footprint, summariseOutline, type AntennaOutline } from "@/lib/site-plan/footprint";
import type { Point } from "@/lib/site-plan/geometry";
import type { Hazard } from "@/lib/site-plan/hazards";

const band = (name: string): BandRange => {
  const found = bandByName(name, 1)!;
  return { name: found.name, lowMHz: found.lowMHz, highMHz: found.highMHz };
};

/** A flat-top dipole outline: two arms of `armM` along the wire direction. */
const dipole = (mastHeightM: number, armM: number, exposureDistanceM = 1): AntennaOutline => ({
  family: "dipole",
  familyLabel: "Dipole",
  feedHeightM: mastHeightM,
  mastHeightM,
  arms: [
    { offsetDeg: 0, lengthM: armM },
    { offsetDeg: 180, lengthM: armM },
  ],
  exposureDistanceM,
});

function station(id: string, bands: string[], outline: AntennaOutline, position: Point, azimuthDeg = 0): StationForChecks {
  return { id, name: `Station ${id}`, bands: bands.map(band), footprint: footprint(summariseOutline(outline), { position, azimuthDeg }) };
}

const powerLine = (x: number): Hazard => ({ kind: "power-line", label: "Line", points: [[x, 0], [x, 200]], heightM: 9 });

describe("harmonically related bands", () => {
  // common practice (reference-data.md §8): avoid co-siting harmonically related bands (80/40/20/10).
  it("finds 7 MHz against 14, 21 and 28 MHz at harmonics 2, 3 and 4", () => {
    expect(harmonicNumber(band("40m"), band("20m"))).toBe(2);
    expect(harmonicNumber(band("40m"), band("15m"))).toBe(3);
    expect(harmonicNumber(band("40m"), band("10m"))).toBe(4);
  });

  it("finds 80/40, 20/10 and 2 m against 70 cm (3 × 144–146 = 432–438 MHz)", () => {
    expect(harmonicNumber(band("80m"), band("40m"))).toBe(2);
    expect(harmonicNumber(band("20m"), band("10m"))).toBe(2);
    expect(harmonicNumber(band("2m"), band("70cm"))).toBe(3);
  });

  it("leaves unrelated bands alone (30 m doubled is 20.2 MHz; 20 m against 15 m is 1.5 ×)", () => {
    expect(harmonicNumber(band("30m"), band("20m"))).toBeNull();
    expect(harmonicNumber(band("30m"), band("17m"))).toBeNull();
    expect(harmonicNumber(band("20m"), band("15m"))).toBeNull();
    expect(harmonicNumber(band("15m"), band("10m"))).toBeNull();
  });

  it("warns about a 40 m station beside a 20 m station, with band-pass filter advice", () => {
    const findings = checkSitePlan([], [station("a", ["40m"], dipole(10, 10), [20, 50]), station("b", ["20m"], dipole(10, 5), [200, 50])]);
    const harmonic = findings.filter((finding) => finding.rule === "harmonic-bands");
    expect(harmonic).toHaveLength(1);
    expect(harmonic[0]).toMatchObject({ severity: "warning", slotIds: ["a", "b"] });
    expect(harmonic[0].message).toMatch(/harmonic 2 of 40m falls in 20m/);
    expect(harmonic[0].advice).toMatch(/band-pass filter/);
  });

  it("warns once per related pair of a multi-band station (40 m against 20 and 15 m)", () => {
    const findings = checkSitePlan([], [station("a", ["40m"], dipole(10, 10), [20, 50]), station("b", ["20m", "15m", "17m"], dipole(10, 5), [200, 50])]);
    expect(findings.filter((finding) => finding.rule === "harmonic-bands").map((finding) => finding.message)).toEqual([
      expect.stringMatching(/harmonic 2 of 40m falls in 20m/),
      expect.stringMatching(/harmonic 3 of 40m falls in 15m/),
    ]);
  });

  it("warns that two stations on one band cannot be separated by a filter", () => {
    const findings = checkSitePlan([], [station("a", ["20m"], dipole(10, 5), [20, 50]), station("b", ["20m"], dipole(10, 5), [200, 50])]);
    expect(findings.find((finding) => finding.rule === "same-band")?.advice).toMatch(/filter cannot/);
  });
});

describe("fall zone against a power line", () => {
  // common practice (reference-data.md §8): keep the line at least mast height + the longest wire
  // reach away, never less than height + 3 m; for comparison only, MSHA 30 CFR 77.807-2 keeps masts
  // 10 ft (3.05 m) from energized lines below 69 kV.
  it("is an error when the line lies inside mast height + wire reach (10 m mast, 10 m arms: 20 m)", () => {
    const mast = station("a", ["40m"], dipole(10, 10), [50, 50], 0);
    expect(mast.footprint.fallZoneRadiusM).toBe(20);
    const findings = checkSitePlan([powerLine(65)], [mast]);
    expect(findings).toHaveLength(1);
    expect(findings[0]).toMatchObject({ rule: "fall-zone-power-line", severity: "error", slotIds: ["a"], hazardIndex: 0 });
    expect(findings[0].message).toMatch(/15\.0 m from the mast/);
  });

  it("counts the line's nearest point, not its vertices (a line passing diagonally)", () => {
    const mast = station("a", ["40m"], dipole(10, 10), [50, 50]);
    const diagonal: Hazard = { kind: "power-line", label: "Diagonal", points: [[0, 120], [120, 0]], heightM: 9 };
    // distance from (50, 50) to x + y = 120 is 20/√2 = 14.1 m
    expect(checkSitePlan([diagonal], [mast])[0]?.message).toMatch(/14\.1 m from the mast/);
  });

  it("is clear once the line is beyond the fall zone", () => {
    expect(checkSitePlan([powerLine(71)], [station("a", ["40m"], dipole(10, 10), [50, 50])])).toEqual([]);
  });

  it("never uses less than height + 3 m, even for an antenna with short arms", () => {
    const short: AntennaOutline = { ...dipole(8, 1), arms: [{ offsetDeg: 0, lengthM: 1 }] };
    const mast = station("a", ["2m"], short, [50, 50]);
    expect(mast.footprint.fallZoneRadiusM).toBe(11);
    expect(checkSitePlan([powerLine(60.5)], [mast])).toHaveLength(1);
    expect(checkSitePlan([powerLine(61.5)], [mast])).toHaveLength(0);
  });

  it("ignores paths, trees and buildings for the fall-zone error", () => {
    const mast = station("a", ["40m"], dipole(10, 10), [50, 50]);
    const hazards: Hazard[] = [
      { kind: "tree", label: "Oak", points: [[55, 50]], heightM: 15 },
      { kind: "building", label: "Hut", points: [[60, 40], [70, 40], [70, 60], [60, 60]], heightM: 4 },
    ];
    expect(checkSitePlan(hazards, [mast]).filter((finding) => finding.severity === "error")).toEqual([]);
  });
});

describe("RF exposure against the public", () => {
  // Source: FCC OET Bulletin 65, Ed. 97-01, Supplement B, with 47 CFR 1.1310 Table 1 (reference-data.md §6,
  // computed worked example): 100 W FM on 14 MHz into a dipole, 1.91 m with the ground factor.
  const exposureM = 1.91;

  it("warns when a path passes within the exposure distance of a wire end", () => {
    // The wire runs north 10 m from (50, 50); a path crosses 1 m beyond its north end.
    const path: Hazard = { kind: "path", label: "Footpath", points: [[0, 61], [100, 61]] };
    const findings = checkSitePlan([path], [station("a", ["20m"], dipole(10, 10, exposureM), [50, 50])]);
    expect(findings).toHaveLength(1);
    expect(findings[0]).toMatchObject({ rule: "exposure-public", severity: "warning", hazardIndex: 0 });
    expect(findings[0].message).toMatch(/within 1\.0 m of the antenna/);
  });

  it("warns when the antenna stands inside a public area", () => {
    const lawn: Hazard = { kind: "public-area", label: "Picnic lawn", points: [[30, 30], [90, 30], [90, 90], [30, 90]] };
    expect(checkSitePlan([lawn], [station("a", ["20m"], dipole(10, 10, exposureM), [50, 50])])[0]?.rule).toBe("exposure-public");
  });

  it("is clear when the public stays beyond the distance", () => {
    const path: Hazard = { kind: "path", label: "Footpath", points: [[0, 63], [100, 63]] };
    expect(checkSitePlan([path], [station("a", ["20m"], dipole(10, 10, exposureM), [50, 50])])).toEqual([]);
  });
});

describe("station-to-station separation", () => {
  // common practice (reference-data.md §8): separate antennas by ≥ 1–2 λ of the lowest band; Guyline
  // warns below 1 λ at the lowest frequency either station uses.
  it("asks for one wavelength at the lowest band edge: 21.4 m on 20 m, 42.8 m on 40 m", () => {
    expect(requiredSeparationM([band("20m")], [band("20m")])).toBeCloseTo(21.41, 2);
    expect(requiredSeparationM([band("40m")], [band("20m"), band("15m")])).toBeCloseTo(42.83, 2);
  });

  it("measures between the nearest conductors: end-on dipoles are as far apart as their wire ends", () => {
    const a = station("a", ["20m"], dipole(10, 5), [50, 20], 0);
    const b = station("b", ["20m"], dipole(10, 5), [50, 45], 0);
    expect(antennaGapM(a.footprint, b.footprint)).toBeCloseTo(15, 6);
  });

  it("warns below one wavelength and is clear beyond it", () => {
    const near = checkSitePlan([], [station("a", ["20m"], dipole(10, 5), [50, 20], 90), station("b", ["17m"], dipole(10, 4), [50, 35], 90)]);
    expect(near.map((finding) => finding.rule)).toEqual(["separation"]);
    expect(near[0].message).toMatch(/15\.0 m apart; at least 21\.4 m/);
    const far = checkSitePlan([], [station("a", ["20m"], dipole(10, 5), [50, 20], 90), station("b", ["17m"], dipole(10, 4), [50, 45], 90)]);
    expect(far).toEqual([]);
  });
});

describe("the list of findings", () => {
  it("puts errors before warnings", () => {
    const findings = checkSitePlan([powerLine(60)], [station("a", ["40m"], dipole(10, 10), [50, 50]), station("b", ["20m"], dipole(10, 5), [20, 80])]);
    expect(findings.map((finding) => finding.rule)).toEqual(["fall-zone-power-line", "harmonic-bands", "separation"]);
    expect(findings.slice(1).every((finding) => finding.severity === "warning")).toBe(true);
  });
});
