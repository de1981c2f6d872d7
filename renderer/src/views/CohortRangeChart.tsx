// One metric across a cohort, per strategy: 5–95 % as a light band, the interquartile range as
// a dark band and the median as a tick, on one horizontal axis in the metric's unit.
import { Bar, BarChart, CartesianGrid, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { OKABE_ITO } from '../charts/palette.js';
import { formatNumber } from '../charts/number-format.js';
import { niceTicks } from '../charts/nice-ticks.js';
import { ChartFigure } from './ChartFigure.js';
import { wrapWords } from '../charts/wrap-words.js';
import type { RangeRow } from '../cohort/cohort-ranges.js';

interface Datum {
  readonly name: string;
  readonly outer: [number, number];
  readonly inner: [number, number];
  readonly tick: [number, number];
  readonly row: RangeRow;
}

const NAME_WIDTH_PX = 200;
const NAME_CHARS_PER_LINE = 26;

/** A category tick that wraps a strategy name over lines instead of cutting it. */
function WrappedName(props: { x?: number; y?: number; payload?: { value?: unknown } }) {
  const lines = wrapWords(String(props.payload?.value ?? ''), NAME_CHARS_PER_LINE);
  const lineH = 14;
  return (
    <text x={props.x ?? 0} y={(props.y ?? 0) - ((lines.length - 1) * lineH) / 2} textAnchor="end" fontSize={12} fill="#4a5563" dominantBaseline="central">
      {lines.map((line, i) => (
        <tspan key={i} x={(props.x ?? 0) - 4} dy={i === 0 ? 0 : lineH}>
          {line}
        </tspan>
      ))}
    </text>
  );
}

export function CohortRangeChart({ rows, title }: { rows: readonly RangeRow[]; title: string }) {
  const usable = rows.filter((r) => r.p05 !== null && r.p95 !== null && r.q25 !== null && r.q75 !== null && r.median !== null);
  if (usable.length === 0) return null;
  const lo = Math.min(...usable.map((r) => r.p05 as number));
  const hi = Math.max(...usable.map((r) => r.p95 as number));
  // Round ticks around the widest range; a cohort without spread still gets a readable axis.
  const axis = niceTicks(lo, hi === lo ? hi + Math.max(0.5, Math.abs(hi) * 0.02) : hi, 6);
  const domain = axis.domain;
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
    <ChartFigure className="cohort-range-chart" label={`${title}: ranges across occupants`} heading={<>{title} ({unit}) — <span className="legend-outer">5–95 %</span>, <span className="legend-inner">interquartile range</span>, median tick</>}>
      <ResponsiveContainer width="100%" height={Math.max(130, 48 * data.length + 50)}>
        <BarChart data={data} layout="vertical" margin={{ top: 8, right: 24, bottom: 8, left: 8 }} barGap={0}>
          <CartesianGrid stroke="#e3e6ea" horizontal={false} />
          <XAxis type="number" domain={domain} ticks={axis.ticks} tickFormatter={(v: number) => `${formatNumber(v, axis.decimals)}${unit === '%' ? ' %' : ''}`} />
          <YAxis yAxisId="outer" type="category" dataKey="name" width={NAME_WIDTH_PX} tick={<WrappedName />} interval={0} />
          <YAxis yAxisId="inner" type="category" dataKey="name" hide width={0} />
          <YAxis yAxisId="tick" type="category" dataKey="name" hide width={0} />
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
    </ChartFigure>
  );
}
