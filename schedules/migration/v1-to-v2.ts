/**
 * Format version 1 → 2.
 *  - `site.timezone` is renamed `site.timeZone`.
 *  - Persona `tau_h` is renamed `intrinsicPeriod_h`.
 *  - Timeline segments used `from` / `to`; they are now `start` / `end`.
 */
type Json = Record<string, unknown>;

function isObject(v: unknown): v is Json {
  return v !== null && typeof v === 'object' && !Array.isArray(v);
}

function rename(obj: Json, from: string, to: string): void {
  if (from in obj && !(to in obj)) {
    obj[to] = obj[from];
    delete obj[from];
  }
}

function migrateSegments(list: unknown): void {
  if (!Array.isArray(list)) return;
  for (const seg of list) {
    if (!isObject(seg)) continue;
    rename(seg, 'from', 'start');
    rename(seg, 'to', 'end');
  }
}

/** Returns a new object in version-2 form; the input is left untouched. */
export function migrateV1ToV2(input: Json): Json {
  const out = structuredClone(input);
  out.version = 2;
  if (isObject(out.site)) rename(out.site, 'timezone', 'timeZone');
  if (Array.isArray(out.personas)) {
    for (const p of out.personas) {
      if (!isObject(p)) continue;
      rename(p, 'tau_h', 'intrinsicPeriod_h');
      if (isObject(p.week)) for (const day of Object.values(p.week)) migrateSegments(day);
      if (isObject(p.templates)) for (const t of Object.values(p.templates)) migrateSegments(t);
    }
  }
  if (Array.isArray(out.strategies)) {
    for (const s of out.strategies) {
      if (!isObject(s) || !Array.isArray(s.changes)) continue;
      for (const c of s.changes) if (isObject(c) && isObject(c.segment)) migrateSegments([c.segment]);
    }
  }
  return out;
}
