import { notYetAvailable } from './not-yet.js';

export const validateCommand = notYetAvailable('validate', 'Check a scenario file and list every problem', '<scenario.json>');
