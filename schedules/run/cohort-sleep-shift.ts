/**
 * A virtual occupant's habitual sleep timing (chronotype): the prescribed sleep episodes of an
 * exposure timeline moved by the occupant's habitual mid-sleep shift (positive = later), in whole
 * minutes, duration kept — except where the moved sleep would fall into the person's work or
 * travel (activity "work" or "commute"), which stays awake: a late type on an early roster loses
 * sleep instead of missing the shift (the "social jet lag" pattern of late chronotypes; common
 * practice). An episode cut by the start or the end of the run keeps that edge, so the run does not
 * start or end with an artificial awake stretch. Free (model-predicted) sleep is never shifted:
 * the model's own period and light sensitivity set its timing.
 * Light at the eye is not recomputed: minutes left by the moved sleep keep the light of the
 * written routine at that minute (usually the bedroom, lights off), and minutes newly asleep are
 * read behind the closed eyelids by the body-clock models (model/circadian eyes-closed-light).
 */
import { normalisedEpisodes, type SleepEpisode, type SleepSpec } from '../../model/circadian/sleep-input.js';
import type { ExposureTimeline } from '../timeline/exposure-types.js';
import { dyadicHours } from './light-segments.js';

/** Activities during which the person stays awake whatever their chronotype. */
export const FIXED_AWAKE_ACTIVITIES: ReadonlySet<string> = new Set(['work', 'commute']);

/** Minute mask (1 = at work or travelling) of a timeline. */
export function fixedAwakeMinutes(timeline: ExposureTimeline): Uint8Array {
  const mask = new Uint8Array(timeline.total_min);
  for (const s of timeline.slices) if (FIXED_AWAKE_ACTIVITIES.has(s.activity)) mask.fill(1, s.start_min, s.end_min);
  return mask;
}

/** Asleep slices of a timeline as minute ranges [start, end), touching ones joined. */
function asleepRanges_min(timeline: ExposureTimeline): [number, number][] {
  const out: [number, number][] = [];
  for (const s of timeline.slices) {
    if (s.sleep !== 'asleep') continue;
    const last = out[out.length - 1];
    if (last !== undefined && last[1] === s.start_min) last[1] = s.end_min;
    else out.push([s.start_min, s.end_min]);
  }
  return out;
}

/**
 * The timeline's prescribed sleep moved by `shift_h`. With a shift that rounds to 0 min, or with
 * free sleep, `spec` is returned unchanged (so a zero-spread cohort reproduces the single run).
 */
export function shiftedSleepSpec(spec: SleepSpec, timeline: ExposureTimeline, shift_h: number, fixedAwake: Uint8Array): SleepSpec {
  const shift_min = Math.round(shift_h * 60);
  if (spec.mode !== 'prescribed' || shift_min === 0 || !Number.isFinite(shift_min)) return spec;
  const total = timeline.total_min;
  const episodes: SleepEpisode[] = [];
  for (const [a, b] of asleepRanges_min(timeline)) {
    const start = a === 0 ? 0 : Math.max(0, a + shift_min);
    const end = b === total ? total : Math.min(total, b + shift_min);
    let m = start;
    while (m < end) {
      while (m < end && fixedAwake[m] === 1) m++;
      const from = m;
      while (m < end && fixedAwake[m] !== 1) m++;
      if (m > from) episodes.push({ start_h: dyadicHours(from), end_h: dyadicHours(m) });
    }
  }
  return { mode: 'prescribed', episodes: episodes.length === 0 ? [] : normalisedEpisodes(episodes) };
}
