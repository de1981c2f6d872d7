/**
 * Spectral filters as Transmittance curves on the canonical grid (multiply a spectrum with
 * applyTransmittance): clear and tinted glazing, amber / blue-blocking and neutral eyewear.
 * ALL CURVES HERE ARE PARAMETRIC, NOT PUBLISHED TABLES: smooth logistic edges and Gaussian
 * notches with levels chosen by us to represent typical products (values from general
 * knowledge, from memory). For a real product, load its measured transmittance instead.
 */
import type { Transmittance } from '../photometry/spectrum.js';
import { GRID_LENGTH, gridWavelength_nm } from '../photometry/wavelength-grid.js';
import { logisticEdge } from './spectral-shapes.js';

export interface FilterInfo {
  readonly id: string;
  readonly name: string;
  readonly kind: 'glazing' | 'eyewear';
  readonly parametric: true;
  readonly description: string;
}

interface FilterDef extends FilterInfo {
  readonly curve: (wavelength_nm: number) => number;
}

const uvCut = (l: number) => logisticEdge(l, 385, 6);

const FILTERS: readonly FilterDef[] = [
  {
    id: 'glazing-clear', name: 'Clear double glazing', kind: 'glazing', parametric: true,
    description: 'flat visible transmittance 0.78 with a UV cut-off near 385 nm',
    curve: (l) => 0.78 * uvCut(l),
  },
  {
    id: 'glazing-low-e', name: 'Clear low-emissivity double glazing', kind: 'glazing', parametric: true,
    description: 'visible transmittance about 0.70, falling towards the near infrared from about 690 nm',
    curve: (l) => 0.72 * uvCut(l) * (1 - 0.3 * logisticEdge(l, 700, 25)),
  },
  {
    id: 'glazing-grey', name: 'Grey tinted glazing', kind: 'glazing', parametric: true,
    description: 'neutral grey tint, visible transmittance 0.40',
    curve: (l) => 0.4 * uvCut(l),
  },
  {
    id: 'glazing-bronze', name: 'Bronze tinted glazing', kind: 'glazing', parametric: true,
    description: 'transmittance rising from about 0.30 in the blue to about 0.60 in the red',
    curve: (l) => (0.28 + 0.34 * logisticEdge(l, 570, 45)) * uvCut(l),
  },
  {
    id: 'eyewear-amber', name: 'Amber blue-blocking glasses', kind: 'eyewear', parametric: true,
    description: 'cut-on near 530 nm: transmittance 0.01 below, 0.90 above',
    curve: (l) => 0.01 + 0.89 * logisticEdge(l, 530, 6),
  },
  {
    id: 'eyewear-blue-filter', name: 'Clear lens with blue-light filter', kind: 'eyewear', parametric: true,
    description: 'clear lens (0.92) with a dip to about 0.60 around 430 nm and a UV cut-off near 405 nm',
    curve: (l) => (0.92 - 0.32 * Math.exp(-0.5 * ((l - 430) / 18) ** 2)) * logisticEdge(l, 405, 5),
  },
  {
    id: 'eyewear-grey-sunglasses', name: 'Grey sunglasses', kind: 'eyewear', parametric: true,
    description: 'neutral grey, transmittance 0.15',
    curve: () => 0.15,
  },
];

const cache = new Map<string, Transmittance>();

/** The built-in filters (all parametric). */
export function listFilters(): FilterInfo[] {
  return FILTERS.map(({ id, name, kind, parametric, description }) => ({ id, name, kind, parametric, description }));
}

/** Transmittance curve of a built-in filter by id; throws naming the known ids. */
export function filterTransmittance(id: string): Transmittance {
  let t = cache.get(id);
  if (t === undefined) {
    const def = FILTERS.find((f) => f.id === id);
    if (def === undefined) throw new RangeError(`unknown filter "${id}"; known filters: ${FILTERS.map((f) => f.id).join(', ')}`);
    const values = new Float64Array(GRID_LENGTH);
    for (let i = 0; i < GRID_LENGTH; i++) values[i] = def.curve(gridWavelength_nm(i));
    t = { values, label: `${def.name} (parametric)` };
    cache.set(id, t);
  }
  return t;
}
