// Sleep: sleep and nap episodes per day for each strategy, drawn on 24-hour rows.
import type { ResultsView } from '../results/view-model.js';
import { formatClock, formatDayLabel } from '../charts/clock.js';
import { seriesColour } from '../charts/palette.js';

export function SleepView({ view, personaId }: { view: ResultsView; personaId: string }) {
  const runs = view.runs.filter((r) => r.personaId === personaId);
  return (
    <div className="sleep-rows" role="table" aria-label="Sleep episodes by day">
      {Array.from({ length: view.days }, (_, day) => (
        <div className="sleep-day" role="row" key={day}>
          <span className="timeline-daylabel" role="rowheader">
            {formatDayLabel(view.startDate, day)}
          </span>
          <div className="sleep-tracks" role="cell">
            {runs.map((run) => {
              const index = view.strategies.findIndex((s) => s.id === run.strategyId);
              const name = view.strategies[index]?.name ?? run.strategyId;
              return (
                <div className="sleep-track" key={run.strategyId} title={name}>
                  {run.sleep
                    .filter((e) => e.end_h > day * 24 && e.start_h < day * 24 + 24)
                    .map((e, i) => {
                      const from = Math.max(0, e.start_h - day * 24);
                      const to = Math.min(24, e.end_h - day * 24);
                      return (
                        <span
                          key={i}
                          className={e.kind === 'nap' ? 'sleep-bar sleep-nap' : 'sleep-bar'}
                          style={{ left: `${(from / 24) * 100}%`, width: `${((to - from) / 24) * 100}%`, background: seriesColour(index) }}
                          title={`${name}: ${e.kind} ${formatClock(e.start_h)}–${formatClock(e.end_h)}`}
                        />
                      );
                    })}
                </div>
              );
            })}
          </div>
        </div>
      ))}
      <ul className="legend">
        {runs.map((run) => {
          const index = view.strategies.findIndex((s) => s.id === run.strategyId);
          return (
            <li key={run.strategyId}>
              <span className="swatch" style={{ background: seriesColour(index) }} />
              {view.strategies[index]?.name ?? run.strategyId}
            </li>
          );
        })}
      </ul>
    </div>
  );
}
