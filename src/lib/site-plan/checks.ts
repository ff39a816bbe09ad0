/**
 * The site-plan checks: fall zones against power lines, RF exposure against the public,
 * harmonically related bands, and station-to-station separation. Pure: a layout in,
 * findings out, so the plan can show them as a coordinator drags a slot.
 * Screening only; local codes, permits and licensed practice prevail.
 */
import { wavelengthMetres } from "@/lib/antenna/physics";
import { pointToShapeDistance, segmentToSegmentDistance, shapeDistance } from "./geometry";
import { hazardShape, isPublicHazard, type Hazard } from "./hazards";
import type { Footprint } from "./footprint";


export interface BandRange {
  name: string;
  lowMHz: number;
  highMHz: number;
}

export interface StationForChecks {
  id: string;
  name: string;
  bands: BandRange[];
  footprint: Footprint;
}

export type FindingRule = "fall-zone-power-line" | "exposure-public" | "harmonic-bands" | "same-band" | "separation";

export interface Finding {
  rule: FindingRule;
  severity: "error" | "warning";
  /** The station slots the finding is about (one or two). */
  slotIds: string[];
  /** The hazard it is about, as an index into the site's hazards. */
  hazardIndex?: number;
  message: string;
  advice: string;
}

const metres = (value: number) => `${value.toFixed(1)} m`;

export function fallZoneFindings(station: StationForChecks, hazards: readonly Hazard[]): Finding[] {
  return hazards.flatMap((hazard, hazardIndex): Finding[] => {
    if (hazard.kind !== "power-line") return [];
    const gap = pointToShapeDistance(station.footprint.mast, hazardShape(hazard));
    if (gap > station.footprint.fallZoneRadiusM) return [];
    return [
      {
        rule: "fall-zone-power-line",
        severity: "error",
        slotIds: [station.id],
        hazardIndex,
        message: `${station.name}: the fall zone (${metres(station.footprint.fallZoneRadiusM)}) reaches the power line “${hazard.label}”, ${metres(gap)} from the mast.`,
        advice: `Move the mast at least ${metres(station.footprint.fallZoneRadiusM)} from the line, or lower it. Masts near power lines kill: never raise one where it could touch a line.`,
      },
    ];
  });
}

/**
 * The exposure distance is measured from the antenna's conductors (wires, radiator, radials),
 * not only the mast: the field is strongest along the wire, so the zone follows it and is a
 * circle only around a vertical.
 */
export function exposureFindings(station: StationForChecks, hazards: readonly Hazard[]): Finding[] {
  const limit = station.footprint.exposureDistanceM;
  return hazards.flatMap((hazard, hazardIndex): Finding[] => {
    if (!isPublicHazard(hazard)) return [];
    const gap = Math.min(...station.footprint.conductors.map((conductor) => shapeDistance({ points: [conductor.from, conductor.to], closed: false }, hazardShape(hazard))));
    if (gap >= limit) return [];
    return [
      {
        rule: "exposure-public",
        severity: "warning",
        slotIds: [station.id],
        hazardIndex,
        message: `${station.name}: “${hazard.label}” comes within ${metres(gap)} of the antenna, inside its RF-exposure distance of ${metres(limit)}.`,
        advice: "Keep the public outside the exposure distance with barriers and signs, move the antenna, or lower the power. Local rules prevail.",
      },
    ];
  });
}

/**
 * The harmonic number n ≥ 2 at which a multiple of the lower band lands in the higher one
 * (7 MHz: 14 at n = 2, 21 at n = 3, 28 at n = 4), or null when none does.
 */
export function harmonicNumber(lower: BandRange, higher: BandRange): number | null {
  for (let n = 2; n * lower.lowMHz <= higher.highMHz; n++) {
    if (n * lower.highMHz >= higher.lowMHz) return n;
  }
  return null;
}

const BAND_PASS_ADVICE =
  "Put a band-pass filter for its own band on each transmitter (typically 40–60 dB rejection of the other HF bands), add coaxial stubs where needed, and keep the antennas far apart, end-on and cross-polarized where you can (common practice).";

export function bandFindings(a: StationForChecks, b: StationForChecks): Finding[] {
  const findings: Finding[] = [];
  for (const bandA of a.bands) {
    for (const bandB of b.bands) {
      if (bandA.name === bandB.name) {
        findings.push({
          rule: "same-band",
          severity: "warning",
          slotIds: [a.id, b.id],
          message: `${a.name} and ${b.name} both use ${bandA.name}.`,
          advice: "A filter cannot separate two stations on one band: agree on frequencies far apart within the band, and give the antennas all the distance the site allows.",
        });
        continue;
      }
      const [lower, higher, lowerStation, higherStation] = bandA.lowMHz < bandB.lowMHz ? [bandA, bandB, a, b] : [bandB, bandA, b, a];
      const n = harmonicNumber(lower, higher);
      if (n === null) continue;
      findings.push({
        rule: "harmonic-bands",
        severity: "warning",
        slotIds: [a.id, b.id],
        message: `${lowerStation.name} on ${lower.name} and ${higherStation.name} on ${higher.name} are harmonically related (harmonic ${n} of ${lower.name} falls in ${higher.name}).`,
        advice: BAND_PASS_ADVICE,
      });
    }
  }
  return findings;
}

/**
 * Required antenna separation, common practice (reference-data.md §8: "separate antennas by
 * ≥ 1–2 λ of the lowest band where possible"). We take 1 λ of the lowest frequency either
 * station uses: coupling is strongest on the lower band, and between λ/2 dipoles 1 λ apart the
 * Friis estimate gives 20·log10(4π) − 2 × 2.15 ≈ 17.7 dB of isolation, which with a band-pass
 * filter's 40–60 dB on each transmitter reaches the usual 60–75 dB. The lower end of the
 * 1–2 λ range, because most club fields allow no more; it is a warning, not a ban.
 */
export function requiredSeparationM(a: readonly BandRange[], b: readonly BandRange[]): number {
  const lowestMHz = Math.min(...a.map((band) => band.lowMHz), ...b.map((band) => band.lowMHz));
  return wavelengthMetres(lowestMHz);
}

/** The shortest distance between any conductor of one antenna and any of the other. */
export function antennaGapM(a: Footprint, b: Footprint): number {
  let best = Infinity;
  for (const s of a.conductors) for (const t of b.conductors) best = Math.min(best, segmentToSegmentDistance(s, t));
  return best;
}

export function separationFindings(a: StationForChecks, b: StationForChecks): Finding[] {
  if (a.bands.length === 0 || b.bands.length === 0) return [];
  const required = requiredSeparationM(a.bands, b.bands);
  const gap = antennaGapM(a.footprint, b.footprint);
  if (gap >= required) return [];
  return [
    {
      rule: "separation",
      severity: "warning",
      slotIds: [a.id, b.id],
      message: `The antennas of ${a.name} and ${b.name} are ${metres(gap)} apart; at least ${metres(required)} (one wavelength on their lowest band) is advised.`,
      advice: `Move them apart where the site allows, place dipoles end-on to each other and cross-polarize where you can; ${BAND_PASS_ADVICE.charAt(0).toLowerCase()}${BAND_PASS_ADVICE.slice(1)}`,
    },
  ];
}

/** Every finding on a layout, errors first. */
export function checkSitePlan(hazards: readonly Hazard[], stations: readonly StationForChecks[]): Finding[] {
  const findings: Finding[] = [];
  for (const station of stations) findings.push(...fallZoneFindings(station, hazards), ...exposureFindings(station, hazards));
  for (let i = 0; i < stations.length; i++) {
    for (let j = i + 1; j < stations.length; j++) {
      findings.push(...bandFindings(stations[i], stations[j]), ...separationFindings(stations[i], stations[j]));
    }
  }
  return findings.sort((x, y) => (x.severity === y.severity ? 0 : x.severity === "error" ? -1 : 1));
}
