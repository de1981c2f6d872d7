// Places: rooms (windows, blinds, luminaires, screens), vehicles and outdoor places.
import type { PlaceInput, ScenarioInput } from '../scenario/scenario-types.js';
import { NumberField, TextField } from '../components/fields.js';

const KIND_LABEL = { room: 'Room', vehicle: 'Vehicle', outdoors: 'Outdoors' } as const;

function PlaceCard({ place, index }: { place: PlaceInput; index: number }) {
  const base = ['places', index] as const;
  return (
    <article className="card place-card" aria-label={place.name ?? place.id}>
      <header className="card-header">
        <span className={`tag tag-${place.kind}`}>{KIND_LABEL[place.kind]}</span>
        <h3>{place.name ?? place.id}</h3>
        <code className="id">{place.id}</code>
      </header>
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
                  <td>{(l.schedule ?? []).map((e) => `${e.start}–${e.end}`).join(', ') || 'always'}</td>
                </tr>
              ))}
            </tbody>
          </table>
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

export function PlacesPanel({ scenario }: { scenario: ScenarioInput }) {
  return (
    <section className="panel" aria-labelledby="places-title">
      <header className="panel-header">
        <h2 id="places-title">Places</h2>
        <p className="panel-lead">Rooms with their windows, blinds, luminaires and screens; vehicles; outdoor places.</p>
      </header>
      <div className="card-list">
        {scenario.places.map((place, i) => (
          <PlaceCard key={place.id} place={place} index={i} />
        ))}
      </div>
    </section>
  );
}
