/**
 * Sense checks of personas and places: body-clock parameters within the human range, eyewear
 * described, rooms and light levels physically plausible.
 */
import type { Scenario } from '../../schema/scenario-types.js';
import { problem, type ScenarioProblem } from '../problem.js';

/**
 * Intrinsic period 24 h 9 min ± 12 min (SD), as cited in Skeldon et al. 2017 (after Czeisler et
 * al. 1999): outside mean ± 3 SD is very unusual.
 */
const TAU_MEAN_H = 24 + 9 / 60;
const TAU_SD_H = 12 / 60;
/** Eye illuminance from room lighting above this is therapy-lamp territory (common practice). */
const HIGH_ROOM_EYE_ILLUMINANCE_LX = 5000;

export function personChecks(s: Scenario): ScenarioProblem[] {
  const out: ScenarioProblem[] = [];
  s.personas.forEach((p, i) => {
    if (Math.abs(p.intrinsicPeriod_h - TAU_MEAN_H) > 3 * TAU_SD_H) {
      out.push(problem('warning', ['personas', i, 'intrinsicPeriod_h'], `an intrinsic period of ${p.intrinsicPeriod_h} h is more than 3 standard deviations from the human mean (24.15 ± 0.2 h)`, 'Use a value between 23.55 and 24.75 h unless it was measured.'));
    }
    if (p.age_y < 18) out.push(problem('warning', ['personas', i, 'age_y'], 'the body-clock models were calibrated on adults', 'Treat results for children and teenagers with extra caution.'));
    if (p.lightSensitivity < 0.2 || p.lightSensitivity > 5) out.push(problem('warning', ['personas', i, 'lightSensitivity'], `a light sensitivity of ${p.lightSensitivity} is far from the published model (1)`, 'Keep it between 0.2 and 5 unless you have a reason.'));
    p.eyewear.forEach((e, k) => {
      if (e.kind === 'custom' && (e.photopicTransmittance === undefined || e.melanopicTransmittance === undefined)) {
        out.push(problem('error', ['personas', i, 'eyewear', k], 'custom eyewear needs its transmittances', 'Give photopicTransmittance and melanopicTransmittance (0–1) from the lens data sheet.'));
      }
    });
  });
  s.places.forEach((pl, i) => {
    if (pl.kind !== 'room') return;
    const r = pl.reflectances;
    if (r.floor > r.ceiling) out.push(problem('warning', ['places', i, 'reflectances', 'floor'], 'the floor reflects more than the ceiling, which is unusual', 'Check the values (typical: ceiling 0.7–0.85, walls 0.5–0.7, floor 0.2–0.4).'));
    for (const key of ['ceiling', 'walls', 'floor'] as const) {
      if (r[key] > 0.95) out.push(problem('warning', ['places', i, 'reflectances', key], `a reflectance of ${r[key]} is above any real interior finish`, 'Use at most about 0.9 (fresh white paint).'));
    }
    pl.windows.forEach((w, k) => {
      if (w.sillHeight_m + w.height_m > pl.height_m + 1e-9) out.push(problem('warning', ['places', i, 'windows', k, 'height_m'], `the window top (${(w.sillHeight_m + w.height_m).toFixed(2)} m) is above the ceiling (${pl.height_m} m)`, 'Lower the sill or the window height, or raise the room height.'));
      if (w.width_m > Math.max(pl.width_m, pl.depth_m) + 1e-9) out.push(problem('warning', ['places', i, 'windows', k, 'width_m'], `the window is wider (${w.width_m} m) than any wall of the room`, 'Check the window width or the room size.'));
    });
    pl.luminaires.forEach((l, k) => {
      if (l.eyeIlluminance_lx > HIGH_ROOM_EYE_ILLUMINANCE_LX) out.push(problem('warning', ['places', i, 'luminaires', k, 'eyeIlluminance_lx'], `${l.eyeIlluminance_lx} lx at the eye is far above room lighting`, 'Check the value; it should be vertical illuminance at the eye, typically 100–1000 lx.'));
    });
  });
  return out;
}
