/**
 * The largest inputs the limits allow (schedules/validation/sense/limit-checks.ts,
 * cli/run-output/cohort-limits.ts, cli/input-file.ts), each run as its own process to measure its
 * peak memory, which must stay under 1 GB: a run at the person-strategy-day budget as one person
 * over 200 days and as 20 people over 30 days, each with a light log at the size limit; cohorts at
 * their worker budget with and without that log; `simulate` over 366 days from a light file at the
 * size limit; and a scenario file at its size limit.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { DEMO_SCENARIO } from '../../schedules/demo/demo-scenario.js';
import { MAX_INPUT_BYTES } from '../../cli/input-file.js';

export const MEMORY_BOUND_MB = 1024;

export interface PeakMemory {
  readonly name: string;
  readonly peak_mb: number | null;
  readonly exitCode: number;
  readonly seconds: number;
  readonly message: string;
}

/** A light log of readings every `step_s` from the run start, just under the size limit. */
function logAtLimit(startUtc_ms: number, step_s: number): string {
  const limit = MAX_INPUT_BYTES['light-log'] - 1000;
  const rows: string[] = ['timestamp,lux'];
  let bytes = 14;
  for (let i = 0; bytes < limit; i++) {
    const line = `${new Date(startUtc_ms + i * step_s * 1000).toISOString()},${(i * 37) % 2000}`;
    rows.push(line);
    bytes += line.length + 1;
  }
  return rows.join('\n') + '\n';
}

export function measureLargestInputs(): PeakMemory[] {
  const dir = mkdtempSync(join(tmpdir(), 'zeitlight-largest-'));
  const runner = fileURLToPath(new URL('./peak-memory-run.js', import.meta.url));
  const desk = DEMO_SCENARIO.personas.find((p) => p.id === 'desk-worker');
  if (desk === undefined) throw new Error('demo changed');
  const deskStrategies = (DEMO_SCENARIO.strategies ?? [])
    .filter((s) => s.personas?.includes('desk-worker'))
    .map((s) => ({ ...s, personas: ['desk-worker'], changes: s.changes.filter((c) => !('persona' in c) || c.persona === 'desk-worker') }))
    .filter((s) => s.changes.length > 0)
    .slice(0, 2);
  const runStart = Date.UTC(2026, 2, 22, 23, 0);
  writeFileSync(join(dir, 'wear.csv'), logAtLimit(runStart, 10));
  const logSpec = [{ id: 'wear', file: 'wear.csv', quantity: { kind: 'photopic-lux' } }];
  const scenario = (name: string, doc: Record<string, unknown>) => {
    writeFileSync(join(dir, `${name}.json`), JSON.stringify({ ...DEMO_SCENARIO, rosters: [], strategies: [], ...doc }));
    return join(dir, `${name}.json`);
  };
  const withLog = { ...desk, measuredLight: [{ log: 'wear' }] };
  const oneFor200 = scenario('one-person-200-days', { run: { startDate: '2026-03-23', days: 200 }, personas: [withLog], strategies: deskStrategies, lightLogs: logSpec });
  const twentyFor30 = scenario('twenty-people-30-days', { run: { startDate: '2026-03-23', days: 30 }, personas: [withLog, ...Array.from({ length: 19 }, (_, i) => ({ ...desk, id: `desk-${i}` }))], lightLogs: logSpec });
  const cohort = scenario('cohort-100-days', { run: { startDate: '2026-03-23', days: 100 }, personas: [desk] });
  const cohortLog = scenario('cohort-100-days-log', { run: { startDate: '2026-03-23', days: 100 }, personas: [withLog], lightLogs: logSpec });
  // simulate: a year of logger readings every 10 s is larger than the limit; readings every 60 s over 366 days.
  writeFileSync(join(dir, 'light.csv'), logAtLimit(Date.UTC(2026, 0, 1), 60));
  // A scenario file at its size limit: the same small scenario with a long description of its places.
  const padding = 'x'.repeat(4900);
  const rooms = Array.from({ length: 100 - DEMO_SCENARIO.places.length }, (_, i) => ({ kind: 'room', id: `room-${i}`, name: `Room ${i}`, width_m: 5, depth_m: 4, height_m: 2.7 }));
  const big = { ...DEMO_SCENARIO, run: { startDate: '2026-03-23', days: 1 }, personas: [desk], rosters: [], strategies: [], description: padding, places: [...DEMO_SCENARIO.places, ...rooms] };
  let text = JSON.stringify(big, null, 1);
  const fill = MAX_INPUT_BYTES.scenario - text.length - 1000;
  text = text.replace('"places": [', `"places": [${' '.repeat(Math.max(0, fill))}`);
  writeFileSync(join(dir, 'largest-file.json'), text);

  const cases: [string, string[]][] = [
    ['run: 1 person × 3 strategies × 200 days, 20 MB light log', ['run', oneFor200, '--out', join(dir, 'out1')]],
    ['run: 20 people × 30 days, 20 MB light log', ['run', twentyFor30, '--out', join(dir, 'out2')]],
    ['cohort: 100 days on 2 workers (the most that fit)', ['run', cohort, '--out', join(dir, 'out3'), '--cohort', '2', '--seed', '1', '--workers', '2', '--no-ensemble']],
    ['cohort: 100 days with a 20 MB light log on 1 worker', ['run', cohortLog, '--out', join(dir, 'out4'), '--cohort', '1', '--seed', '1', '--workers', '1', '--no-ensemble']],
    ['simulate: 366 days from a 20 MB light file', ['simulate', join(dir, 'light.csv'), '--days', '366', '--json']],
    ['run: a 20 MB scenario file', ['run', join(dir, 'largest-file.json'), '--out', join(dir, 'out6'), '--no-ensemble']],
  ];
  return cases.map(([name, argv]) => {
    const t0 = performance.now();
    const r = spawnSync(process.execPath, [runner, ...argv], { encoding: 'utf8', maxBuffer: 1 << 26 });
    const m = /peak-rss-mb (\d+)/.exec(r.stderr);
    return { name, peak_mb: m === null ? null : Number(m[1]), exitCode: r.status ?? -1, seconds: (performance.now() - t0) / 1000, message: r.stderr.replace(/peak-rss-mb \d+/, '').trim().slice(-300) };
  });
}
