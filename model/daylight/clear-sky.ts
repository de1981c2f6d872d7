/**
 * Clear-sky irradiance, Ineichen & Perez (2002), "A new airmass independent formulation for the
 * Linke turbidity coefficient", Solar Energy 73(3):151–157, in the form of pvlib-python's
 * `clearsky.ineichen` (without the optional "Perez enhancement"). Inputs: apparent zenith θz (deg), absolute air mass m_a, Linke
 * turbidity T_L, site altitude h (m), extraterrestrial normal irradiance I0 (W/m²).
 *   fh1 = exp(−h/8000), fh2 = exp(−h/1250), cg1 = 5.09e−5 h + 0.868, cg2 = 3.92e−5 h + 0.0387
 *   GHI = cg1·I0·cos θz·exp(−cg2·m_a·(fh1 + fh2·(T_L − 1)))
 *   DNI = min(b·I0·exp(−0.09·m_a·(T_L − 1)),  GHI·[1 − (0.1 − 0.2 e^(−T_L))/(0.1 + 0.882/fh1)]/cos θz),
 *         b = 0.664 + 0.163/fh1
 *   DHI = GHI − DNI·cos θz
 */
import { airMassKastenYoung1989 } from './extraterrestrial.js';

export interface IrradianceComponents {
  readonly globalHorizontal_W_m2: number;
  readonly directNormal_W_m2: number;
  readonly diffuseHorizontal_W_m2: number;
}

const NONE: IrradianceComponents = { globalHorizontal_W_m2: 0, directNormal_W_m2: 0, diffuseHorizontal_W_m2: 0 };

/** Ineichen–Perez clear sky with an explicit absolute air mass. */
export function ineichenClearSky(apparentZenith_deg: number, absoluteAirMass: number, linkeTurbidity: number, altitude_m = 0, extraterrestrial_W_m2 = 1364): IrradianceComponents {
  const cosZ = Math.max(0, Math.cos((apparentZenith_deg * Math.PI) / 180));
  if (cosZ === 0 || !Number.isFinite(absoluteAirMass)) return NONE;
  const h = altitude_m;
  const tl = linkeTurbidity;
  const fh1 = Math.exp(-h / 8000);
  const fh2 = Math.exp(-h / 1250);
  const cg1 = 5.09e-5 * h + 0.868;
  const cg2 = 3.92e-5 * h + 0.0387;
  const ghi = cg1 * extraterrestrial_W_m2 * cosZ * Math.max(0, Math.exp(-cg2 * absoluteAirMass * (fh1 + fh2 * (tl - 1))));
  const b = 0.664 + 0.163 / fh1;
  const dni1 = b * extraterrestrial_W_m2 * Math.exp(-0.09 * absoluteAirMass * (tl - 1));
  const dni2 = ghi * Math.min(Math.max((1 - (0.1 - 0.2 * Math.exp(-tl)) / (0.1 + 0.882 / fh1)) / cosZ, 0), 1e20);
  const dni = Math.min(dni1, dni2);
  return { globalHorizontal_W_m2: ghi, directNormal_W_m2: dni, diffuseHorizontal_W_m2: ghi - dni * cosZ };
}

/** Standard-atmosphere station pressure (Pa) at altitude h (m): 101325(1 − 2.25577e−5 h)^5.25588 (ISO 2533, common practice). */
export function standardPressure_Pa(altitude_m: number): number {
  return 101325 * (1 - 2.25577e-5 * altitude_m) ** 5.25588;
}

/** Ineichen–Perez clear sky from the zenith alone (Kasten–Young air mass scaled by standard pressure). */
export function clearSkyIrradiance(apparentZenith_deg: number, options: { linkeTurbidity?: number; altitude_m?: number; extraterrestrial_W_m2?: number } = {}): IrradianceComponents {
  const altitude_m = options.altitude_m ?? 0;
  const am = airMassKastenYoung1989(apparentZenith_deg) * (standardPressure_Pa(altitude_m) / 101325);
  return ineichenClearSky(apparentZenith_deg, am, options.linkeTurbidity ?? 3, altitude_m, options.extraterrestrial_W_m2 ?? 1364);
}
