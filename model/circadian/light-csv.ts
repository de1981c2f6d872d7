/**
 * Text formats of the `simulate` command (parsing only; the caller reads the file):
 *   light:  header `hour,lux` (native lux of the calibration source) or `hour,mel_edi_lx`
 *           (melanopic EDI at the eye); hours since t = 0 (local midnight of day 0), strictly
 *           increasing, the first at 0; each value holds until the next row (the last to the end).
 *   sleep:  header `start_h,end_h`; one sleep episode per row, hours since t = 0.
 * Lines starting with `#` and blank lines are skipped. Errors name the file and line.
 */
import Papa from 'papaparse';
import { lightFromSteps, type LightSeries, type LightUnit } from './light-series.js';
import { normalisedEpisodes, type SleepEpisode } from './sleep-input.js';

export class BodyClockInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'BodyClockInputError';
  }
}

interface Row {
  readonly line: number;
  readonly cells: string[];
}

function rows(text: string): Row[] {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: false });
  const out: Row[] = [];
  parsed.data.forEach((cells, i) => {
    const first = (cells[0] ?? '').trim();
    if (cells.every((c) => c.trim() === '') || first.startsWith('#')) return;
    out.push({ line: i + 1, cells: cells.map((c) => c.trim()) });
  });
  return out;
}

function num(file: string, r: Row, col: number, name: string): number {
  const text = r.cells[col] ?? '';
  const v = Number(text);
  if (text === '' || !Number.isFinite(v)) throw new BodyClockInputError(`${file}, line ${r.line}: ${name} "${text}" is not a number`);
  return v;
}

export function parseLightCsv(text: string, file: string): LightSeries {
  const all = rows(text);
  const header = all[0];
  if (header === undefined) throw new BodyClockInputError(`${file}: no header; expected "hour,lux" or "hour,mel_edi_lx"`);
  const [h0, h1] = header.cells.map((c) => c.toLowerCase());
  let unit: LightUnit;
  if (h0 === 'hour' && h1 === 'lux' && header.cells.length === 2) unit = 'native_lx';
  else if (h0 === 'hour' && h1 === 'mel_edi_lx' && header.cells.length === 2) unit = 'mel_edi_lx';
  else throw new BodyClockInputError(`${file}, line ${header.line}: header must be "hour,lux" or "hour,mel_edi_lx" (got "${header.cells.join(',')}")`);
  const data = all.slice(1);
  if (data.length === 0) throw new BodyClockInputError(`${file}: no data rows after the header`);
  const times: number[] = [];
  const levels: number[] = [];
  for (const r of data) {
    if (r.cells.length !== 2) throw new BodyClockInputError(`${file}, line ${r.line}: expected 2 values (hour, ${h1}), got ${r.cells.length}`);
    const t = num(file, r, 0, 'hour');
    const v = num(file, r, 1, h1);
    if (times.length === 0 && t !== 0) throw new BodyClockInputError(`${file}, line ${r.line}: the first hour must be 0 (local midnight of day 0), got ${t}`);
    const prev = times[times.length - 1];
    if (prev !== undefined && !(t > prev)) throw new BodyClockInputError(`${file}, line ${r.line}: hour ${t} is not after the previous row (${prev})`);
    if (v < 0) throw new BodyClockInputError(`${file}, line ${r.line}: ${h1} must be ≥ 0, got ${v}`);
    if (levels.length > 0 && levels[levels.length - 1] === v) continue; // same level holds on
    times.push(t);
    levels.push(v);
  }
  return lightFromSteps(times, levels, unit);
}

export function parseSleepCsv(text: string, file: string): SleepEpisode[] {
  const all = rows(text);
  const header = all[0];
  if (header === undefined || header.cells.map((c) => c.toLowerCase()).join(',') !== 'start_h,end_h') {
    throw new BodyClockInputError(`${file}, line ${header?.line ?? 1}: header must be "start_h,end_h"`);
  }
  const episodes: SleepEpisode[] = [];
  for (const r of all.slice(1)) {
    if (r.cells.length !== 2) throw new BodyClockInputError(`${file}, line ${r.line}: expected 2 values (start_h, end_h), got ${r.cells.length}`);
    const s = num(file, r, 0, 'start_h');
    const e = num(file, r, 1, 'end_h');
    if (!(e > s)) throw new BodyClockInputError(`${file}, line ${r.line}: end_h (${e}) must be after start_h (${s})`);
    const prev = episodes[episodes.length - 1];
    if (prev !== undefined && s < prev.end_h) throw new BodyClockInputError(`${file}, line ${r.line}: episode starting at ${s} h overlaps or precedes the previous one (ends ${prev.end_h} h); list episodes in time order`);
    episodes.push({ start_h: s, end_h: e });
  }
  if (episodes.length === 0) throw new BodyClockInputError(`${file}: no sleep episodes after the header`);
  return normalisedEpisodes(episodes);
}
