/**
 * Locates the real EPW file used as test data only (never shipped): NLD_Amsterdam062400_IWEC.epw,
 * an IWEC typical year for Amsterdam Schiphol (source data © 2001 ASHRAE, as distributed in the
 * pvlib-python test data). It sits in <project root>/../shared/data/weather/.
 */
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { PROJECT_ROOT } from '../helpers/run-cli.js';

export const AMSTERDAM_EPW_PATH = join(PROJECT_ROOT, '..', 'shared', 'data', 'weather', 'NLD_Amsterdam062400_IWEC.epw');

export function amsterdamEpwText(): string {
  if (!existsSync(AMSTERDAM_EPW_PATH)) throw new Error(`test weather file not found at ${AMSTERDAM_EPW_PATH}`);
  return readFileSync(AMSTERDAM_EPW_PATH, 'utf8');
}
