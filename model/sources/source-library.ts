/**
 * The built-in light-source library: one registry of ids → relative spectra, with cached
 * CCT and α-opic DER per id for callers that need them every simulated minute.
 *
 * Fixed ids: D65 (CIE table), A (CIE formula), E (equal energy), D50/D55/D75 (CIE D-series at
 * the nominal CCT × 1.4388/1.4380, CIE 015:2018), FL1–FL12 and LED-B1…LED-V2 (CIE 015:2018
 * tables), pc-LED-2700K…6500K (parametric), tunable-white-3000K/4000K/5000K (LED-B1 + LED-B5
 * mixed), display-normal / display-night (parametric display white).
 * Parameterised ids (any number, K): daylight-<CCT>K (CIE D-series at that CCT on today's
 * scale, 4000–25 000 K), planckian-<T>K (1000–100 000 K), pc-LED-<CCT>K (2200–8000 K),
 * tunable-white-<CCT>K (LED-B1/LED-B5 mix, within their CCTs).
 */
import { alphaOpicDer, illuminantD65 } from '../photometry/alpha-opic.js';
import type { AlphaOpicKey } from '../photometry/action-spectra.js';
import { cctDuv } from '../photometry/cct-ohno.js';
import type { Spectrum } from '../photometry/spectrum.js';
import { cieDaylightSpectrum, NOMINAL_TO_ACTUAL_CCT } from './cie-daylight.js';
import { CIE_FL_NAMES, CIE_LED_NAMES, cieLampSpectrum, isCieLampName } from './cie-lamp-tables.js';
import { defaultDisplayModel, displayWhite } from './display.js';
import { phosphorLedSpectrum } from './phosphor-led.js';
import { equalEnergySpectrum, illuminantA, planckianSpectrum } from './planckian.js';
import { tunableWhiteMix } from './tunable-white.js';

export type SourceKind =
  | 'cie-standard-illuminant'
  | 'cie-daylight'
  | 'equal-energy'
  | 'planckian'
  | 'cie-fluorescent'
  | 'cie-led'
  | 'parametric-led'
  | 'tunable-white'
  | 'display';

export interface SourceInfo {
  readonly id: string;
  readonly name: string;
  readonly kind: SourceKind;
  /** True when the spectrum is a parametric model of ours, not a published table. */
  readonly parametric: boolean;
  readonly cct_K: number;
  readonly duv: number;
  readonly melanopic_der: number;
  readonly reference: string;
}

interface SourceDef {
  readonly name: string;
  readonly kind: SourceKind;
  readonly parametric: boolean;
  readonly reference: string;
  readonly build: () => Spectrum;
}

const CIE015 = 'CIE 015:2018';
const FIXED_IDS: readonly string[] = [
  'D65', 'A', 'E', 'D50', 'D55', 'D75',
  ...CIE_FL_NAMES, ...CIE_LED_NAMES,
  'pc-LED-2700K', 'pc-LED-3000K', 'pc-LED-4000K', 'pc-LED-5000K', 'pc-LED-6500K',
  'tunable-white-3000K', 'tunable-white-4000K', 'tunable-white-5000K',
  'display-normal', 'display-night',
];

const PARAM_ID = /^(daylight|planckian|pc-LED|tunable-white)-(\d+(?:\.\d+)?)K$/;

function definition(id: string): SourceDef | undefined {
  if (id === 'D65') return { name: 'CIE standard illuminant D65', kind: 'cie-standard-illuminant', parametric: false, reference: 'ISO/CIE 11664-2:2022 Table B.1', build: illuminantD65 };
  if (id === 'A') return { name: 'CIE standard illuminant A', kind: 'cie-standard-illuminant', parametric: false, reference: 'ISO/CIE 11664-2:2022 eq. 1 (c2 = 1.435e-2 m·K, 2848 K)', build: illuminantA };
  if (id === 'E') return { name: 'Equal-energy spectrum E', kind: 'equal-energy', parametric: false, reference: CIE015, build: equalEnergySpectrum };
  const dNominal = /^D(50|55|75)$/.exec(id);
  if (dNominal) {
    const nominal = Number(dNominal[1]) * 100;
    return { name: `CIE illuminant ${id} (D-series, ${nominal} K nominal)`, kind: 'cie-daylight', parametric: false, reference: `${CIE015} daylight components S0, S1, S2`, build: () => cieDaylightSpectrum(nominal * NOMINAL_TO_ACTUAL_CCT) };
  }
  if (isCieLampName(id)) {
    const fl = id.startsWith('FL');
    return { name: `CIE illuminant ${id}`, kind: fl ? 'cie-fluorescent' : 'cie-led', parametric: false, reference: fl ? `${CIE015} Tables 10.1–10.3 (5 nm, interpolated)` : `${CIE015} Tables 12.1/12.2 (CIE 1 nm dataset)`, build: () => cieLampSpectrum(id) };
  }
  if (id === 'display-normal' || id === 'display-night') {
    const mode = id === 'display-normal' ? 'normal' : 'night';
    return { name: `Display white, ${mode} mode (parametric RGB display)`, kind: 'display', parametric: true, reference: 'parametric model (display.ts)', build: () => displayWhite(defaultDisplayModel(), mode).unitSpectrum };
  }
  const m = PARAM_ID.exec(id);
  if (m) {
    const family = m[1] as string;
    const t = Number(m[2]);
    switch (family) {
      case 'daylight':
        return { name: `CIE daylight (D-series) at ${t} K`, kind: 'cie-daylight', parametric: false, reference: `${CIE015} daylight components S0, S1, S2`, build: () => cieDaylightSpectrum(t) };
      case 'planckian':
        return { name: `Planckian radiator at ${t} K`, kind: 'planckian', parametric: false, reference: "Planck's law, c2 = 1.4388e-2 m·K (CIE 015:2018)", build: () => planckianSpectrum(t) };
      case 'pc-LED':
        return { name: `Phosphor-converted white LED at ${t} K (parametric)`, kind: 'parametric-led', parametric: true, reference: 'parametric model (phosphor-led.ts)', build: () => phosphorLedSpectrum(t) };
      case 'tunable-white':
        return { name: `Tunable white (LED-B1 + LED-B5) at ${t} K`, kind: 'tunable-white', parametric: false, reference: `mix of ${CIE015} LED-B1 and LED-B5 (tunable-white.ts)`, build: () => tunableWhiteMix(cieLampSpectrum('LED-B1'), cieLampSpectrum('LED-B5'), t, 100).spectrum };
    }
  }
  return undefined;
}

const spectra = new Map<string, Spectrum>();
const ders = new Map<string, Readonly<Record<AlphaOpicKey, number>>>();
const infos = new Map<string, SourceInfo>();
const CACHE_LIMIT = 2048;

/** True when `id` names a built-in or parameterised source. */
export function isKnownSourceId(id: string): boolean {
  return definition(id) !== undefined;
}

/** Relative SPD of a library source (cached); throws naming the problem for unknown or out-of-range ids. */
export function sourceSpectrum(id: string): Spectrum {
  let s = spectra.get(id);
  if (s === undefined) {
    const def = definition(id);
    if (def === undefined) {
      throw new RangeError(`unknown light source "${id}"; run "zeitlight sources" for the list (parameterised forms: daylight-<K>K, planckian-<K>K, pc-LED-<K>K, tunable-white-<K>K)`);
    }
    s = def.build();
    if (spectra.size < CACHE_LIMIT) spectra.set(id, s);
  }
  return s;
}

/** The five α-opic DERs of a library source (cached after the first call). */
export function sourceAlphaOpicDer(id: string): Readonly<Record<AlphaOpicKey, number>> {
  let d = ders.get(id);
  if (d === undefined) {
    d = alphaOpicDer(sourceSpectrum(id));
    if (ders.size < CACHE_LIMIT) ders.set(id, d);
  }
  return d;
}

/** Melanopic DER of a library source (cached). */
export function sourceMelanopicDer(id: string): number {
  return sourceAlphaOpicDer(id).mel;
}

/** Description, CCT and melanopic DER of one source (cached). */
export function sourceInfo(id: string): SourceInfo {
  let info = infos.get(id);
  if (info === undefined) {
    const def = definition(id);
    if (def === undefined) sourceSpectrum(id); // throws the explanatory error
    const d = def as SourceDef;
    const c = cctDuv(sourceSpectrum(id));
    info = { id, name: d.name, kind: d.kind, parametric: d.parametric, cct_K: c.cct_K, duv: c.duv, melanopic_der: sourceMelanopicDer(id), reference: d.reference };
    if (infos.size < CACHE_LIMIT) infos.set(id, info);
  }
  return info;
}

/** The fixed entries of the library (parameterised forms are described in the module comment). */
export function listSources(): SourceInfo[] {
  return FIXED_IDS.map(sourceInfo);
}

/** The parameterised id patterns, for help texts. */
export const PARAMETERISED_SOURCE_FORMS: readonly string[] = ['daylight-<CCT>K', 'planckian-<T>K', 'pc-LED-<CCT>K', 'tunable-white-<CCT>K'];
