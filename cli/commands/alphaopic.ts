import { notYetAvailable } from './not-yet.js';

export const alphaopicCommand = notYetAvailable('alphaopic', 'CIE S 026 α-opic quantities of a spectrum', '<spd.csv> [--illuminance <lx>] [--age <years>]');
