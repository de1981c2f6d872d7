/**
 * One entry point for a luminaire's photometric file: recognises IES LM-63 (first line
 * `IESNA:LM-63-…`, `IES:LM-63-2019`, `IESNA91`, or a `TILT=` line) and otherwise reads EULUMDAT.
 * Pure: takes the file's text. Refusals are PhotometricFileError (line and field).
 */
import { PhotometricFileError, type CandelaTable } from './candela-table.js';
import { readEulumdat } from './eulumdat.js';
import { looksLikeLm63, readLm63 } from './ies-lm63.js';

export function readPhotometricFile(text: string): CandelaTable {
  if (text.trim() === '') throw new PhotometricFileError(1, 'file', 'the file is empty');
  return looksLikeLm63(text) ? readLm63(text) : readEulumdat(text);
}
