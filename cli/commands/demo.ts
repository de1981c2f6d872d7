import { notYetAvailable } from './not-yet.js';

export const demoCommand = notYetAvailable('demo', 'Run the built-in demo scenario', '--out <dir>');
