import { alphaOpicQuantities, illuminantD65 } from '../../model/photometry/alpha-opic.js';
import { medianMs } from '../timing.js';

export async function bench(): Promise<Record<string, unknown>> {
  const d65 = illuminantD65();
  const n = 1000;
  const ms = medianMs(() => {
    for (let i = 0; i < n; i++) alphaOpicQuantities(d65);
  });
  return { alphaopic_us_per_spectrum: (ms * 1000) / n };
}
