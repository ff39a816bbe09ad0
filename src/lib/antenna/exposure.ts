/**
 * RF-exposure screening distances by the far-field method (FCC OET Bulletin 65 and
 * its Supplement B), against 47 CFR 1.1310 Table 1 and the ICNIRP 2020
 * general-public reference levels (reference-data.md §6).
 *
 * R = √(F·EIRP / (4π·S_lim)), with F = 2.56 for a ground reflection that can
 * raise the field by 1.6. Average power = PEP × mode duty factor × transmit-time
 * fraction. Feedline loss is not subtracted, which errs on the safe side.
 */

/** Free-space wave impedance μ0·c (CODATA 2022), used to turn a field limit into a power density. */
export const FREE_SPACE_IMPEDANCE_OHMS = 376.730313412;
const SPEED_OF_LIGHT = 299_792_458;

/** Power-density factor for a ground reflection that adds 60 % to the field (1.6² = 2.56). */
export const GROUND_REFLECTION_FACTOR = 2.56;

export type OperatingMode = "ssb" | "cw" | "fm" | "digital" | "am" | "carrier";

export interface ModeDuty {
  mode: OperatingMode;
  label: string;
  dutyFactor: number;
  /** The transmit-time fraction when the plan gives none: worst case 1, unless the mode itself forbids it. */
  defaultTransmitTimeFraction: number;
  note: string;
}

export const MODE_DUTY: Record<OperatingMode, ModeDuty> = {
  ssb: {
    mode: "ssb",
    label: "SSB (conversational)",
    dutyFactor: 0.2,
    defaultTransmitTimeFraction: 1,
    note: "20 % for conversational SSB, 40 % with heavy speech processing (OET Bulletin 65 Supplement B, from memory).",
  },
  cw: {
    mode: "cw",
    label: "CW (conversational)",
    dutyFactor: 0.4,
    defaultTransmitTimeFraction: 1,
    note: "40 % for conversational CW (OET Bulletin 65 Supplement B, from memory).",
  },
  fm: {
    mode: "fm",
    label: "FM",
    dutyFactor: 1,
    defaultTransmitTimeFraction: 1,
    note: "Constant envelope: 100 % while transmitting (OET Bulletin 65 Supplement B, from memory).",
  },
  digital: {
    mode: "digital",
    label: "Digital, 15 s transmit/receive cycles",
    dutyFactor: 1,
    defaultTransmitTimeFraction: 0.5,
    note: "Constant envelope: 100 % while transmitting; alternate 15 s cycles limit transmitting to half the time (common practice).",
  },
  am: {
    mode: "am",
    label: "AM (full carrier)",
    dutyFactor: 0.5,
    defaultTransmitTimeFraction: 1,
    note: "About 50 % for full-carrier AM (OET Bulletin 65 Supplement B, from memory, lower confidence).",
  },
  carrier: {
    mode: "carrier",
    label: "Carrier (tune-up)",
    dutyFactor: 1,
    defaultTransmitTimeFraction: 1,
    note: "A steady carrier is 100 %.",
  },
};

export type ExposureLimitId = "fcc-controlled" | "fcc-uncontrolled" | "icnirp-2020-public";

export interface ExposureLimit {
  id: ExposureLimitId;
  label: string;
  /** Averaging time of the limit in minutes. */
  averagingMinutes: number;
  /** The power-density limit (or plane-wave equivalent) in W/m², or undefined outside the limit's range. */
  powerDensityWm2(mhz: number): number | undefined;
}

const MW_PER_CM2 = 10; // 1 mW/cm² = 10 W/m²

/** 47 CFR 1.1310 Table 1 (A), occupational/controlled exposure. */
function fccControlled(mhz: number): number | undefined {
  if (mhz < 0.3 || mhz > 100_000) return undefined;
  if (mhz <= 3) return 100 * MW_PER_CM2;
  if (mhz <= 30) return (900 / mhz ** 2) * MW_PER_CM2;
  if (mhz <= 300) return 1 * MW_PER_CM2;
  if (mhz <= 1500) return (mhz / 300) * MW_PER_CM2;
  return 5 * MW_PER_CM2;
}

/** 47 CFR 1.1310 Table 1 (B), general population/uncontrolled exposure. */
function fccUncontrolled(mhz: number): number | undefined {
  if (mhz < 0.3 || mhz > 100_000) return undefined;
  if (mhz <= 1.34) return 100 * MW_PER_CM2;
  if (mhz <= 30) return (180 / mhz ** 2) * MW_PER_CM2;
  if (mhz <= 300) return 0.2 * MW_PER_CM2;
  if (mhz <= 1500) return (mhz / 1500) * MW_PER_CM2;
  return 1 * MW_PER_CM2;
}

/**
 * ICNIRP 2020 general public, whole body, 30 min (Table 5, from memory). Below
 * 30 MHz only E and H levels exist: both must be met, so the plane-wave
 * equivalent is the smaller of E²/Z0 and H²·Z0.
 */
function icnirpPublic(mhz: number): number | undefined {
  const z0 = FREE_SPACE_IMPEDANCE_OHMS;
  if (mhz < 0.1 || mhz > 2000) return undefined;
  if (mhz <= 30) return Math.min((300 / mhz ** 0.7) ** 2 / z0, (2.2 / mhz) ** 2 * z0);
  if (mhz <= 400) return 2;
  return mhz / 200;
}

export const EXPOSURE_LIMITS: readonly ExposureLimit[] = [
  {
    id: "fcc-uncontrolled",
    label: "47 CFR 1.1310, general population/uncontrolled (neighbours, the public)",
    averagingMinutes: 30,
    powerDensityWm2: fccUncontrolled,
  },
  {
    id: "fcc-controlled",
    label: "47 CFR 1.1310, occupational/controlled (the licensee and those who know of the exposure)",
    averagingMinutes: 6,
    powerDensityWm2: fccControlled,
  },
  {
    id: "icnirp-2020-public",
    label: "ICNIRP 2020, general public (whole body)",
    averagingMinutes: 30,
    powerDensityWm2: icnirpPublic,
  },
];

export interface ExposureRequest {
  mhz: number;
  /** Peak envelope power at the antenna, watts. */
  pepW: number;
  mode: OperatingMode;
  /** Antenna gain in dBi (a half-wave dipole is 2.15 dBi). */
  gainDbi: number;
  /** Fraction of the averaging time spent transmitting; the mode's default when absent. */
  transmitTimeFraction?: number;
}

export interface ExposureDistance {
  limit: ExposureLimitId;
  label: string;
  averagingMinutes: number;
  powerDensityLimitWm2: number;
  /** Minimum distance with the 2.56 ground-reflection factor: the figure to use. */
  distanceM: number;
  /** The same without the ground factor, for comparison. */
  freeSpaceDistanceM: number;
}

export interface ExposureResult {
  mhz: number;
  dutyFactor: number;
  transmitTimeFraction: number;
  averagePowerW: number;
  eirpW: number;
  groundReflectionFactor: number;
  distances: ExposureDistance[];
  /** λ/2π: closer than this is the reactive near field, where the far-field formula is unreliable. */
  reactiveNearFieldM: number;
  cautions: string[];
}

/** R = √(F·EIRP / (4π·S)). */
export function minimumDistanceM(eirpW: number, powerDensityLimitWm2: number, factor: number): number {
  return Math.sqrt((factor * eirpW) / (4 * Math.PI * powerDensityLimitWm2));
}

export function exposureDistances(request: ExposureRequest): ExposureResult {
  const duty = MODE_DUTY[request.mode];
  const transmitTimeFraction = request.transmitTimeFraction ?? duty.defaultTransmitTimeFraction;
  const averagePowerW = request.pepW * duty.dutyFactor * transmitTimeFraction;
  const eirpW = averagePowerW * 10 ** (request.gainDbi / 10);
  const distances = EXPOSURE_LIMITS.flatMap((limit): ExposureDistance[] => {
    const powerDensityLimitWm2 = limit.powerDensityWm2(request.mhz);
    if (powerDensityLimitWm2 === undefined) return [];
    return [
      {
        limit: limit.id,
        label: limit.label,
        averagingMinutes: limit.averagingMinutes,
        powerDensityLimitWm2,
        distanceM: minimumDistanceM(eirpW, powerDensityLimitWm2, GROUND_REFLECTION_FACTOR),
        freeSpaceDistanceM: minimumDistanceM(eirpW, powerDensityLimitWm2, 1),
      },
    ];
  });
  const reactiveNearFieldM = SPEED_OF_LIGHT / (request.mhz * 1e6) / (2 * Math.PI);
  const cautions = [
    "These distances come from a far-field formula: treat them as screening numbers, not measurements.",
    ...(distances.some((distance) => distance.distanceM < reactiveNearFieldM)
      ? [
          `Every distance closer than λ/2π = ${reactiveNearFieldM.toFixed(1)} m lies in the reactive near field, where the far-field formula can under- or over-predict the field: keep people well beyond it where you can.`,
        ]
      : []),
    `Average power assumes the mode's duty factor (${duty.note}) and transmitting ${Math.round(transmitTimeFraction * 100)} % of the averaging time; feedline loss is not subtracted.`,
    "Neighbours and the public fall under the general-population limit; the licensee and their household may be evaluated against the controlled limit.",
    "Keep the public outside the larger distance with barriers and signs. Local rules prevail.",
  ];
  if (distances.length < EXPOSURE_LIMITS.length) {
    cautions.push(`Some limits do not cover ${request.mhz} MHz; those distances are left out.`);
  }
  return {
    mhz: request.mhz,
    dutyFactor: duty.dutyFactor,
    transmitTimeFraction,
    averagePowerW,
    eirpW,
    groundReflectionFactor: GROUND_REFLECTION_FACTOR,
    distances,
    reactiveNearFieldM,
    cautions,
  };
}
