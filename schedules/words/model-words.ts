/**
 * The models of a run for people: each model's name and its one citation, taken from the model
 * registry (model/circadian/model-citations.ts, registry.ts, sleepiness-registry.ts), and the
 * other published methods the results rest on with their references. Every printed source of a
 * model comes from here.
 */
import { isPacemakerId } from '../../model/circadian/registry.js';
import { isSleepinessModelId } from '../../model/circadian/sleepiness-registry.js';
import { MELATONIN_MODEL, melatoninCitation, pacemakerCitation, sleepinessCitation } from '../../model/circadian/model-citations.js';
import { pacemakerName, sleepinessName } from '../run/ensemble-members.js';

export interface ModelWords {
  /** What the model does, for a table's first column. */
  readonly part: string;
  readonly name: string;
  readonly citation: string;
}

export function bodyClockModelWords(id: string): ModelWords {
  return { part: 'Body clock and its response to light', name: pacemakerName(id), citation: isPacemakerId(id) ? pacemakerCitation(id) : 'not in this version’s model registry' };
}

export function sleepinessModelWords(id: string): ModelWords {
  const name = sleepinessName(id);
  return { part: 'Sleepiness (KSS)', name: name.charAt(0).toUpperCase() + name.slice(1), citation: isSleepinessModelId(id) ? sleepinessCitation(id) : 'not in this version’s model registry' };
}

export function melatoninModelWords(): ModelWords {
  return { part: 'Melatonin and its suppression by light', name: MELATONIN_MODEL.name, citation: melatoninCitation() };
}

/** Published methods behind the light and the headline thresholds (not registry models; one reference each). */
export interface MethodWords {
  readonly part: string;
  readonly method: string;
  readonly reference: string;
}

export const LIGHT_METHODS: readonly MethodWords[] = [
  { part: 'Sun position', method: 'Solar position algorithm of the US National Renewable Energy Laboratory', reference: 'Reda & Andreas 2004, Solar Energy 76:577' },
  { part: 'Sky and daylight through windows', method: 'CIE standard general sky, the view of each window from the seat, light reflected inside the room', reference: 'CIE S 011/E:2003' },
  { part: 'Light at the eye', method: 'CIE S 026 α-opic quantities (melanopic EDI), with the lens of the person’s age', reference: 'CIE S 026/E:2018' },
  { part: 'Recommended light levels', method: 'At least 250 lx melanopic EDI by day, at most 10 lx in the 3 h before sleep, at most 1 lx during sleep', reference: 'Brown et al. 2022, PLOS Biology 20:e3001571' },
  { part: 'Sleepiness threshold', method: 'KSS 7 or more (“sleepy, but no effort to keep awake”) counts as sleepy', reference: 'Åkerstedt & Gillberg 1990, Int J Neurosci 52:29' },
];
