/**
 * Feedlines, baluns and ununs, and the transmission-line formulas that carry a
 * feed-point impedance to the radio (Pozar, Microwave Engineering §2.3 and §2.7;
 * reference-data.md §4 and §5).
 *
 * Lines are treated as low-loss: Z0 is real and the attenuation α comes from the
 * matched-loss fit α(f) = k1·√f + k2·f (dB per 100 m, f in MHz).
 */
import { abs, add, complex, coth, divide, multiply, subtract, tanh, type Complex } from "mathjs";
import type { FeedlineType, Transformer } from "./feedline-types";
import { wavelengthMetres } from "./physics";

/** Nepers to decibels: 1 Np = 20·log10(e) dB. */
export const DB_PER_NEPER = 20 / Math.LN10;

/** Matched-line loss in dB of `lengthM` metres of the line at `mhz`. */
export function matchedLossDb(type: FeedlineType, mhz: number, lengthM: number): number {
  return ((type.k1 * Math.sqrt(mhz) + type.k2 * mhz) * lengthM) / 100;
}

/** A run of line at one frequency: Z0, the one-way loss αl in nepers and the electrical length βl in radians. */
export interface LineSection {
  z0Ohms: number;
  lossNepers: number;
  phaseRadians: number;
}

export function lineSection(type: FeedlineType, mhz: number, lengthM: number): LineSection {
  const wavelengthInLine = type.velocityFactor * wavelengthMetres(mhz);
  return {
    z0Ohms: type.z0Ohms,
    lossNepers: matchedLossDb(type, mhz, lengthM) / DB_PER_NEPER,
    phaseRadians: (2 * Math.PI * lengthM) / wavelengthInLine,
  };
}

/**
 * tanh γl, or coth γl where tanh grows past 1 (near an odd number of quarter
 * waves it is infinite on a lossless line); the formulas below take either.
 */
function hyperbolic(section: LineSection): { tanh: Complex } | { coth: Complex } {
  const gammaL = complex(section.lossNepers, section.phaseRadians);
  const t = tanh(gammaL);
  return (abs(t) as number) <= 1 ? { tanh: t } : { coth: coth(gammaL) };
}

/**
 * Zin = Z0·(ZL + Z0·tanh γl)/(Z0 + ZL·tanh γl): the impedance looking into a
 * line ending in ZL (equally Z0·(ZL·coth γl + Z0)/(Z0·coth γl + ZL)).
 */
export function inputImpedance(zLoad: Complex, section: LineSection): Complex {
  const z0 = complex(section.z0Ohms, 0);
  const h = hyperbolic(section);
  if ("tanh" in h) {
    return multiply(z0, divide(add(zLoad, multiply(z0, h.tanh)), add(z0, multiply(zLoad, h.tanh)))) as Complex;
  }
  return multiply(z0, divide(add(multiply(zLoad, h.coth), z0), add(multiply(z0, h.coth), zLoad))) as Complex;
}

/**
 * The load that gives the impedance `zIn` at the line's input: the same formula
 * solved for ZL, ZL = Z0·(Zin − Z0·tanh γl)/(Z0 − Zin·tanh γl). Used to refer a
 * sweep measured at the radio back to the feed point.
 */
export function loadImpedance(zIn: Complex, section: LineSection): Complex {
  const z0 = complex(section.z0Ohms, 0);
  const h = hyperbolic(section);
  if ("tanh" in h) {
    return multiply(z0, divide(subtract(zIn, multiply(z0, h.tanh)), subtract(z0, multiply(zIn, h.tanh)))) as Complex;
  }
  return multiply(z0, divide(subtract(multiply(zIn, h.coth), z0), subtract(multiply(z0, h.coth), zIn))) as Complex;
}

/** Γ = (Z − Z0)/(Z + Z0). */
export function reflectionCoefficient(z: Complex, z0Ohms: number): Complex {
  const z0 = complex(z0Ohms, 0);
  return divide(subtract(z, z0), add(z, z0)) as Complex;
}

/** SWR = (1 + |Γ|)/(1 − |Γ|); infinite for a total reflection. */
export function swrFromGamma(gammaMagnitude: number): number {
  return gammaMagnitude >= 1 ? Infinity : (1 + gammaMagnitude) / (1 - gammaMagnitude);
}

/** |Γ| = (SWR − 1)/(SWR + 1). */
export function gammaFromSwr(swr: number): number {
  return swr === Infinity ? 1 : (swr - 1) / (swr + 1);
}

/** The SWR an impedance makes on a line (or an analyser) of reference `z0Ohms`. */
export function swr(z: Complex, z0Ohms: number): number {
  return swrFromGamma(abs(reflectionCoefficient(z, z0Ohms)) as number);
}

/** Return loss RL = −20·log10|Γ| dB. */
export function returnLossDb(gammaMagnitude: number): number {
  return -20 * Math.log10(gammaMagnitude);
}

/** Fraction of the forward power reflected, |Γ|². */
export function reflectedPowerFraction(gammaMagnitude: number): number {
  return gammaMagnitude ** 2;
}

/** Mismatch loss ML = −10·log10(1 − |Γ|²) dB. */
export function mismatchLossDb(gammaMagnitude: number): number {
  return -10 * Math.log10(1 - gammaMagnitude ** 2);
}

/**
 * Total line loss with a mismatched load (ARRL Antenna Book, Transmission Lines):
 * TL = 10·log10[(a² − |ΓL|²)/(a·(1 − |ΓL|²))] with a = 10^(A/10), A the matched loss.
 */
export function totalLossDb(matchedDb: number, loadGammaMagnitude: number): number {
  const a = 10 ** (matchedDb / 10);
  const g2 = loadGammaMagnitude ** 2;
  return 10 * Math.log10((a * a - g2) / (a * (1 - g2)));
}

/** |Γin| = |ΓL|·10^(−A/10): the reflection seen at the line's input after the round trip of 2A dB. */
export function inputGammaMagnitude(loadGammaMagnitude: number, matchedDb: number): number {
  return loadGammaMagnitude * 10 ** (-matchedDb / 10);
}

/** An ideal (lossless, frequency-independent) transformer: the line sees Z / n. */
export function throughTransformer(zAntenna: Complex, transformer: Transformer): Complex {
  return divide(zAntenna, transformer.impedanceRatio) as Complex;
}

/** The radio's reference impedance: transmitters and analysers are built for 50 Ω. */
export const RADIO_REFERENCE_OHMS = 50;

export interface FeedChainPoint {
  /** Impedance at the line's antenna end, after the balun or unun. */
  zLineEnd: Complex;
  /** SWR on the line at the feed point (against the line's Z0). */
  swrFeed: number;
  /** Impedance at the radio end of the line. */
  zRadio: Complex;
  /** SWR a 50 Ω radio or analyser reads at the radio end. */
  swrRadio: number;
  matchedLossDb: number;
  totalLossDb: number;
}

/** Carry a feed-point impedance through the transformer and the lossy line to the radio. */
export function throughFeedChain(
  zFeed: Complex,
  transformer: Transformer,
  type: FeedlineType,
  lengthM: number,
  mhz: number,
): FeedChainPoint {
  const zLineEnd = throughTransformer(zFeed, transformer);
  const section = lineSection(type, mhz, lengthM);
  const zRadio = inputImpedance(zLineEnd, section);
  const loadGamma = abs(reflectionCoefficient(zLineEnd, type.z0Ohms)) as number;
  const matched = matchedLossDb(type, mhz, lengthM);
  return {
    zLineEnd,
    swrFeed: swrFromGamma(loadGamma),
    zRadio,
    swrRadio: swr(zRadio, RADIO_REFERENCE_OHMS),
    matchedLossDb: matched,
    totalLossDb: totalLossDb(matched, loadGamma),
  };
}
