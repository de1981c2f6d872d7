/**
 * The output folder of `zeitlight run` / `zeitlight demo`: created when missing; refused when it
 * holds files other than the ones a run writes (unless forced); files written under temporary
 * names first and renamed into place only when every one of them is complete, so a failed run
 * never leaves a half-written file.
 */
import { existsSync, mkdirSync, readdirSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { CliError } from '../cli-error.js';

export const RUN_OUTPUT_FILES = ['results.json', 'exposure.csv', 'summary.csv', 'scenario.json', 'report.pdf'] as const;

/** Checks (and creates) the folder; throws CliError naming the files in the way. */
export function prepareOutputFolder(dir: string, force: boolean): void {
  if (existsSync(dir)) {
    if (!statSync(dir).isDirectory()) throw new CliError(`--out ${dir}: exists and is not a folder`);
    const others = readdirSync(dir).filter((f) => !(RUN_OUTPUT_FILES as readonly string[]).includes(f));
    if (others.length > 0 && !force) {
      const list = others.slice(0, 5).join(', ') + (others.length > 5 ? `, and ${others.length - 5} more` : '');
      throw new CliError(`--out ${dir}: the folder holds other files (${list}); choose an empty or new folder, or add --force to write into it anyway`);
    }
  } else {
    try {
      mkdirSync(dir, { recursive: true });
    } catch (err) {
      throw new CliError(`--out ${dir}: cannot create the folder: ${(err as Error).message}`);
    }
  }
}

/** Writes every file under a temporary name, then renames them all into place. */
export function writeFilesAtomically(dir: string, files: Readonly<Record<string, string | Uint8Array>>): string[] {
  const temps: [string, string][] = [];
  try {
    for (const [name, content] of Object.entries(files)) {
      const tmp = join(dir, `.${name}.${process.pid}.partial`);
      writeFileSync(tmp, content);
      temps.push([tmp, join(dir, name)]);
    }
  } catch (err) {
    for (const [tmp] of temps) rmSync(tmp, { force: true });
    throw new CliError(`cannot write into ${dir}: ${(err as Error).message}`);
  }
  for (const [tmp, final] of temps) renameSync(tmp, final);
  return temps.map(([, f]) => f);
}
