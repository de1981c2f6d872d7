/**
 * What a run rests on, in sentences (results.json `basis`, schedules/run/run-basis.ts): the
 * weather source and, per person, the days whose light was measured and how the log's gaps were
 * filled.
 */
import type { MeasuredLightGap, MeasuredLightUse, RunBasis, WeatherBasis } from '../run/run-basis.js';
import { utcOffsetWords, weatherSiteWarning } from '../run/run-basis.js';

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];
const WEEKDAYS = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'];

/** "Mon 23 Mar" for "2026-03-23". */
export function shortDate(iso: string): string {
  const [y, m, d] = iso.slice(0, 10).split('-').map(Number);
  const weekday = WEEKDAYS[new Date(Date.UTC(y ?? 2000, (m ?? 1) - 1, d ?? 1)).getUTCDay()] ?? '';
  return `${weekday} ${d ?? 1} ${MONTHS[(m ?? 1) - 1] ?? ''}`;
}

/** "23 Mar 12:00" for "2026-03-23T12:00". */
function dayAndTime(local: string): string {
  const [, m, d] = local.slice(0, 10).split('-').map(Number);
  return `${d ?? 1} ${MONTHS[(m ?? 1) - 1] ?? ''} ${local.slice(11, 16)}`;
}

const hours = (h: number) => (h >= 23.95 ? 'all day' : `${h.toFixed(1)} h`);

function duration(min: number): string {
  if (min < 120) return `${Math.round(min)} min`;
  const h = min / 60;
  return h < 48 ? `${h.toFixed(1)} h` : `${(h / 24).toFixed(1)} days`;
}

/** "23 Mar 12:00 to 23 Mar 13:00 (60 min, no readings): filled with the last reading before it." */
export function gapSentence(g: MeasuredLightGap): string {
  return `${dayAndTime(g.start_local)} to ${dayAndTime(g.end_local)} (${duration(g.duration_min)}, ${g.reason}): filled with ${g.filled_with}.`;
}

/** "Light measured with the logger file wear.csv on 2 days: Mon 23 Mar (11.0 h), Tue 24 Mar (all day). No gaps." */
export function measuredDaysSentence(use: MeasuredLightUse): string {
  const days = use.days.map((d) => `${shortDate(d.date)} (${hours(d.measured_h)})`).join(', ');
  const gaps = use.gaps.length === 0 ? ' The log has no gaps in the run.' : ` ${use.gaps.length === 1 ? 'One gap was' : `${use.gaps.length} gaps were`} filled:`;
  return `Light at the eye measured with a light logger (file ${use.file}) on ${use.days.length} ${use.days.length === 1 ? 'day' : 'days'}: ${days}; the rest of the run is modelled.${gaps}`;
}

/** The weather source in one sentence. */
export function weatherBasisSentence(w: WeatherBasis, site: { readonly latitude_deg: number; readonly longitude_deg: number }): string {
  if (w.kind === 'sky-model') return 'Daylight from generated skies: each day clear, partly cloudy or overcast, drawn from the seasonal mix entered for the site.';
  const warning = weatherSiteWarning(w, site);
  if (warning !== null) return warning;
  const where = w.place === '' ? '' : ` (${w.place})`;
  return `Daylight from the hourly weather file ${w.file}, recorded for a place${where} ${w.offset_deg.toFixed(1)}° from the site in the same time zone (${utcOffsetWords(w.time_zone_h)}).`;
}

export interface BasisForPerson {
  readonly personaId: string;
  readonly sentence: string;
  readonly gaps: readonly string[];
}

/** Measured-light sentences for each person with a log, in the order of `basis.measured_light`. */
export function measuredLightWords(basis: RunBasis | undefined): BasisForPerson[] {
  return (basis?.measured_light ?? []).map((u) => ({ personaId: u.persona_id, sentence: measuredDaysSentence(u), gaps: u.gaps.map(gapSentence) }));
}
