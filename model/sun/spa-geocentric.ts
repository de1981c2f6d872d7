/**
 * Geocentric apparent sun of the NREL Solar Position Algorithm (Reda & Andreas 2004,
 * "Solar position algorithm for solar radiation applications", Solar Energy 76(5):577–589,
 * §3.1–3.8, Eqs. 5–30). Angles in degrees, R in astronomical units.
 */
import { asinD, atan2D, cosD, DEG, sinD, tanD, wrap360_deg } from './angles.js';
import { JD_J2000 } from './julian.js';
import { spaTerms, type EarthTerm } from './spa-terms.js';

export interface GeocentricSun {
  readonly jd: number;
  readonly jde: number;
  readonly jc: number;
  readonly jce: number;
  readonly jme: number;
  /** Earth heliocentric longitude L, latitude B (deg) and radius vector R (AU), Eqs. 9–11. */
  readonly L_deg: number;
  readonly B_deg: number;
  readonly R_au: number;
  /** Geocentric longitude Θ and latitude β (deg), Eqs. 13–14. */
  readonly theta_deg: number;
  readonly beta_deg: number;
  /** Fundamental nutation arguments X0..X4 (deg), Eqs. 15–19. */
  readonly x_deg: readonly [number, number, number, number, number];
  /** Nutation in longitude Δψ and obliquity Δε (deg), Eqs. 20–23. */
  readonly dPsi_deg: number;
  readonly dEpsilon_deg: number;
  /** Mean obliquity ε0 (arc-seconds) and true obliquity ε (deg), Eqs. 24–25. */
  readonly epsilon0_arcsec: number;
  readonly epsilon_deg: number;
  /** Aberration correction Δτ and apparent sun longitude λ (deg), Eqs. 26–27. */
  readonly dTau_deg: number;
  readonly lambda_deg: number;
  /** Mean and apparent sidereal time at Greenwich ν0, ν (deg), Eqs. 28–29. */
  readonly nu0_deg: number;
  readonly nu_deg: number;
  /** Geocentric right ascension α and declination δ (deg), Eqs. 30–31. */
  readonly alpha_deg: number;
  readonly delta_deg: number;
}

/** Σ over rows of A·cos(B + C·JME) (Eq. 9). */
function termSum(terms: readonly EarthTerm[], jme: number): number {
  let s = 0;
  for (const t of terms) s += t.a * Math.cos(t.b + t.c * jme);
  return s;
}

/** Polynomial in JME of the periodic series, divided by 10⁸ (Eq. 10–11). Radians or AU. */
function earthSeries(series: readonly (readonly EarthTerm[])[], jme: number): number {
  let value = 0;
  let power = 1;
  for (const terms of series) {
    value += termSum(terms, jme) * power;
    power *= jme;
  }
  return value / 1e8;
}

/** Geocentric sun at Julian day `jd` (UT) with ΔT = TT − UT in seconds. */
export function geocentricSun(jd: number, deltaT_s: number): GeocentricSun {
  const terms = spaTerms();
  const jde = jd + deltaT_s / 86400; // Eq. 5
  const jc = (jd - JD_J2000) / 36525; // Eq. 6
  const jce = (jde - JD_J2000) / 36525; // Eq. 7
  const jme = jce / 10; // Eq. 8

  const L_deg = wrap360_deg(earthSeries(terms.L, jme) / DEG);
  const B_deg = earthSeries(terms.B, jme) / DEG;
  const R_au = earthSeries(terms.R, jme);
  const theta_deg = wrap360_deg(L_deg + 180); // Eq. 13
  const beta_deg = -B_deg; // Eq. 14

  // Eqs. 15–19 (Meeus' fundamental arguments as printed in the SPA paper).
  const x0 = 297.85036 + jce * (445267.11148 + jce * (-0.0019142 + jce / 189474));
  const x1 = 357.52772 + jce * (35999.05034 + jce * (-0.0001603 - jce / 300000));
  const x2 = 134.96298 + jce * (477198.867398 + jce * (0.0086972 + jce / 56250));
  const x3 = 93.27191 + jce * (483202.017538 + jce * (-0.0036825 + jce / 327270));
  const x4 = 125.04452 + jce * (-1934.136261 + jce * (0.0020708 + jce / 450000));
  const x: [number, number, number, number, number] = [x0, x1, x2, x3, x4];

  let dPsi = 0;
  let dEps = 0;
  for (const t of terms.nutation) {
    const arg = (x0 * t.y[0] + x1 * t.y[1] + x2 * t.y[2] + x3 * t.y[3] + x4 * t.y[4]) * DEG;
    dPsi += (t.a + t.b * jce) * Math.sin(arg); // Eq. 20
    dEps += (t.c + t.d * jce) * Math.cos(arg); // Eq. 21
  }
  const dPsi_deg = dPsi / 36_000_000; // Eq. 22 (0.0001″ → deg)
  const dEpsilon_deg = dEps / 36_000_000; // Eq. 23

  const u = jme / 10; // Eq. 24
  const epsilon0_arcsec =
    84381.448 +
    u * (-4680.93 + u * (-1.55 + u * (1999.25 + u * (-51.38 + u * (-249.67 + u * (-39.05 + u * (7.12 + u * (27.87 + u * (5.79 + u * 2.45)))))))));
  const epsilon_deg = epsilon0_arcsec / 3600 + dEpsilon_deg; // Eq. 25

  const dTau_deg = -20.4898 / (3600 * R_au); // Eq. 26
  const lambda_deg = theta_deg + dPsi_deg + dTau_deg; // Eq. 27

  const nu0_deg = wrap360_deg(280.46061837 + 360.98564736629 * (jd - JD_J2000) + jc * jc * (0.000387933 - jc / 38710000)); // Eq. 28
  const nu_deg = nu0_deg + dPsi_deg * cosD(epsilon_deg); // Eq. 29

  const alpha_deg = wrap360_deg(atan2D(sinD(lambda_deg) * cosD(epsilon_deg) - tanD(beta_deg) * sinD(epsilon_deg), cosD(lambda_deg))); // Eq. 30
  const delta_deg = asinD(sinD(beta_deg) * cosD(epsilon_deg) + cosD(beta_deg) * sinD(epsilon_deg) * sinD(lambda_deg)); // Eq. 31

  return {
    jd, jde, jc, jce, jme, L_deg, B_deg, R_au, theta_deg, beta_deg, x_deg: x, dPsi_deg, dEpsilon_deg,
    epsilon0_arcsec, epsilon_deg, dTau_deg, lambda_deg, nu0_deg, nu_deg, alpha_deg, delta_deg,
  };
}

/** Sun's mean longitude M (deg) for the equation of time (SPA Eq. A2). */
export function sunMeanLongitude_deg(jme: number): number {
  return wrap360_deg(280.4664567 + jme * (360007.6982779 + jme * (0.03032028 + jme * (1 / 49931 + jme * (-1 / 15300 - jme / 2_000_000)))));
}

/** Equation of time (minutes, in ±20) from the geocentric sun (SPA Eqs. A1–A2). */
export function equationOfTime_min(g: GeocentricSun): number {
  const m = sunMeanLongitude_deg(g.jme);
  let e = 4 * (m - 0.0057183 - g.alpha_deg + g.dPsi_deg * cosD(g.epsilon_deg));
  e = ((e % 1440) + 1440) % 1440;
  if (e > 20) e -= 1440;
  return e;
}
