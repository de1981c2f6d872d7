/**
 * Two-channel tunable-white mixing (warm + cool channel) to a target CCT and photopic
 * illuminance. Photometric and tristimulus quantities add linearly across channels, so the
 * mixture with illuminance fraction f from the cool channel is
 *   S = E_target · [(1 − f) Ŝ_warm + f Ŝ_cool],   Ŝ = channel spectrum scaled to 1 lx,
 * and its chromaticity moves along the straight line between the channel chromaticities.
 * CCT is not linear in f, so f is found by a bracketing root search (Illinois false position
 * on 1/CCT) with the Ohno 2014 CCT; tolerance 0.05 K. Melanopic EDI of the mixture equals
 * E_warm·DER_warm + E_cool·DER_cool (CIE S 026 quantities are linear).
 */
import { photopicIlluminance_lx, scaleToIlluminance } from '../photometry/alpha-opic.js';
import { cctDuvFromUv } from '../photometry/cct-ohno.js';
import { tristimulus, uv1960Of, type Tristimulus } from '../photometry/colorimetry.js';
import { addSpectra, scaleSpectrum, type Spectrum } from '../photometry/spectrum.js';

export interface TunableWhiteResult {
  /** Spectral irradiance at the target illuminance, W·m⁻²·nm⁻¹. */
  readonly spectrum: Spectrum;
  readonly warm_lx: number;
  readonly cool_lx: number;
  /** Fraction of the illuminance from the cool channel, 0–1. */
  readonly coolFraction: number;
  readonly cct_K: number;
  readonly duv: number;
}

function perLux(s: Spectrum): { unit: Spectrum; xyz: Tristimulus } {
  const unit = scaleToIlluminance(s, 1);
  return { unit, xyz: tristimulus(unit) };
}

function mixCct(w: Tristimulus, c: Tristimulus, f: number): number {
  return cctDuvFromUv(uv1960Of({ X: (1 - f) * w.X + f * c.X, Y: (1 - f) * w.Y + f * c.Y, Z: (1 - f) * w.Z + f * c.Z })).cct_K;
}

/** Mix two channel spectra (any scale) to `target_cct_K` at `target_lx` photopic illuminance. */
export function tunableWhiteMix(warm: Spectrum, cool: Spectrum, target_cct_K: number, target_lx: number): TunableWhiteResult {
  if (!(target_lx >= 0) || !Number.isFinite(target_lx)) throw new RangeError(`target illuminance ${target_lx} lx must be a finite number ≥ 0`);
  if (!(photopicIlluminance_lx(warm) > 0 && photopicIlluminance_lx(cool) > 0)) throw new RangeError('both tunable-white channels need light in the visible range');
  const w = perLux(warm);
  const c = perLux(cool);
  const cctWarm = mixCct(w.xyz, c.xyz, 0);
  const cctCool = mixCct(w.xyz, c.xyz, 1);
  const lo = Math.min(cctWarm, cctCool);
  const hi = Math.max(cctWarm, cctCool);
  if (!(target_cct_K >= lo - 0.05 && target_cct_K <= hi + 0.05)) {
    throw new RangeError(`target CCT ${target_cct_K} K is outside the range the two channels can mix (${lo.toFixed(0)}–${hi.toFixed(0)} K)`);
  }
  // g(f) = 1/CCT(f) − 1/target, nearly linear in f.
  const g = (f: number) => 1 / mixCct(w.xyz, c.xyz, f) - 1 / target_cct_K;
  let a = 0;
  let b = 1;
  let ga = 1 / cctWarm - 1 / target_cct_K;
  let gb = 1 / cctCool - 1 / target_cct_K;
  let f = 0;
  let side = 0;
  if (Math.abs(ga) < 1e-12) f = 0;
  else if (Math.abs(gb) < 1e-12) f = 1;
  else {
    for (let iter = 0; iter < 60; iter++) {
      f = (a * gb - b * ga) / (gb - ga);
      const gf = g(f);
      if (Math.abs(1 / (gf + 1 / target_cct_K) - target_cct_K) < 0.05) break;
      if (gf * gb > 0) {
        b = f;
        gb = gf;
        if (side === 1) ga /= 2;
        side = 1;
      } else {
        a = f;
        ga = gf;
        if (side === -1) gb /= 2;
        side = -1;
      }
    }
  }
  f = Math.min(Math.max(f, 0), 1);
  const mix = addSpectra(scaleSpectrum(w.unit, (1 - f) * target_lx), scaleSpectrum(c.unit, f * target_lx));
  const result = cctDuvFromUv(uv1960Of({ X: (1 - f) * w.xyz.X + f * c.xyz.X, Y: (1 - f) * w.xyz.Y + f * c.xyz.Y, Z: (1 - f) * w.xyz.Z + f * c.xyz.Z }));
  return { spectrum: { values: mix.values, absolute: true }, warm_lx: (1 - f) * target_lx, cool_lx: f * target_lx, coolFraction: f, cct_K: result.cct_K, duv: result.duv };
}
