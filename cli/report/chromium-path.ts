// Which Chromium prints the briefing: the option, else ZEITLIGHT_CHROMIUM, else /usr/bin/chromium.
import { accessSync, constants, statSync } from 'node:fs';
import { CliError } from '../cli-error.js';

export const DEFAULT_CHROMIUM = '/usr/bin/chromium';

export const HOW_TO_GET_CHROMIUM =
  'install one (Debian/Ubuntu: "apt-get install chromium") or point ZEITLIGHT_CHROMIUM (or the chromiumPath option) at a Chromium or Chrome executable';

export function chromiumExecutable(option: string | undefined, env: NodeJS.ProcessEnv = process.env): string {
  const chosen = option ?? (env.ZEITLIGHT_CHROMIUM !== undefined && env.ZEITLIGHT_CHROMIUM !== '' ? env.ZEITLIGHT_CHROMIUM : DEFAULT_CHROMIUM);
  const from = option !== undefined ? 'chromiumPath option' : env.ZEITLIGHT_CHROMIUM ? 'ZEITLIGHT_CHROMIUM' : 'default';
  try {
    if (!statSync(chosen).isFile()) throw new Error('not a file');
    accessSync(chosen, constants.X_OK);
  } catch {
    throw new CliError(`briefing PDF: no Chromium found at ${chosen} (${from}); ${HOW_TO_GET_CHROMIUM}`);
  }
  return chosen;
}
