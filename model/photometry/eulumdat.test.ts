import { describe, expect, it } from 'vitest';
import { PhotometricFileError } from './candela-table.js';
import { candelaAt_cd, expandCandelaTable } from './candela-grid.js';
import { readEulumdat } from './eulumdat.js';

/** An EULUMDAT text: Mc = 4 planes (C0, 90, 180, 270), γ 0/90, one lamp set of 2000 lm, LORL 80 %. */
function ldt(isym: number, intensities: readonly number[], over: Record<number, string> = {}): string {
  const lines = ['Invented', '3', String(isym), '4', '90', '2', '90', 'R1', 'Name', 'N1', 'f.ldt', 'today', '600', '300', '80', '500', '0', '10', '20', '30', '40', '100', '80', '1', '0', '1', '2', 'LED', '2000', '4000K', '1B', '30', ...Array.from({ length: 10 }, () => '0.5'), '0', '90', '180', '270', '0', '90', ...intensities.map(String)];
  for (const [n, v] of Object.entries(over)) lines[Number(n) - 1] = v;
  return lines.join('\r\n');
}

function refusal(text: string): PhotometricFileError {
  try {
    readEulumdat(text);
  } catch (err) {
    if (err instanceof PhotometricFileError) return err;
    throw err;
  }
  throw new Error('the file was accepted');
}

describe('EULUMDAT reader', () => {
  it('scales cd/klm by the lamp flux and states the luminaire flux as lamp flux × LORL', () => {
    const t = readEulumdat(ldt(1, [100, 0]));
    expect(t.symmetry).toBe('rotational');
    expect(t.horizontal_deg).toEqual([0]);
    expect(t.candela_cd).toEqual([[200, 0]]);
    expect(t.statedFlux_lm).toBe(1600);
    expect(t.lamps).toEqual({ count: 2, lumensPerLamp: 1000, description: 'LED', watts: 30 });
    expect(t.opening).toEqual({ width_m: 0, length_m: 0.5, height_m: 0.025 });
    expect(t.labels.name).toBe('Name');
  });

  it('stores the planes each symmetry indicator names', () => {
    expect(readEulumdat(ldt(0, [1, 0, 2, 0, 3, 0, 4, 0])).horizontal_deg).toEqual([0, 90, 180, 270]);
    expect(readEulumdat(ldt(2, [1, 0, 2, 0, 3, 0])).horizontal_deg).toEqual([0, 90, 180]);
    // Isym 3 stores C270, C0, C90 (Mc1 = 3·Mc/4 + 1 to Mc1 + Mc/2); kept as their mirror images C270, C180, C90.
    const t3 = readEulumdat(ldt(3, [1, 0, 2, 0, 3, 0]));
    expect([t3.symmetry, t3.horizontal_deg, t3.candela_cd.map((r) => r[0])]).toEqual(['plane-C90-C270', [90, 180, 270], [6, 4, 2]]);
    const g3 = expandCandelaTable(t3);
    expect([0, 90, 180, 270].map((c) => candelaAt_cd(g3, c, 0))).toEqual([4, 6, 4, 2]);
    expect(readEulumdat(ldt(4, [1, 0, 2, 0])).horizontal_deg).toEqual([0, 90]);
  });

  it('reads a decimal comma', () => {
    expect(readEulumdat(ldt(1, [100, 0], { 23: '50,0' })).statedFlux_lm).toBe(1000);
  });

  it('refuses bad files naming the line and the field', () => {
    expect(refusal(ldt(5, [1, 0]))).toMatchObject({ line: 3, field: 'Isym (symmetry indicator)' });
    expect(refusal(ldt(1, [100, 0], { 29: '-5' }))).toMatchObject({ line: 29, field: 'total lamp flux (set 1)' });
    expect(refusal(ldt(1, [100, 0], { 23: '120' }))).toMatchObject({ line: 23, field: 'LORL (light output ratio)' });
    expect(refusal(ldt(1, [100]))).toMatchObject({ field: 'intensity at C0, γ 90°' });
    expect(refusal(ldt(1, [100, 0, 5]))).toMatchObject({ line: 51, field: 'end of data' });
    expect(refusal(ldt(1, [100, 'x' as unknown as number]))).toMatchObject({ line: 50, field: 'intensity at C0, γ 90°' });
    expect(refusal(ldt(2, [1, 0, 2, 0, 3, 0], { 45: '200' }))).toMatchObject({ line: 43, field: 'C angles' });
    expect(refusal('Invented\n1\n')).toMatchObject({ line: 3, field: 'Isym (symmetry indicator)' });
  });
});
