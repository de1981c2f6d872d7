// Sleepiness: KSS as a day × hour grid (local clock hours) with the sleepy threshold outlined, and
// one day's curve with the KSS 7 line. On the day the clocks go forward the skipped hour is marked;
// on the day they go back the repeated hour shows both of its real hours.
import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { useState } from 'react';
import type { ResultsView } from '../results/view-model.js';
import { findRun } from '../results/view-model.js';
import { kssDayRows, kssGrid, KSS_SLEEPY_THRESHOLD, sleepyHours, type KssPart } from '../charts/kss-grid-data.js';
import { kssColour, OKABE_ITO } from '../charts/palette.js';
import { formatClock, formatDayLabel } from '../charts/clock.js';
import { wallClockOf } from '../charts/wall-clock.js';
import { ChartFigure } from './ChartFigure.js';

const partClass = (p: KssPart) => (p.sleepy ? 'kss-part kss-sleepy' : p.kss === null ? 'kss-part kss-none' : 'kss-part');

export function SleepinessView({ view, personaId, day }: { view: ResultsView; personaId: string; day: number }) {
  const [strategyId, setStrategyId] = useState(view.baselineId);
  const run = findRun(view, personaId, strategyId) ?? findRun(view, personaId, view.baselineId);
  if (run === undefined) return <p className="empty">No results for this person.</p>;
  const clock = wallClockOf(view);
  const grid = kssGrid(run.kssHourly, view.days, clock);
  const axis = clock.dayAxis(day);
  const name = view.strategies.find((s) => s.id === run.strategyId)?.name ?? run.strategyId;
  const describe = (d: number, hour: number, p: KssPart | undefined, which: string) =>
    `${formatDayLabel(view.startDate, d)} ${formatClock(hour)}${which}: ${p === undefined ? 'no such hour (clocks went forward)' : p.kss === null ? 'asleep or not modelled' : `KSS ${p.kss.toFixed(1)}`}`;
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
                {h % 3 === 0 ? `${String(h).padStart(2, '0')}:00` : ''}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {grid.map((row, d) => (
            <tr key={d}>
              <th scope="row">{formatDayLabel(view.startDate, d)}</th>
              {row.map((cell) =>
                cell.parts.length === 2 ? (
                  <td key={cell.hour} className="kss-cell kss-repeated">
                    <div className="kss-pair">
                      {cell.parts.map((p, k) => (
                        <span key={p.index} className={partClass(p)} style={p.kss === null ? undefined : { background: kssColour(p.kss) }} title={describe(d, cell.hour, p, k === 0 ? ' (first time)' : ' (second time, after the clocks went back)')} />
                      ))}
                    </div>
                  </td>
                ) : (
                  <td
                    key={cell.hour}
                    className={cell.parts.length === 0 ? 'kss-cell kss-skipped' : cell.sleepy ? 'kss-cell kss-sleepy' : cell.kss === null ? 'kss-cell kss-none' : 'kss-cell'}
                    style={cell.kss === null ? undefined : { background: kssColour(cell.kss) }}
                    title={describe(d, cell.hour, cell.parts[0], '')}
                  />
                ),
              )}
            </tr>
          ))}
        </tbody>
      </table>
      <p className="small muted">
        Darker = sleepier (KSS 1 extremely alert … 9 very sleepy). Outlined cells: KSS ≥ 7. Hatched: asleep or not modelled. Local clock time{clock.changes ? '; crossed out: the hour skipped when the clocks go forward; split in two: the hour lived twice when they go back' : ''}.
      </p>
      <ChartFigure label={`KSS over ${formatDayLabel(view.startDate, day)} — ${name}`} caption={clock.changeNote(day) ?? undefined}>
        <ResponsiveContainer width="100%" height={260}>
          <LineChart data={kssDayRows(run.kssHourly, day, clock)} margin={{ top: 12, right: 56, bottom: 8, left: 8 }}>
            <CartesianGrid stroke="#e3e6ea" vertical={false} />
            <XAxis dataKey="x_h" type="number" domain={axis.domain} ticks={axis.ticks} tickFormatter={axis.labelOf} />
            <YAxis domain={[1, 9]} ticks={[1, 3, 5, 7, 9]} width={48} label={{ value: 'KSS', angle: -90, position: 'insideLeft', fill: '#4a5563' }} />
            <Tooltip labelFormatter={(x) => axis.labelOf(Number(x))} formatter={(v) => [`KSS ${Number(v).toFixed(1)} (1–9 scale)`, 'Sleepiness']} />
            <ReferenceLine y={KSS_SLEEPY_THRESHOLD} stroke={OKABE_ITO.vermillion} strokeDasharray="6 3" label={{ value: 'KSS 7', position: 'right', fill: OKABE_ITO.vermillion }} />
            <Line dataKey="kss" name="Sleepiness" stroke={OKABE_ITO.blue} strokeWidth={2} dot={{ r: 2 }} isAnimationActive={false} />
          </LineChart>
        </ResponsiveContainer>
      </ChartFigure>
    </div>
  );
}
