/**
 * Lossy ground by the reflection-coefficient approximation: the field of the
 * perfect-ground image is split into its parts perpendicular to the plane of
 * incidence (horizontal polarisation) and in it (vertical polarisation), and
 * each is scaled by the Fresnel plane-wave reflection coefficient at the
 * specular angle. This is the approximation of NEC-2's "finite ground,
 * reflection-coefficient approximation" (Burke & Poggio, NEC-2 theory manual).
 *
 * With εc = εr − jσ/(ωε0) and θ the angle of incidence from the vertical:
 *   Γv = (εc·cosθ − √(εc − sin²θ)) / (εc·cosθ + √(εc − sin²θ))
 *   Γh = (cosθ − √(εc − sin²θ)) / (cosθ + √(εc − sin²θ))
 * Both are returned relative to a perfect ground (Γv → +1, Γh → −1 as σ → ∞),
 * so that a perfect ground gives factors (1, 1) on the image field.
 */
import { EPS0 } from "./physics";

/** Complex relative permittivity εc = εr − jσ/(ωε0) of a ground at a frequency in MHz, as [re, im]. */
export function groundPermittivity(relativePermittivity: number, conductivitySm: number, mhz: number): [number, number] {
  return [relativePermittivity, -conductivitySm / (2 * Math.PI * mhz * 1e6 * EPS0)];
}

/**
 * Image-field factors [vRe, vIm, hRe, hIm] for the vertical (in the plane of
 * incidence) and horizontal (perpendicular) parts, at cosθ = cosTheta.
 */
export function imageFactors(cosTheta: number, epsRe: number, epsIm: number, out: Float64Array): void {
  const c = cosTheta;
  // root = √(εc − 1 + cos²θ), principal branch
  const xr = epsRe - 1 + c * c;
  const xi = epsIm;
  const mod = Math.hypot(xr, xi);
  const rr = Math.sqrt((mod + xr) / 2);
  const ri = Math.sign(xi) * Math.sqrt(Math.max(mod - xr, 0) / 2);
  // Γv = (εc·c − root)/(εc·c + root)
  const nr = epsRe * c - rr;
  const ni = epsIm * c - ri;
  const dr = epsRe * c + rr;
  const di = epsIm * c + ri;
  const den = dr * dr + di * di;
  out[0] = (nr * dr + ni * di) / den;
  out[1] = (ni * dr - nr * di) / den;
  // −Γh = (root − c)/(root + c)
  const hn = rr - c;
  const hd = rr + c;
  const hden = hd * hd + ri * ri;
  out[2] = (hn * hd + ri * ri) / hden;
  out[3] = (ri * hd - hn * ri) / hden;
}
