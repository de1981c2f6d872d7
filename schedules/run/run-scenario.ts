/**
 * The run pipeline: scenario → exposure timelines (persona × strategy) → light at the eye per
 * minute and source → body-clock models → metrics per day and strategy → results document.
 * Pure: the weather file and light logs come in as text, nothing is read or written here, so
 * the same function runs in the CLI, in Electron's main process and in a Web Worker.
 */
import { sunTimes } from '../../model/daylight/index.js';
import type { PacemakerId } from '../../model/circadian/registry.js';
import { DEFAULT_PACEMAKER_ID } from '../../model/circadian/registry.js';
import { DLMO_DEFINITION, SUPPRESSION_DEFINITION } from '../../model/circadian/melatonin-nights.js';
import { HEADLINE_SLEEPINESS_ID, SLEEPINESS_MODELS } from '../../model/circadian/sleepiness-registry.js';
import { MELATONIN_MODEL, melatoninCitation } from '../../model/circadian/model-citations.js';
import { importLightLog } from '../lightlog/import-light-log.js';
import { logToMinuteSeries, type MinuteLightSeries } from '../lightlog/log-to-minutes.js';
import type { Persona, Scenario } from '../schema/scenario-types.js';
import { utcOffsetAt_min } from '../time/local-calendar.js';
import { expandScenario } from '../timeline/expand-scenario.js';
import { BASELINE_ID, type ExposureTimeline } from '../timeline/exposure-types.js';
import { closedEyeLightSeries, entrainedStart, pacemakerFor, runBodyClockFor, sleepSpecFor } from './body-clock-run.js';
import { eyeSeries, type EyeCaches, type EyeSeries } from './eye-series.js';
import { mergedLightSeries } from './light-segments.js';
import { localClock, localIsoAt, utcOffsetSpans, type LocalClock } from './local-clock.js';
import { strategyMetrics, DAYTIME_MEL_EDI_LX, KSS_SLEEPY, PRE_SLEEP_MEL_EDI_LX, PRE_SLEEP_WINDOW_H, SLEEP_MEL_EDI_LX } from './metrics.js';
import { outdoorLight, type OutdoorLight, type WeatherText } from './outdoor-light.js';
import { headlines, recommend } from './recommend.js';
import { RESULTS_FORMAT, RESULTS_FORMAT_VERSION, type PersonaResult, type RunResults, type StrategyResult } from './results-types.js';
import type { NightBlinds } from './room-scene.js';
import { RunInputError } from './run-input-error.js';
import { measuredLightUses, weatherBasis, weatherSiteWarning, type LogInRun } from './run-basis.js';

export const PIPELINE_VERSION = '1.0.0';

export const RUN_CAUTION =
  'Caution: model estimates for planning and comparing lighting options, not diagnosis or treatment. ' +
  'People differ widely. Follow local codes, lighting standards and photobiological safety limits; ' +
  'consult qualified clinicians for any therapeutic use of light.';

export interface RunInput {
  /** A validated scenario (validateScenarioText / validateScenarioValue). */
  readonly scenario: Scenario;
  /** The weather file's text when the site names one. */
  readonly weather?: WeatherText;
  /** Light-log CSV text by log id. */
  readonly lightLogTexts?: Readonly<Record<string, string>>;
  /** Only these personas (default all). */
  readonly personaIds?: readonly string[];
  readonly modelId?: PacemakerId;
  /** Called after each persona × strategy with the fraction done (0–1) and a short stage text. */
  readonly onProgress?: (fraction: number, stage: string) => void;
}

/** Per-minute light at the eye kept for exposure.csv and checks. */
export interface TimelineLight {
  readonly personaId: string;
  readonly strategyId: string;
  readonly timeline: ExposureTimeline;
  readonly eye: EyeSeries;
  /** The persona as the body-clock models saw it under this strategy. */
  readonly persona: Persona;
  /** Sleep episodes the body-clock run used or predicted (h since the run start). */
  readonly sleepEpisodes: readonly { readonly start_h: number; readonly end_h: number }[];
  /** Modelled plasma melatonin (pmol/L) with light and in dim light, at the body-clock samples (h). */
  readonly melatonin: { readonly t_h: readonly number[]; readonly plasma_pmol_L: readonly number[]; readonly dim_pmol_L: readonly number[] };
}

export interface RunOutput {
  readonly results: RunResults;
  readonly light: readonly TimelineLight[];
  readonly clock: LocalClock;
  readonly outdoor: OutdoorLight;
}

function nightBlinds(scenario: Scenario, timeline: ExposureTimeline): NightBlinds {
  const mid = timeline.days[Math.floor(timeline.days.length / 2)] ?? timeline.days[0];
  if (mid === undefined) return { sunset_min: 1260, sunrise_min: 420 };
  const [y, m, d] = mid.date.split('-').map(Number);
  const offset_h = utcOffsetAt_min(scenario.site.timeZone, mid.utcStart_ms + 12 * 3_600_000) / 60;
  const t = sunTimes({ year: y ?? 2000, month: m ?? 1, day: d ?? 1 }, { latitude_deg: scenario.site.latitude_deg, longitude_deg: scenario.site.longitude_deg, elevation_m: scenario.site.elevation_m }, offset_h);
  if (t.kind === 'polar-day') return { sunrise_min: 0, sunset_min: 1439 };
  if (t.kind === 'polar-night') return { sunrise_min: 720, sunset_min: 721 };
  return { sunrise_min: (t.sunrise_h ?? 7) * 60, sunset_min: (t.sunset_h ?? 19) * 60 };
}

function importLogs(scenario: Scenario, timeline: ExposureTimeline, texts: Readonly<Record<string, string>>, warnings: string[], imported: LogInRun[]): Map<string, MinuteLightSeries> {
  const used = new Set(scenario.personas.flatMap((p) => p.measuredLight.map((m) => m.log)));
  const out = new Map<string, MinuteLightSeries>();
  scenario.lightLogs.forEach((spec, i) => {
    if (!used.has(spec.id)) return;
    const text = texts[spec.id];
    if (text === undefined) throw new RunInputError(`lightLogs[${i}].file`, `the light log ${spec.file} was not supplied`);
    const r = importLightLog(text, { ...spec, timeZone: spec.timeZone ?? scenario.site.timeZone });
    if (r.log === undefined) {
      const first = r.problems.find((p) => p.severity === 'error') ?? r.problems[0];
      throw new RunInputError(`lightLogs[${i}].file`, `${spec.file}${first?.line != null ? ` line ${first.line}` : ''}: ${first?.message ?? 'cannot be read'}`);
    }
    for (const p of r.problems) if (p.severity === 'warning') warnings.push(`${spec.file}${p.line !== null ? ` line ${p.line}` : ''}: ${p.message}`);
    const minutes = logToMinuteSeries(r.log, timeline.runStartUtc_ms, timeline.total_min);
    out.set(spec.id, minutes);
    imported.push({ id: spec.id, file: spec.file, log: r.log, minutes });
  });
  return out;
}

export function runScenario(input: RunInput): RunOutput {
  const scenario = input.scenario;
  const modelId = input.modelId ?? DEFAULT_PACEMAKER_ID;
  const expanded = expandScenario(scenario);
  const first = expanded.timelines[0];
  if (first === undefined) throw new RunInputError('personas', 'no persona to run');
  const clock = localClock(first);
  // Minutes at which anyone is outdoors or in a vehicle under any strategy.
  const outside = new Uint8Array(first.total_min);
  const indoorIds = new Set(expanded.variants.flatMap((v) => v.scenario.places.filter((p) => p.kind === 'room').map((p) => p.id)));
  for (const t of expanded.timelines) for (const s of t.slices) if (!indoorIds.has(s.placeId)) outside.fill(1, s.start_min, s.end_min);
  const outdoor = outdoorLight(scenario, first, input.weather, outside);
  const warnings: string[] = [];
  if (outdoor.filledHours > 0) warnings.push(`weather file: ${outdoor.filledHours} hour(s) with missing values were filled from a neighbour`);
  const weather = weatherBasis(scenario, input.weather?.fileName ?? null, outdoor.weatherLocation);
  const weatherWarning = weatherSiteWarning(weather, scenario.site);
  if (weatherWarning !== null) warnings.push(weatherWarning);
  const importedLogs: LogInRun[] = [];
  const logs = importLogs(scenario, first, input.lightLogTexts ?? {}, warnings, importedLogs);
  const night = nightBlinds(scenario, first);
  const caches: EyeCaches = { weatherKey: outdoor.key, daylightFactors: new Map() };
  const wanted = input.personaIds === undefined ? undefined : new Set(input.personaIds);
  const light: TimelineLight[] = [];

  const personas: PersonaResult[] = [];
  const jobs = Math.max(1, expanded.timelines.filter((t) => wanted === undefined || wanted.has(t.personaId)).length);
  let done = 0;
  for (const persona of scenario.personas) {
    if (wanted !== undefined && !wanted.has(persona.id)) continue;
    const runs: Omit<StrategyResult, 'headlines'>[] = [];
    let baselineCbt: number[] | undefined;
    let initial: ReturnType<typeof entrainedStart> | undefined;
    for (const variant of expanded.variants) {
      const timeline = expanded.timelines.find((t) => t.personaId === persona.id && t.strategyId === variant.id);
      if (timeline === undefined) continue;
      const vPersona: Persona = variant.scenario.personas.find((p) => p.id === persona.id) ?? persona;
      const eye = eyeSeries({ variant: variant.scenario, persona: vPersona, timeline, clock, outdoor, night, logs, caches });
      const model = pacemakerFor(vPersona, modelId);
      const sleep = sleepSpecFor(vPersona, timeline);
      // Every strategy starts from the state entrained to the baseline's first day.
      if (variant.id === BASELINE_ID) initial = entrainedStart(model, mergedLightSeries(eye.mel_edi_lx), sleep, closedEyeLightSeries(eye.melClosed_edi_lx));
      const bc = runBodyClockFor(model, eye.mel_edi_lx, sleep, initial, timeline.total_min, eye.melClosed_edi_lx);
      if (variant.id === BASELINE_ID) baselineCbt = bc.outcome.cbtmin_h;
      light.push({ personaId: persona.id, strategyId: variant.id, timeline, eye, persona: vPersona, sleepEpisodes: bc.outcome.sleepEpisodes, melatonin: { t_h: bc.run.samples.t_h, plasma_pmol_L: bc.run.samples.plasmaMelatonin_pmol_L, dim_pmol_L: bc.run.samples.dimMelatonin_pmol_L } });
      done++;
      input.onProgress?.(done / jobs, `${persona.name}: ${variant.name}`);
      runs.push(
        strategyMetrics({
          id: variant.id,
          name: variant.name,
          changes: variant.changes,
          timeline,
          clock,
          eye,
          clockOutcome: bc.outcome,
          rhsEvaluations: bc.run.rhsEvaluations,
          baselineCbtmin_h: variant.id === BASELINE_ID ? undefined : baselineCbt,
        }),
      );
    }
    const base = runs.find((r) => r.is_baseline);
    if (base === undefined) continue;
    const shortName = persona.name.replace(/\s*\([^)]*\)\s*$/, '');
    const strategies: StrategyResult[] = runs.map((r) => ({ ...r, headlines: headlines(shortName, r, base, r.name, r.is_baseline) }));
    personas.push({ id: persona.id, name: persona.name, age_y: persona.age_y, sleep_mode: persona.sleep.mode, strategies, recommendation: recommend(shortName, runs) });
  }

  const hours = Math.ceil(first.total_min / 60);
  const results: RunResults = {
    format: RESULTS_FORMAT,
    version: RESULTS_FORMAT_VERSION,
    generator: { name: 'zeitlight', pipeline: PIPELINE_VERSION },
    caution: RUN_CAUTION,
    scenario: {
      name: scenario.name,
      start_date: scenario.run.startDate,
      days: scenario.run.days,
      time_zone: scenario.site.timeZone,
      site_name: scenario.site.name ?? null,
      latitude_deg: scenario.site.latitude_deg,
      longitude_deg: scenario.site.longitude_deg,
      weather: scenario.site.weather.kind === 'file' ? 'weather-file' : 'sky-model',
      sky_by_day: outdoor.skyByDay,
    },
    models: { pacemaker: modelId, melatonin: `${MELATONIN_MODEL.name} (${melatoninCitation()})`, sleepiness: SLEEPINESS_MODELS[HEADLINE_SLEEPINESS_ID].name, light_input: 'melanopic EDI at the eye (CIE S 026), converted to the pacemaker calibration source', dlmo_definition: DLMO_DEFINITION, melatonin_suppression_definition: SUPPRESSION_DEFINITION },
    thresholds: {
      daytime_mel_edi_lx: DAYTIME_MEL_EDI_LX,
      pre_sleep_mel_edi_lx: PRE_SLEEP_MEL_EDI_LX,
      pre_sleep_window_h: PRE_SLEEP_WINDOW_H,
      sleep_mel_edi_lx: SLEEP_MEL_EDI_LX,
      kss_sleepy: KSS_SLEEPY,
      source: 'Brown et al. 2022, PLOS Biology 20(3):e3001571; KSS 7 or more = sleepy (common practice)',
    },
    days: first.days.map((d) => ({ index: d.index, date: d.date, weekday: d.weekday, start_local: localIsoAt(first, clock, d.start_min), length_h: d.length_min / 60 })),
    hours: { start_local: Array.from({ length: hours }, (_, h) => localIsoAt(first, clock, h * 60)) },
    local_clock: { utc_offsets: utcOffsetSpans(clock) },
    personas,
    warnings,
    basis: { weather, measured_light: measuredLightUses(expanded.timelines.filter((t) => t.strategyId === BASELINE_ID && (wanted === undefined || wanted.has(t.personaId))), importedLogs) },
  };
  return { results, light, clock, outdoor };
}
