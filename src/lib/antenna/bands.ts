/**
 * Amateur band edges per ITU Region (ITU Radio Regulations, Art. 5), 2200 m to 70 cm.
 * Edges are in MHz. `fromMemory` marks an allocation or status recalled but not
 * checked against a published copy (reference-data.md §1 tags it [M]).
 */

export type ItuRegion = 1 | 2 | 3;

export const ITU_REGIONS: readonly ItuRegion[] = [1, 2, 3];

export type AllocationStatus = "primary" | "secondary";

export interface Band {
  /** Name the way amateurs say it: "20m", "70cm". */
  name: string;
  region: ItuRegion;
  lowMHz: number;
  highMHz: number;
  status: AllocationStatus;
  /** True where the edges or the status are recalled, not verified. */
  fromMemory: boolean;
  note?: string;
}

interface Allocation {
  lowMHz: number;
  highMHz: number;
  status: AllocationStatus;
  fromMemory?: boolean;
  note?: string;
}

type BandRow = { name: string } & Partial<Record<ItuRegion, Allocation>>;

function everyRegion(allocation: Allocation): Record<ItuRegion, Allocation> {
  return { 1: allocation, 2: allocation, 3: allocation };
}

const BAND_ROWS: BandRow[] = [
  {
    name: "2200m",
    ...everyRegion({ lowMHz: 0.1357, highMHz: 0.1378, status: "secondary", note: "1 W EIRP at most (RR 5.67A)." }),
  },
  {
    name: "630m",
    ...everyRegion({
      lowMHz: 0.472,
      highMHz: 0.479,
      status: "secondary",
      fromMemory: true,
      note: "1 W EIRP at most (RR 5.80A); not every administration allows it.",
    }),
  },
  {
    name: "160m",
    1: {
      lowMHz: 1.81,
      highMHz: 1.85,
      status: "primary",
      note: "RR 5.96 lets listed countries give up to 200 kHz within 1715–1800 and 1850–2000 kHz.",
    },
    2: { lowMHz: 1.8, highMHz: 2.0, status: "primary", note: "1850–2000 kHz is shared with other services." },
    3: { lowMHz: 1.8, highMHz: 2.0, status: "primary", note: "Shared with other services." },
  },
  {
    name: "80m",
    1: { lowMHz: 3.5, highMHz: 3.8, status: "primary", note: "Shared with the fixed and mobile services." },
    2: { lowMHz: 3.5, highMHz: 4.0, status: "primary", note: "3750–4000 kHz is shared with other services." },
    3: { lowMHz: 3.5, highMHz: 3.9, status: "primary", note: "Shared with other services." },
  },
  {
    name: "60m",
    ...everyRegion({
      lowMHz: 5.3515,
      highMHz: 5.3665,
      status: "secondary",
      note: "15 W EIRP at most (RR 5.133B); some administrations use channels instead of the segment.",
    }),
  },
  {
    name: "40m",
    1: { lowMHz: 7.0, highMHz: 7.2, status: "primary" },
    2: {
      lowMHz: 7.0,
      highMHz: 7.3,
      status: "primary",
      note: "7200–7300 kHz must not constrain broadcasting (RR 5.142).",
    },
    3: { lowMHz: 7.0, highMHz: 7.2, status: "primary" },
  },
  {
    name: "30m",
    ...everyRegion({ lowMHz: 10.1, highMHz: 10.15, status: "secondary", note: "Secondary to the fixed service." }),
  },
  { name: "20m", ...everyRegion({ lowMHz: 14.0, highMHz: 14.35, status: "primary" }) },
  { name: "17m", ...everyRegion({ lowMHz: 18.068, highMHz: 18.168, status: "primary" }) },
  { name: "15m", ...everyRegion({ lowMHz: 21.0, highMHz: 21.45, status: "primary" }) },
  { name: "12m", ...everyRegion({ lowMHz: 24.89, highMHz: 24.99, status: "primary" }) },
  { name: "10m", ...everyRegion({ lowMHz: 28.0, highMHz: 29.7, status: "primary" }) },
  {
    name: "6m",
    1: {
      lowMHz: 50,
      highMHz: 52,
      status: "secondary",
      note: "Many Region 1 countries have primary status on part or all of 50–54 MHz by footnote.",
    },
    2: { lowMHz: 50, highMHz: 54, status: "primary" },
    3: { lowMHz: 50, highMHz: 54, status: "primary" },
  },
  {
    name: "2m",
    1: { lowMHz: 144, highMHz: 146, status: "primary" },
    2: { lowMHz: 144, highMHz: 148, status: "primary" },
    3: { lowMHz: 144, highMHz: 148, status: "primary", note: "146–148 MHz is shared with fixed and mobile." },
  },
  { name: "1.25m", 2: { lowMHz: 220, highMHz: 225, status: "primary", fromMemory: true } },
  {
    name: "70cm",
    1: { lowMHz: 430, highMHz: 440, status: "primary", note: "Shared with radiolocation." },
    2: { lowMHz: 430, highMHz: 440, status: "secondary", fromMemory: true },
    3: { lowMHz: 430, highMHz: 440, status: "secondary", fromMemory: true },
  },
];

function toBand(row: BandRow, region: ItuRegion): Band | undefined {
  const allocation = row[region];
  if (!allocation) return undefined;
  return {
    name: row.name,
    region,
    lowMHz: allocation.lowMHz,
    highMHz: allocation.highMHz,
    status: allocation.status,
    fromMemory: allocation.fromMemory ?? false,
    ...(allocation.note ? { note: allocation.note } : {}),
  };
}

/** Every band allocated to amateurs in the region, lowest frequency first. */
export function bandsForRegion(region: ItuRegion): Band[] {
  return BAND_ROWS.flatMap((row) => toBand(row, region) ?? []);
}

/** Every band name in any region, lowest frequency first. */
export const BAND_NAMES: readonly string[] = BAND_ROWS.map((row) => row.name);

function normaliseName(name: string): string {
  return name.replace(/\s+/g, "").toLowerCase();
}

/** The band called `name` ("20m", "20 m", "70CM") in the region, or undefined if not allocated there. */
export function bandByName(name: string, region: ItuRegion): Band | undefined {
  const wanted = normaliseName(name);
  const row = BAND_ROWS.find((candidate) => candidate.name === wanted);
  return row ? toBand(row, region) : undefined;
}

/** The band that contains `mhz` (edges included) in the region, or undefined. */
export function bandAt(mhz: number, region: ItuRegion): Band | undefined {
  return bandsForRegion(region).find((band) => mhz >= band.lowMHz && mhz <= band.highMHz);
}

/** The arithmetic centre of the band. */
export function bandCentreMHz(band: Pick<Band, "lowMHz" | "highMHz">): number {
  return (band.lowMHz + band.highMHz) / 2;
}
