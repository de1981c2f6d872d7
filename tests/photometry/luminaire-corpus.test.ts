/**
 * The invented luminaires of tests/photometry/luminaires/ (made by make-luminaires.mjs from
 * analytic distributions, README.md there): every format case is read, its flux integrated from
 * the table by the zonal-constant method agrees with the file's stated flux and with the closed
 * form, and a luminaire written as LM-63 and as EULUMDAT gives the same table and flux.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { candelaAt_cd, expandCandelaTable } from '../../model/photometry/candela-grid.js';
import { readPhotometricFile } from '../../model/photometry/photometric-file.js';
import { zonalFlux_lm } from '../../model/photometry/zonal-flux.js';
import { PROJECT_ROOT } from '../helpers/run-cli.js';
// @ts-expect-error -- plain JavaScript generator without type declarations
import { FILES } from './luminaires/make-luminaires.mjs';

const DIR = join(PROJECT_ROOT, 'tests', 'photometry', 'luminaires');
const read = (name: string) => readPhotometricFile(readFileSync(join(DIR, name), 'utf8'));

/** Closed-form flux of each file's analytic distribution (README.md): Lambertian I0·cos → π·I0, isotropic I0 → 4π·I0. */
const CLOSED_FORM_LM: Record<string, number> = {
  'lambertian-downlight-2002.ies': 3000,
  'lambertian-downlight-2019-tilt.ies': 3000,
  'lambertian-downlight.ldt': 3000,
  'batwing-quadrant.ies': 4000,
  'batwing-quadrant.ldt': 4000,
  'wallwasher-c0-c180.ies': 2000,
  'wallwasher-c0-c180.ldt': 2000,
  'wallwasher-c90-c270-2019.ies': 2000,
  'wallwasher-c90-c270.ldt': 2000,
  'asymmetric-0-360.ies': 1500,
  'asymmetric.ldt': 1500,
  'uplight-90-180.ies': 2500,
  'globe-absolute.ies': 4 * Math.PI * 100,
  'floodlight-type-b.ies': 5000,
  'floodlight-type-a.ies': 5000,
};

const EXPECTED: Record<string, { edition: string; type: string; symmetry: string }> = {
  'lambertian-downlight-2002.ies': { edition: 'LM-63-2002', type: 'C', symmetry: 'rotational' },
  'lambertian-downlight-2019-tilt.ies': { edition: 'LM-63-2019', type: 'C', symmetry: 'rotational' },
  'lambertian-downlight.ldt': { edition: 'EULUMDAT', type: 'C', symmetry: 'rotational' },
  'batwing-quadrant.ies': { edition: 'LM-63-2002', type: 'C', symmetry: 'quadrant' },
  'batwing-quadrant.ldt': { edition: 'EULUMDAT', type: 'C', symmetry: 'quadrant' },
  'wallwasher-c0-c180.ies': { edition: 'LM-63-2002', type: 'C', symmetry: 'plane-C0-C180' },
  'wallwasher-c0-c180.ldt': { edition: 'EULUMDAT', type: 'C', symmetry: 'plane-C0-C180' },
  'wallwasher-c90-c270-2019.ies': { edition: 'LM-63-2019', type: 'C', symmetry: 'plane-C90-C270' },
  'wallwasher-c90-c270.ldt': { edition: 'EULUMDAT', type: 'C', symmetry: 'plane-C90-C270' },
  'asymmetric-0-360.ies': { edition: 'LM-63-2002', type: 'C', symmetry: 'none' },
  'asymmetric.ldt': { edition: 'EULUMDAT', type: 'C', symmetry: 'none' },
  'uplight-90-180.ies': { edition: 'LM-63-2002', type: 'C', symmetry: 'rotational' },
  'globe-absolute.ies': { edition: 'LM-63-2019', type: 'C', symmetry: 'rotational' },
  'floodlight-type-b.ies': { edition: 'LM-63-2002', type: 'B', symmetry: 'lateral' },
  'floodlight-type-a.ies': { edition: 'LM-63-2002', type: 'A', symmetry: 'none' },
};

describe('invented luminaire corpus', () => {
  it('is exactly what the committed generator writes', () => {
    const files = FILES as Record<string, string>;
    expect(Object.keys(files).sort()).toEqual(Object.keys(CLOSED_FORM_LM).sort());
    for (const [name, text] of Object.entries(files)) expect(readFileSync(join(DIR, name), 'utf8'), name).toBe(text);
  });

  for (const [name, exact] of Object.entries(CLOSED_FORM_LM)) {
    it(`${name}: read as ${EXPECTED[name]?.edition} type ${EXPECTED[name]?.type}, ${EXPECTED[name]?.symmetry}; zonal flux within 1 % of the stated and the closed-form flux`, () => {
      const t = read(name);
      expect({ edition: t.edition, type: t.photometryType, symmetry: t.symmetry }).toEqual(EXPECTED[name]);
      const flux = zonalFlux_lm(expandCandelaTable(t));
      // Closed form of the generating distribution (README.md); tolerance 1 % as the product requires.
      expect(Math.abs(flux / exact - 1)).toBeLessThan(0.01);
      if (t.statedFlux_lm !== undefined) expect(Math.abs(flux / t.statedFlux_lm - 1)).toBeLessThan(0.01);
      else expect(t.absolutePhotometry).toBe(true);
    });
  }

  for (const [iesName, ldtName] of [
    ['lambertian-downlight-2002.ies', 'lambertian-downlight.ldt'],
    ['batwing-quadrant.ies', 'batwing-quadrant.ldt'],
    ['wallwasher-c0-c180.ies', 'wallwasher-c0-c180.ldt'],
    ['wallwasher-c90-c270-2019.ies', 'wallwasher-c90-c270.ldt'],
    ['asymmetric-0-360.ies', 'asymmetric.ldt'],
  ] as const) {
    it(`${iesName} and ${ldtName} give the same candela table and flux`, () => {
      const a = read(iesName);
      const b = read(ldtName);
      const ga = expandCandelaTable(a);
      const gb = expandCandelaTable(b);
      expect(ga.vertical_deg).toEqual(gb.vertical_deg);
      // Same directions every 5° in C and 2.5° in γ; both files print 3 decimals (cd vs cd/klm), so 0.01 cd covers the rounding.
      for (let c = 0; c < 360; c += 5) for (let g = 0; g <= 90; g += 2.5) expect(Math.abs(candelaAt_cd(ga, c, g) - candelaAt_cd(gb, c, g))).toBeLessThan(0.01);
      expect(Math.abs(zonalFlux_lm(ga) - zonalFlux_lm(gb))).toBeLessThan(0.01);
      expect(a.statedFlux_lm).toBeCloseTo(b.statedFlux_lm ?? NaN, 9);
    });
  }
});
