/**
 * How the plan screen and the station sheet write the engine's numbers: lengths in the
 * person's units (metric, or feet and inches), impedances as R ± jX, SWR as a ratio, signed
 * figures with a true minus sign (U+2212).
 */
import { feetAndInches } from "@/lib/antenna/cut-sheet";
import type { SwrBandwidth } from "@/lib/antenna/plan";

export type Units = "metric" | "imperial";

/** The international foot, exactly 0.3048 m. */
export const METRES_PER_FOOT = 0.3048;

/** A length to cut or measure: millimetres in metric, eighths of an inch in imperial. */
export function formatCutLength(metres: number, units: Units): string {
  return units === "imperial" ? feetAndInches(metres) : `${metres.toFixed(3)} m`;
}

/** A distance or height: to the centimetre (metric) or tenth of a foot (imperial) below 10, coarser above. */
export function formatDistance(metres: number, units: Units): string {
  if (units === "imperial") {
    const feet = metres / METRES_PER_FOOT;
    return `${feet.toFixed(feet < 10 ? 1 : 0)} ft`;
  }
  return `${metres.toFixed(metres < 10 ? 2 : 1)} m`;
}

export function formatImpedance({ r, x }: { r: number; x: number }): string {
  const sign = x < 0 ? "−" : "+";
  return `${r.toFixed(1)} ${sign} j${Math.abs(x).toFixed(1)} Ω`;
}

/** SWR as "1.42:1"; above 99:1 the exact figure means nothing on a real line. */
export function formatSwr(swr: number): string {
  return swr > 99 ? "> 99:1" : `${swr.toFixed(2)}:1`;
}

export function formatMHz(mhz: number): string {
  return `${mhz.toFixed(3)} MHz`;
}

/** A signed figure: "+1.25", "−0.40", or "0.00" when it rounds to zero; always the true minus sign. */
export function formatSigned(value: number, digits: number): string {
  const magnitude = Math.abs(value).toFixed(digits);
  if (Number(magnitude) === 0) return magnitude;
  return `${value < 0 ? "−" : "+"}${magnitude}`;
}

/** The 2:1 bandwidth: "at least" when it runs off an end of the sweep, and the edges in MHz. */
export function formatBandwidth(width: SwrBandwidth | null): string {
  if (!width) return "nowhere under 2:1";
  const atLeast = width.lowOpen || width.highOpen ? "at least " : "";
  return `${atLeast}${Math.round(width.widthKHz)} kHz (${width.lowMHz.toFixed(3)}–${width.highMHz.toFixed(3)} MHz)`;
}
