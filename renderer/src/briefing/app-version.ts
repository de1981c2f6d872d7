/** Zeitlight's version as printed on the briefing cover; kept equal to package.json by a test. */
export const APP_VERSION = '0.1.0';
