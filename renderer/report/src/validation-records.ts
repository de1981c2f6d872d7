/// <reference types="vite/client" />
// The validation records as embedded into the report page when it is built (Vite raw import).
import { plainValidation, summariseValidationRecord, type PlainValidation, type ValidationRecordSummary } from './validation-summary.js';

const RECORDS = import.meta.glob<string>('../../../docs/validation/*.md', { query: '?raw', import: 'default', eager: true });
const PLAIN = 'summary.md';

const fileOf = (path: string) => path.replace(/^.*\//, '');

/** The technical records (every part but the plain-language summary). */
export function validationRecords(): ValidationRecordSummary[] {
  return Object.entries(RECORDS)
    .filter(([file]) => fileOf(file) !== PLAIN)
    .sort(([a], [b]) => a.localeCompare(b))
    .map(([file, text]) => summariseValidationRecord(fileOf(file), text));
}

/** The plain-language page "How these numbers were checked". */
export function plainValidationPage(): PlainValidation {
  const entry = Object.entries(RECORDS).find(([file]) => fileOf(file) === PLAIN);
  return plainValidation(entry?.[1] ?? '');
}
