/**
 * Daylight without a weather file: each day is 'clear', 'intermediate' or 'overcast'.
 *  - clear: Ineichen–Perez clear sky (Linke turbidity 3 by default — rural/suburban mid-latitude,
 *    from memory);
 *  - intermediate: 5 oktas of cloud, overcast: 8 oktas, dimming clear-sky GHI by Kasten & Czeplak
 *    (1980) — factors 0.85 and 0.25; overcast 0.25 matches the usual "20–30 % of clear-sky
 *    GHI" order of magnitude (from memory);
 *  - intermediate GHI is split into direct and diffuse by Erbs et al. (1982); overcast keeps no
 *    direct sun (sun hidden), all GHI diffuse.
 * The cloud amounts per class are our own choice (documented in docs/methods/sun-and-daylight.md).
 */
import { clearSkyIrradiance, type IrradianceComponents } from './clear-sky.js';
import { cloudGlobalFactor, erbsSplit } from './decomposition.js';

export const SKY_CONDITIONS = ['clear', 'intermediate', 'overcast'] as const;
export type SkyCondition = (typeof SKY_CONDITIONS)[number];

/** Cloud amount (oktas) assumed for each sky condition. */
export const SKY_CONDITION_CLOUD_OKTAS: Readonly<Record<SkyCondition, number>> = { clear: 0, intermediate: 5, overcast: 8 };

export interface SkyConditionOptions {
  readonly linkeTurbidity?: number;
  readonly altitude_m?: number;
}

/** Irradiance components (W/m²) for a sky condition at apparent zenith θz (deg). */
export function skyConditionIrradiance(condition: SkyCondition, apparentZenith_deg: number, extraterrestrial_W_m2: number, options: SkyConditionOptions = {}): IrradianceComponents {
  const clear = clearSkyIrradiance(apparentZenith_deg, { linkeTurbidity: options.linkeTurbidity ?? 3, altitude_m: options.altitude_m ?? 0, extraterrestrial_W_m2 });
  if (condition === 'clear') return clear;
  const ghi = clear.globalHorizontal_W_m2 * cloudGlobalFactor(SKY_CONDITION_CLOUD_OKTAS[condition]);
  if (condition === 'overcast') return { globalHorizontal_W_m2: ghi, directNormal_W_m2: 0, diffuseHorizontal_W_m2: ghi };
  const split = erbsSplit(ghi, apparentZenith_deg, extraterrestrial_W_m2);
  return { globalHorizontal_W_m2: split.globalHorizontal_W_m2, directNormal_W_m2: split.directNormal_W_m2, diffuseHorizontal_W_m2: split.diffuseHorizontal_W_m2 };
}

/**
 * Sky condition class from Perez clearness ε, at the breakpoints EnergyPlus uses to blend its
 * skies (ε 1.2 and 3; EnergyPlus Engineering Reference, "Time-Step Daylighting Calculation").
 */
export function skyConditionFromClearness(clearness: number): SkyCondition {
  if (clearness < 1.2) return 'overcast';
  if (clearness < 3) return 'intermediate';
  return 'clear';
}
