// A persona's routine as seven 24-hour rows. Segments can be moved and resized with the mouse
// (drag the body or an edge) or the keyboard (arrows move by 15 min; Shift+arrows change the
// end, Alt+arrows the start; Delete removes). Every change is one undoable edit.
import { useRef, useState, type KeyboardEvent, type PointerEvent } from 'react';
import type { PersonaInput, ScenarioInput, Weekday } from '../scenario/scenario-types.js';
import { moveSegment, removeSegment, resizeSegment, timelinePieces, WEEKDAY_NAMES, WEEKDAY_ORDER, dayTemplateName } from '../scenario/routine-edits.js';
import { MINUTES_PER_DAY, snap, SNAP_MIN, clockOf } from '../scenario/clock-minutes.js';
import { useController } from '../state/workspace-context.js';
import { OKABE_ITO } from '../charts/palette.js';

export const ACTIVITY_STYLE: Record<string, { fill: string; ink: string }> = {
  sleep: { fill: '#3b4a5c', ink: '#ffffff' },
  nap: { fill: '#6b7b8e', ink: '#ffffff' },
  work: { fill: OKABE_ITO.blue, ink: '#ffffff' },
  commute: { fill: OKABE_ITO.orange, ink: '#1b1b1b' },
  leisure: { fill: '#e7c6da', ink: '#1b1b1b' },
  meal: { fill: OKABE_ITO.yellow, ink: '#1b1b1b' },
  exercise: { fill: OKABE_ITO.bluishGreen, ink: '#ffffff' },
  other: { fill: '#c9ced6', ink: '#1b1b1b' },
};

interface Drag {
  readonly day: Weekday;
  readonly index: number;
  readonly mode: 'move' | 'start' | 'end';
  readonly startX: number;
  readonly rowWidth: number;
  readonly delta_min: number;
}

export function WeekTimeline({ scenario, persona }: { scenario: ScenarioInput; persona: PersonaInput }) {
  const controller = useController();
  const [selected, setSelected] = useState<{ day: Weekday; index: number } | null>(null);
  const [drag, setDrag] = useState<Drag | null>(null);
  const rowRef = useRef<HTMLDivElement | null>(null);
  const placeName = (id: string) => scenario.places.find((p) => p.id === id)?.name ?? id;

  const apply = (day: Weekday, index: number, mode: Drag['mode'], delta: number) => {
    if (delta === 0) return;
    controller.store.edit((s) => (mode === 'move' ? moveSegment(s, persona.id, day, index, delta) : resizeSegment(s, persona.id, day, index, mode, delta)));
  };

  const onKey = (event: KeyboardEvent<HTMLButtonElement>, day: Weekday, index: number) => {
    const step = event.key === 'ArrowRight' ? SNAP_MIN : event.key === 'ArrowLeft' ? -SNAP_MIN : 0;
    if (step !== 0) {
      event.preventDefault();
      apply(day, index, event.shiftKey ? 'end' : event.altKey ? 'start' : 'move', step);
    } else if (event.key === 'Delete' || event.key === 'Backspace') {
      event.preventDefault();
      controller.store.edit((s) => removeSegment(s, persona.id, day, index));
      setSelected(null);
    }
  };

  const beginDrag = (event: PointerEvent<HTMLElement>, day: Weekday, index: number, mode: Drag['mode']) => {
    const row = (event.currentTarget.closest('.timeline-track') as HTMLElement | null) ?? rowRef.current;
    if (row === null) return;
    event.preventDefault();
    event.stopPropagation();
    (event.currentTarget as HTMLElement).setPointerCapture(event.pointerId);
    setSelected({ day, index });
    setDrag({ day, index, mode, startX: event.clientX, rowWidth: row.getBoundingClientRect().width, delta_min: 0 });
  };
  const moveDrag = (event: PointerEvent<HTMLElement>) => {
    if (drag === null) return;
    const delta = snap(((event.clientX - drag.startX) / Math.max(1, drag.rowWidth)) * MINUTES_PER_DAY);
    if (delta !== drag.delta_min) setDrag({ ...drag, delta_min: delta });
  };
  const endDrag = () => {
    if (drag === null) return;
    apply(drag.day, drag.index, drag.mode, drag.delta_min);
    setDrag(null);
  };

  const pieces = timelinePieces(persona);
  return (
    <div className="timeline" role="group" aria-label={`Routine of ${persona.name}`}>
      <div className="timeline-hours" aria-hidden="true">
        <span className="timeline-daylabel" />
        <div className="timeline-scale">
          {[0, 3, 6, 9, 12, 15, 18, 21, 24].map((h) => (
            <span key={h} style={{ left: `${(h / 24) * 100}%` }}>
              {String(h).padStart(2, '0')}:00
            </span>
          ))}
        </div>
      </div>
      {WEEKDAY_ORDER.map((day) => {
        const template = dayTemplateName(persona, day);
        return (
          <div className="timeline-row" key={day}>
            <span className="timeline-daylabel">
              {WEEKDAY_NAMES[day]}
              {template !== null && <small className="muted"> · {template}</small>}
            </span>
            <div className="timeline-track" ref={day === 'mon' ? rowRef : undefined}>
              {pieces
                .filter((p) => p.day === day)
                .map((p) => {
                  const owner = p.continued ? WEEKDAY_ORDER[(WEEKDAY_ORDER.indexOf(day) + 6) % 7]! : day;
                  const isDragged = drag !== null && drag.day === owner && drag.index === p.index;
                  const d = isDragged ? drag.delta_min : 0;
                  const mode = isDragged ? drag.mode : null;
                  const shiftFrom = !p.continued && (mode === 'move' || mode === 'start') ? d : 0;
                  const shiftTo = mode === 'move' || mode === 'end' ? d : 0;
                  const from = Math.max(0, Math.min(MINUTES_PER_DAY, p.from_min + shiftFrom));
                  const to = Math.max(from, Math.min(MINUTES_PER_DAY, p.to_min + shiftTo));
                  const activity = p.segment.activity ?? 'other';
                  const style = ACTIVITY_STYLE[activity] ?? ACTIVITY_STYLE.other!;
                  const isSelected = selected !== null && selected.day === owner && selected.index === p.index;
                  const label = `${WEEKDAY_NAMES[owner]} ${p.segment.start}–${p.segment.end}, ${activity} at ${placeName(p.segment.place)}`;
                  const width = ((to - from) / MINUTES_PER_DAY) * 100;
                  if (p.continued) {
                    return <div key={`${owner}-${p.index}-c`} className="segment segment-continued" aria-hidden="true" style={{ left: `${(from / MINUTES_PER_DAY) * 100}%`, width: `${width}%`, background: style.fill, color: style.ink }} />;
                  }
                  return (
                    <button
                      type="button"
                      key={`${owner}-${p.index}`}
                      className={isSelected ? 'segment segment-selected' : 'segment'}
                      style={{ left: `${(from / MINUTES_PER_DAY) * 100}%`, width: `${width}%`, background: style.fill, color: style.ink }}
                      aria-label={label}
                      aria-pressed={isSelected}
                      title={`${label}\nArrows move by 15 min · Shift+arrows change the end · Alt+arrows the start · Delete removes`}
                      onFocus={() => setSelected({ day: owner, index: p.index })}
                      onKeyDown={(e) => onKey(e, owner, p.index)}
                      onPointerDown={(e) => beginDrag(e, owner, p.index, 'move')}
                      onPointerMove={moveDrag}
                      onPointerUp={endDrag}
                      onPointerCancel={() => setDrag(null)}
                    >
                      <span className="segment-handle segment-handle-start" onPointerDown={(e) => beginDrag(e, owner, p.index, 'start')} onPointerMove={moveDrag} onPointerUp={endDrag} />
                      {width > 4 && <span className="segment-text">{activity}</span>}
                      <span className="segment-handle segment-handle-end" onPointerDown={(e) => beginDrag(e, owner, p.index, 'end')} onPointerMove={moveDrag} onPointerUp={endDrag} />
                    </button>
                  );
                })}
            </div>
          </div>
        );
      })}
      {drag !== null && drag.delta_min !== 0 && (
        <p className="timeline-status" role="status">
          {drag.mode === 'move' ? 'Move' : drag.mode === 'start' ? 'Start' : 'End'} {drag.delta_min > 0 ? '+' : '−'}
          {clockOf(Math.abs(drag.delta_min))}
        </p>
      )}
      <ul className="legend" aria-label="Activities">
        {Object.entries(ACTIVITY_STYLE).map(([name, s]) => (
          <li key={name}>
            <span className="swatch" style={{ background: s.fill }} />
            {name}
          </li>
        ))}
      </ul>
    </div>
  );
}
