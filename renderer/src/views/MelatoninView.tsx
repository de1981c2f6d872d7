// Melatonin: one night's modelled melatonin per strategy (18:00 to 12:00 local time), with the
// curve without light (dashed, light colour) to show suppression, and the cohort's 5–95 % and
// interquartile bands when a cohort ran. The x axis is real time with wall-clock ticks, so a night
// with a clock change is drawn an hour shorter or longer.
import { useState } from 'react';
import { Area, CartesianGrid, ComposedChart, Legend, Line, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { ResultsView } from '../results/view-model.js';
import { melatoninKey, melatoninNightRows, nightAxis, nightWindow } from '../charts/melatonin-data.js';
import { seriesColour } from '../charts/palette.js';
import { wallClockOf } from '../charts/wall-clock.js';
import { bandKeys, melatoninBands } from '../charts/cohort-bands.js';
import { formatNumber } from '../charts/number-format.js';
import { ChartFigure } from './ChartFigure.js';
import { useCohortSeries } from './use-cohort-series.js';
import { BandPicker, bandedStrategies, effectiveBandChoice } from './band-choice.js';

const AXIS_INK = '#4a5563';

export function MelatoninView({ view, personaId, day }: { view: ResultsView; personaId: string; day: number }) {
  const [chosenBand, setBandChoice] = useState<string | null>(null);
  const cohort = useCohortSeries(personaId);
  const clock = wallClockOf(view);
  const runs = view.runs.filter((r) => r.personaId === personaId);
  const strategies = view.strategies.filter((s) => runs.some((r) => r.strategyId === s.id));
  const rows = melatoninNightRows(runs, strategies, day, 10, clock);
  const axis = nightAxis(day, clock);
  const start = clock.dayStart_h(day);
  const bandChoice = effectiveBandChoice(chosenBand, strategies, view, personaId);
  const banded = bandedStrategies(bandChoice, strategies, cohort);
  for (const s of banded) {
    const bands = melatoninBands(cohort?.byStrategy[s.id] ?? [], rows.map((r) => start + r.x_h));
    const keys = bandKeys(s.id);
    rows.forEach((row, i) => {
      const b = bands[i];
      (row as Record<string, unknown>)[keys.outer] = b === null || b === undefined ? null : b.outer;
      (row as Record<string, unknown>)[keys.inner] = b === null || b === undefined ? null : b.inner;
    });
  }
  const unit = runs[0]?.melatonin.unit ?? '';
  const value = (v: unknown) => (Array.isArray(v) ? `${formatNumber(Number(v[0]), 1)}–${formatNumber(Number(v[1]), 1)} ${unit}` : `${formatNumber(Number(v), 1)} ${unit}`);
  const night = nightWindow(day, clock);
  const change = clock.changeNoteBetween(night.from_h, night.to_h);
  return (
    <div className="chart-block">
      {cohort !== null && (
        <div className="chart-toolbar">
          <BandPicker value={bandChoice} onChange={setBandChoice} strategies={strategies} cohort={cohort} />
        </div>
      )}
      {change !== null && <p className="clock-note">This night the {change}; the axis shows the night’s real length.</p>}
      <ChartFigure
        label="Melatonin over the night"
        caption={
          <>
            Where a solid line runs below its dashed partner, light is suppressing melatonin. Local clock time.
            {cohort !== null && banded.length > 0 && ` Shaded: the cohort of ${cohort.occupants} virtual occupants (seed ${cohort.seed}) — light band 5–95 %, dark band the middle half (interquartile range), melatonin with light.`}
          </>
        }
      >
        <ResponsiveContainer width="100%" height={360}>
          <ComposedChart data={rows} margin={{ top: 12, right: 24, bottom: 8, left: 8 }}>
            <CartesianGrid stroke="#e3e6ea" vertical={false} />
            <XAxis dataKey="x_h" type="number" domain={axis.domain} ticks={axis.ticks} tickFormatter={axis.labelOf} />
            <YAxis width={64} label={{ value: `melatonin (${unit})`, angle: -90, position: 'insideLeft', style: { textAnchor: 'middle', fill: AXIS_INK } }} tickFormatter={(v: number) => formatNumber(v, 0)} />
            <Tooltip labelFormatter={(x) => axis.labelOf(Number(x))} formatter={(v, name) => [value(v), String(name)]} />
            <Legend />
            {banded.map((s) => {
              const i = strategies.findIndex((x) => x.id === s.id);
              const keys = bandKeys(s.id);
              return [
                <Area key={keys.outer} className="cohort-band cohort-band-outer" dataKey={keys.outer} name={`${s.name}: cohort 5–95 %`} stroke="none" fill={seriesColour(i)} fillOpacity={0.12} legendType="none" isAnimationActive={false} />,
                <Area key={keys.inner} className="cohort-band cohort-band-inner" dataKey={keys.inner} name={`${s.name}: cohort middle half`} stroke="none" fill={seriesColour(i)} fillOpacity={0.24} legendType="none" isAnimationActive={false} />,
              ];
            })}
            {strategies.map((s, i) => (
              <Line key={`${s.id}-dark`} dataKey={melatoninKey(s.id, true)} name={`${s.name} — without light`} stroke={seriesColour(i)} strokeOpacity={0.45} strokeDasharray="4 3" dot={false} isAnimationActive={false} legendType="plainline" />
            ))}
            {strategies.map((s, i) => (
              <Line key={s.id} dataKey={melatoninKey(s.id)} name={s.name} stroke={seriesColour(i)} strokeWidth={2} dot={false} isAnimationActive={false} />
            ))}
          </ComposedChart>
        </ResponsiveContainer>
      </ChartFigure>
    </div>
  );
}
