/**
 * Physical constants for the antenna engine (SI units), CODATA 2022 recommended values.
 * μ0 is measured since the 2019 SI redefinition, so Z0 = μ0·c is no longer exactly 120π.
 */

/** Speed of light in vacuum, m/s (exact by definition of the metre). */
export const SPEED_OF_LIGHT = 299_792_458;

/** Vacuum magnetic permeability μ0, H/m (CODATA 2022). */
export const MU0 = 1.25663706127e-6;

/** Vacuum electric permittivity ε0 = 1/(μ0·c²), F/m. */
export const EPS0 = 1 / (MU0 * SPEED_OF_LIGHT * SPEED_OF_LIGHT);

/** Free-space wave impedance Z0 = μ0·c, Ω (CODATA 2022: 376.730 313 412 Ω). */
export const Z0 = 376.730313412;

/** Conductivity of annealed copper, S/m (handbook value). */
export const COPPER_CONDUCTIVITY = 5.8e7;

/** Conductivity of aluminium wire, S/m (handbook value). */
export const ALUMINIUM_CONDUCTIVITY = 3.5e7;

/** Wavelength in free space, metres, for a frequency in MHz. */
export function wavelengthMetres(mhz: number): number {
  return SPEED_OF_LIGHT / (mhz * 1e6);
}
