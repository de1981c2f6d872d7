/**
 * Sleep as the body-clock simulation reads it. Prescribed: episodes [start_h, end_h) in hours since
 * t = 0. Free: predicted by the HCL thresholds (sleep-switch-hcl.ts), with an optional daily alarm
 * and wake windows (work and travel) during which the person is held awake.
 * While asleep the models read the light behind the closed eyelids (eyes-closed-light.ts), not
 * darkness: the eyelids pass about 0.3 % of the melanopic EDI (Ando & Kripke 1996).
 */
import type { HclParams } from './sleep-switch-hcl.js';

export interface SleepEpisode {
  readonly start_h: number;
  readonly end_h: number;
}

export type SleepSpec =
  | { readonly mode: 'prescribed'; readonly episodes: readonly SleepEpisode[] }
  | {
      readonly mode: 'free';
      /** Clock hour (0–24) at which an alarm ends sleep every day, if any. */
      readonly alarm_h?: number;
      /**
       * Spans [start_h, end_h) (h since t = 0) in which the person is held awake whatever the
       * thresholds say (product rule, like the alarm: scheduled work and travel). Asleep at the
       * start of a span, the person wakes; at its end, a person whose sleep pressure is already
       * above the sleep threshold falls asleep at once.
       */
      readonly wakeWindows?: readonly SleepEpisode[];
      readonly hcl?: HclParams;
      /** Initial homeostat value (HCL H); default 13 (between the thresholds). */
      readonly initialPressure?: number;
    };

/** Checks, sorts and joins episodes (touching ones merge); throws naming the episode (`what`: its name in messages). */
export function normalisedEpisodes(episodes: readonly SleepEpisode[], what = 'sleep episode'): SleepEpisode[] {
  const sorted = [...episodes].sort((a, b) => a.start_h - b.start_h);
  const out: SleepEpisode[] = [];
  sorted.forEach((e, i) => {
    if (!Number.isFinite(e.start_h) || !Number.isFinite(e.end_h) || !(e.end_h > e.start_h)) {
      throw new Error(`${what} ${i + 1}: end (${e.end_h} h) must be after start (${e.start_h} h)`);
    }
    const prev = out[out.length - 1];
    if (prev !== undefined && e.start_h < prev.end_h - 1e-9) throw new Error(`${what} ${i + 1} (from ${e.start_h} h) overlaps the previous one (to ${prev.end_h} h)`);
    if (prev !== undefined && e.start_h <= prev.end_h + 1e-9) out[out.length - 1] = { start_h: prev.start_h, end_h: e.end_h };
    else out.push(e);
  });
  return out;
}

/** Episodes of a 24 h routine repeated over days [firstDay, lastDay]. */
export function repeatDaily(day: readonly SleepEpisode[], firstDay: number, lastDay: number): SleepEpisode[] {
  const out: SleepEpisode[] = [];
  for (let d = firstDay; d <= lastDay; d++) for (const e of day) out.push({ start_h: e.start_h + 24 * d, end_h: e.end_h + 24 * d });
  return normalisedEpisodes(out);
}
