import { notYetAvailable } from './not-yet.js';

export const sunCommand = notYetAvailable('sun', 'Topocentric solar position (NREL SPA)', '--lat <deg> --lon <deg> --time <ISO 8601>');
