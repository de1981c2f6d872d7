/**
 * The photometric core against published values. Each check names its source; the same
 * lines appear in docs/validation/photometry.md with the measured numbers.
 */
import { describe, expect, it } from 'vitest';
import { alphaOpicDer, illuminantD65, KM_LM_PER_W, photopicIlluminance_lx } from '../../model/photometry/alpha-opic.js';
import { cctDuv } from '../../model/photometry/cct-ohno.js';
import { spectrum } from '../../model/photometry/spectrum.js';
import { GRID_LENGTH } from '../../model/photometry/wavelength-grid.js';
import { equalEnergySpectrum, illuminantA } from '../../model/sources/planckian.js';
import { cieLampSpectrum, type CieLampName } from '../../model/sources/cie-lamp-tables.js';
import { ALPHA_OPIC_KEYS } from '../../model/photometry/action-spectra.js';

describe('photometric core against published values', () => {
  it('D65 gives DER = 1 for all five α-opic quantities (CIE S 026:2018 definition of DER)', () => {
    const der = alphaOpicDer(illuminantD65());
    for (const k of ALPHA_OPIC_KEYS) expect(der[k]).toBeCloseTo(1, 12);
  });

  it('a 555 nm line of 1 W/m² gives 683.002 lx, i.e. efficacy K_m (definition of the lumen, CIE vocabulary "maximum luminous efficacy")', () => {
    const values = new Float64Array(GRID_LENGTH);
    values[555 - 380] = 1; // 1 W·m⁻²·nm⁻¹ over the 1 nm bin = 1 W/m²
    expect(photopicIlluminance_lx(spectrum(values, true))).toBeCloseTo(KM_LM_PER_W, 9);
  });

  it('illuminant A has melanopic DER 0.496 within 0.001 (value quoted for CIE S 026; no publication of it was found, see docs/validation/photometry.md)', () => {
    expect(Math.abs(alphaOpicDer(illuminantA()).mel - 0.496)).toBeLessThan(0.001);
  });

  it('the equal-energy spectrum has melanopic DER 0.9058 within 1e-4 (published factor melanopic EDI = 0.9058 × equivalent melanopic lux of Lucas et al. 2014, whose reference is E)', () => {
    expect(Math.abs(alphaOpicDer(equalEnergySpectrum()).mel - 0.9058)).toBeLessThan(1e-4);
  });

  it('illuminant A has CCT 2856 K and D65 6504 K within 1 K (ISO/CIE 11664-2:2022; CIE 015:2018)', () => {
    expect(Math.abs(cctDuv(illuminantA()).cct_K - 2856)).toBeLessThan(1);
    expect(Math.abs(cctDuv(illuminantD65()).cct_K - 6504)).toBeLessThan(1);
  });

  // CCTs of the CIE lamp tables, rounded to 10 K, as computed independently for the bundled
  // data (shared/data/spectra/README.md, sections 8 and 10). Tolerance 6 K = rounding + method.
  const published: [CieLampName, number][] = [
    ['FL1', 6430], ['FL2', 4230], ['FL3', 3450], ['FL4', 2940], ['FL5', 6340], ['FL6', 4150],
    ['FL7', 6490], ['FL8', 5000], ['FL9', 4150], ['FL10', 5000], ['FL11', 4000], ['FL12', 3000],
    ['LED-B1', 2730], ['LED-B2', 3000], ['LED-B3', 4100], ['LED-B4', 5110], ['LED-B5', 6600],
    ['LED-BH1', 2850], ['LED-RGB1', 2840], ['LED-V1', 2720], ['LED-V2', 4070],
  ];
  for (const [name, cct] of published) {
    it(`${name} has CCT ${cct} K within 6 K (CIE 015:2018 table; CCT from the bundled-data record)`, () => {
      expect(Math.abs(cctDuv(cieLampSpectrum(name)).cct_K - cct)).toBeLessThan(6);
    });
  }
});
