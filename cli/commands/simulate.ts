import { notYetAvailable } from './not-yet.js';

export const simulateCommand = notYetAvailable('simulate', 'Body clock, melatonin and sleepiness from a light series', '<light.csv> --days <n> [--model <id>]');
