// Body clock: DLMO or CBTmin clock time day by day for each strategy, and each strategy's shift on
// the last day with whether it moves the body clock toward alignment with work and sleep hours.
import { useState } from 'react';
import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { ResultsView } from '../results/view-model.js';
import { findRun } from '../results/view-model.js';
import { phaseByDayRows, phaseKey, phaseShiftVsBaseline_h, type PhaseMarker } from '../charts/phase-data.js';
import { seriesColour, seriesDash } from '../charts/palette.js';
import { clockAxis, formatClock, formatDayLabel } from '../charts/clock.js';
import { lastDayShiftReading, shortPersonName } from '../../../schedules/run/phase-words.js';

export function BodyClockView({ view, personaId }: { view: ResultsView; personaId: string }) {
  const [marker, setMarker] = useState<PhaseMarker>('dlmo');
  const runs = view.runs.filter((r) => r.personaId === personaId);
  const strategies = view.strategies.filter((s) => runs.some((r) => r.strategyId === s.id));
  const rows = phaseByDayRows(runs, strategies, view.days, marker);
  const baseline = findRun(view, personaId, view.baselineId);
  const person = shortPersonName(view.personas.find((p) => p.id === personaId)?.name ?? personaId);
  const axis = clockAxis(rows.flatMap((r) => strategies.map((st) => r[phaseKey(st.id, marker)])));
  return (
    <div className="chart-block">
      <div className="chart-toolbar">
        <div className="segmented" role="radiogroup" aria-label="Phase marker">
          {(['dlmo', 'cbtmin'] as const).map((m) => (
            <button key={m} type="button" role="radio" aria-checked={marker === m} className={marker === m ? 'seg seg-on' : 'seg'} onClick={() => setMarker(m)}>
              {m === 'dlmo' ? 'DLMO' : 'CBTmin'}
            </button>
          ))}
        </div>
      </div>
      <figure className="chart" aria-label={`${marker === 'dlmo' ? 'DLMO' : 'CBTmin'} by day`}>
        <ResponsiveContainer width="100%" height={340}>
          <LineChart data={rows} margin={{ top: 16, right: 24, bottom: 8, left: 8 }}>
            <CartesianGrid stroke="#e3e6ea" />
            <XAxis dataKey="day" tickFormatter={(d: number) => formatDayLabel(view.startDate, d)} />
            <YAxis reversed domain={axis.domain} ticks={axis.ticks} tickFormatter={(h: number) => formatClock(h)} label={{ value: 'clock time (earlier ↑)', angle: -90, position: 'insideLeft', style: { textAnchor: 'middle', fill: '#4a5563' } }} />
            <Tooltip labelFormatter={(d) => formatDayLabel(view.startDate, Number(d))} formatter={(v, name) => [formatClock(Number(v)), String(name)]} />
            <Legend />
            {strategies.map((s, i) => (
              <Line key={s.id} dataKey={phaseKey(s.id, marker)} name={s.name} stroke={seriesColour(i)} strokeDasharray={seriesDash(i)} strokeWidth={2} dot={{ r: 3 }} connectNulls isAnimationActive={false} />
            ))}
          </LineChart>
        </ResponsiveContainer>
      </figure>
      {baseline !== undefined && (
        <ul className="readings">
          {runs
            .filter((r) => r.strategyId !== view.baselineId)
            .map((r) => {
              const shift = phaseShiftVsBaseline_h(r, baseline, marker);
              const name = view.strategies.find((s) => s.id === r.strategyId)?.name ?? r.strategyId;
              return (
                <li key={r.strategyId}>
                  {name}:{' '}
                  {lastDayShiftReading(shift === null ? null : -shift, person, r.alignment, baseline.alignment)}
                </li>
              );
            })}
        </ul>
      )}
    </div>
  );
}
