/**
 * `zeitlight simulate <light.csv> --days <n> [--model <id>] [--init entrained|<x,xc,n>]
 * [--sleep <csv>] [--alarm <hour>] [--json]` — body clock, melatonin and sleepiness for one
 * person from a light series. JSON keys follow the stable CLI contract (architecture §4):
 * `model`, `xmin_h`, `cbtmin_h`, `dlmo_h`, `melatonin_suppression_pct` (per night), `kss_hourly`;
 * `dlmo_25pct_h`, `kss_sleepy_hours`, `melatonin_pg_ml_hourly`, `dim_melatonin_pg_ml_hourly`,
 * `sleep_episodes`, `entrainment`, `input`, `warnings`, `definitions` and `caution` are extra.
 * `definitions` says what each output means (DLMO: dim-light onset; suppression: its window).
 * Without --sleep, sleep is predicted by the model (free sleep), with an optional daily alarm.
 */
import { CliError, UsageError } from '../cli-error.js';
import type { Command, CommandContext } from '../command.js';
import { numberOption, positionals, requiredNumberOption, stringOption } from '../args.js';
import { readInputFile } from '../input-file.js';
import { formatTable, HEALTH_CAUTION, printJson } from '../output.js';
import { MELATONIN_OUTPUT_DEFINITIONS, runBodyClock, type InitialCondition } from '../../model/circadian/body-clock.js';
import { lightFromSteps } from '../../model/circadian/light-series.js';
import { LightSeriesCsvError, readLightSeriesCsv } from '../../schedules/lightlog/light-series-csv.js';
import { readSleepCsv, SleepCsvError } from '../../schedules/lightlog/sleep-csv.js';
import { isValidTimeZone } from '../../schedules/time/local-calendar.js';
import { createPacemaker, DEFAULT_PACEMAKER_ID, isPacemakerId, PACEMAKER_IDS } from '../../model/circadian/registry.js';
import type { SleepSpec } from '../../model/circadian/sleep-input.js';

const MAX_DAYS = 366;

function parseInit(text: string | undefined, modelId: string, stateSize: number, names: readonly string[]): InitialCondition {
  if (text === undefined || text === 'entrained') return { kind: 'entrained' };
  const parts = text.split(',').map((s) => s.trim());
  const values = parts.map(Number);
  if (parts.length !== stateSize || parts.some((p) => p === '') || values.some((v) => !Number.isFinite(v))) {
    throw new UsageError(`--init: expected "entrained" or ${stateSize} numbers ${names.join(',')} for ${modelId}, got "${text}"`);
  }
  const n = values[stateSize - 1] as number;
  if (n < 0 || n > 1) throw new UsageError(`--init: n (Process L) must be within 0–1, got ${n}`);
  if (modelId === 'hfb19-sp' && !((values[0] as number) > 0)) throw new UsageError(`--init: R must be > 0 for hfb19-sp, got ${values[0]}`);
  return { kind: 'state', pacemaker: values };
}

const round = (v: number, digits = 3) => Math.round(v * 10 ** digits) / 10 ** digits;
const clock = (t: number) => {
  const m = Math.round((((t % 24) + 24) % 24) * 60);
  return `${String(Math.floor(m / 60) % 24).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}`;
};

export const simulateCommand: Command = {
  name: 'simulate',
  summary: 'Body clock (CBTmin, DLMO), melatonin suppression and sleepiness (KSS) from a light series',
  usage: `<light.csv> --days <n> [--model <${PACEMAKER_IDS.join('|')}>] [--init entrained|<x,xc,n>] [--sleep <csv>] [--alarm <hour>] [--time-zone <IANA zone>]`,
  options: {
    days: { type: 'string' },
    model: { type: 'string' },
    init: { type: 'string' },
    sleep: { type: 'string' },
    alarm: { type: 'string' },
    'time-zone': { type: 'string' },
  },
  async run(ctx: CommandContext): Promise<number> {
    const [lightPath] = positionals(ctx, ['light.csv']) as [string];
    const days = requiredNumberOption(ctx, 'days');
    if (!Number.isInteger(days) || days < 1 || days > MAX_DAYS) throw new UsageError(`--days: a whole number of days from 1 to ${MAX_DAYS}, got ${days}`);
    const modelId = stringOption(ctx, 'model') ?? DEFAULT_PACEMAKER_ID;
    if (!isPacemakerId(modelId)) throw new UsageError(`--model: unknown model "${modelId}"; choose one of ${PACEMAKER_IDS.join(', ')} (see zeitlight models)`);
    const model = createPacemaker(modelId);
    const init = parseInit(stringOption(ctx, 'init'), modelId, model.stateSize, model.stateNames);
    const alarm = numberOption(ctx, 'alarm');
    if (alarm !== undefined && !(alarm >= 0 && alarm < 24)) throw new UsageError(`--alarm: a clock hour from 0 to below 24, got ${alarm}`);
    const sleepPath = stringOption(ctx, 'sleep');
    if (sleepPath !== undefined && alarm !== undefined) throw new UsageError('--alarm applies to predicted sleep only; leave it out when --sleep is given');
    const timeZone = stringOption(ctx, 'time-zone');
    if (timeZone !== undefined && !isValidTimeZone(timeZone)) throw new UsageError(`--time-zone: "${timeZone}" is not an IANA time zone such as Europe/Berlin`);

    let light;
    let lightFile;
    let sleep: SleepSpec;
    try {
      lightFile = readLightSeriesCsv(readInputFile(lightPath, 'light-log'), lightPath, timeZone !== undefined ? { timeZone } : {});
      light = lightFromSteps(lightFile.start_h, lightFile.level, lightFile.unit);
      sleep =
        sleepPath === undefined
          ? { mode: 'free', ...(alarm === undefined ? {} : { alarm_h: alarm }) }
          : { mode: 'prescribed', episodes: readSleepCsv(readInputFile(sleepPath, 'sleep', '--sleep'), sleepPath) };
    } catch (err) {
      if (err instanceof SleepCsvError || err instanceof LightSeriesCsvError) throw new CliError(err.message);
      throw err;
    }

    const r = runBodyClock({ modelId, light, days, sleep, init });
    const lastRow_h = light.start_h[light.start_h.length - 1] as number;
    const warnings: string[] = [...lightFile.warnings];
    if (lastRow_h < 24 * days - 24) {
      warnings.push(`the light series ends at hour ${lastRow_h}; its last value (${light.level[light.level.length - 1]} ${light.unit === 'native_lx' ? 'lux' : 'lx melanopic EDI'}) holds to the end of day ${days - 1}`);
    }
    const result = {
      model: r.model,
      xmin_h: r.xmin_h.map((v) => round(v)),
      cbtmin_h: r.cbtmin_h.map((v) => round(v)),
      dlmo_h: r.dlmo_h.map((v) => round(v)),
      melatonin_suppression_pct: r.melatonin_suppression_pct.map((v) => (v === null ? null : round(v, 2))),
      kss_hourly: r.kss_hourly.map((v) => (v === null ? null : round(v, 2))),
      dlmo_25pct_h: r.dlmo_25pct_h.map((v) => (Number.isFinite(v) ? round(v) : null)),
      kss_sleepy_hours: r.kss_sleepy_hours,
      melatonin_pg_ml_hourly: r.melatonin_pg_ml_hourly.map((v) => round(v, 2)),
      dim_melatonin_pg_ml_hourly: r.dim_melatonin_pg_ml_hourly.map((v) => round(v, 2)),
      sleep_episodes: r.sleep_episodes.map((e) => ({ start_h: round(e.start_h), end_h: round(e.end_h) })),
      entrainment: r.entrainment ?? null,
      input: { light: lightPath, light_unit: light.unit, light_form: lightFile.form, start_local: lightFile.start_local, sleep: sleepPath ?? (alarm === undefined ? 'predicted' : `predicted, alarm ${alarm} h`), days },
      warnings,
      definitions: {
        cbtmin_h: `x minimum + ${model.marker.cbtminOffset_h} h (model's phase-reference offset)`,
        ...MELATONIN_OUTPUT_DEFINITIONS,
        melatonin_suppression_pct: `${MELATONIN_OUTPUT_DEFINITIONS.melatonin_suppression_pct}; null for a night cut off by the end of the run`,
        kss_hourly: 'mean KSS of the headline sleepiness model (see zeitlight models) over each hour awake since t = 0; null when asleep the whole hour; ≥ 7 is sleepy',
      },
      caution: HEALTH_CAUTION,
    };
    if (ctx.json) {
      printJson(ctx, result);
      return 0;
    }
    ctx.stdout(`Model: ${model.label} (${modelId})\n\n`);
    ctx.stdout(formatTable(['day', 'CBTmin'], r.cbtmin_h.map((c) => [String(Math.floor(c / 24)), clock(c)])));
    ctx.stdout(`\n${formatTable(['night', 'DLMO (dim light, 10 pg/mL)', 'suppression while awake in the biological night (%)'], r.melatonin_nights.map((n, i) => [String(i + 1), clock(n.onset_h), result.melatonin_suppression_pct[i] === null || result.melatonin_suppression_pct[i] === undefined ? 'n/a (night cut off)' : (result.melatonin_suppression_pct[i] as number).toFixed(1)]))}`);
    ctx.stdout(`Hours at KSS ≥ 7: ${r.kss_sleepy_hours.length}\n`);
    for (const w of warnings) ctx.stdout(`Note: ${w}\n`);
    ctx.stdout(`\n${HEALTH_CAUTION}\n`);
    return 0;
  },
};
