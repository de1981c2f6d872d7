/**
 * Eyes closed are not a dark room: while asleep the body-clock models read the light behind the
 * closed eyelids — each source's spectrum × the closed-eyelid transmittance (Ando & Kripke 1996
 * Biol Psychiatry 39:22; Robinson, Bayliss & Fielder 1991 Vision Res 31:1837;
 * model/data/eyelid/closed_eyelid_transmittance_adult.csv) — so a sunlit bedroom during day sleep
 * acts on the clock and a blacked-out one does not.
 *
 * Expected sign (reasoned, then checked): a day-oriented sleeper's CBTmin lies near 04:00–06:00.
 * After the first night shifts, the day sleep 08:00–15:30 falls 2–11 h after CBTmin, where light
 * advances the clock (Khalsa et al. 2003 J Physiol 549:945: advances for light after CBTmin). So
 * the light through the eyelids in a sunlit bedroom moves CBTmin earlier than in a blacked-out
 * one — it works against the delay that night work asks of the clock — and a blackout strategy
 * shows as a later CBTmin (a positive phase shift against the sunlit baseline).
 */
import { describe, expect, it } from 'vitest';
import { runBodyClock } from '../../model/circadian/body-clock.js';
import { lightFromPerMinute } from '../../model/circadian/light-series.js';
import type { SleepEpisode } from '../../model/circadian/sleep-input.js';
import { illuminantD65 } from '../../model/photometry/alpha-opic.js';
import { eyelidMelanopicTransmittance } from '../../model/photometry/eyelid-transmittance.js';
import { exposureCsv, runScenario } from '../../schedules/run/index.js';
import { closedEyeLightSeries, entrainedStart, pacemakerFor, runBodyClockFor, sleepSpecFor } from '../../schedules/run/body-clock-run.js';
import { mergedLightSeries } from '../../schedules/run/light-segments.js';
import Papa from 'papaparse';
import { demoScenario } from '../run/demo-run.js';

const DAYS = 6;
/** Day worker on days 0–1 (awake 07–23 at 150 lx), then night work 23:00–07:00 at 300 lx, drive home, day sleep 08:00–15:30. */
const SLEEP: SleepEpisode[] = [{ start_h: 0, end_h: 7 }, { start_h: 23, end_h: 31 }, ...[2, 3, 4, 5].map((d) => ({ start_h: 24 * d + 8, end_h: 24 * d + 15.5 }))];

/** Melanopic EDI at the open eye per minute; the bedroom gives `bedroom_lx` during the day sleep. */
function dayWorkerTurnedNightWorker(bedroom_lx: number): number[] {
  const out: number[] = [];
  for (let d = 0; d < DAYS; d++) {
    for (let m = 0; m < 1440; m++) {
      const h = m / 60;
      let v = h >= 7 && h < 23 ? 150 : 0;
      if (d >= 1 && h >= 23) v = 300;
      if (d >= 2 && h < 7) v = 300;
      if (d >= 2 && h >= 7 && h < 8) v = 500;
      if (d >= 2 && h >= 8 && h < 15.5) v = bedroom_lx;
      out.push(v);
    }
  }
  return out;
}

function dayClock(t_h: number): number {
  return ((t_h % 24) + 24) % 24;
}

describe('a day sleeper in a sunlit bedroom and in a blacked-out one', () => {
  // daylight through the eyelids: D65, 0.30 % of the melanopic EDI (eyelid-transmittance.ts)
  const lid = eyelidMelanopicTransmittance(illuminantD65());

  for (const modelId of ['jfk99-x7', 'fjk99-cubic', 'fjk99-cubic-sf14', 'hfb19-sp'] as const) {
    it(`${modelId}: the sunlit bedroom (1000 lx melanopic EDI at the open eye, ~3 lx behind the eyelids) gives an earlier CBTmin than the blackout`, () => {
      const run = (bedroom_lx: number) => {
        const open = dayWorkerTurnedNightWorker(bedroom_lx);
        return runBodyClock({
          light: lightFromPerMinute(open, 'mel_edi_lx'),
          lightEyesClosed: lightFromPerMinute(open.map((v) => v * lid), 'mel_edi_lx'),
          days: DAYS,
          modelId,
          sleep: { mode: 'prescribed', episodes: SLEEP },
        });
      };
      const sunlit = run(1000);
      const blackout = run(0);
      // the day sleeps (08:00–15:30) fall after CBTmin, in the advance half of the phase response
      // (Hannay's clock drifts fastest: by day 4 its CBTmin reaches 08:24, still before most of that sleep)
      for (const k of [2, 3]) expect(dayClock(blackout.cbtmin_h[k] as number)).toBeLessThan(8);
      expect(dayClock(blackout.cbtmin_h[4] as number)).toBeLessThan(9);
      // last two CBTmins: sunlit earlier
      for (const k of [4, 5]) expect((sunlit.cbtmin_h[k] as number) - (blackout.cbtmin_h[k] as number)).toBeLessThan(-0.005);
      // before any day sleep, no difference
      expect(sunlit.cbtmin_h[2]).toBeCloseTo(blackout.cbtmin_h[2] as number, 9);
    });
  }

  it('records the size of the difference on the last day (jfk99-x7, regression value)', () => {
    const run = (bedroom_lx: number) => {
      const open = dayWorkerTurnedNightWorker(bedroom_lx);
      return runBodyClock({ light: lightFromPerMinute(open, 'mel_edi_lx'), lightEyesClosed: lightFromPerMinute(open.map((v) => v * lid), 'mel_edi_lx'), days: DAYS, modelId: 'jfk99-x7', sleep: { mode: 'prescribed', episodes: SLEEP } });
    };
    // docs/validation/circadian.md: −0.43 h (sunlit minus blackout, CBTmin of day 5)
    expect((run(1000).cbtmin_h[5] as number) - (run(0).cbtmin_h[5] as number)).toBeCloseTo(-0.434, 2);
  });
});

describe('the demo\'s "Dark bedroom for day sleep" strategy', () => {
  const base = demoScenario();
  const scenario = { ...base, strategies: base.strategies.filter((s) => s.id === 'ward-dark-bedroom') };
  const out = runScenario({ scenario, personaIds: ['nurse'] });
  const nurse = out.results.personas[0];
  const baseline = out.light.find((l) => l.strategyId === 'baseline');
  const dark = out.light.find((l) => l.strategyId === 'ward-dark-bedroom');

  it('lets light through the eyelids in the sunlit bedroom and almost none in the blacked-out one', () => {
    if (baseline === undefined || dark === undefined) throw new Error('both strategies run');
    const closedDuringSleep = (tl: typeof baseline) => {
      let s = 0;
      for (const e of tl.sleepEpisodes) for (let m = Math.round(e.start_h * 60); m < Math.round(e.end_h * 60); m++) s += tl.eye.melClosed_edi_lx[m] ?? 0;
      return s / 60;
    };
    expect(closedDuringSleep(baseline)).toBeGreaterThan(10);
    expect(closedDuringSleep(dark)).toBeLessThan(0.1 * closedDuringSleep(baseline));
    // each source behind the eyelids: ≈ 0.3 % of the open-eye value
    for (let m = 0; m < baseline.eye.total_min; m += 37) {
      const open = baseline.eye.mel_edi_lx[m] ?? 0;
      if (open > 1) {
        expect((baseline.eye.melClosed_edi_lx[m] ?? 0) / open).toBeGreaterThan(0.0029);
        expect((baseline.eye.melClosed_edi_lx[m] ?? 0) / open).toBeLessThan(0.0035);
      }
    }
  });

  it('moves CBTmin later than the sunlit baseline (positive phase shift), and by more than with the eyelids treated as opaque', () => {
    const shift = nurse?.strategies.find((s) => s.id === 'ward-dark-bedroom')?.summary.mean_phase_shift_h;
    expect(shift).toBeGreaterThan(0);
    // the same two runs with no light behind the eyelids (full gating)
    if (baseline === undefined || dark === undefined) throw new Error('both strategies run');
    const persona = scenario.personas.find((p) => p.id === 'nurse');
    if (persona === undefined) throw new Error('the demo has a nurse');
    const model = pacemakerFor(persona);
    const none = new Float64Array(baseline.eye.total_min);
    const sleep = sleepSpecFor(persona, baseline.timeline);
    const init = entrainedStart(model, mergedLightSeries(baseline.eye.mel_edi_lx), sleep, closedEyeLightSeries(none));
    const gatedBase = runBodyClockFor(model, baseline.eye.mel_edi_lx, sleep, init, baseline.timeline.total_min, none).outcome.cbtmin_h;
    const gatedDark = runBodyClockFor(model, dark.eye.mel_edi_lx, sleepSpecFor(persona, dark.timeline), init, dark.timeline.total_min, none).outcome.cbtmin_h;
    const last = (a: number[], b: number[]) => {
      const k = Math.min(a.length, b.length);
      let s = 0;
      for (let i = k - 7; i < k; i++) s += (a[i] as number) - (b[i] as number);
      return s / 7;
    };
    expect(shift as number).toBeGreaterThan(last(gatedDark, gatedBase) + 0.005);
  });

  it('says in exposure.csv which minutes were behind closed eyelids and what reached the eye', () => {
    const rows = Papa.parse<Record<string, string>>(exposureCsv(out.light, out.clock), { header: true, skipEmptyLines: true }).data;
    const asleep = rows.filter((r) => r.strategy_id === 'baseline' && r.eyes_closed_min === '10');
    const awake = rows.filter((r) => r.strategy_id === 'baseline' && r.eyes_closed_min === '0');
    expect(asleep.length).toBeGreaterThan(100);
    expect(awake.length).toBeGreaterThan(100);
    for (const r of awake) expect(Number(r.mel_edi_received_lx)).toBeCloseTo(Number(r.mel_edi_lx), 1);
    const sunlit = asleep.filter((r) => Number(r.mel_edi_lx) > 100);
    expect(sunlit.length).toBeGreaterThan(0);
    for (const r of sunlit) expect(Number(r.mel_edi_received_lx)).toBeLessThan(0.01 * Number(r.mel_edi_lx));
  });

  it('counts in the melanopic dose only the light that reached the eye', () => {
    const b = nurse?.strategies.find((s) => s.is_baseline);
    if (b === undefined || baseline === undefined) throw new Error('baseline runs');
    let open = 0;
    for (let m = 0; m < baseline.eye.total_min; m++) open += baseline.eye.mel_edi_lx[m] ?? 0;
    const openDose = open / 60 / b.days.length;
    expect(b.summary.mean_mel_dose_lx_h).toBeLessThan(openDose);
  });
});
