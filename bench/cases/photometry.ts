/**
 * Photometry benchmarks: CIE S 026 quantities per spectrum (with and without age correction),
 * CCT per spectrum, parsing a user CSV, and the cached DER lookups that per-minute light
 * models call (by source id, and daylight DER by CCT).
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { alphaOpicQuantities, illuminantD65 } from '../../model/photometry/alpha-opic.js';
import { cctDuv } from '../../model/photometry/cct-ohno.js';
import { lensTransmittanceRelativeTo32 } from '../../model/photometry/lens-aging.js';
import { parseSpdCsv } from '../../model/photometry/spd-csv.js';
import { daylightMelanopicDer } from '../../model/sources/daylight-der.js';
import { listSources, sourceMelanopicDer } from '../../model/sources/source-library.js';
import { medianMs } from '../timing.js';

export async function bench(): Promise<Record<string, unknown>> {
  const d65 = illuminantD65();
  const n = 1000;
  const alphaMs = medianMs(() => {
    for (let i = 0; i < n; i++) alphaOpicQuantities(d65);
  });
  const lens = lensTransmittanceRelativeTo32(64);
  const agedMs = medianMs(() => {
    for (let i = 0; i < n; i++) alphaOpicQuantities(d65, { eyeTransmittance: lens });
  });
  const cctN = 50;
  const cctMs = medianMs(() => {
    for (let i = 0; i < cctN; i++) cctDuv(d65);
  });

  const csvText = readFileSync(join(process.cwd(), 'docs', 'examples', 'warm-white-led-desk.csv'), 'utf8');
  const csvMs = medianMs(() => {
    parseSpdCsv(csvText, 'example.csv');
  });

  const listFirstMs = (() => {
    const t0 = performance.now();
    listSources();
    return performance.now() - t0;
  })();
  const ids = ['LED-B3', 'FL11', 'D65', 'A', 'pc-LED-3000K', 'display-night'];
  const lookups = 1_000_000;
  let sink = 0;
  const idMs = medianMs(() => {
    for (let i = 0; i < lookups; i++) sink += sourceMelanopicDer(ids[i % ids.length] as string);
  });
  daylightMelanopicDer(6500); // builds the table once
  const dayMs = medianMs(() => {
    for (let i = 0; i < lookups; i++) sink += daylightMelanopicDer(4000 + (i % 21000));
  });
  if (!(sink > 0)) throw new Error('benchmark sink unexpectedly empty');

  return {
    alphaopic_us_per_spectrum: (alphaMs * 1000) / n,
    alphaopic_with_age_us_per_spectrum: (agedMs * 1000) / n,
    cct_duv_us_per_spectrum: (cctMs * 1000) / cctN,
    spd_csv_parse_ms_example: csvMs,
    source_library_first_list_ms: listFirstMs,
    source_mel_der_lookup_ns: (idMs * 1e6) / lookups,
    daylight_mel_der_by_cct_ns: (dayMs * 1e6) / lookups,
  };
}
