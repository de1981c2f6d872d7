/// <reference types="vite/client" />
// The validation records as embedded into the report page when it is built (Vite raw import).
import { summariseValidationRecord, type ValidationRecordSummary } from './validation-summary.js';

const RECORDS = import.meta.glob<string>('../../../docs/validation/*.md', { query: '?raw', import: 'default', eager: true });

export function validationRecords(): ValidationRecordSummary[] {
  return Object.entries(RECORDS)
    .sort(([a], [b]) => a.localeCompare(b))
    .map(([file, text]) => summariseValidationRecord(file.replace(/^.*\//, ''), text));
}
