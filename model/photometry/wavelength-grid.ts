/**
 * The canonical wavelength grid of every spectrum inside Zeitlight: 380–780 nm in 1 nm steps,
 * the range and step over which CIE S 026:2018 evaluates α-opic and photopic quantities.
 * Inputs on other grids are resampled at the edge (see resample.ts).
 */
export const GRID_START_NM = 380;
export const GRID_END_NM = 780;
export const GRID_STEP_NM = 1;
export const GRID_LENGTH = (GRID_END_NM - GRID_START_NM) / GRID_STEP_NM + 1; // 401

/** Wavelength (nm) of grid index i. */
export function gridWavelength_nm(i: number): number {
  return GRID_START_NM + i * GRID_STEP_NM;
}

export const GRID_WAVELENGTHS_NM: Float64Array = Float64Array.from({ length: GRID_LENGTH }, (_, i) => gridWavelength_nm(i));
