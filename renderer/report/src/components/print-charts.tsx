// Charts sized for a printed page: fixed pixel sizes (no resize observer), no animation, no
// tooltips; drawn as SVG so the PDF keeps them as vectors. Data come from the app's chart-data
// modules (renderer/src/charts/*), colours from its palette, and times go through the app's one
// run-time → wall-clock mapping (charts/wall-clock.ts): one-day charts span the day's real length
// (23 h or 25 h on a day the clocks change) with wall-clock ticks.
import { Area, CartesianGrid, ComposedChart, Legend, Line, LineChart, ReferenceArea, ReferenceLine, XAxis, YAxis } from 'recharts';
import type { NamedItem, ResultsView, RunView } from '../../../src/results/view-model.js';
import { lightAtEyeRows, recommendationBands, RECOMMENDED_DAY_MIN_LX, RECOMMENDED_EVENING_MAX_LX, RECOMMENDED_NIGHT_MAX_LX } from '../../../src/charts/light-at-eye-data.js';
import { phaseByDayRows, phaseKey } from '../../../src/charts/phase-data.js';
import { melatoninKey, melatoninNightRows, nightAxis } from '../../../src/charts/melatonin-data.js';
import { kssDayRows, KSS_SLEEPY_THRESHOLD } from '../../../src/charts/kss-grid-data.js';
import { BAND_COLOURS, OKABE_ITO, SOURCE_KIND_COLOURS, seriesColour, seriesDash } from '../../../src/charts/palette.js';
import { clockAxis, formatClock, formatDayLabel } from '../../../src/charts/clock.js';
import { STEADY_CLOCK, type WallClock } from '../../../src/charts/wall-clock.js';
import { formatLux, lightAxisTop_lx } from '../../../src/charts/light-scale.js';
import { niceTicks } from '../../../src/charts/nice-ticks.js';

export const CHART_WIDTH_PX = 660;
const AXIS_INK = '#4a5563';
const GRID = '#e3e6ea';
const TICK = { fontSize: 10, fill: AXIS_INK };
const LEGEND_STYLE = { fontSize: 10, lineHeight: '14px' };

export { lightAxisTop_lx };

export function PrintLightChart({ run, day, title, axisTop_lx, clock = STEADY_CLOCK }: { run: RunView; day: number; title: string; axisTop_lx?: number; clock?: WallClock }) {
  const rows = lightAtEyeRows(run.light, day, 10, clock);
  const bands = recommendationBands(run.sleep, day, clock);
  const axis = clock.dayAxis(day);
  const auto = lightAxisTop_lx(rows.map((r) => r.total_lx));
  const yAxis = niceTicks(0, axisTop_lx ?? auto.top, 6);
  const top = yAxis.domain[1];
  const cut = auto.peak > top;
  return (
    <figure className="chart">
      <figcaption className="chart-title">{title}</figcaption>
      <ComposedChart width={CHART_WIDTH_PX} height={210} data={rows} margin={{ top: 8, right: 16, bottom: 0, left: 4 }}>
        <CartesianGrid stroke={GRID} vertical={false} />
        {bands.map((b, i) => (
          <ReferenceArea key={`a${i}`} x1={b.from_h} x2={b.to_h} fill={BAND_COLOURS[b.kind]} fillOpacity={b.kind === 'night' ? 0.07 : 0.06} ifOverflow="hidden" />
        ))}
        <XAxis dataKey="x_h" type="number" domain={axis.domain} ticks={axis.ticks} tick={TICK} tickFormatter={axis.labelOf} />
        <YAxis tick={TICK} width={52} domain={yAxis.domain} ticks={yAxis.ticks} tickFormatter={formatLux} allowDataOverflow label={{ value: 'melanopic EDI (lx)', angle: -90, position: 'insideLeft', style: { textAnchor: 'middle', fill: AXIS_INK, fontSize: 10 } }} />
        <Legend wrapperStyle={LEGEND_STYLE} iconSize={9} />
        {run.light.sources.map((s) => (
          <Area key={s.id} type="stepAfter" dataKey={s.id} name={s.label} stackId="light" stroke={SOURCE_KIND_COLOURS[s.kind]} fill={SOURCE_KIND_COLOURS[s.kind]} fillOpacity={0.55} isAnimationActive={false} dot={false} />
        ))}
        {bands.map((b, i) => (
          <ReferenceLine key={`l${i}`} segment={[{ x: b.from_h, y: b.limit_lx }, { x: b.to_h, y: b.limit_lx }]} stroke={BAND_COLOURS[b.kind]} strokeWidth={1.5} strokeDasharray={b.rule === 'at least' ? '6 3' : '2 3'} ifOverflow="hidden" />
        ))}
      </ComposedChart>
      <p className="chart-note">
        {clock.changeNote(day) === null ? '' : `${clock.changeNote(day)}. `}
        {cut ? `Peaks above ${top} lx are cut off (highest ${Math.round(auto.peak)} lx, usually outdoors). ` : ''}Shaded, by the person’s own sleep: awake, the last 3 h before sleep, and sleep. Dashed lines: recommended melanopic EDI at the eye (Brown et al. 2022) — at least {RECOMMENDED_DAY_MIN_LX} lx while awake in the day, at most {RECOMMENDED_EVENING_MAX_LX} lx in the 3 h before sleep, at most {RECOMMENDED_NIGHT_MAX_LX} lx during sleep; for a night worker the 3 h before sleep fall in the morning.
      </p>
    </figure>
  );
}

export function PrintPhaseChart({ view, runs, strategies, clock = STEADY_CLOCK }: { view: ResultsView; runs: readonly RunView[]; strategies: readonly NamedItem[]; clock?: WallClock }) {
  const rows = phaseByDayRows(runs, strategies, view.days, 'dlmo', clock);
  const axis = clockAxis(rows.flatMap((r) => strategies.map((s) => r[phaseKey(s.id, 'dlmo')])));
  const stride = view.days > 10 ? 2 : 1;
  return (
    <figure className="chart">
      <figcaption className="chart-title">Body clock: dim-light melatonin onset (DLMO) by day</figcaption>
      <LineChart width={CHART_WIDTH_PX} height={190} data={rows} margin={{ top: 8, right: 16, bottom: 0, left: 4 }}>
        <CartesianGrid stroke={GRID} />
        <XAxis dataKey="day" tick={TICK} interval={stride - 1} tickFormatter={(d: number) => formatDayLabel(view.startDate, d)} />
        <YAxis reversed tick={TICK} width={52} domain={axis.domain} ticks={axis.ticks} tickFormatter={(h: number) => formatClock(h)} label={{ value: 'clock time (earlier ↑)', angle: -90, position: 'insideLeft', style: { textAnchor: 'middle', fill: AXIS_INK, fontSize: 10 } }} />
        {Array.from({ length: view.days }, (_, d) => d)
          .filter((d) => clock.changesIn(d).length > 0)
          .map((d) => (
            <ReferenceLine key={`change-${d}`} x={d} stroke={AXIS_INK} strokeDasharray="3 3" label={{ value: (clock.changesIn(d)[0]?.by_h ?? 0) > 0 ? 'clocks +1 h' : 'clocks −1 h', position: 'insideTopLeft', fill: AXIS_INK, fontSize: 9 }} />
          ))}
        <Legend wrapperStyle={LEGEND_STYLE} iconSize={9} />
        {strategies.map((s, i) => (
          <Line key={s.id} dataKey={phaseKey(s.id, 'dlmo')} name={s.name} stroke={seriesColour(i)} strokeDasharray={seriesDash(i)} strokeWidth={1.8} dot={{ r: 2 }} connectNulls isAnimationActive={false} />
        ))}
      </LineChart>
    </figure>
  );
}

export function PrintMelatoninChart({ runs, strategies, day, dayLabel, clock = STEADY_CLOCK }: { runs: readonly RunView[]; strategies: readonly NamedItem[]; day: number; dayLabel: string; clock?: WallClock }) {
  const rows = melatoninNightRows(runs, strategies, day, 15, clock);
  const axis = nightAxis(day, clock);
  const unit = runs[0]?.melatonin.unit ?? '';
  return (
    <figure className="chart">
      <figcaption className="chart-title">Melatonin in the night after {dayLabel}</figcaption>
      <LineChart width={CHART_WIDTH_PX} height={190} data={rows} margin={{ top: 8, right: 16, bottom: 0, left: 4 }}>
        <CartesianGrid stroke={GRID} vertical={false} />
        <XAxis dataKey="x_h" type="number" domain={axis.domain} ticks={axis.ticks} tick={TICK} tickFormatter={axis.labelOf} />
        <YAxis tick={TICK} width={52} label={{ value: `melatonin (${unit})`, angle: -90, position: 'insideLeft', style: { textAnchor: 'middle', fill: AXIS_INK, fontSize: 10 } }} />
        <Legend wrapperStyle={LEGEND_STYLE} iconSize={9} />
        {strategies.map((s, i) => (
          <Line key={`${s.id}-dark`} dataKey={melatoninKey(s.id, true)} name={`${s.name}, without light`} stroke={seriesColour(i)} strokeOpacity={0.45} strokeDasharray="4 3" dot={false} isAnimationActive={false} legendType="none" />
        ))}
        {strategies.map((s, i) => (
          <Line key={s.id} dataKey={melatoninKey(s.id)} name={s.name} stroke={seriesColour(i)} strokeWidth={1.8} dot={false} isAnimationActive={false} />
        ))}
      </LineChart>
      <p className="chart-note">Solid: modelled melatonin with the light of each strategy. Dashed, same colour: the same night without light. Where a solid line runs below its dashed partner, light is suppressing melatonin.</p>
    </figure>
  );
}

export function PrintKssChart({ runs, strategies, day, dayLabel, clock = STEADY_CLOCK }: { runs: readonly RunView[]; strategies: readonly NamedItem[]; day: number; dayLabel: string; clock?: WallClock }) {
  const byStrategy = new Map(strategies.map((s) => [s.id, runs.find((r) => r.strategyId === s.id)]));
  const rows = Array.from({ length: Math.round(clock.dayLength_h(day)) }, (_, x_h) => {
    const row: Record<string, number | null> = { x_h };
    for (const s of strategies) {
      const run = byStrategy.get(s.id);
      row[s.id] = run === undefined ? null : (kssDayRows(run.kssHourly, day, clock)[x_h]?.kss ?? null);
    }
    return row;
  });
  const axis = clock.dayAxis(day);
  return (
    <figure className="chart">
      <figcaption className="chart-title">Sleepiness (KSS) by hour on {dayLabel}</figcaption>
      <LineChart width={CHART_WIDTH_PX} height={170} data={rows} margin={{ top: 8, right: 40, bottom: 0, left: 4 }}>
        <CartesianGrid stroke={GRID} vertical={false} />
        <XAxis dataKey="x_h" type="number" domain={axis.domain} ticks={axis.ticks} tick={TICK} tickFormatter={axis.labelOf} />
        <YAxis tick={TICK} width={52} domain={[1, 9]} ticks={[1, 3, 5, 7, 9]} label={{ value: 'KSS', angle: -90, position: 'insideLeft', style: { textAnchor: 'middle', fill: AXIS_INK, fontSize: 10 } }} />
        <ReferenceLine y={KSS_SLEEPY_THRESHOLD} stroke={OKABE_ITO.vermillion} strokeDasharray="6 3" label={{ value: 'KSS 7', position: 'right', fill: OKABE_ITO.vermillion, fontSize: 10 }} />
        <Legend wrapperStyle={LEGEND_STYLE} iconSize={9} />
        {strategies.map((s, i) => (
          <Line key={s.id} dataKey={s.id} name={s.name} stroke={seriesColour(i)} strokeDasharray={seriesDash(i)} strokeWidth={1.8} dot={{ r: 1.5 }} isAnimationActive={false} />
        ))}
      </LineChart>
    </figure>
  );
}

/** Melatonin suppression per night, one line per strategy (nights by the local date of melatonin onset). */
export function PrintSuppressionChart({ view, strategies, nights }: { view: ResultsView; strategies: readonly NamedItem[]; nights: ReadonlyMap<string, readonly { day: number; pct: number | null }[]> }) {
  const rows = Array.from({ length: view.days }, (_, day) => {
    const row: Record<string, number | null> = { day };
    for (const s of strategies) row[s.id] = nights.get(s.id)?.find((n) => n.day === day)?.pct ?? null;
    return row;
  });
  const stride = view.days > 10 ? 2 : 1;
  return (
    <figure className="chart">
      <figcaption className="chart-title">Melatonin suppression by light, night by night</figcaption>
      <LineChart width={CHART_WIDTH_PX} height={190} data={rows} margin={{ top: 8, right: 16, bottom: 0, left: 4 }}>
        <CartesianGrid stroke={GRID} />
        <XAxis dataKey="day" tick={TICK} interval={stride - 1} tickFormatter={(d: number) => formatDayLabel(view.startDate, d)} />
        <YAxis tick={TICK} width={52} domain={[0, 100]} ticks={[0, 25, 50, 75, 100]} label={{ value: 'suppression (%)', angle: -90, position: 'insideLeft', style: { textAnchor: 'middle', fill: AXIS_INK, fontSize: 10 } }} />
        <Legend wrapperStyle={LEGEND_STYLE} iconSize={9} />
        {strategies.map((s, i) => (
          <Line key={s.id} dataKey={s.id} name={s.name} stroke={seriesColour(i)} strokeDasharray={seriesDash(i)} strokeWidth={1.8} dot={{ r: 2 }} connectNulls isAnimationActive={false} />
        ))}
      </LineChart>
      <p className="chart-note">Each night: modelled melatonin with the night’s light against the same night in darkness (100 % = fully suppressed). Lower is kinder to sleep.</p>
    </figure>
  );
}

/** Total melanopic EDI of two strategies on one day on a log axis, so evening and night levels show. */
export function PrintLightCompareChart({ runs, names, day, title, clock = STEADY_CLOCK }: { runs: readonly RunView[]; names: readonly string[]; day: number; title: string; clock?: WallClock }) {
  const FLOOR_LX = 0.1;
  const series = runs.map((r) => lightAtEyeRows(r.light, day, 10, clock));
  const axis = clock.dayAxis(day);
  const rows = (series[0] ?? []).map((row, i) => {
    const out: Record<string, number> = { x_h: row.x_h };
    series.forEach((s, k) => {
      out[`s${k}`] = Math.max(FLOOR_LX, s[i]?.total_lx ?? 0);
    });
    return out;
  });
  const bands = runs[0] === undefined ? [] : recommendationBands(runs[0].sleep, day, clock);
  const peak = Math.max(10, ...rows.flatMap((r) => runs.map((_, k) => r[`s${k}`] ?? 0)));
  const top = 10 ** Math.ceil(Math.log10(peak));
  const ticks = [0.1, 1, 10, 100, 1000, 10000, 100000].filter((t) => t <= top);
  return (
    <figure className="chart">
      <figcaption className="chart-title">{title}</figcaption>
      <LineChart width={CHART_WIDTH_PX} height={190} data={rows} margin={{ top: 8, right: 16, bottom: 0, left: 4 }}>
        <CartesianGrid stroke={GRID} vertical={false} />
        {bands.map((b, i) => (
          <ReferenceArea key={`a${i}`} x1={b.from_h} x2={b.to_h} fill={BAND_COLOURS[b.kind]} fillOpacity={b.kind === 'night' ? 0.07 : 0.06} ifOverflow="hidden" />
        ))}
        <XAxis dataKey="x_h" type="number" domain={axis.domain} ticks={axis.ticks} tick={TICK} tickFormatter={axis.labelOf} />
        <YAxis scale="log" domain={[FLOOR_LX, top]} ticks={ticks} allowDataOverflow tick={TICK} width={52} tickFormatter={formatLux} label={{ value: 'melanopic EDI (lx, log)', angle: -90, position: 'insideLeft', style: { textAnchor: 'middle', fill: AXIS_INK, fontSize: 10 } }} />
        <Legend wrapperStyle={LEGEND_STYLE} iconSize={9} />
        {bands.map((b, i) => (
          <ReferenceLine key={`l${i}`} segment={[{ x: b.from_h, y: b.limit_lx }, { x: b.to_h, y: b.limit_lx }]} stroke={BAND_COLOURS[b.kind]} strokeWidth={1.5} strokeDasharray={b.rule === 'at least' ? '6 3' : '2 3'} ifOverflow="hidden" />
        ))}
        {runs.map((r, k) => (
          <Line key={r.strategyId} type="stepAfter" dataKey={`s${k}`} name={names[k] ?? r.strategyId} stroke={seriesColour(k === 0 ? 0 : 1)} strokeDasharray={k === 0 ? '' : '6 3'} strokeWidth={1.6} dot={false} isAnimationActive={false} />
        ))}
      </LineChart>
      <p className="chart-note">All sources together, {(runs[0]?.light.step_h ?? 1) >= 1 ? 'hourly' : '10-minute'} means; values below {FLOOR_LX} lx are drawn at {FLOOR_LX} lx. Dashed band lines as above.</p>
    </figure>
  );
}
