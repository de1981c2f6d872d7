/**
 * EPW reader: structure and bad input, on small invented files (two days, 48 hourly rows) laid
 * out per the EnergyPlus EPW Data Dictionary (8 header lines, 35 fields per data line, missing
 * codes such as 9999 and 999999 for illuminance).
 */
import { describe, expect, it } from 'vitest';
import { EpwError, parseEpw } from './epw.js';
import { checkDirectLightAgainstSun } from './epw-sun-check.js';

function header(period = ' 1/ 1, 1/ 2'): string[] {
  return [
    'LOCATION,Testville,-,XXX,invented,000000,48.00,11.00,1.0,500.0',
    'DESIGN CONDITIONS,0',
    'TYPICAL/EXTREME PERIODS,0',
    'GROUND TEMPERATURES,0',
    'HOLIDAYS/DAYLIGHT SAVINGS,No,0,0,0',
    'COMMENTS 1,"invented test data, not a real place"',
    'COMMENTS 2,',
    `DATA PERIODS,1,1,Data,Sunday,${period}`,
  ];
}

/** One data line; daylight only 08–16 local standard time, values invented but plausible. */
function row(month: number, day: number, hour: number, overrides: Partial<Record<number, string>> = {}): string {
  const sunUp = hour >= 9 && hour <= 16;
  const cells = [
    '2001', String(month), String(day), String(hour), '60', 'A7A7', '2.0', '-1.0', '80', '95000', sunUp ? '300' : '0', '1400', '300',
    sunUp ? '150' : '0', sunUp ? '200' : '0', sunUp ? '80' : '0', sunUp ? '16000' : '0', sunUp ? '20000' : '0', sunUp ? '9000' : '0', '9999',
    '180', '3.0', '5', '5', '20', '77777', '9', '999999999', '10', '0.1', '12', '1', '0.3', '0', '0',
  ];
  for (const [col, v] of Object.entries(overrides)) if (v !== undefined) cells[Number(col) - 1] = v;
  return cells.join(',');
}

function fileText(rows: string[], period?: string): string {
  return [...header(period), ...rows].join('\n') + '\n';
}

type Tweak = (m: number, d: number, h: number) => Partial<Record<number, string>>;
function twoDays(tweak: Tweak = () => ({})): string[] {
  const rows: string[] = [];
  for (const d of [1, 2]) for (let h = 1; h <= 24; h++) rows.push(row(1, d, h, tweak(1, d, h)));
  return rows;
}

function errorOf(text: string): EpwError {
  try {
    parseEpw(text, 'test.epw');
  } catch (e) {
    if (e instanceof EpwError) return e;
    throw e;
  }
  throw new Error('expected an EpwError');
}

describe('EPW reader', () => {
  it('reads a well-formed file: location, 48 records, snow depth and hour labels', () => {
    const f = parseEpw(fileText(twoDays()), 'test.epw');
    expect(f.count).toBe(48);
    expect(f.location.latitude_deg).toBe(48);
    expect(f.location.timeZone_h).toBe(1);
    expect(f.values.snowDepth_cm[0]).toBe(12);
    expect(f.hour[47]).toBe(24);
    expect(f.warningCount).toBe(0);
    // Zenith luminance 9999 is the missing code (EPW Data Dictionary) → NaN, counted.
    expect(Number.isNaN(f.values.zenithLuminance_cd_m2[0] as number)).toBe(true);
    expect(f.missingCounts.zenithLuminance_cd_m2).toBe(48);
  });

  it('refuses a truncated file, naming the last line and the expected end', () => {
    const rows = twoDays().slice(0, 30);
    const e = errorOf(fileText(rows));
    expect(e.line).toBe(38);
    expect(e.message).toMatch(/truncated/);
  });

  it('refuses a file that ends inside the header', () => {
    expect(errorOf(header().slice(0, 5).join('\n')).message).toMatch(/header/);
  });

  it('refuses a data line too short to hold the light fields, naming the line', () => {
    const rows = twoDays();
    rows[4] = (rows[4] ?? '').split(',').slice(0, 19).join(',');
    const e = errorOf(fileText(rows));
    expect(e.message).toMatch(/test\.epw, line 13: expected 35 comma-separated fields \(at least 20, through zenith luminance\), found 19/);
  });

  it('reads data lines that end early as missing trailing fields, and counts them in a warning', () => {
    const rows = twoDays().map((r, i) => (i % 2 === 0 ? r.split(',').slice(0, 30).join(',') : `${r},,`));
    const f = parseEpw(fileText(rows), 'test.epw');
    expect(f.count).toBe(48);
    expect(f.missingCounts.albedo).toBe(24);
    expect(f.values.globalHorizontal_lx[12]).toBe(16000);
    expect(f.warnings[0]).toEqual({ line: 9, message: '30 of 35 fields; fields 31–35 taken as missing' });
    expect(f.warningCount).toBe(24);
  });

  it('refuses a non-numeric hour and an impossible date, naming the line', () => {
    expect(errorOf(fileText(twoDays((_m, d, h) => (d === 1 && h === 3 ? { 4: 'x' } : {})))).message).toMatch(/line 11: hour "x"/);
    expect(errorOf(fileText(twoDays((_m, d, h) => (d === 2 && h === 1 ? { 2: '2', 3: '30' } : {})))).message).toMatch(/line 33: day "30"/);
  });

  it('refuses missing or repeated hours, naming the line', () => {
    const rows = twoDays();
    rows.splice(5, 1);
    expect(errorOf(fileText(rows)).message).toMatch(/line 14: record 1\/1 hour 7 does not follow 1\/1 hour 5/);
  });

  it('counts non-numeric, negative and missing-code cells as warnings naming the line; the values become missing', () => {
    const rows = twoDays((_m, d, h) => {
      if (d === 1 && h === 12) return { 17: 'abc' };
      if (d === 1 && h === 13) return { 19: '-50' };
      if (d === 1 && h === 14) return { 18: '999999' };
      return {};
    });
    const f = parseEpw(fileText(rows), 'test.epw');
    expect(f.warningCount).toBe(2);
    expect(f.warnings.map((w) => w.line)).toEqual([20, 21]);
    expect(f.warnings[0]?.message).toMatch(/global horizontal illuminance "abc" is not a number/);
    expect(f.warnings[1]?.message).toMatch(/diffuse horizontal illuminance -50 is impossible/);
    expect(Number.isNaN(f.values.globalHorizontal_lx[11] as number)).toBe(true);
    expect(Number.isNaN(f.values.directNormal_lx[13] as number)).toBe(true);
    expect(f.missingCounts.directNormal_lx).toBe(1);
  });

  it('refuses sub-hourly files and a LOCATION latitude out of range', () => {
    const t = fileText(twoDays()).replace('DATA PERIODS,1,1,', 'DATA PERIODS,1,4,');
    expect(errorOf(t).message).toMatch(/records per hour/);
    expect(errorOf(fileText(twoDays()).replace('48.00,11.00', '148.00,11.00')).message).toMatch(/line 1: LOCATION latitude/);
  });

  it('accepts 29 February and reports the leap day', () => {
    const rows: string[] = [];
    for (const d of [28, 29]) for (let h = 1; h <= 24; h++) rows.push(row(2, d, h));
    const f = parseEpw(fileText(rows, ' 2/28, 2/29'), 'leap.epw');
    expect(f.hasLeapDay).toBe(true);
    expect(f.count).toBe(48);
  });

  it('flags direct light at an hour when the sun is far below the horizon (midnight), naming the line', () => {
    const rows = twoDays((_m, d, h) => (d === 1 && h === 1 ? { 15: '300' } : {}));
    const r = checkDirectLightAgainstSun(parseEpw(fileText(rows), 'test.epw'));
    expect(r.count).toBe(1);
    expect(r.issues[0]?.line).toBe(9);
  });
});
