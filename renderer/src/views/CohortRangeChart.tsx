// One metric across a cohort, per strategy: 5–95 % as a light band, the interquartile range as
// a dark band and the median as a tick, on one horizontal axis in the metric's unit.
import { Bar, BarChart, CartesianGrid, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { OKABE_ITO } from '../charts/palette.js';
import { formatNumber } from '../charts/comparison-data.js';
import type { RangeRow } from '../cohort/cohort-ranges.js';

interface Datum {
  readonly name: string;
  readonly outer: [number, number];
  readonly inner: [number, number];
  readonly tick: [number, number];
  readonly row: RangeRow;
}

export function CohortRangeChart({ rows, title }: { rows: readonly RangeRow[]; title: string }) {
  const usable = rows.filter((r) => r.p05 !== null && r.p95 !== null && r.q25 !== null && r.q75 !== null && r.median !== null);
  if (usable.length === 0) return null;
  const lo = Math.min(...usable.map((r) => r.p05 as number));
  const hi = Math.max(...usable.map((r) => r.p95 as number));
  // Padding around the widest range; a cohort without spread still gets a readable axis.
  const pad = hi - lo > 0 ? (hi - lo) * 0.05 : Math.max(0.5, Math.abs(hi) * 0.02);
  const domain: [number, number] = [lo - pad, hi + pad];
  const half = (domain[1] - domain[0]) * 0.004;
  const data: Datum[] = usable.map((r) => ({
    name: r.strategyName,
    outer: [r.p05 as number, r.p95 as number],
    inner: [r.q25 as number, r.q75 as number],
    tick: [(r.median as number) - half, (r.median as number) + half],
    row: r,
  }));
  const unit = usable[0]?.unit ?? '';
  const decimals = usable[0]?.decimals ?? 1;
  return (
    <figure className="chart cohort-range-chart" aria-label={`${title}: ranges across occupants`}>
      <figcaption>
        {title} ({unit}) — <span className="legend-outer">5–95 %</span>, <span className="legend-inner">interquartile range</span>, median tick
      </figcaption>
      <ResponsiveContainer width="100%" height={Math.max(120, 44 * data.length + 50)}>
        <BarChart data={data} layout="vertical" margin={{ top: 8, right: 24, bottom: 8, left: 72 }} barGap={0}>
          <CartesianGrid stroke="#e3e6ea" horizontal={false} />
          <XAxis type="number" domain={domain} tickCount={5} tickFormatter={(v: number) => formatNumber(v, decimals)} />
          <YAxis yAxisId="outer" type="category" dataKey="name" width={190} tick={{ fontSize: 12 }} tickFormatter={(name: string) => (name.length > 24 ? `${name.slice(0, 23)}…` : name)} />
          <YAxis yAxisId="inner" type="category" dataKey="name" hide />
          <YAxis yAxisId="tick" type="category" dataKey="name" hide />
          <Tooltip
            cursor={{ fill: 'rgba(0, 0, 0, 0.04)' }}
            content={({ active, payload }) => {
              const d = payload?.[0]?.payload as Datum | undefined;
              if (active !== true || d === undefined) return null;
              const f = (v: number | null) => `${formatNumber(v, decimals)} ${unit}`;
              return (
                <div className="tooltip">
                  <strong>{d.name}</strong>
                  <div>median {f(d.row.median)}</div>
                  <div>
                    IQR {f(d.row.q25)} – {f(d.row.q75)}
                  </div>
                  <div>
                    5–95 % {f(d.row.p05)} – {f(d.row.p95)}
                  </div>
                  <div>{d.row.n} occupants</div>
                </div>
              );
            }}
          />
          <Bar yAxisId="outer" dataKey="outer" fill={OKABE_ITO.skyBlue} fillOpacity={0.45} barSize={22} isAnimationActive={false} />
          <Bar yAxisId="inner" dataKey="inner" fill={OKABE_ITO.blue} fillOpacity={0.8} barSize={22} isAnimationActive={false} />
          <Bar yAxisId="tick" dataKey="tick" fill={OKABE_ITO.black} barSize={30} minPointSize={2} isAnimationActive={false} />
        </BarChart>
      </ResponsiveContainer>
    </figure>
  );
}
