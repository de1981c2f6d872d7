/**
 * One citation per registered model, in the form every printed text uses (the briefing, the app,
 * the command line): "Authors Year, Journal Volume:Page", several papers joined by "; ". The
 * models' `source` fields (registry.ts, sleepiness-registry.ts, melatonin-sthilaire.ts) keep the
 * technical provenance (which values came from where, what was read from memory); a citation names
 * only the published papers a reader would look up, each of which that `source` also names.
 *
 * The two St Hilaire et al. 2007 papers are different works and are always cited with their full
 * author lists and journals: the light-processing model (J Theor Biol 247:583) and the melatonin
 * model (J Pineal Res 43:294).
 */
import type { PacemakerId } from './registry.js';
import type { SleepinessModelId } from './sleepiness-registry.js';

/** A published paper as cited. */
export interface PaperRef {
  readonly authors: string;
  readonly year: number;
  /** "J Biol Rhythms 14:493". */
  readonly journal: string;
}

export const paperText = (p: PaperRef): string => `${p.authors} ${p.year}, ${p.journal}`;

/** Papers, each written once (journal abbreviations as in the models' sources). */
export const PAPERS = {
  jewett99: { authors: 'Jewett, Forger & Kronauer', year: 1999, journal: 'J Biol Rhythms 14:493' },
  kronauer99: { authors: 'Kronauer, Forger & Jewett', year: 1999, journal: 'J Biol Rhythms 14:500' },
  forger99: { authors: 'Forger, Jewett & Kronauer', year: 1999, journal: 'J Biol Rhythms 14:532' },
  serkh14: { authors: 'Serkh & Forger', year: 2014, journal: 'PLoS Comput Biol 10:e1003523' },
  stHilaireLight07: { authors: 'St Hilaire, Klerman, Khalsa, Wright, Czeisler & Kronauer', year: 2007, journal: 'J Theor Biol 247:583' },
  hannay19: { authors: 'Hannay, Booth & Forger', year: 2019, journal: 'J Biol Rhythms 34:658' },
  stHilaireMelatonin07: { authors: 'St Hilaire, Gronfier, Zeitzer & Klerman', year: 2007, journal: 'J Pineal Res 43:294' },
  akerstedt97: { authors: 'Åkerstedt & Folkard', year: 1997, journal: 'Chronobiol Int 14:115' },
  akerstedt04: { authors: 'Åkerstedt, Folkard & Portin', year: 2004, journal: 'Aviat Space Environ Med 75:A75' },
  ingre14: { authors: 'Ingre et al.', year: 2014, journal: 'PLoS ONE 9:e108679' },
  postnova18: { authors: 'Postnova, Lockley & Robinson', year: 2018, journal: 'J Biol Rhythms 33:203' },
} as const satisfies Record<string, PaperRef>;

/** The papers of each body-clock model: oscillator first, then its light processing when published separately. */
export const PACEMAKER_PAPERS: Readonly<Record<PacemakerId, readonly PaperRef[]>> = {
  'jfk99-x7': [PAPERS.jewett99, PAPERS.kronauer99],
  'jfk99-x7-sh07': [PAPERS.jewett99, PAPERS.stHilaireLight07],
  'fjk99-cubic': [PAPERS.forger99],
  'fjk99-cubic-sf14': [PAPERS.forger99, PAPERS.serkh14],
  'fjk99-cubic-sh07': [PAPERS.forger99, PAPERS.stHilaireLight07],
  'hfb19-sp': [PAPERS.hannay19],
};

export const SLEEPINESS_PAPERS: Readonly<Record<SleepinessModelId, readonly PaperRef[]>> = {
  'tpm-kss': [PAPERS.akerstedt97, PAPERS.akerstedt04, PAPERS.ingre14],
  'postnova18-kss': [PAPERS.postnova18],
};

/** The melatonin model (one in this version): St Hilaire et al. 2007, melatonin-sthilaire.ts. */
export const MELATONIN_MODEL = {
  id: 'sthilaire07-melatonin',
  name: 'St Hilaire et al. 2007 melatonin model',
  papers: [PAPERS.stHilaireMelatonin07] as readonly PaperRef[],
} as const;

const join = (papers: readonly PaperRef[]): string => papers.map(paperText).join('; ');

export function pacemakerCitation(id: PacemakerId): string {
  return join(PACEMAKER_PAPERS[id]);
}

export function sleepinessCitation(id: SleepinessModelId): string {
  return join(SLEEPINESS_PAPERS[id]);
}

export function melatoninCitation(): string {
  return join(MELATONIN_MODEL.papers);
}
