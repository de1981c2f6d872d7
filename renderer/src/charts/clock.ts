// Clock-time helpers for charts: "HH:MM" and day labels, clock hours kept continuous across
// midnight, clock axes. Real run time → local day and wall-clock hour lives in wall-clock.ts.

/** A clock hour wrapped to [0, 24). */
export function clockHourOf(hour: number): number {
  return ((hour % 24) + 24) % 24;
}

/** "HH:MM" for a clock hour (any real number, wrapped to a day). */
export function formatClock(hour: number): string {
  const minutes = Math.round(clockHourOf(hour) * 60) % 1440;
  return `${String(Math.floor(minutes / 60)).padStart(2, '0')}:${String(minutes % 60).padStart(2, '0')}`;
}

/** "Mon 23 Mar" for day `day` after the ISO start date (calendar arithmetic in UTC, no zones). */
export function formatDayLabel(startDate: string, day: number): string {
  const [y, m, d] = startDate.split('-').map(Number);
  const date = new Date(Date.UTC(y ?? 2000, (m ?? 1) - 1, (d ?? 1) + day));
  const weekday = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'][date.getUTCDay()];
  const month = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'][date.getUTCMonth()];
  return `${weekday} ${date.getUTCDate()} ${month}`;
}

/**
 * Places each clock hour on the 24 h branch nearest the previous value, so a series that
 * drifts across midnight draws as a continuous line (e.g. 23.5, 0.2 → 23.5, 24.2).
 */
export function unwrapClockHours(values: readonly (number | null)[], reference: number | null = null): (number | null)[] {
  let previous = reference;
  return values.map((v) => {
    if (v === null) return null;
    let h = clockHourOf(v);
    if (previous !== null) {
      while (h - previous > 12) h -= 24;
      while (previous - h > 12) h += 24;
    }
    previous = h;
    return h;
  });
}

/** Axis domain and ticks for clock-hour values: whole steps of `step_h` around the data. */
export function clockAxis(values: readonly (number | null | undefined)[], step_h = 0.5): { domain: [number, number]; ticks: number[] } {
  const known = values.filter((v): v is number => typeof v === 'number' && Number.isFinite(v));
  if (known.length === 0) return { domain: [0, 24], ticks: [0, 6, 12, 18, 24] };
  let lo = Math.floor(Math.min(...known) / step_h) * step_h;
  let hi = Math.ceil(Math.max(...known) / step_h) * step_h;
  if (hi - lo < 2 * step_h) {
    lo -= step_h;
    hi += step_h;
  }
  const span = hi - lo;
  const stride = span > 12 ? 3 : span > 6 ? 2 : span > 3 ? 1 : step_h;
  const ticks: number[] = [];
  for (let t = Math.ceil(lo / stride) * stride; t <= hi + 1e-9; t += stride) ticks.push(Number(t.toFixed(6)));
  return { domain: [lo, hi], ticks };
}
