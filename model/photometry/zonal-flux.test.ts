import { describe, expect, it } from 'vitest';
import type { CandelaGrid } from './candela-grid.js';
import { zonalFlux_lm } from './zonal-flux.js';

const steps = (from: number, to: number, step: number) => Array.from({ length: Math.round((to - from) / step) + 1 }, (_, i) => from + i * step);
const RAD = Math.PI / 180;

describe('zonal-lumen flux', () => {
  it('gives 4π·I for an isotropic source (definition of the lumen)', () => {
    const v = steps(0, 180, 10);
    const g: CandelaGrid = { photometryType: 'C', horizontal_deg: [0, 360], vertical_deg: v, candela_cd: [v.map(() => 100), v.map(() => 100)] };
    expect(zonalFlux_lm(g)).toBeCloseTo(400 * Math.PI, 9);
  });

  it('gives π·I0 within 0.2 % for a Lambertian emitter tabulated every 5° (closed form Φ = π·I0)', () => {
    const v = steps(0, 90, 5);
    const row = v.map((g) => 1000 * Math.cos(g * RAD));
    const flux = zonalFlux_lm({ photometryType: 'C', horizontal_deg: [0], vertical_deg: v, candela_cd: [row] });
    expect(Math.abs(flux / (1000 * Math.PI) - 1)).toBeLessThan(0.002);
  });

  it('integrates type B cells as ΔH·Δ(sin V): a uniform front hemisphere gives 2π·I', () => {
    const h = steps(-90, 90, 5);
    const v = steps(-90, 90, 5);
    expect(zonalFlux_lm({ photometryType: 'B', horizontal_deg: h, vertical_deg: v, candela_cd: h.map(() => v.map(() => 10)) })).toBeCloseTo(20 * Math.PI, 9);
  });
});
