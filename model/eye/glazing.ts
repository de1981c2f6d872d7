/**
 * Glazing transmittance for daylight.
 *
 * Spectral: the glazing carries a spectral transmittance τ(λ) at normal incidence (a
 * `Transmittance` on the canonical grid), or a flat visible transmittance τ_v,n when only that is
 * known. The photopic and α-opic effect is applied through the source response (source-response.ts).
 *
 * Angular: relative transmittance τ(θ)/τ(0) from the Fresnel equations for uncoated glass of
 * refractive index n = 1.526 (soda-lime float glass, common practice), unpolarised light, two
 * air–glass interfaces per pane, multiple reflections and the longer absorption path neglected:
 *   R_s = ((cosθ − n cosθt)/(cosθ + n cosθt))²,  R_p = ((cosθt − n cosθ)/(cosθt + n cosθ))²
 *   t(θ) = [1 − (R_s + R_p)/2]^(2·panes),   τ(θ)/τ(0) = t(θ)/t(0)
 * (Fresnel equations: Born & Wolf, Principles of Optics §1.5). This replaces the ASHRAE
 * incidence-angle modifier, which we had only from memory.
 */
export const GLASS_REFRACTIVE_INDEX = 1.526;

function interfaceTransmittance(cosTheta: number, n: number): number {
  const c = Math.max(0, Math.min(1, cosTheta));
  const sinT = Math.sqrt(1 - c * c) / n;
  const cosT = Math.sqrt(1 - sinT * sinT);
  const rs = (c - n * cosT) / (c + n * cosT);
  const rp = (cosT - n * c) / (cosT + n * c);
  return 1 - (rs * rs + rp * rp) / 2;
}

/** τ(θ)/τ(0) for `panes` panes of uncoated glass; 0 at grazing incidence, 1 at normal incidence. */
export function relativeAngularTransmittance(cosIncidence: number, panes: number): number {
  if (cosIncidence <= 0) return 0;
  const t0 = interfaceTransmittance(1, GLASS_REFRACTIVE_INDEX);
  const t = interfaceTransmittance(cosIncidence, GLASS_REFRACTIVE_INDEX);
  return Math.pow(t / t0, 2 * panes);
}

const TABLE_STEPS = 2000;
const tables = new Map<number, Float64Array>();

/**
 * τ(θ)/τ(0) from a table on cos θ (2000 steps, linear interpolation; error < 1e-4 against the
 * direct formula, checked in tests) for per-minute use.
 */
export function relativeAngularTransmittanceFast(cosIncidence: number, panes: number): number {
  if (cosIncidence <= 0) return 0;
  let t = tables.get(panes);
  if (t === undefined) {
    t = new Float64Array(TABLE_STEPS + 2);
    for (let i = 0; i <= TABLE_STEPS; i++) t[i] = relativeAngularTransmittance(i / TABLE_STEPS, panes);
    t[TABLE_STEPS + 1] = t[TABLE_STEPS] as number;
    tables.set(panes, t);
  }
  const x = (cosIncidence >= 1 ? 1 : cosIncidence) * TABLE_STEPS;
  const i = Math.floor(x);
  const a = t[i] as number;
  return a + ((t[i + 1] as number) - a) * (x - i);
}
