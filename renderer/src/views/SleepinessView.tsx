// Sleepiness: KSS as a day × hour grid with the sleepy threshold outlined, and one day's curve
// with the KSS 7 line.
import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { useState } from 'react';
import type { ResultsView } from '../results/view-model.js';
import { findRun } from '../results/view-model.js';
import { kssDayRows, kssGrid, KSS_SLEEPY_THRESHOLD, sleepyHours } from '../charts/kss-grid-data.js';
import { kssColour, OKABE_ITO } from '../charts/palette.js';
import { formatClock, formatDayLabel } from '../charts/clock.js';

export function SleepinessView({ view, personaId, day }: { view: ResultsView; personaId: string; day: number }) {
  const [strategyId, setStrategyId] = useState(view.baselineId);
  const run = findRun(view, personaId, strategyId) ?? findRun(view, personaId, view.baselineId);
  if (run === undefined) return <p className="empty">No results for this person.</p>;
  const grid = kssGrid(run.kssHourly, view.days);
  return (
    <div className="chart-block">
      <div className="chart-toolbar">
        <label>
          Strategy
          <select value={run.strategyId} onChange={(e) => setStrategyId(e.target.value)}>
            {view.strategies
              .filter((s) => view.runs.some((r) => r.personaId === personaId && r.strategyId === s.id))
              .map((s) => (
                <option key={s.id} value={s.id}>
                  {s.name}
                </option>
              ))}
          </select>
        </label>
        <span className="muted">
          {sleepyHours(run.kssHourly)} awake hours at KSS ≥ {KSS_SLEEPY_THRESHOLD}
        </span>
      </div>
      <table className="kss-grid" aria-label="KSS by day and hour">
        <thead>
          <tr>
            <th scope="col">Day</th>
            {Array.from({ length: 24 }, (_, h) => (
              <th key={h} scope="col">
                {h % 3 === 0 ? String(h).padStart(2, '0') : ''}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {grid.map((row, d) => (
            <tr key={d}>
              <th scope="row">{formatDayLabel(view.startDate, d)}</th>
              {row.map((cell) => (
                <td
                  key={cell.hour}
                  className={cell.sleepy ? 'kss-cell kss-sleepy' : cell.kss === null ? 'kss-cell kss-none' : 'kss-cell'}
                  style={cell.kss === null ? undefined : { background: kssColour(cell.kss) }}
                  title={cell.kss === null ? `${formatDayLabel(view.startDate, d)} ${formatClock(cell.hour)}: asleep or not modelled` : `${formatDayLabel(view.startDate, d)} ${formatClock(cell.hour)}: KSS ${cell.kss.toFixed(1)}`}
                />
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      <p className="small muted">Darker = sleepier (KSS 1 extremely alert … 9 very sleepy). Outlined cells: KSS ≥ 7. Hatched: asleep or not modelled.</p>
      <figure className="chart" aria-label="KSS over one day">
        <ResponsiveContainer width="100%" height={240}>
          <LineChart data={kssDayRows(run.kssHourly, day)} margin={{ top: 16, right: 56, bottom: 8, left: 8 }}>
            <CartesianGrid stroke="#e3e6ea" vertical={false} />
            <XAxis dataKey="hour" type="number" domain={[0, 23]} ticks={[0, 3, 6, 9, 12, 15, 18, 21]} tickFormatter={(h: number) => formatClock(h)} />
            <YAxis domain={[1, 9]} ticks={[1, 3, 5, 7, 9]} label={{ value: 'KSS', angle: -90, position: 'insideLeft', fill: '#4a5563' }} />
            <Tooltip labelFormatter={(h) => formatClock(Number(h))} formatter={(v) => [`KSS ${Number(v).toFixed(1)}`, 'Sleepiness']} />
            <ReferenceLine y={KSS_SLEEPY_THRESHOLD} stroke={OKABE_ITO.vermillion} strokeDasharray="6 3" label={{ value: 'KSS 7', position: 'right', fill: OKABE_ITO.vermillion }} />
            <Line dataKey="kss" stroke={OKABE_ITO.blue} strokeWidth={2} dot={{ r: 2 }} isAnimationActive={false} />
          </LineChart>
        </ResponsiveContainer>
      </figure>
    </div>
  );
}
