import { notYetAvailable } from './not-yet.js';

export const sourcesCommand = notYetAvailable('sources', 'List the built-in light-source library', '[--json]');
