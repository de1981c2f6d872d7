/**
 * Sleep episodes for `zeitlight simulate --sleep`, read with the light-series reader's text layer
 * (csv-table.ts: any delimiter, decimal commas with a non-comma delimiter, "#" comments): header
 * `start_h,end_h`, one episode per row in hours since t = 0, in time order, each ending after it
 * starts; episodes that touch are joined. Every refusal names the file and the line.
 */
import { readCsvTable, readNumber, rowText } from './csv-table.js';

export interface SleepEpisodeRow {
  readonly start_h: number;
  readonly end_h: number;
}

export class SleepCsvError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'SleepCsvError';
  }
}

/** Longest sleep episode taken as sleep, hours (a longer one is a typing mistake). */
const MAX_EPISODE_H = 48;

export function readSleepCsv(text: string, file: string): SleepEpisodeRow[] {
  const { header, body, delimiter, decimalComma } = readCsvTable(text);
  const expected = rowText(['start_h', 'end_h'], delimiter);
  if (header === undefined) throw new SleepCsvError(`${file}, line 1: the file is empty; expected the header "${expected}" and one sleep episode per line`);
  if (header.cells.map((c) => c.trim().toLowerCase()).join('\u0000') !== 'start_h\u0000end_h') {
    throw new SleepCsvError(`${file}, line ${header.line}: header must be "${expected}" (got "${rowText(header.cells, delimiter).slice(0, 60)}")`);
  }
  const out: SleepEpisodeRow[] = [];
  let previous: { end_h: number; line: number } | undefined;
  for (const r of body) {
    if (r.cells.length !== 2) throw new SleepCsvError(`${file}, line ${r.line}: expected 2 values (${expected}), found ${r.cells.length}`);
    const s = readNumber(r.cells[0], decimalComma);
    const e = readNumber(r.cells[1], decimalComma);
    if (!Number.isFinite(s)) throw new SleepCsvError(`${file}, line ${r.line}: start_h "${(r.cells[0] ?? '').trim().slice(0, 20)}" is not a number`);
    if (!Number.isFinite(e)) throw new SleepCsvError(`${file}, line ${r.line}: end_h "${(r.cells[1] ?? '').trim().slice(0, 20)}" is not a number`);
    if (!(e > s)) throw new SleepCsvError(`${file}, line ${r.line}: end_h (${e}) must be after start_h (${s})`);
    if (e - s > MAX_EPISODE_H) throw new SleepCsvError(`${file}, line ${r.line}: an episode of ${e - s} h; one sleep episode lasts at most ${MAX_EPISODE_H} h`);
    if (previous !== undefined && s < previous.end_h) throw new SleepCsvError(`${file}, line ${r.line}: episode starting at ${s} h overlaps or precedes the previous one (line ${previous.line}, ends ${previous.end_h} h); list episodes in time order`);
    const last = out[out.length - 1];
    if (last !== undefined && s === last.end_h) out[out.length - 1] = { start_h: last.start_h, end_h: e };
    else out.push({ start_h: s, end_h: e });
    previous = { end_h: e, line: r.line };
  }
  if (out.length === 0) throw new SleepCsvError(`${file}, line ${header.line}: no sleep episodes after the header`);
  return out;
}
