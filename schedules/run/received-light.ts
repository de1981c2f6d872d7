/**
 * The light that reaches the eye minute by minute once sleep is known: melanopic EDI at the open
 * eye while awake and behind the closed eyelids while asleep (eye-series.ts computes both per
 * source). The melanopic doses and exposure.csv's received column are built from it.
 */
import type { SleepEpisode } from '../../model/circadian/sleep-input.js';

/** 1 at the minutes spent asleep (episode edges to the nearest minute), 0 elsewhere. */
export function asleepMinutes(episodes: readonly SleepEpisode[], total_min: number): Uint8Array {
  const asleep = new Uint8Array(total_min);
  for (const e of episodes) asleep.fill(1, Math.max(0, Math.round(e.start_h * 60)), Math.min(total_min, Math.round(e.end_h * 60)));
  return asleep;
}

/** Per-minute melanopic EDI received (lx): `closed` where asleep, `open` elsewhere. */
export function receivedMel(open: Float64Array, closed: Float64Array, asleep: Uint8Array): Float64Array {
  const out = new Float64Array(open.length);
  for (let m = 0; m < open.length; m++) out[m] = asleep[m] === 1 ? (closed[m] ?? 0) : (open[m] ?? 0);
  return out;
}
