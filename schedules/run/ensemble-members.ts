/**
 * The models of an ensemble run: each member is one body-clock model (pacemaker with its light
 * front end, model/circadian/registry.ts) paired with one sleepiness model
 * (model/circadian/sleepiness-registry.ts). The default ensemble is every pacemaker of
 * DEFAULT_ENSEMBLE_PACEMAKERS with every sleepiness model, the run's default pair first. Names and
 * citations are those the briefing and the CLI print.
 */
import { createPacemaker, DEFAULT_ENSEMBLE_PACEMAKERS, DEFAULT_PACEMAKER_ID, isPacemakerId, type PacemakerId } from '../../model/circadian/registry.js';
import { HEADLINE_SLEEPINESS_ID, isSleepinessModelId, SLEEPINESS_MODEL_IDS, SLEEPINESS_MODELS, type SleepinessModelId } from '../../model/circadian/sleepiness-registry.js';

/** The run's sleepiness model (the headline KSS model). */
export const DEFAULT_SLEEPINESS_ID: SleepinessModelId = HEADLINE_SLEEPINESS_ID;

export interface EnsembleMember {
  readonly pacemaker: PacemakerId;
  readonly sleepiness: SleepinessModelId;
}

/** Short names for sentences ("with the Hannay et al. 2019 single-population model it ranks second"); the pacemaker's own label otherwise. */
const PACEMAKER_NAMES: Partial<Record<PacemakerId, string>> = {
  'jfk99-x7': 'Jewett et al. 1999 x⁷ oscillator',
  'jfk99-x7-sh07': 'Jewett et al. 1999 x⁷ oscillator with St Hilaire et al. 2007 light processing',
  'fjk99-cubic': 'Forger et al. 1999 cubic oscillator',
  'fjk99-cubic-sf14': 'Forger et al. 1999 cubic oscillator with Serkh & Forger 2014 light processing',
  'fjk99-cubic-sh07': 'Forger et al. 1999 cubic oscillator with St Hilaire et al. 2007 light processing',
  'hfb19-sp': 'Hannay et al. 2019 single-population model',
};

export function pacemakerName(id: string): string {
  if (!isPacemakerId(id)) return id;
  return PACEMAKER_NAMES[id] ?? createPacemaker(id).label;
}

export function pacemakerSource(id: string): string {
  return isPacemakerId(id) ? createPacemaker(id).source : id;
}

/** Short names of the sleepiness models inside a member's name; the registry's name otherwise. */
const SLEEPINESS_SHORT: Partial<Record<SleepinessModelId, string>> = {
  'tpm-kss': 'three-process model',
  'postnova18-kss': 'Postnova et al. 2018 model',
};

/** "three-process model", "Postnova et al. 2018 model": a sleepiness model's name after "KSS from the". */
export function sleepinessShortName(id: string): string {
  return (isSleepinessModelId(id) ? SLEEPINESS_SHORT[id] : undefined) ?? sleepinessName(id);
}

export function sleepinessName(id: string): string {
  return isSleepinessModelId(id) ? SLEEPINESS_MODELS[id].name : id;
}

export function sleepinessSource(id: string): string {
  return isSleepinessModelId(id) ? SLEEPINESS_MODELS[id].source : id;
}

/** True when every member uses the same sleepiness model (the ensemble varies the body clock only). */
export function bodyClockOnly(members: readonly EnsembleMember[]): boolean {
  return new Set(members.map((m) => m.sleepiness)).size <= 1;
}

/** A member's name in sentences: the body-clock model, plus "(KSS: three-process model)" when the sleepiness models vary too. */
export function memberName(m: { readonly pacemaker: string; readonly sleepiness: string }, withSleepiness: boolean): string {
  if (!withSleepiness) return pacemakerName(m.pacemaker);
  return `${pacemakerName(m.pacemaker)} (KSS: ${sleepinessShortName(m.sleepiness)})`;
}

/**
 * The default ensemble for a run whose default model is `defaultPacemaker`: that model first, then
 * the other pacemakers of DEFAULT_ENSEMBLE_PACEMAKERS; each with every sleepiness model, the
 * headline one first.
 */
export function defaultEnsemble(defaultPacemaker: PacemakerId = DEFAULT_PACEMAKER_ID): EnsembleMember[] {
  const pacemakers = [defaultPacemaker, ...DEFAULT_ENSEMBLE_PACEMAKERS.filter((p) => p !== defaultPacemaker)];
  const sleepiness = [DEFAULT_SLEEPINESS_ID, ...SLEEPINESS_MODEL_IDS.filter((s) => s !== DEFAULT_SLEEPINESS_ID)];
  return pacemakers.flatMap((pacemaker) => sleepiness.map((s) => ({ pacemaker, sleepiness: s })));
}
