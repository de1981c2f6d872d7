/**
 * Outdoor daylight for the light-at-eye models — public API.
 *
 * Sun (model/sun):
 *   solarPosition(epochMs, observer, { deltaT_s? }) → { zenith_deg, azimuth_deg, elevation_deg, … }
 *       NREL SPA, topocentric, refraction-corrected, azimuth from north clockwise.
 *   sunPositionsEvery(startEpochMs, step_min, count, observer) → SunSamples (Float64Arrays)
 *       cheap per-minute path, < 1e-6° from the full SPA.
 *   sunTimes({ year, month, day }, observer, utcOffset_h) → sunrise/transit/sunset (local hours and instants).
 *
 * Weather files (model/weather):
 *   parseEpw(text, fileName) → EpwFile (throws EpwError naming the line; counted warnings).
 *   epwRecordIndexAt(file, epwDayIndex(file), epochMs) → record whose hour contains the instant.
 *   checkDirectLightAgainstSun(file) → count of hours with direct light and the sun down.
 *   summariseEpw(file) → location, months, snow days, illuminance statistics (weather command).
 *
 * Daylight per time step (this folder) — the main entry points:
 *   daylightFromEpw(file, { startEpochMs, step_min, count }) → { series: DaylightSeries, filledHours }
 *   daylightFromSkyConditions({ startEpochMs, step_min, count, site, utcOffset_h,
 *                               conditions: ('clear'|'intermediate'|'overcast')[] }) → DaylightSeries
 *   DaylightSeries (struct of Float64Arrays, one value per step):
 *     sun.zenith_deg / sun.azimuth_deg / sun.elevation_deg,
 *     directNormal_lx, diffuseHorizontal_lx, globalHorizontal_lx (and the same in W/m²),
 *     clearness (Perez ε), brightness (Perez Δ), skyCondition (0 clear, 1 intermediate, 2 overcast),
 *     snowDepth_cm, daysSinceSnowfall, sunCct_K, skyCct_K.
 *   Spectra: cieDaylightSpectrum(series.sunCct_K[i]) for the sun, cieDaylightSpectrum(series.skyCct_K[i])
 *     for sky light; daylightMixSpectrum([{ illuminance_lx, cct_K }, …]) for mixtures (ground light).
 *   Ground: groundReflectanceWithSnow(base, snowDepth_cm, daysSinceSnowfall), SURFACE_REFLECTANCE.
 *
 * At the eye outdoors:
 *   outdoorEyeIlluminance({ sunZenith_deg, sunAzimuth_deg, directNormal_lx, diffuseHorizontal_lx,
 *       groundReflectance, gazeAzimuth_deg: number | 'all-directions', gazeTilt_deg?, skyModel:
 *       'isotropic'|'perez', clearness?, brightness? }) → { sun_lx, sky_lx, ground_lx, total_lx, … }
 *   outdoorEyeSeries(series, { gazeAzimuth_deg, skyModel?, groundReflectance? }) → per-step arrays.
 *
 * Building blocks: ineichenClearSky / clearSkyIrradiance, erbsSplit, cloudGlobalFactor,
 *   perezSkyIndices, perezIlluminance, perezBrightening, extraterrestrialNormal_W_m2,
 *   airMassKasten1966, airMassKastenYoung1989, twilightDiffuseFloor_lx, sunCct_K, skyCct_K.
 * Methods and sources: docs/methods/sun-and-daylight.md.
 */
export { solarPosition, spaDetailed, type SolarPosition, type SpaOptions } from '../sun/spa.js';
export { sunPositionsEvery, type SunSamples, type SunTrackOptions } from '../sun/sun-track.js';
export { sunTimes, type SunTimes, type CalendarDate } from '../sun/sunrise-sunset.js';
export type { Observer } from '../sun/observer.js';
export { parseEpw, EpwError, type EpwFile, type EpwLocation, type EpwIssue } from '../weather/epw.js';
export { epwDayIndex, epwRecordIndexAt, epwIntervalEndMs } from '../weather/epw-time.js';
export { checkDirectLightAgainstSun } from '../weather/epw-sun-check.js';
export { summariseEpw, type EpwSummary } from '../weather/epw-summary.js';
export { daylightFromEpw, type EpwDaylightResult } from './daylight-from-epw.js';
export { daylightFromSkyConditions, SKY_CONDITION_CODE, type DaylightSeries, type SampleWindow, type Site, type SkyConditionDaylightInput } from './daylight-series.js';
export { SKY_CONDITIONS, skyConditionFromClearness, skyConditionIrradiance, type SkyCondition } from './sky-condition.js';
export { daylightMixSpectrum, skyCct_K, sunCct_K } from './daylight-cct.js';
export { DEFAULT_GROUND_REFLECTANCE, groundReflectanceWithSnow, SURFACE_REFLECTANCE } from './ground-reflectance.js';
export { outdoorEyeIlluminance, outdoorEyeSeries, type EyeIlluminance, type OutdoorEyeInput, type SkyDiffuseModel } from './outdoor-eye.js';
export { clearSkyIrradiance, ineichenClearSky, type IrradianceComponents } from './clear-sky.js';
export { cloudGlobalFactor, erbsSplit } from './decomposition.js';
export { perezSkyIndices, type PerezSkyIndices } from './perez-sky-indices.js';
export { perezIlluminance } from './perez-efficacy.js';
export { perezBrightening } from './perez-transposition.js';
export { airMassKasten1966, airMassKastenYoung1989, extraterrestrialNormal_W_m2 } from './extraterrestrial.js';
export { twilightDiffuseFloor_lx } from './twilight.js';
