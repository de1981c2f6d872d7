/**
 * Alignment of the body clock with a person's work and sleep hours (pure; times in real hours
 * since the run start).
 *
 * Biological night: from the dim-light melatonin onset (DLMO) to CBTmin + 2 h. The biological
 * night as the span between melatonin onset and offset is the usual definition in studies of
 * light, sleep and shift work (Wright et al. 2013, Curr Biol 23:1554 — internal biological night
 * bounded by melatonin onset and offset, from memory; Smith & Eastman 2012, Nat Sci Sleep 4:111,
 * abstract — circadian misalignment between the clock and work and sleep as the underlying cause
 * of night-work problems). Melatonin offset ≈ CBTmin + 2 h is a working approximation, from
 * memory (in entrained adults the melatonin offset falls some 2–3 h after the temperature
 * minimum; Hannay 2019's marker convention, which the product's DLMO = CBTmin − 7 h also follows,
 * puts it at DLMO + 10 h = CBTmin + 3 h: ours is the shorter night).
 *
 * Parts, each in hours per day over the assessed window (the pipeline assesses every day of the
 * run, like the sleepiness and suppression headlines: a roster's night shifts may lie anywhere):
 *  - work in the biological night: scheduled work minutes inside it;
 *  - main sleep in the biological day: minutes of main sleep (episodes ≥ the main-sleep length)
 *    outside it;
 *  - waking in the biological night: awake minutes from the end of a main sleep that ends inside
 *    a biological night to that night's end (waking before the biological night is over; Wright
 *    et al. 2013: under natural light alone the biological night ended before wake time; under
 *    electric lighting it ran later, past waking — the latter from memory).
 * Misalignment (the single score used in sentences and the recommendation): minutes in any of the
 * three parts, each minute counted once, in hours per day. 0 = sleep inside the biological night,
 * no work in it, and the night over by waking; a day worker whose CBTmin falls about 2 h before
 * waking (typical of entrained young adults, from memory) scores about 0.
 * The awake evening between DLMO and sleep onset is not counted (the DLMO normally precedes
 * sleep by about 2 h; from memory).
 * Also reported: the share of CBTmins that fall inside a main sleep episode.
 */

/** End of the biological night after CBTmin (h; see above, from memory). */
export const BIOLOGICAL_NIGHT_END_AFTER_CBTMIN_H = 2;
/** A DLMO pairs with the CBTmin that follows it within this many hours (h; our choice, > 7 h + margin). */
export const DLMO_PAIRING_WINDOW_H = 14;
/** Differences in misalignment below this count as no change (h per day; our judgement of model resolution for planning). */
export const ALIGNMENT_MARGIN_H = 0.25;

export interface Interval {
  readonly start_h: number;
  readonly end_h: number;
}

export interface AlignmentInput {
  /** Assessed window [from_h, to_h) and the number of days it spans (for per-day figures). */
  readonly from_h: number;
  readonly to_h: number;
  readonly days: number;
  /** Scheduled work. */
  readonly work: readonly Interval[];
  /** Every sleep episode (naps too); main sleep = episodes of at least `mainSleepMin_h`. */
  readonly sleep: readonly Interval[];
  readonly mainSleepMin_h: number;
  /** Body-clock markers (h since the run start), any order. */
  readonly dlmo_h: readonly number[];
  readonly cbtmin_h: readonly number[];
  /** DLMO used for a CBTmin that has no DLMO in the pairing window: CBTmin minus this (h). */
  readonly fallbackDlmoBeforeCbtmin_h: number;
}

/** Alignment figures of one person under one strategy, in results.json units. */
export interface AlignmentSummary {
  /** Days the figures are averaged over. */
  readonly days: number;
  /** Biological nights that touch the window. */
  readonly biological_nights: number;
  readonly work_h_in_biological_night_per_day: number;
  readonly main_sleep_h_in_biological_day_per_day: number;
  readonly waking_h_in_biological_night_per_day: number;
  /** The alignment score: hours per day in any of the three parts above. */
  readonly misalignment_h_per_day: number;
  /** Share of CBTmins in the window that fall inside a main sleep episode (null without CBTmin). */
  readonly cbtmin_in_main_sleep_share: number | null;
}

/** The alignment figures that summary.csv lists (after the summary metrics). */
export const ALIGNMENT_FIELDS = [
  'misalignment_h_per_day', 'work_h_in_biological_night_per_day', 'main_sleep_h_in_biological_day_per_day', 'waking_h_in_biological_night_per_day', 'cbtmin_in_main_sleep_share',
] as const satisfies readonly (keyof AlignmentSummary)[];

/** Biological nights [DLMO, CBTmin + 2 h), one per CBTmin, in time order. */
export function biologicalNights(dlmo_h: readonly number[], cbtmin_h: readonly number[], fallbackDlmoBeforeCbtmin_h: number): Interval[] {
  const onsets = [...dlmo_h].sort((a, b) => a - b);
  return [...cbtmin_h]
    .sort((a, b) => a - b)
    .map((c) => {
      let onset: number | undefined;
      for (const d of onsets) if (d < c && d > c - DLMO_PAIRING_WINDOW_H) onset = d;
      return { start_h: onset ?? c - fallbackDlmoBeforeCbtmin_h, end_h: c + BIOLOGICAL_NIGHT_END_AFTER_CBTMIN_H };
    });
}

const round = (v: number, d = 3) => Math.round(v * 10 ** d) / 10 ** d;

/** Alignment figures over the window, or null when no biological night touches it. */
export function alignmentSummary(inp: AlignmentInput): AlignmentSummary | null {
  const n = Math.max(0, Math.round((inp.to_h - inp.from_h) * 60));
  const nights = biologicalNights(inp.dlmo_h, inp.cbtmin_h, inp.fallbackDlmoBeforeCbtmin_h).filter((b) => b.end_h > inp.from_h && b.start_h < inp.to_h);
  if (n === 0 || nights.length === 0 || inp.days <= 0) return null;
  const idx = (t_h: number) => Math.max(0, Math.min(n, Math.round((t_h - inp.from_h) * 60)));
  const paint = (mask: Uint8Array, iv: Interval) => mask.fill(1, idx(iv.start_h), idx(iv.end_h));
  const night = new Uint8Array(n);
  const work = new Uint8Array(n);
  const asleep = new Uint8Array(n);
  const main = new Uint8Array(n);
  const waking = new Uint8Array(n);
  for (const b of nights) paint(night, b);
  for (const w of inp.work) paint(work, w);
  const mains = inp.sleep.filter((e) => e.end_h - e.start_h >= inp.mainSleepMin_h);
  for (const e of inp.sleep) paint(asleep, e);
  for (const e of mains) paint(main, e);
  for (const e of mains) {
    const b = nights.find((x) => e.end_h >= x.start_h && e.end_h < x.end_h);
    if (b !== undefined) paint(waking, { start_h: e.end_h, end_h: b.end_h });
  }
  let inWork = 0;
  let inDay = 0;
  let woken = 0;
  let any = 0;
  for (let m = 0; m < n; m++) {
    const bn = night[m] === 1;
    const a = bn && work[m] === 1;
    const b = !bn && main[m] === 1;
    const c = bn && waking[m] === 1 && asleep[m] !== 1;
    if (a) inWork++;
    if (b) inDay++;
    if (c) woken++;
    if (a || b || c) any++;
  }
  const perDay = (min: number) => round(min / 60 / inp.days);
  const cbts = inp.cbtmin_h.filter((t) => t >= inp.from_h && t < inp.to_h);
  const inSleep = cbts.filter((t) => mains.some((e) => t >= e.start_h && t < e.end_h)).length;
  return {
    days: inp.days,
    biological_nights: nights.length,
    work_h_in_biological_night_per_day: perDay(inWork),
    main_sleep_h_in_biological_day_per_day: perDay(inDay),
    waking_h_in_biological_night_per_day: perDay(woken),
    misalignment_h_per_day: perDay(any),
    cbtmin_in_main_sleep_share: cbts.length === 0 ? null : round(inSleep / cbts.length, 4),
  };
}

export type AlignmentDirection = 'toward' | 'away' | 'unchanged';

/** Whether a strategy moves the body clock toward or away from alignment compared with the baseline (lower misalignment = toward). */
export function alignmentDirection(strategy: Pick<AlignmentSummary, 'misalignment_h_per_day'>, baseline: Pick<AlignmentSummary, 'misalignment_h_per_day'>): AlignmentDirection {
  // 1e-9: figures are rounded to 0.001 h, so a difference of exactly the margin may carry float noise.
  const d = strategy.misalignment_h_per_day - baseline.misalignment_h_per_day;
  if (d <= -ALIGNMENT_MARGIN_H + 1e-9) return 'toward';
  if (d >= ALIGNMENT_MARGIN_H - 1e-9) return 'away';
  return 'unchanged';
}
