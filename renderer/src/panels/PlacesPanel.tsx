// Places: rooms (windows, blinds, luminaires, screens), vehicles and outdoor places.
import { useState } from 'react';
import type { PlaceInput, ScenarioInput } from '../scenario/scenario-types.js';
import { NumberField, TextField } from '../components/fields.js';
import { useController } from '../state/workspace-context.js';
import { addLuminaire, addPlace, luminaireReferences, placeUsers, removeLuminaire, removePlace, type PlaceKind } from '../scenario/place-edits.js';

const KIND_LABEL = { room: 'Room', vehicle: 'Vehicle', outdoors: 'Outdoors' } as const;

function usedBy(users: readonly string[]): string {
  return users.length === 0 ? '' : `Used by ${users.join(', ')}; change that first to remove it.`;
}

function PlaceCard({ place, index, scenario }: { place: PlaceInput; index: number; scenario: ScenarioInput }) {
  const controller = useController();
  const base = ['places', index] as const;
  const refs = placeUsers(scenario, place.id);
  const label = place.name ?? place.id;
  return (
    <article className="card place-card" aria-label={label}>
      <header className="card-header">
        <span className={`tag tag-${place.kind}`}>{KIND_LABEL[place.kind]}</span>
        <h3>{label}</h3>
        <code className="id">{place.id}</code>
        <span className="card-actions">
          <button type="button" className="button button-small" disabled={refs.length > 0} title={usedBy(refs) || `Remove ${label}`} aria-label={`Remove ${label}`} onClick={() => controller.store.edit((s) => removePlace(s, place.id))}>
            Remove
          </button>
        </span>
      </header>
      {refs.length > 0 && <p className="small muted">{usedBy(refs)}</p>}
      <div className="field-grid">
        <TextField label="Name" path={[...base, 'name']} value={place.name} wide />
        {place.kind === 'room' && (
          <>
            <NumberField label="Width" path={[...base, 'width_m']} value={place.width_m} unit="m" min={0.5} />
            <NumberField label="Depth" path={[...base, 'depth_m']} value={place.depth_m} unit="m" min={0.5} />
            <NumberField label="Height" path={[...base, 'height_m']} value={place.height_m} unit="m" min={1.8} />
          </>
        )}
        {place.kind === 'vehicle' && <NumberField label="Window transmittance" path={[...base, 'windowTransmittance']} value={place.windowTransmittance} min={0} max={1} step={0.05} />}
      </div>
      {place.kind === 'room' && (
        <>
          <h4>Windows</h4>
          <ul className="plain-list">
            {(place.windows ?? []).map((w) => (
              <li key={w.id}>
                <strong>{w.id}</strong>: facing {w.facadeAzimuth_deg}°, {w.width_m} × {w.height_m} m{w.visibleTransmittance !== undefined ? `, τv ${w.visibleTransmittance}` : ''}
              </li>
            ))}
            {(place.windows ?? []).length === 0 && <li className="muted">No windows.</li>}
          </ul>
          <p className="muted">Blinds: {place.blinds?.rule ?? 'none'}</p>
          <h4>Luminaires</h4>
          <table className="data-table">
            <thead>
              <tr>
                <th scope="col">Luminaire</th>
                <th scope="col">Spectrum</th>
                <th scope="col">At the eye</th>
                <th scope="col">On</th>
                <th scope="col">
                  <span className="visually-hidden">Actions</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {(place.luminaires ?? []).map((l, li) => (
                <tr key={l.id}>
                  <td>{l.name ?? l.id}</td>
                  <td>{l.spectrum.kind === 'cct' ? `${l.spectrum.cct_K} K` : l.spectrum.kind}</td>
                  <td>
                    <NumberField label={`Illuminance at the eye, ${l.name ?? l.id}`} path={[...base, 'luminaires', li, 'eyeIlluminance_lx']} value={l.eyeIlluminance_lx} unit="lx" min={0} compact />
                  </td>
                  <td>{(l.schedule ?? []).map((e) => `${e.start}–${e.end}`).join(', ') || 'off'}</td>
                  <td>
                    {(() => {
                      const lr = luminaireReferences(scenario, place.id, l.id).map((r) => r.replace(/^.*\((.*)\)$/, 'strategy “$1”'));
                      return (
                        <button type="button" className="button button-small" disabled={lr.length > 0} title={usedBy(lr) || `Remove ${l.name ?? l.id}`} aria-label={`Remove luminaire ${l.name ?? l.id}`} onClick={() => controller.store.edit((s) => removeLuminaire(s, place.id, l.id))}>
                          Remove
                        </button>
                      );
                    })()}
                  </td>
                </tr>
              ))}
              {(place.luminaires ?? []).length === 0 && (
                <tr>
                  <td colSpan={5} className="muted">
                    No luminaires.
                  </td>
                </tr>
              )}
            </tbody>
          </table>
          <button type="button" className="button button-small" onClick={() => controller.store.edit((s) => addLuminaire(s, place.id))}>
            Add luminaire
          </button>
          {(place.screens ?? []).length > 0 && (
            <>
              <h4>Screens</h4>
              <ul className="plain-list">
                {(place.screens ?? []).map((s) => (
                  <li key={s.id}>
                    <strong>{s.id}</strong>: {s.device}, {s.luminance_cd_m2} cd/m² at {s.distance_m} m
                  </li>
                ))}
              </ul>
            </>
          )}
        </>
      )}
    </article>
  );
}

function AddPlaceForm() {
  const controller = useController();
  const [kind, setKind] = useState<PlaceKind>('room');
  return (
    <form
      className="inline-form"
      aria-label="Add a place"
      onSubmit={(e) => {
        e.preventDefault();
        controller.store.edit((s) => addPlace(s, kind));
      }}
    >
      <label>
        Kind
        <select value={kind} onChange={(e) => setKind(e.target.value as PlaceKind)}>
          <option value="room">Room</option>
          <option value="vehicle">Vehicle</option>
          <option value="outdoors">Outdoors</option>
        </select>
      </label>
      <button type="submit" className="button">
        Add place
      </button>
    </form>
  );
}

export function PlacesPanel({ scenario }: { scenario: ScenarioInput }) {
  return (
    <section className="panel" aria-labelledby="places-title">
      <header className="panel-header">
        <h2 id="places-title">Places</h2>
        <p className="panel-lead">Rooms with their windows, blinds, luminaires and screens; vehicles; outdoor places.</p>
      </header>
      <div className="card-list">
        {scenario.places.map((place, i) => (
          <PlaceCard key={place.id} place={place} index={i} scenario={scenario} />
        ))}
      </div>
      <AddPlaceForm />
    </section>
  );
}
