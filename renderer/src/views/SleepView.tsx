// Sleep: sleep and nap episodes per local day for each strategy, one row per day on a drawn time
// axis (local clock time). Rows share one hour width, so a 23-hour or 25-hour day (a clock change)
// is drawn shorter or longer, with its own hour lines and the change marked.
import type { ResultsView } from '../results/view-model.js';
import { formatDayLabel } from '../charts/clock.js';
import { seriesColour } from '../charts/palette.js';
import { wallClockOf } from '../charts/wall-clock.js';
import { formatDuration } from '../charts/number-format.js';
import { ChartFigure } from './ChartFigure.js';

const W = 1000;
const LABEL_W = 118;
const RIGHT_PAD = 14;
const TRACK_H = 9;
const TRACK_GAP = 2;
const DAY_GAP = 8;
const AXIS_H = 22;
const OWN_AXIS_H = 14;
const LEGEND_ROW_H = 18;
const INK = '#4a5563';
const GRID = '#e3e6ea';

export function SleepView({ view, personaId }: { view: ResultsView; personaId: string }) {
  const clock = wallClockOf(view);
  const runs = view.runs.filter((r) => r.personaId === personaId);
  // colours by the person's own strategy order, as in the other charts
  const strategies = view.strategies.filter((s) => runs.some((r) => r.strategyId === s.id));
  const tracks = strategies.flatMap((s, index) => {
    const run = runs.find((r) => r.strategyId === s.id);
    return run === undefined ? [] : [{ run, index, name: s.name }];
  });
  const days = Array.from({ length: view.days }, (_, day) => ({ day, start: clock.dayStart_h(day), length: clock.dayLength_h(day) }));
  const longest = Math.max(24, ...days.map((d) => d.length));
  const trackW = W - LABEL_W - RIGHT_PAD;
  const x = (h: number) => LABEL_W + (h / longest) * trackW;
  const tracksH = Math.max(1, tracks.length) * (TRACK_H + TRACK_GAP) - TRACK_GAP;
  // a day with a clock change gets its own line of local times under its tracks
  const rowHeight = (d: { day: number }) => tracksH + DAY_GAP + (clock.changesIn(d.day).length > 0 ? OWN_AXIS_H : 0);
  const rowTops: number[] = [];
  let y = AXIS_H;
  for (const d of days) {
    rowTops.push(y);
    y += rowHeight(d);
  }
  const top = AXIS_H;
  const bodyH = y - AXIS_H;
  const legendY = top + bodyH + AXIS_H + 8;
  const legendPerRow = 3;
  const height = legendY + Math.ceil(tracks.length / legendPerRow) * LEGEND_ROW_H + 4;
  const hourTicks = [0, 3, 6, 9, 12, 15, 18, 21, 24];
  const label = (h: number) => `${String(h).padStart(2, '0')}:00`;
  return (
    <div className="chart-block">
      <ChartFigure label="Sleep episodes by day" caption="Each day from local midnight to midnight; hour lines at 3-hour steps of local clock time. A day with a clock change has its own hour lines and is drawn an hour shorter or longer. Hover a bar for its times.">
        <svg data-chart-svg className="sleep-chart" viewBox={`0 0 ${W} ${height}`} width="100%" role="img" aria-label="Sleep episodes by day and strategy, local clock time" fontSize={12}>
          {/* time-of-day axis, top and bottom */}
          {hourTicks.map((h) => (
            <g key={`axis-${h}`} className="sleep-axis-tick">
              <text x={x(h)} y={top - 8} textAnchor={h === 0 ? 'start' : h === 24 ? 'end' : 'middle'} fill={INK}>
                {label(h)}
              </text>
              <text x={x(h)} y={top + bodyH + 16} textAnchor={h === 0 ? 'start' : h === 24 ? 'end' : 'middle'} fill={INK}>
                {label(h)}
              </text>
            </g>
          ))}
          {days.map(({ day, start, length }) => {
            const y0 = rowTops[day] ?? top;
            const change = clock.changesIn(day)[0];
            const own = clock.dayTicks(day, 3);
            const rowH = tracksH + DAY_GAP;
            return (
              <g key={day} className="sleep-day-row" data-day={day}>
                <text x={0} y={y0 + 10} fill={INK}>
                  {formatDayLabel(view.startDate, day)}
                </text>
                {change !== undefined && (
                  <text x={0} y={y0 + 24} fill={INK} fontSize={10}>
                    {`${Math.round(length)} h: clocks ${change.by_h > 0 ? 'forward' : 'back'}`}
                  </text>
                )}
                <rect x={x(0)} y={y0} width={x(length) - x(0)} height={rowH - DAY_GAP} fill="#f7f8fa" />
                {own.map((k) => (
                  <line key={k.x_h} x1={x(k.x_h)} x2={x(k.x_h)} y1={y0} y2={y0 + rowH - DAY_GAP} stroke={GRID} />
                ))}
                {change !== undefined && (
                  <g className="sleep-clock-change">
                    <line x1={x(change.x_h)} x2={x(change.x_h)} y1={y0 - 2} y2={y0 + rowH - DAY_GAP + 2} stroke={INK} strokeDasharray="3 2" />
                    <title>{clock.changeNote(day)}</title>
                    {own.map((k, i) => (
                      <text key={`own-${k.x_h}`} x={x(k.x_h)} y={y0 + tracksH + OWN_AXIS_H - 1} fontSize={10} fill={INK} textAnchor={i === 0 ? 'start' : i === own.length - 1 ? 'end' : 'middle'}>
                        {i === own.length - 1 ? '24:00' : k.label}
                      </text>
                    ))}
                  </g>
                )}
                {tracks.map((t, k) => {
                  const ty = y0 + k * (TRACK_H + TRACK_GAP);
                  return t.run.sleep
                    .filter((e) => e.end_h > start && e.start_h < start + length)
                    .map((e, i) => {
                      const from = Math.max(0, e.start_h - start);
                      const to = Math.min(length, e.end_h - start);
                      return (
                        <rect key={`${t.run.strategyId}-${i}`} className={e.kind === 'nap' ? 'sleep-bar sleep-nap' : 'sleep-bar'} x={x(from)} y={ty} width={Math.max(1, x(to) - x(from))} height={TRACK_H} rx={2} fill={seriesColour(t.index)} fillOpacity={e.kind === 'nap' ? 0.55 : 1}>
                          <title>{`${t.name}: ${e.kind} ${clock.format(e.start_h)}–${clock.format(e.end_h)} (${formatDuration(e.end_h - e.start_h)})`}</title>
                        </rect>
                      );
                    });
                })}
              </g>
            );
          })}
          {tracks.map((t, k) => {
            const lx = (k % legendPerRow) * ((W - 20) / legendPerRow);
            const ly = legendY + Math.floor(k / legendPerRow) * LEGEND_ROW_H;
            return (
              <g key={`legend-${t.run.strategyId}`} className="sleep-legend-item">
                <rect x={lx} y={ly - 9} width={14} height={10} rx={2} fill={seriesColour(t.index)} />
                <text x={lx + 20} y={ly} fill={INK}>
                  {t.name}
                </text>
              </g>
            );
          })}
        </svg>
      </ChartFigure>
    </div>
  );
}
