// A compact drawing of a persona's first days: one thin row per day, coloured by activity with
// the app's activity colours, clock hours across.
import type { TimelineRow } from '../scenario-facts.js';
import { ACTIVITY_STYLE } from '../../../src/components/WeekTimeline.js';
import { ACTIVITY_LABELS } from '../../../../schedules/words/scenario-terms.js';

const LABEL_W = 64;
const ROW_H = 11;
const GAP = 3;

export function TimelineDrawing({ rows, width = 640 }: { rows: readonly TimelineRow[]; width?: number }) {
  const track = width - LABEL_W - 6;
  const height = rows.length * (ROW_H + GAP) + 14;
  const x = (h: number) => LABEL_W + (h / 24) * track;
  const used = [...new Set(rows.flatMap((r) => r.bars.map((b) => b.activity)))];
  return (
    <div className="timeline-drawing">
      <svg width={width} height={height} viewBox={`0 0 ${width} ${height}`} role="img" aria-label="Timeline of the first days">
        {rows.map((row, i) => (
          <g key={row.day} transform={`translate(0 ${i * (ROW_H + GAP)})`}>
            <text x={0} y={ROW_H - 2} fontSize={9} fill="#4a5563">
              {row.date}
            </text>
            <rect x={LABEL_W} y={0} width={track} height={ROW_H} fill="#f1f3f5" />
            {row.bars.map((b, j) => (
              <rect key={j} x={x(b.from_h)} y={0} width={Math.max(0.5, x(b.to_h) - x(b.from_h))} height={ROW_H} fill={(ACTIVITY_STYLE[b.activity] ?? ACTIVITY_STYLE.other)?.fill} />
            ))}
          </g>
        ))}
        {[0, 3, 6, 9, 12, 15, 18, 21, 24].map((h) => (
          <g key={h}>
            <line x1={x(h)} x2={x(h)} y1={0} y2={rows.length * (ROW_H + GAP) - GAP} stroke="#ffffff" strokeWidth={h % 6 === 0 ? 1 : 0.5} />
            <text x={x(h)} y={height - 2} fontSize={8} fill="#6b7685" textAnchor={h === 0 ? 'start' : h === 24 ? 'end' : 'middle'}>
              {String(h).padStart(2, '0')}:00
            </text>
          </g>
        ))}
      </svg>
      <ul className="key">
        {used.map((a) => (
          <li key={a}>
            <span className="swatch" style={{ background: (ACTIVITY_STYLE[a] ?? ACTIVITY_STYLE.other)?.fill }} />
            {ACTIVITY_LABELS[a]}
          </li>
        ))}
      </ul>
    </div>
  );
}
