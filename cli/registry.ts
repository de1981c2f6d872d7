import type { Command } from './command.js';
import { alphaopicCommand } from './commands/alphaopic.js';
import { sourcesCommand } from './commands/sources.js';
import { simulateCommand } from './commands/simulate.js';
import { modelsCommand } from './commands/models.js';
import { sunCommand } from './commands/sun.js';
import { weatherCommand } from './commands/weather.js';
import { runCommand } from './commands/run.js';
import { validateCommand } from './commands/validate.js';
import { demoCommand } from './commands/demo.js';
import { photometryCommand } from './commands/photometry.js';

/** Every `zeitlight` command, in the order `zeitlight help` lists them. */
export const COMMANDS: readonly Command[] = [
  demoCommand,
  runCommand,
  validateCommand,
  alphaopicCommand,
  photometryCommand,
  sourcesCommand,
  sunCommand,
  weatherCommand,
  simulateCommand,
  modelsCommand,
];
