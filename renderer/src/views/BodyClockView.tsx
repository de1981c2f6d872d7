// Body clock: DLMO or CBTmin local clock time day by day for each strategy, with the cohort's
// 5–95 % and interquartile bands when a cohort ran, and each strategy's shift on the last day with
// whether it moves the body clock toward alignment with work and sleep hours.
import { useState } from 'react';
import { Area, CartesianGrid, ComposedChart, Legend, Line, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { ResultsView } from '../results/view-model.js';
import { findRun } from '../results/view-model.js';
import { phaseByDayRows, phaseKey, phaseShiftVsBaseline_h, type PhaseMarker } from '../charts/phase-data.js';
import { seriesColour, seriesDash } from '../charts/palette.js';
import { clockAxis, formatClock, formatDayLabel } from '../charts/clock.js';
import { wallClockOf } from '../charts/wall-clock.js';
import { bandKeys, markerBands } from '../charts/cohort-bands.js';
import { lastDayShiftReading, shortPersonName } from '../../../schedules/run/phase-words.js';
import { ChartFigure } from './ChartFigure.js';
import { useCohortSeries } from './use-cohort-series.js';
import { BandPicker, bandedStrategies, effectiveBandChoice } from './band-choice.js';

const AXIS_INK = '#4a5563';

/** A tooltip value: a clock time, or a band's low–high. */
function clockValue(v: unknown): string {
  if (Array.isArray(v)) return `${formatClock(Number(v[0]))}–${formatClock(Number(v[1]))}`;
  return formatClock(Number(v));
}

export function BodyClockView({ view, personaId }: { view: ResultsView; personaId: string }) {
  const [marker, setMarker] = useState<PhaseMarker>('dlmo');
  const [chosenBand, setBandChoice] = useState<string | null>(null);
  const cohort = useCohortSeries(personaId);
  const clock = wallClockOf(view);
  const runs = view.runs.filter((r) => r.personaId === personaId);
  const strategies = view.strategies.filter((s) => runs.some((r) => r.strategyId === s.id));
  const rows = phaseByDayRows(runs, strategies, view.days, marker, clock);
  const bandChoice = effectiveBandChoice(chosenBand, strategies, view, personaId);
  const banded = bandedStrategies(bandChoice, strategies, cohort);
  for (const s of banded) {
    const run = runs.find((r) => r.strategyId === s.id);
    if (run === undefined || cohort === null) continue;
    const bands = markerBands(cohort.byStrategy[s.id] ?? [], run, marker, rows.map((r) => r[phaseKey(s.id, marker)]));
    const keys = bandKeys(s.id);
    rows.forEach((row, day) => {
      const b = bands[day];
      (row as Record<string, unknown>)[keys.outer] = b === null || b === undefined ? null : b.outer;
      (row as Record<string, unknown>)[keys.inner] = b === null || b === undefined ? null : b.inner;
    });
  }
  const baseline = findRun(view, personaId, view.baselineId);
  const person = shortPersonName(view.personas.find((p) => p.id === personaId)?.name ?? personaId);
  const axis = clockAxis(rows.flatMap((r) => [...strategies.map((st) => r[phaseKey(st.id, marker)]), ...banded.flatMap((st) => ((r as Record<string, unknown>)[bandKeys(st.id).outer] as [number, number] | null | undefined) ?? [])]));
  const markerName = marker === 'dlmo' ? 'DLMO' : 'CBTmin';
  const changeDays = Array.from({ length: view.days }, (_, d) => d).filter((d) => clock.changesIn(d).length > 0);
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
        <BandPicker value={bandChoice} onChange={setBandChoice} strategies={strategies} cohort={cohort} />
      </div>
      <ChartFigure
        label={`${markerName} by day`}
        caption={
          <>
            {markerName === 'DLMO' ? 'Dim-light melatonin onset' : 'Core-body-temperature minimum'}, local clock time; earlier is up.{changeDays.length > 0 && ' A step on a day the clocks change is the clock moving, not the body clock.'}
            {cohort !== null && banded.length > 0 && ` Shaded: the cohort of ${cohort.occupants} virtual occupants (seed ${cohort.seed}) — light band 5–95 %, dark band the middle half (interquartile range).`}
          </>
        }
      >
        <ResponsiveContainer width="100%" height={360}>
          <ComposedChart data={rows} margin={{ top: 12, right: 24, bottom: 8, left: 8 }}>
            <CartesianGrid stroke="#e3e6ea" />
            <XAxis dataKey="day" tickFormatter={(d: number) => formatDayLabel(view.startDate, d)} />
            <YAxis reversed domain={axis.domain} ticks={axis.ticks} width={64} tickFormatter={(h: number) => formatClock(h)} label={{ value: 'local time (earlier ↑)', angle: -90, position: 'insideLeft', style: { textAnchor: 'middle', fill: AXIS_INK } }} />
            <Tooltip labelFormatter={(d) => formatDayLabel(view.startDate, Number(d))} formatter={(v, name) => [clockValue(v), String(name)]} />
            <Legend />
            {banded.map((s) => {
              const i = strategies.findIndex((x) => x.id === s.id);
              const keys = bandKeys(s.id);
              return [
                <Area key={keys.outer} className="cohort-band cohort-band-outer" dataKey={keys.outer} name={`${s.name}: cohort 5–95 %`} stroke="none" fill={seriesColour(i)} fillOpacity={0.12} legendType="none" connectNulls isAnimationActive={false} />,
                <Area key={keys.inner} className="cohort-band cohort-band-inner" dataKey={keys.inner} name={`${s.name}: cohort middle half`} stroke="none" fill={seriesColour(i)} fillOpacity={0.24} legendType="none" connectNulls isAnimationActive={false} />,
              ];
            })}
            {changeDays.map((d) => (
              <ReferenceLine key={`change-${d}`} x={d} stroke="#4a5563" strokeDasharray="3 3" label={{ value: clock.changesIn(d)[0]?.by_h === 1 ? 'clocks +1 h' : 'clocks −1 h', position: 'insideTopLeft', fill: '#4a5563', fontSize: 11 }} />
            ))}
            {strategies.map((s, i) => (
              <Line key={s.id} dataKey={phaseKey(s.id, marker)} name={s.name} stroke={seriesColour(i)} strokeDasharray={seriesDash(i)} strokeWidth={2} dot={{ r: 3 }} connectNulls isAnimationActive={false} />
            ))}
          </ComposedChart>
        </ResponsiveContainer>
      </ChartFigure>
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
