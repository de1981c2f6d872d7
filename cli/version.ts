/** Product version, kept equal to package.json "version" (checked by a test). */
export const VERSION = '0.1.0';
