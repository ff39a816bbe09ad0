/**
 * Skin-effect loss of a round wire: the internal impedance per unit length of
 * a conductor much thicker than its skin depth δ = √(2/(ωμ0σ)) is
 * Zs = (1 + j)/(2π·a·σ·δ) Ω/m (the surface impedance spread over the circumference).
 */
import { MU0 } from "./physics";

/** R′ in Zs = R′·(1 + j), Ω per metre of a round wire; zero for a perfect conductor. */
export function wireImpedancePerMetre(radius: number, conductivity: number, mhz: number): number {
  if (!Number.isFinite(conductivity)) return 0;
  const omega = 2 * Math.PI * mhz * 1e6;
  const skinDepth = Math.sqrt(2 / (omega * MU0 * conductivity));
  return 1 / (2 * Math.PI * radius * conductivity * skinDepth);
}

/**
 * ∫ I_e·I_f ds over one segment of length d for its two sinusoidal monopoles
 * (current sin(k·s)/sin(k·d) towards each end, opposite directions):
 * [same monopole, the two different monopoles].
 */
export function monopoleOverlaps(k: number, d: number): [number, number] {
  const skd = Math.sin(k * d);
  const sin2 = skd * skd;
  const same = (d / 2 - Math.sin(2 * k * d) / (4 * k)) / sin2;
  const cross = -(skd - k * d * Math.cos(k * d)) / (2 * k * sin2);
  return [same, cross];
}
