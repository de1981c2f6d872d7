// Writes the invented luminaires of this folder from analytic intensity distributions whose
// total flux is known in closed form (see README.md). Run: node tests/photometry/luminaires/make-luminaires.mjs
import { writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const HERE = dirname(fileURLToPath(import.meta.url));
const RAD = Math.PI / 180;
const steps = (from, to, step) => Array.from({ length: Math.round((to - from) / step) + 1 }, (_, i) => from + i * step);
const fmt = (v) => (Math.abs(v) < 5e-4 ? '0' : v.toFixed(3));

/** Lines of at most `perLine` values (LM-63 keeps lines short). */
function wrap(values, perLine = 10) {
  const out = [];
  for (let i = 0; i < values.length; i += perLine) out.push(values.slice(i, i + perLine).join(' '));
  return out;
}

/** An IES LM-63 file (2002 or 2019 layout) from an intensity function I(h, v) in candela. */
function ies({ edition, test, tilt, lamps = 1, lumens, multiplier = 1, type = 1, units = 2, dims, ballast = 1, watts, v, h, intensity }) {
  const first = edition === 2019 ? 'IES:LM-63-2019' : 'IESNA:LM-63-2002';
  const lines = [first, `[TEST] ${test}`, '[TESTLAB] Zeitlight invented luminaires', '[ISSUEDATE] 2026-12-06', '[MANUFAC] Zeitlight test corpus (invented, not a product)', `[LUMINAIRE] ${test}`, '[LAMP] LED module'];
  if (tilt === undefined) lines.push('TILT=NONE');
  else lines.push('TILT=INCLUDE', String(tilt.geometry), String(tilt.angles.length), tilt.angles.join(' '), tilt.factors.join(' '));
  lines.push([lamps, lumens, multiplier, v.length, h.length, type, units, ...dims].join(' '));
  lines.push([ballast, 1, watts].join(' '));
  lines.push(...wrap(v.map(String)), ...wrap(h.map(String)));
  for (const hh of h) lines.push(...wrap(v.map((vv) => fmt(intensity(hh, vv) / multiplier))));
  return lines.join('\r\n') + '\r\n';
}

/** An EULUMDAT file; intensities are written in cd/klm of the lamp flux (LORL 100 %). */
function ldt({ name, isym, mc, ng, dg, lampFlux, watts, gAngles, intensity }) {
  const dc = 360 / mc;
  const cAngles = steps(0, 360 - dc, dc);
  const stored = isym === 0 ? cAngles : isym === 1 ? [0] : isym === 2 ? steps(0, 180, dc) : isym === 3 ? [...steps(270, 360 - dc, dc), ...steps(0, 90, dc)] : steps(0, 90, dc);
  const lines = [
    'Zeitlight test corpus (invented, not a product)', isym === 1 ? '1' : '3', String(isym), String(mc), String(dc), String(ng), String(dg),
    'ZL-TEST', name, 'ZL-1', name.slice(0, 8), '2026-12-06 zeitlight',
    '600', '600', '80', '580', '580', '0', '0', '0', '0',
    '100', '100', '1', '0', '1', '1', 'LED module', String(lampFlux), '4000K', '1B', String(watts),
    ...Array.from({ length: 10 }, () => '0.5'),
    ...cAngles.map(String), ...gAngles.map(String),
  ];
  for (const c of stored) for (const g of gAngles) lines.push(fmt((intensity(c, g) / lampFlux) * 1000));
  return lines.join('\r\n') + '\r\n';
}

const G90 = steps(0, 90, 5);
const C15 = (a, b) => steps(a, b, 15);
const cos = (d) => Math.cos(d * RAD);
const sin = (d) => Math.sin(d * RAD);
const down = (g) => (g <= 90 ? cos(g) : 0);

// Peak intensities chosen so each closed-form flux is a round number.
const lambert = (flux) => (_c, g) => (flux / Math.PI) * down(g); // Φ = π·I0
const batwing = (flux) => (c, g) => (flux / (2.5 * Math.PI)) * down(g) * (1 + 3 * sin(g) ** 2) * (1 + 0.5 * cos(2 * c)); // Φ = 2.5·π·I0
const washC0 = (flux) => (c, g) => (flux / Math.PI) * down(g) * (1 + 0.8 * cos(c)); // Φ = π·I0
const washC90 = (flux) => (c, g) => (flux / Math.PI) * down(g) * (1 + 0.8 * sin(c)); // Φ = π·I0
const skew = (flux) => (c, g) => (flux / Math.PI) * down(g) * (1 + 0.5 * cos(c) + 0.3 * sin(c)); // Φ = π·I0

const FILES = {
  'lambertian-downlight-2002.ies': ies({ edition: 2002, test: 'Lambertian downlight', lumens: 3000, dims: [-0.2, -0.2, 0], watts: 25, v: G90, h: [0], intensity: lambert(3000) }),
  'lambertian-downlight-2019-tilt.ies': ies({ edition: 2019, test: 'Lambertian downlight, tilt table', tilt: { geometry: 1, angles: [0, 45, 90], factors: [1, 0.95, 0.9] }, lumens: 3000, dims: [-0.2, -0.2, 0], watts: 25, v: G90, h: [0], intensity: lambert(3000) }),
  'lambertian-downlight.ldt': ldt({ name: 'Lambertian downlight', isym: 1, mc: 24, ng: 19, dg: 5, lampFlux: 3000, watts: 25, gAngles: G90, intensity: lambert(3000) }),
  'batwing-quadrant.ies': ies({ edition: 2002, test: 'Batwing, quadrant symmetric', lumens: 2000, lamps: 2, multiplier: 2, dims: [0.6, 0.6, 0], watts: 36, v: G90, h: C15(0, 90), intensity: batwing(4000) }),
  'batwing-quadrant.ldt': ldt({ name: 'Batwing, quadrant symmetric', isym: 4, mc: 24, ng: 19, dg: 5, lampFlux: 4000, watts: 36, gAngles: G90, intensity: batwing(4000) }),
  'wallwasher-c0-c180.ies': ies({ edition: 2002, test: 'Wall-washer, symmetric about C0-C180', lumens: 2000, dims: [0.1, 1.2, 0], watts: 20, v: G90, h: C15(0, 180), intensity: washC0(2000) }),
  'wallwasher-c0-c180.ldt': ldt({ name: 'Wall-washer, symmetric about C0-C180', isym: 2, mc: 24, ng: 19, dg: 5, lampFlux: 2000, watts: 20, gAngles: G90, intensity: washC0(2000) }),
  'wallwasher-c90-c270-2019.ies': ies({ edition: 2019, test: 'Wall-washer, symmetric about C90-C270', lumens: 2000, dims: [0.1, 1.2, 0], watts: 20, v: G90, h: C15(90, 270), intensity: washC90(2000) }),
  'wallwasher-c90-c270.ldt': ldt({ name: 'Wall-washer, symmetric about C90-C270', isym: 3, mc: 24, ng: 19, dg: 5, lampFlux: 2000, watts: 20, gAngles: G90, intensity: washC90(2000) }),
  'asymmetric-0-360.ies': ies({ edition: 2002, test: 'Asymmetric downlight, no symmetry', lumens: 1500, dims: [0.3, 0.3, 0.05], watts: 15, v: G90, h: C15(0, 360), intensity: skew(1500) }),
  'asymmetric.ldt': ldt({ name: 'Asymmetric downlight, no symmetry', isym: 0, mc: 24, ng: 19, dg: 5, lampFlux: 1500, watts: 15, gAngles: G90, intensity: skew(1500) }),
  'uplight-90-180.ies': ies({ edition: 2002, test: 'Lambertian uplight', lumens: 2500, dims: [-0.4, -0.4, 0], watts: 22, v: steps(90, 180, 5), h: [0], intensity: (_c, g) => (2500 / Math.PI) * Math.abs(cos(g)) }),
  'globe-absolute.ies': ies({ edition: 2019, test: 'Isotropic globe, absolute photometry', lumens: -1, dims: [-0.25, -0.25, -0.25], watts: 12, v: steps(0, 180, 10), h: [0], intensity: () => 100 }),
  'floodlight-type-b.ies': ies({ edition: 2002, test: 'Floodlight, type B, laterally symmetric', type: 2, lumens: 5000, dims: [0.3, 0.3, 0.1], watts: 40, v: steps(-90, 90, 5), h: steps(0, 90, 5), intensity: (h, v) => (5000 / Math.PI) * cos(h) * cos(v) }),
  'floodlight-type-a.ies': ies({ edition: 2002, test: 'Floodlight, type A, symmetric about the horizontal', type: 3, units: 1, lumens: 5000, dims: [1, 1, 0.25], watts: 40, v: steps(0, 90, 5), h: steps(-90, 90, 5), intensity: (h, v) => (5000 / Math.PI) * cos(h) * cos(v) }),
};

export { FILES };

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  for (const [name, text] of Object.entries(FILES)) writeFileSync(join(HERE, name), text);
  console.log(`wrote ${Object.keys(FILES).length} files to ${HERE}`);
}
