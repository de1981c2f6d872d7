// Site: location, time zone, weather source, ground and snow.
import type { ScenarioInput } from '../scenario/scenario-types.js';
import { NumberField, TextField } from '../components/fields.js';

export function SitePanel({ scenario }: { scenario: ScenarioInput }) {
  const site = scenario.site;
  const weather = site.weather;
  return (
    <section className="panel" aria-labelledby="site-title">
      <header className="panel-header">
        <h2 id="site-title">Site</h2>
        <p className="panel-lead">Where the building is and what the sky does there.</p>
      </header>
      <div className="card">
        <h3>Scenario</h3>
        <div className="field-grid">
          <TextField label="Scenario name" path={['name']} value={scenario.name} wide />
          <TextField label="First day" path={['run', 'startDate']} value={scenario.run.startDate} hint="YYYY-MM-DD, local to the site" />
          <NumberField label="Days simulated" path={['run', 'days']} value={scenario.run.days} min={1} max={400} step={1} />
        </div>
      </div>
      <div className="card">
        <h3>Location</h3>
        <div className="field-grid">
          <TextField label="Site name" path={['site', 'name']} value={site.name} wide />
          <NumberField label="Latitude" path={['site', 'latitude_deg']} value={site.latitude_deg} unit="°N" min={-90} max={90} />
          <NumberField label="Longitude" path={['site', 'longitude_deg']} value={site.longitude_deg} unit="°E" min={-180} max={180} />
          <NumberField label="Elevation" path={['site', 'elevation_m']} value={site.elevation_m} unit="m" />
          <TextField label="Time zone" path={['site', 'timeZone']} value={site.timeZone} hint="IANA name, e.g. Europe/Berlin" />
        </div>
      </div>
      <div className="card">
        <h3>Weather</h3>
        {weather.kind === 'file' ? (
          <div className="field-grid">
            <TextField label="Weather file" path={['site', 'weather', 'file']} value={weather.file} hint="EPW file, relative to the scenario" wide />
          </div>
        ) : (
          <>
            <p className="muted">Sky conditions drawn by season (shares of clear, intermediate and overcast days).</p>
            <table className="data-table">
              <thead>
                <tr>
                  <th scope="col">Months</th>
                  <th scope="col">Clear</th>
                  <th scope="col">Intermediate</th>
                  <th scope="col">Overcast</th>
                </tr>
              </thead>
              <tbody>
                {weather.seasons.map((season, i) => (
                  <tr key={i}>
                    <td>{season.months.join(', ')}</td>
                    {(['clear', 'intermediate', 'overcast'] as const).map((k) => (
                      <td key={k}>
                        <NumberField label={`${k} share, months ${season.months.join(', ')}`} path={['site', 'weather', 'seasons', i, k]} value={season[k]} min={0} max={1} step={0.05} compact />
                      </td>
                    ))}
                  </tr>
                ))}
              </tbody>
            </table>
          </>
        )}
      </div>
      <div className="card">
        <h3>Ground and snow</h3>
        <div className="field-grid">
          <NumberField label="Ground reflectance" path={['site', 'ground', 'reflectance']} value={site.ground?.reflectance} min={0} max={1} step={0.05} />
          <NumberField label="Snow reflectance" path={['site', 'ground', 'snow', 'reflectance']} value={site.ground?.snow?.reflectance} min={0} max={1} step={0.05} />
        </div>
      </div>
    </section>
  );
}
