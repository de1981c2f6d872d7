// Light at the eye: melanopic EDI over one local day, stacked by source on a capped linear axis
// or as the total on a log axis (the choice is remembered), with the recommendation bands
// (Brown et al. 2022) drawn in. The x axis is the day's real length with wall-clock ticks.
import { useState } from 'react';
import { Area, CartesianGrid, ComposedChart, Legend, Line, ReferenceArea, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { ResultsView } from '../results/view-model.js';
import { findRun } from '../results/view-model.js';
import { bandCompliance, lightAtEyeRows, recommendationBands } from '../charts/light-at-eye-data.js';
import { BAND_COLOURS, SOURCE_KIND_COLOURS } from '../charts/palette.js';
import { formatClock } from '../charts/clock.js';
import { wallClockOf } from '../charts/wall-clock.js';
import { formatLux, lightAxisTop_lx, logLightTicks, LOG_FLOOR_LX, type LightScale } from '../charts/light-scale.js';
import { niceTicks } from '../charts/nice-ticks.js';
import { ChartFigure } from './ChartFigure.js';
import { useRememberedChoice } from './remembered-choice.js';

/** Bands named by the person's own sleep (a night worker's "3 h before sleep" falls in the morning). */
const BAND_TEXT = { day: 'Awake: ≥ 250 lx', evening: 'Last 3 h before sleep: ≤ 10 lx', night: 'Asleep: ≤ 1 lx' } as const;
const SCALES: readonly LightScale[] = ['capped', 'log'];
const AXIS_INK = '#4a5563';

export function LightAtEyeView({ view, personaId, day }: { view: ResultsView; personaId: string; day: number }) {
  const [strategyId, setStrategyId] = useState(view.baselineId);
  const [scale, setScale] = useRememberedChoice<LightScale>('light-scale', SCALES, 'capped');
  const run = findRun(view, personaId, strategyId) ?? findRun(view, personaId, view.baselineId);
  if (run === undefined) return <p className="empty">No results for this person.</p>;
  const clock = wallClockOf(view);
  const axis = clock.dayAxis(day);
  const rows = lightAtEyeRows(run.light, day, 10, clock);
  const bands = recommendationBands(run.sleep, day, clock);
  const compliance = bandCompliance(rows, bands);
  const capped = lightAxisTop_lx(rows.map((r) => r.total_lx));
  const linear = niceTicks(0, capped.top, 6);
  const peakRow = rows.reduce<(typeof rows)[number] | undefined>((best, r) => (best === undefined || r.total_lx > best.total_lx ? r : best), undefined);
  const log = logLightTicks(capped.peak);
  const logRows = rows.map((r) => ({ x_h: r.x_h, total_lx: Math.max(LOG_FLOOR_LX, r.total_lx) }));
  const available = view.strategies.filter((s) => view.runs.some((r) => r.personaId === personaId && r.strategyId === s.id));
  const name = view.strategies.find((s) => s.id === run.strategyId)?.name ?? run.strategyId;
  const change = clock.changeNote(day);
  const cut = scale === 'capped' && capped.peak > linear.domain[1];
  return (
    <div className="chart-block">
      <div className="chart-toolbar">
        <label>
          Strategy
          <select value={run.strategyId} onChange={(e) => setStrategyId(e.target.value)}>
            {available.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name}
              </option>
            ))}
          </select>
        </label>
        <div className="segmented" role="radiogroup" aria-label="Light scale">
          {SCALES.map((s) => (
            <button key={s} type="button" role="radio" aria-checked={scale === s} className={scale === s ? 'seg seg-on' : 'seg'} onClick={() => setScale(s)}>
              {s === 'capped' ? 'By source, capped axis' : 'Total, log axis'}
            </button>
          ))}
        </div>
      </div>
      {change !== null && <p className="clock-note">{change}; the axis shows the day’s real length.</p>}
      <ChartFigure
        label={`Melanopic EDI at the eye — ${name}`}
        caption={
          <>
            {cut && peakRow !== undefined && `Peaks above ${formatLux(linear.domain[1])} lx are cut (highest ${formatLux(capped.peak)} lx at ${formatClock(peakRow.clock_h)}); the log axis shows them whole. `}
            Dashed lines: recommended melanopic EDI at the eye — at least 250 lx while awake, at most 10 lx in the 3 h before sleep, at most 1 lx during sleep (Brown et al. 2022, PLOS Biology 20:e3001571). Local clock time.
          </>
        }
      >
        <ResponsiveContainer width="100%" height={360}>
          <ComposedChart data={scale === 'capped' ? rows : logRows} margin={{ top: 12, right: 24, bottom: 8, left: 8 }}>
            <CartesianGrid stroke="#e3e6ea" vertical={false} />
            {bands.map((b, i) => (
              <ReferenceArea key={`a${i}`} x1={b.from_h} x2={b.to_h} fill={BAND_COLOURS[b.kind]} fillOpacity={b.kind === 'night' ? 0.06 : 0.05} ifOverflow="hidden" />
            ))}
            <XAxis dataKey="x_h" type="number" domain={axis.domain} ticks={axis.ticks} tickFormatter={axis.labelOf} />
            <YAxis
              scale={scale === 'log' ? 'log' : 'linear'}
              domain={scale === 'log' ? log.domain : linear.domain}
              ticks={scale === 'log' ? log.ticks : linear.ticks}
              allowDataOverflow
              width={64}
              label={{ value: scale === 'log' ? 'melanopic EDI (lx, log)' : 'melanopic EDI (lx)', angle: -90, position: 'insideLeft', style: { textAnchor: 'middle', fill: AXIS_INK } }}
              tickFormatter={formatLux}
            />
            <Tooltip labelFormatter={(x) => axis.labelOf(Number(x))} formatter={(v, n) => [`${formatLux(Number(v))} lx`, String(n)]} />
            <Legend />
            {scale === 'capped' &&
              run.light.sources.map((s) => <Area key={s.id} type="stepAfter" dataKey={s.id} name={s.label} stackId="light" stroke={SOURCE_KIND_COLOURS[s.kind]} fill={SOURCE_KIND_COLOURS[s.kind]} fillOpacity={0.55} isAnimationActive={false} />)}
            {scale === 'log' && <Line type="stepAfter" dataKey="total_lx" name="All sources" stroke="#1b1b1b" dot={false} isAnimationActive={false} />}
            {bands.map((b, i) => (
              <ReferenceLine
                key={`l${i}`}
                segment={[
                  { x: b.from_h, y: b.limit_lx },
                  { x: b.to_h, y: b.limit_lx },
                ]}
                stroke={BAND_COLOURS[b.kind]}
                strokeWidth={2}
                strokeDasharray={b.rule === 'at least' ? '6 3' : '2 3'}
                ifOverflow="hidden"
              />
            ))}
          </ComposedChart>
        </ResponsiveContainer>
      </ChartFigure>
      <ul className="compliance" aria-label="Time meeting the recommendations">
        {compliance.map((c, i) => (
          <li key={i}>
            <span className="swatch" style={{ background: BAND_COLOURS[c.band.kind] }} />
            {BAND_TEXT[c.band.kind]} {formatClock(c.band.from_clock_h)}–{c.band.to_clock_h >= 24 ? '24:00' : formatClock(c.band.to_clock_h)}: <strong>{Math.round(c.met * 100)} %</strong> of the time met
          </li>
        ))}
      </ul>
    </div>
  );
}
