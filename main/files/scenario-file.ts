// Reading and writing scenario files on disk, with messages that name the file.
import * as path from 'node:path';
import type { ScenarioDocument } from '../../types/desktop-api.js';
import type { FileSystem } from './file-system.js';
import { writeFileAtomic } from './atomic-write.js';
import { checkScenarioText, MAX_SCENARIO_CHARS } from '../ipc/scenario-check.js';

/** Our scenario file extension (JSON content); plain .json scenarios open too. */
export const SCENARIO_EXTENSION = 'zeitlight';

export function displayNameFor(filePath: string | null): string {
  return filePath === null ? 'Untitled' : path.basename(filePath);
}

/** Adds the scenario extension when a save dialog returned a name without a known one. */
export function withScenarioExtension(filePath: string): string {
  const lower = filePath.toLowerCase();
  return lower.endsWith(`.${SCENARIO_EXTENSION}`) || lower.endsWith('.json') ? filePath : `${filePath}.${SCENARIO_EXTENSION}`;
}

export type ReadOutcome = { ok: true; document: ScenarioDocument } | { ok: false; message: string };

export async function readScenarioFile(fs: FileSystem, filePath: string): Promise<ReadOutcome> {
  try {
    const info = await fs.stat(filePath);
    if (info.size > MAX_SCENARIO_CHARS * 4) return { ok: false, message: `${filePath}: file is too large to be a scenario` };
    const text = await fs.readFile(filePath, 'utf8');
    const check = checkScenarioText(text, filePath);
    if (!check.ok) return { ok: false, message: check.problems.join('\n') };
    return { ok: true, document: { path: filePath, displayName: displayNameFor(filePath), text } };
  } catch (error) {
    return { ok: false, message: `${filePath}: ${error instanceof Error ? error.message : String(error)}` };
  }
}

export type WriteResult = { ok: true } | { ok: false; message: string };

export async function writeScenarioFile(fs: FileSystem, filePath: string, text: string): Promise<WriteResult> {
  const check = checkScenarioText(text, filePath);
  if (!check.ok) return { ok: false, message: check.problems.join('\n') };
  return writeTextFile(fs, filePath, text);
}

export async function writeTextFile(fs: FileSystem, filePath: string, data: string | Uint8Array): Promise<WriteResult> {
  try {
    await writeFileAtomic(fs, filePath, data);
    return { ok: true };
  } catch (error) {
    return { ok: false, message: `${filePath}: ${error instanceof Error ? error.message : String(error)}` };
  }
}
