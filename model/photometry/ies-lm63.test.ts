import { describe, expect, it } from 'vitest';
import { PhotometricFileError } from './candela-table.js';
import { looksLikeLm63, readLm63 } from './ies-lm63.js';

/** A small LM-63-2002 file: 2 lamps × 500 lm, multiplier 2, γ 0/45/90, C 0 and 90 (quadrant), metres. */
const QUADRANT = [
  'IESNA:LM-63-2002',
  '[TEST] T1',
  '[MANUFAC] Invented',
  '[MORE] second line',
  'TILT=NONE',
  '2 500 2 3 2 1 2 0.5 0.6 0.1',
  '0.9 1 30',
  '0 45 90',
  '0 90',
  '100 50 0',
  '80, 40, 0',
].join('\n');

function refusal(text: string): PhotometricFileError {
  try {
    readLm63(text);
  } catch (err) {
    if (err instanceof PhotometricFileError) return err;
    throw err;
  }
  throw new Error('the file was accepted');
}

describe('IES LM-63 reader', () => {
  it('reads the header, keywords, multiplier and quadrant symmetry of a 2002 file', () => {
    const t = readLm63(QUADRANT);
    expect(t.edition).toBe('LM-63-2002');
    expect(t.photometryType).toBe('C');
    expect(t.symmetry).toBe('quadrant');
    expect(t.candela_cd).toEqual([[200, 100, 0], [160, 80, 0]]);
    expect(t.statedFlux_lm).toBe(1000);
    expect(t.lamps).toEqual({ count: 2, lumensPerLamp: 500, description: '', watts: 30 });
    expect(t.ballastFactor).toBe(0.9);
    expect(t.opening).toEqual({ width_m: 0.5, length_m: 0.6, height_m: 0.1 });
    expect(t.labels.MANUFAC).toBe('Invented\nsecond line');
    expect(t.tilt).toBeUndefined();
  });

  it('reads an inline tilt table, the 2019 first line, feet and absolute photometry', () => {
    const t = readLm63(['IES:LM-63-2019', '[TEST] x', 'TILT=INCLUDE', '3', '2', '0 90', '1 0.8', '1 -1 1 2 1 1 1 1 2 0', '1 1 10', '0 90', '0', '10 0'].join('\r\n'));
    expect(t.edition).toBe('LM-63-2019');
    expect(t.tilt).toEqual({ geometry: 3, angles_deg: [0, 90], factors: [1, 0.8] });
    expect(t.absolutePhotometry).toBe(true);
    expect(t.statedFlux_lm).toBeUndefined();
    expect(t.opening.width_m).toBeCloseTo(0.3048, 12); // 1 ft = 0.3048 m exactly (international foot)
    expect(t.symmetry).toBe('rotational');
  });

  it('recognises every horizontal range of type C and the lateral range of type B', () => {
    const file = (h: string, n: number, type = 1, v = '0 90') => ['IESNA:LM-63-2002', 'TILT=NONE', `1 100 1 2 ${n} ${type} 2 0 0 0`, '1 1 1', v, h, ...Array.from({ length: n }, () => '1 1')].join('\n');
    expect(readLm63(file('0 90 180', 3)).symmetry).toBe('plane-C0-C180');
    expect(readLm63(file('90 180 270', 3)).symmetry).toBe('plane-C90-C270');
    expect(readLm63(file('0 120 240 360', 4)).symmetry).toBe('none');
    expect(readLm63(file('0 90', 2, 2, '-90 90')).symmetry).toBe('lateral');
    expect(readLm63(file('-90 90', 2, 3)).symmetry).toBe('none');
    expect(refusal(file('0 45', 2))).toMatchObject({ line: 6, field: 'horizontal angles' });
    expect(refusal(file('0 90', 2, 1, '10 90'))).toMatchObject({ line: 5, field: 'vertical angles' });
  });

  it('refuses bad files naming the line and the field', () => {
    expect(refusal(QUADRANT.replace('TILT=NONE', 'TILT=lamp.tlt'))).toMatchObject({ line: 5, field: 'TILT' });
    expect(refusal(QUADRANT.replace('TILT=NONE\n', ''))).toMatchObject({ field: 'TILT' });
    expect(refusal(QUADRANT.replace('2 500 2 3', '2 500 0 3'))).toMatchObject({ line: 6, field: 'candela multiplier' });
    expect(refusal(QUADRANT.replace('2 500 2 3 2 1 2', '2 500 2 3 2 4 2'))).toMatchObject({ line: 6, field: 'photometric type' });
    expect(refusal(QUADRANT.replace('80, 40, 0', '80, x, 0'))).toMatchObject({ line: 11, field: 'candela at horizontal 90°, vertical 45°' });
    expect(refusal(QUADRANT.replace('80, 40, 0', '80, 40'))).toMatchObject({ line: 11, field: 'candela at horizontal 90°, vertical 90°' });
    expect(refusal(QUADRANT.replace('80, 40, 0', '80, -40, 0'))).toMatchObject({ line: 11 });
    expect(refusal(`${QUADRANT}\n7`)).toMatchObject({ line: 12, field: 'end of data' });
    expect(refusal(QUADRANT.replace('0 45 90', '0 90 45'))).toMatchObject({ line: 8, field: 'vertical angles' });
    expect(refusal(QUADRANT.replace('80, 40, 0', '80, 40')).message).toBe('line 11, candela at horizontal 90°, vertical 90°: missing value: the file ends early');
  });

  it('tells LM-63 text from other text', () => {
    expect(looksLikeLm63(QUADRANT)).toBe(true);
    expect(looksLikeLm63('Company\n1\n1\n')).toBe(false);
  });
});
