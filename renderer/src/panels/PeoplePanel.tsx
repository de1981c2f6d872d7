// People: persona properties, the routine (a week timeline) or the roster a persona follows.
import { useState } from 'react';
import type { PersonaInput, ScenarioInput, Weekday } from '../scenario/scenario-types.js';
import { NumberField, SelectField, TextField } from '../components/fields.js';
import { WeekTimeline } from '../components/WeekTimeline.js';
import { addSegment, WEEKDAY_NAMES, WEEKDAY_ORDER } from '../scenario/routine-edits.js';
import { useController } from '../state/workspace-context.js';
import { setAt } from '../scenario/set-at.js';

const ACTIVITIES = ['work', 'commute', 'leisure', 'meal', 'exercise', 'nap', 'sleep', 'other'] as const;

function AddSegmentForm({ scenario, persona }: { scenario: ScenarioInput; persona: PersonaInput }) {
  const controller = useController();
  const [day, setDay] = useState<Weekday>('mon');
  const [start, setStart] = useState('12:30');
  const [end, setEnd] = useState('13:00');
  const [place, setPlace] = useState(scenario.places[0]?.id ?? '');
  const [activity, setActivity] = useState<(typeof ACTIVITIES)[number]>('exercise');
  return (
    <form
      className="inline-form"
      aria-label="Add a segment"
      onSubmit={(e) => {
        e.preventDefault();
        controller.store.edit((s) => addSegment(s, persona.id, day, { start, end, place, activity }));
      }}
    >
      <label>
        Day
        <select aria-label="Day" value={day} onChange={(e) => setDay(e.target.value as Weekday)}>
          {WEEKDAY_ORDER.map((d) => (
            <option key={d} value={d}>
              {WEEKDAY_NAMES[d]}
            </option>
          ))}
        </select>
      </label>
      <label>
        From
        <input type="text" inputMode="numeric" pattern="([01][0-9]|2[0-3]):[0-5][0-9]|24:00" placeholder="HH:MM" size={6} aria-label="From" value={start} onChange={(e) => setStart(e.target.value)} required />
      </label>
      <label>
        To
        <input type="text" inputMode="numeric" pattern="([01][0-9]|2[0-3]):[0-5][0-9]|24:00" placeholder="HH:MM" size={6} aria-label="To" value={end} onChange={(e) => setEnd(e.target.value)} required />
      </label>
      <label>
        Place
        <select aria-label="Place" value={place} onChange={(e) => setPlace(e.target.value)}>
          {scenario.places.map((p) => (
            <option key={p.id} value={p.id}>
              {p.name ?? p.id}
            </option>
          ))}
        </select>
      </label>
      <label>
        Activity
        <select aria-label="Activity" value={activity} onChange={(e) => setActivity(e.target.value as (typeof ACTIVITIES)[number])}>
          {ACTIVITIES.map((a) => (
            <option key={a} value={a}>
              {a}
            </option>
          ))}
        </select>
      </label>
      <button type="submit" className="button button-primary">
        Add segment
      </button>
    </form>
  );
}

function RosterEditor({ scenario, persona }: { scenario: ScenarioInput; persona: PersonaInput }) {
  const controller = useController();
  const rosterIndex = (scenario.rosters ?? []).findIndex((r) => r.id === persona.roster?.roster);
  const roster = scenario.rosters?.[rosterIndex];
  if (roster === undefined) return <p className="muted">This person follows a roster that is not in the scenario.</p>;
  const choices = ['rest', ...roster.shifts.map((s) => s.id)];
  return (
    <div className="card">
      <h3>Roster: {roster.name ?? roster.id}</h3>
      <p className="muted">
        A {roster.cycle.length}-day cycle starting {roster.anchorDate}
        {persona.roster?.offsetDays ? `, this person ${persona.roster.offsetDays} days ahead` : ''}.
      </p>
      <ol className="roster-cycle" aria-label="Cycle">
        {roster.cycle.map((entry, i) => (
          <li key={i} className={`roster-day shift-${roster.shifts.find((s) => s.id === entry)?.kind ?? 'rest'}`}>
            <span className="roster-index">Day {i + 1}</span>
            <select
              aria-label={`Cycle day ${i + 1}`}
              value={entry}
              onChange={(e) => controller.store.edit((s) => setAt(s, ['rosters', rosterIndex, 'cycle', i], e.target.value))}
            >
              {choices.map((c) => (
                <option key={c} value={c}>
                  {c}
                </option>
              ))}
            </select>
          </li>
        ))}
      </ol>
      <h4>Shifts</h4>
      <table className="data-table">
        <thead>
          <tr>
            <th scope="col">Shift</th>
            <th scope="col">Kind</th>
            <th scope="col">Start</th>
            <th scope="col">End</th>
            <th scope="col">Place</th>
          </tr>
        </thead>
        <tbody>
          {roster.shifts.map((shift, si) => (
            <tr key={shift.id}>
              <td>{shift.id}</td>
              <td>{shift.kind}</td>
              <td>
                <input aria-label={`${shift.id} start`} type="text" size={6} placeholder="HH:MM" value={shift.start} onChange={(e) => controller.store.edit((s) => setAt(s, ['rosters', rosterIndex, 'shifts', si, 'start'], e.target.value), `shift-${si}-start`)} />
              </td>
              <td>
                <input aria-label={`${shift.id} end`} type="text" size={6} placeholder="HH:MM" value={shift.end} onChange={(e) => controller.store.edit((s) => setAt(s, ['rosters', rosterIndex, 'shifts', si, 'end'], e.target.value), `shift-${si}-end`)} />
              </td>
              <td>{scenario.places.find((p) => p.id === shift.place)?.name ?? shift.place}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

export function PeoplePanel({ scenario }: { scenario: ScenarioInput }) {
  const [personaId, setPersonaId] = useState(scenario.personas[0]?.id ?? '');
  const index = Math.max(0, scenario.personas.findIndex((p) => p.id === personaId));
  const persona = scenario.personas[index];
  if (persona === undefined) return null;
  const base = ['personas', index] as const;
  return (
    <section className="panel" aria-labelledby="people-title">
      <header className="panel-header">
        <h2 id="people-title">People</h2>
        <p className="panel-lead">Who is exposed: their body-clock properties and their routine or roster.</p>
      </header>
      <div className="tabs" role="tablist" aria-label="Personas">
        {scenario.personas.map((p) => (
          <button key={p.id} type="button" role="tab" aria-selected={p.id === persona.id} className={p.id === persona.id ? 'tab tab-active' : 'tab'} onClick={() => setPersonaId(p.id)}>
            {p.name}
          </button>
        ))}
      </div>
      <div className="card">
        <h3>Properties</h3>
        <div className="field-grid">
          <TextField label="Name" path={[...base, 'name']} value={persona.name} wide />
          <NumberField label="Age" path={[...base, 'age_y']} value={persona.age_y} unit="years" min={1} max={110} step={1} />
          <NumberField label="Intrinsic period" path={[...base, 'intrinsicPeriod_h']} value={persona.intrinsicPeriod_h} unit="h" min={23} max={25.5} step={0.01} placeholder="24.18" hint="Default 24.18 h (Czeisler et al. 1999)" />
          <NumberField label="Light sensitivity" path={[...base, 'lightSensitivity']} value={persona.lightSensitivity} unit="×" min={0.05} max={20} step={0.1} placeholder="1" hint="1 = the published model" />
          <SelectField
            label="Sleep timing"
            path={[...base, 'sleep', 'mode']}
            value={persona.sleep?.mode ?? 'habitual'}
            options={[
              { value: 'habitual', label: 'Habitual (as written)' },
              { value: 'free', label: 'Free (predicted by the model)' },
            ]}
          />
        </div>
      </div>
      {persona.week !== undefined ? (
        <div className="card">
          <h3>Routine</h3>
          <WeekTimeline scenario={scenario} persona={persona} />
          <AddSegmentForm scenario={scenario} persona={persona} />
        </div>
      ) : (
        <RosterEditor scenario={scenario} persona={persona} />
      )}
    </section>
  );
}
