/**
 * Choice of the CIE general sky type for an instant when the weather source gives none.
 *
 * Perez sky clearness (Perez et al. 1990, Solar Energy 44(5):271–289):
 *   ε = ((E_dh + E_bn)/E_dh + κ·Z³) / (1 + κ·Z³),   κ = 1.041, Z = solar zenith in radians.
 * Perez defines ε on irradiances; here it is evaluated on illuminances when no irradiance is given
 * (an approximation: beam and diffuse efficacies differ by ~10 %).
 * Mapping ε → CIE type: a heuristic from memory, unverified; we take one type per bin: ε < 1.065 → 1 (overcast), < 1.5 → 4, < 2.8 → 7,
 * < 4.5 → 11, otherwise 12 (CIE standard clear sky).
 */
const KAPPA = 1.041;

export function perezClearness(diffuseHorizontal: number, directNormal: number, sunZenith_rad: number): number {
  if (!(diffuseHorizontal > 0)) return 1;
  const z3 = KAPPA * sunZenith_rad ** 3;
  return ((diffuseHorizontal + directNormal) / diffuseHorizontal + z3) / (1 + z3);
}

export function cieSkyTypeFromClearness(epsilon: number): number {
  if (epsilon < 1.065) return 1;
  if (epsilon < 1.5) return 4;
  if (epsilon < 2.8) return 7;
  if (epsilon < 4.5) return 11;
  return 12;
}
