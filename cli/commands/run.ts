import { notYetAvailable } from './not-yet.js';

export const runCommand = notYetAvailable('run', 'Run a scenario and write results', '<scenario.json> --out <dir>');
