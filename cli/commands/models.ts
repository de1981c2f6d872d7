import { notYetAvailable } from './not-yet.js';

export const modelsCommand = notYetAvailable('models', 'List the physiological models and their parameter sets', '[--json]');
