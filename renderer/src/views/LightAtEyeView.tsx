// Light at the eye: melanopic EDI over one day, stacked by source, with the recommendation
// bands (Brown et al. 2022) drawn in.
import { useState } from 'react';
import { Area, CartesianGrid, ComposedChart, Legend, Line, ReferenceArea, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { ResultsView } from '../results/view-model.js';
import { findRun } from '../results/view-model.js';
import { bandCompliance, lightAtEyeRows, recommendationBands } from '../charts/light-at-eye-data.js';
import { BAND_COLOURS, SOURCE_KIND_COLOURS } from '../charts/palette.js';
import { formatClock } from '../charts/clock.js';

const BAND_TEXT = { day: 'Day: ≥ 250 lx', evening: 'Evening: ≤ 10 lx', night: 'Night: ≤ 1 lx' } as const;

export function LightAtEyeView({ view, personaId, day }: { view: ResultsView; personaId: string; day: number }) {
  const [strategyId, setStrategyId] = useState(view.baselineId);
  const [scale, setScale] = useState<'linear' | 'log'>('linear');
  const run = findRun(view, personaId, strategyId) ?? findRun(view, personaId, view.baselineId);
  if (run === undefined) return <p className="empty">No results for this person.</p>;
  const rows = lightAtEyeRows(run.light, day);
  const bands = recommendationBands(run.sleep, day);
  const compliance = bandCompliance(rows, bands);
  const logRows = rows.map((r) => ({ clock_h: r.clock_h, total_lx: Math.max(0.1, r.total_lx) }));
  const available = view.strategies.filter((s) => view.runs.some((r) => r.personaId === personaId && r.strategyId === s.id));
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
        <div className="segmented" role="radiogroup" aria-label="Scale">
          {(['linear', 'log'] as const).map((s) => (
            <button key={s} type="button" role="radio" aria-checked={scale === s} className={scale === s ? 'seg seg-on' : 'seg'} onClick={() => setScale(s)}>
              {s === 'linear' ? 'Stacked by source' : 'Total, log scale'}
            </button>
          ))}
        </div>
      </div>
      <figure className="chart" aria-label="Melanopic EDI at the eye over the day">
        <ResponsiveContainer width="100%" height={360}>
          <ComposedChart data={scale === 'linear' ? rows : logRows} margin={{ top: 16, right: 24, bottom: 8, left: 8 }}>
            <CartesianGrid stroke="#e3e6ea" vertical={false} />
            {bands.map((b, i) => (
              <ReferenceArea key={`a${i}`} x1={b.from_h} x2={b.to_h} fill={BAND_COLOURS[b.kind]} fillOpacity={b.kind === 'night' ? 0.06 : 0.05} ifOverflow="hidden" />
            ))}
            <XAxis dataKey="clock_h" type="number" domain={[0, 24]} ticks={[0, 3, 6, 9, 12, 15, 18, 21, 24]} tickFormatter={(h: number) => formatClock(h === 24 ? 0 : h)} />
            <YAxis
              scale={scale === 'log' ? 'log' : 'linear'}
              domain={scale === 'log' ? [0.1, 'auto'] : [0, 'auto']}
              allowDataOverflow={scale === 'log'}
              label={{ value: 'melanopic EDI (lx)', angle: -90, position: 'insideLeft', style: { textAnchor: 'middle', fill: '#4a5563' } }}
              tickFormatter={(v: number) => (v >= 1000 ? `${v / 1000}k` : String(v))}
            />
            <Tooltip labelFormatter={(h) => formatClock(Number(h))} formatter={(v, name) => [`${Number(v).toFixed(1)} lx`, String(name)]} />
            <Legend />
            {scale === 'linear' &&
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
        <figcaption>
          Dashed lines: recommended melanopic EDI at the eye — at least 250 lx by day, at most 10 lx in the 3 h before sleep, at most 1 lx during sleep (Brown et al. 2022, PLOS Biology 20:e3001571).
        </figcaption>
      </figure>
      <ul className="compliance" aria-label="Time meeting the recommendations">
        {compliance.map((c, i) => (
          <li key={i}>
            <span className="swatch" style={{ background: BAND_COLOURS[c.band.kind] }} />
            {BAND_TEXT[c.band.kind]} {formatClock(c.band.from_h)}–{formatClock(c.band.to_h)}: <strong>{Math.round(c.met * 100)} %</strong> of the time met
          </li>
        ))}
      </ul>
    </div>
  );
}
