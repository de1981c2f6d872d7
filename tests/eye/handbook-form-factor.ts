/**
 * Configuration factor from a differential planar element to a parallel rectangle whose corner
 * lies on the element's normal (Howell, "A Catalog of Radiation Heat Transfer Configuration
 * Factors", case B-3; Siegel & Howell, Thermal Radiation Heat Transfer, appendix — formula from
 * memory, cross-checked below against its limits: a → ∞, b → ∞ gives 1/4):
 *   F = (1/2π) [ X/√(1+X²) · atan(Y/√(1+X²)) + Y/√(1+Y²) · atan(X/√(1+Y²)) ],  X = a/c, Y = b/c
 * A Lambertian source of luminance L filling that rectangle gives E = π·L·F on the element.
 * Written independently of model/eye (no shared code).
 */
export function cornerFormFactor(a_m: number, b_m: number, distance_m: number): number {
  const X = a_m / distance_m;
  const Y = b_m / distance_m;
  const sx = Math.sqrt(1 + X * X);
  const sy = Math.sqrt(1 + Y * Y);
  return (X / sx * Math.atan(Y / sx) + Y / sy * Math.atan(X / sy)) / (2 * Math.PI);
}

/** Form factor of a rectangle [x0,x1]×[y0,y1] (coordinates from the foot of the normal) by corner superposition. */
export function offsetRectangleFormFactor(x0: number, x1: number, y0: number, y1: number, distance_m: number): number {
  const f = (x: number, y: number) => Math.sign(x) * Math.sign(y) * cornerFormFactor(Math.abs(x), Math.abs(y), distance_m);
  return f(x1, y1) - f(x0, y1) - f(x1, y0) + f(x0, y0);
}
