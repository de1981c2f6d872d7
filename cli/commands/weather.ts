import { notYetAvailable } from './not-yet.js';

export const weatherCommand = notYetAvailable('weather', 'Summarise an EPW weather file', '<file.epw>');
