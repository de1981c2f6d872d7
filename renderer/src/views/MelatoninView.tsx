// Melatonin: one night's modelled melatonin per strategy, with the curve without light
// (dashed, light colour) to show suppression.
import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { ResultsView } from '../results/view-model.js';
import { melatoninKey, melatoninNightRows } from '../charts/melatonin-data.js';
import { seriesColour } from '../charts/palette.js';
import { formatClock } from '../charts/clock.js';

export function MelatoninView({ view, personaId, day }: { view: ResultsView; personaId: string; day: number }) {
  const runs = view.runs.filter((r) => r.personaId === personaId);
  const strategies = view.strategies.filter((s) => runs.some((r) => r.strategyId === s.id));
  const rows = melatoninNightRows(runs, strategies, day);
  const unit = runs[0]?.melatonin.unit ?? '';
  return (
    <div className="chart-block">
      <figure className="chart" aria-label="Melatonin over the night">
        <ResponsiveContainer width="100%" height={340}>
          <LineChart data={rows} margin={{ top: 16, right: 24, bottom: 8, left: 8 }}>
            <CartesianGrid stroke="#e3e6ea" vertical={false} />
            <XAxis dataKey="hour" type="number" domain={[18, 36]} ticks={[18, 21, 24, 27, 30, 33, 36]} tickFormatter={(h: number) => formatClock(h)} />
            <YAxis label={{ value: `melatonin (${unit})`, angle: -90, position: 'insideLeft', style: { textAnchor: 'middle', fill: '#4a5563' } }} />
            <Tooltip labelFormatter={(h) => formatClock(Number(h))} formatter={(v, name) => [`${Number(v).toFixed(1)} ${unit}`, String(name)]} />
            <Legend />
            {strategies.map((s, i) => (
              <Line key={`${s.id}-dark`} dataKey={melatoninKey(s.id, true)} name={`${s.name} — without light`} stroke={seriesColour(i)} strokeOpacity={0.45} strokeDasharray="4 3" dot={false} isAnimationActive={false} legendType="plainline" />
            ))}
            {strategies.map((s, i) => (
              <Line key={s.id} dataKey={melatoninKey(s.id)} name={s.name} stroke={seriesColour(i)} strokeWidth={2} dot={false} isAnimationActive={false} />
            ))}
          </LineChart>
        </ResponsiveContainer>
        <figcaption>Where a solid line runs below its dashed partner, light is suppressing melatonin.</figcaption>
      </figure>
    </div>
  );
}
