// "Nice" axis ticks: steps of 1, 2 or 5 times a power of ten (or 2.5 when that fits the count
// better), the domain widened to whole steps, and the decimals the step needs — so an axis reads
// −0.2, 0, 0.2, 0.4 rather than −0.13, 0.22, 0.57 (the 1-2-5 rule of chart design, common practice).

export interface NiceAxis {
  readonly domain: [number, number];
  readonly ticks: number[];
  readonly step: number;
  /** Decimals that show every tick exactly. */
  readonly decimals: number;
}

const MULTIPLES = [1, 2, 2.5, 5, 10];

/** Ticks covering [lo, hi] with at most `maxTicks` ticks (at least 2 intervals when lo < hi). */
export function niceTicks(lo: number, hi: number, maxTicks = 6): NiceAxis {
  let a = Math.min(lo, hi);
  let b = Math.max(lo, hi);
  if (!Number.isFinite(a) || !Number.isFinite(b)) return { domain: [0, 1], ticks: [0, 1], step: 1, decimals: 0 };
  if (a === b) {
    const pad = a === 0 ? 1 : Math.abs(a) * 0.1;
    a -= pad;
    b += pad;
  }
  const intervals = Math.max(1, maxTicks - 1);
  const raw = (b - a) / intervals;
  const power = 10 ** Math.floor(Math.log10(raw));
  let step = power * 10;
  for (const m of MULTIPLES) {
    const candidate = m * power;
    if (Math.floor(b / candidate - 1e-9) - Math.ceil(a / candidate + 1e-9) + 2 <= intervals) {
      step = candidate;
      break;
    }
  }
  const first = Math.floor(a / step + 1e-9) * step;
  const last = Math.ceil(b / step - 1e-9) * step;
  let decimals = 0;
  while (decimals < 12 && Math.abs(Math.round(step * 10 ** decimals) - step * 10 ** decimals) > 1e-6) decimals += 1;
  const ticks: number[] = [];
  const count = Math.round((last - first) / step);
  for (let i = 0; i <= count; i++) {
    const t = Number((first + i * step).toFixed(decimals));
    ticks.push(t === 0 ? 0 : t);
  }
  return { domain: [ticks[0] ?? first, ticks[ticks.length - 1] ?? last], ticks, step, decimals };
}
