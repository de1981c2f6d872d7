// Colour-blind-safe palette: the eight colours of Okabe & Ito, "Color Universal Design (CUD):
// how to make figures and presentations that are friendly to colorblind people" (2008),
// hex values as commonly quoted (from memory). Series are told apart by colour and also by
// dash pattern, so nothing relies on hue alone.
export const OKABE_ITO = {
  black: '#000000',
  orange: '#E69F00',
  skyBlue: '#56B4E9',
  bluishGreen: '#009E73',
  yellow: '#F0E442',
  blue: '#0072B2',
  vermillion: '#D55E00',
  reddishPurple: '#CC79A7',
} as const;

/** Order for strategies: baseline in black, then the most distinct pairs first. */
const SERIES_ORDER = [OKABE_ITO.black, OKABE_ITO.blue, OKABE_ITO.vermillion, OKABE_ITO.bluishGreen, OKABE_ITO.reddishPurple, OKABE_ITO.orange, OKABE_ITO.skyBlue];
const DASHES = ['', '6 3', '2 3', '8 3 2 3', '1 2', '10 4', '4 4'];

export function seriesColour(index: number): string {
  return SERIES_ORDER[((index % SERIES_ORDER.length) + SERIES_ORDER.length) % SERIES_ORDER.length] ?? OKABE_ITO.black;
}

export function seriesDash(index: number): string {
  return DASHES[Math.floor(index / SERIES_ORDER.length + index) % DASHES.length] ?? '';
}

/** Light-source kinds keep one colour each wherever they appear. */
export const SOURCE_KIND_COLOURS = {
  daylight: OKABE_ITO.orange,
  electric: OKABE_ITO.blue,
  screen: OKABE_ITO.reddishPurple,
  outdoor: OKABE_ITO.yellow,
  measured: OKABE_ITO.bluishGreen,
  other: OKABE_ITO.skyBlue,
} as const;

/** Recommendation band colours (light fills, drawn under the data). */
export const BAND_COLOURS = { day: OKABE_ITO.orange, evening: OKABE_ITO.blue, night: OKABE_ITO.black } as const;

/**
 * Sequential scale for KSS 1..9 (alert to very sleepy): light to dark in one hue family
 * (Okabe-Ito blue) with lightness steps, readable by all common colour-vision types.
 */
export function kssColour(kss: number): string {
  const t = Math.min(1, Math.max(0, (kss - 1) / 8));
  const light = [240, 246, 252];
  const dark = [0, 62, 110];
  const mix = (i: number) => Math.round((light[i] ?? 0) + ((dark[i] ?? 0) - (light[i] ?? 0)) * t);
  return `rgb(${mix(0)}, ${mix(1)}, ${mix(2)})`;
}
