/**
 * The output folder of `zeitlight run` / `zeitlight demo` holds one run's files and nothing older,
 * and is never left half-written:
 *  - the folder is checked before any work: a folder holding files other than a run's is refused
 *    unless forced (and never when it holds the run's own input files or is the working folder);
 *  - every file is written into a new sibling folder (`.<name>.zeitlight-new-<pid>`), and only
 *    when all of them are complete does that folder take the output folder's place: the earlier
 *    folder is renamed aside (`.<name>.zeitlight-old-<pid>`), the new one renamed into place, and
 *    the earlier one deleted. Killed at any moment before the renames, the output folder is as it
 *    was; after them, it is complete;
 *  - between the two renames (two system calls) the output folder is briefly absent; if the
 *    process dies exactly there, the next run or demo into that folder renames the earlier folder
 *    back first. Leftover sibling folders of dead processes are removed the same way.
 */
import { chmodSync, existsSync, mkdirSync, readdirSync, realpathSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { basename, dirname, isAbsolute, join, relative, resolve, sep } from 'node:path';
import { CliError } from '../cli-error.js';
import { readFailure } from '../input-file.js';

/** The files a run writes; a folder holding only these holds an earlier run. */
export const RUN_OUTPUT_FILES = ['results.json', 'exposure.csv', 'summary.csv', 'scenario.json', 'report.pdf'] as const;

const NEW_TAG = 'zeitlight-new';
const OLD_TAG = 'zeitlight-old';

function pidAlive(pid: number): boolean {
  if (!Number.isInteger(pid) || pid <= 0) return false;
  if (pid === process.pid) return true;
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    return (err as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/** Sibling folders left by earlier runs into `dir`: `{ path, tag, pid }`. */
function siblings(dir: string): { path: string; tag: string; pid: number }[] {
  const parent = dirname(dir);
  const prefix = `.${basename(dir)}.`;
  let names: string[];
  try {
    names = readdirSync(parent);
  } catch {
    return [];
  }
  return names
    .filter((n) => n.startsWith(prefix))
    .map((n) => {
      const m = new RegExp(`^(${NEW_TAG}|${OLD_TAG})-(\\d+)`).exec(n.slice(prefix.length));
      return m === null ? undefined : { path: join(parent, n), tag: m[1] ?? '', pid: Number(m[2]) };
    })
    .filter((s): s is { path: string; tag: string; pid: number } => s !== undefined);
}

/**
 * Puts back an output folder that an interrupted run left renamed aside, and removes folders
 * left by runs that are no longer running.
 */
export function recoverOutputFolder(dir: string): void {
  const left = siblings(dir).filter((s) => !pidAlive(s.pid));
  const aside = left.filter((s) => s.tag === OLD_TAG);
  if (!existsSync(dir) && aside.length > 0) {
    const newest = aside.map((s) => ({ s, t: statSync(s.path).mtimeMs })).sort((a, b) => b.t - a.t)[0];
    if (newest !== undefined) renameSync(newest.s.path, dir);
  }
  for (const s of left) if (existsSync(s.path)) rmSync(s.path, { recursive: true, force: true });
}

function isInside(child: string, folder: string): boolean {
  const rel = relative(folder, child);
  return rel === '' || (rel !== '..' && !rel.startsWith(`..${sep}`) && !isAbsolute(rel));
}

export interface OutputFolderOptions {
  /** Replace the content of a folder that holds files other than a run's. */
  readonly force: boolean;
  /** Files this run reads (scenario, weather, light logs): a forced folder must not hold them. */
  readonly inputFiles?: readonly string[];
}

/** An output folder being written: files go into `staging`; `commit` puts them in place. */
export interface StagedOutput {
  /** The output folder as the user named it. */
  readonly dir: string;
  /** The folder the files are written into until commit. */
  readonly staging: string;
  /** Writes files into the staging folder; returns nothing until committed. */
  write(files: Readonly<Record<string, string | Uint8Array>>): void;
  /** Puts the staging folder in place of the output folder; returns the paths of the files as the user named the folder. */
  commit(): string[];
  /** Removes the staging folder (after a failure). */
  abandon(): void;
}

/** Checks the output folder and opens a staging folder beside it; throws CliError naming --out. */
export function beginOutput(dir: string, options: OutputFolderOptions): StagedOutput {
  const given = dir;
  let target = resolve(dir);
  try {
    recoverOutputFolder(target);
  } catch (err) {
    throw new CliError(`--out ${given}: an earlier interrupted run left the folder renamed aside and it cannot be put back: ${readFailure(err)}`);
  }
  let mode: number | undefined;
  if (existsSync(target)) {
    target = realpathSync(target);
    const st = statSync(target);
    if (!st.isDirectory()) throw new CliError(`--out ${given}: exists and is not a folder`);
    mode = st.mode & 0o7777;
    let entries: string[];
    try {
      entries = readdirSync(target);
    } catch (err) {
      throw new CliError(`--out ${given}: cannot read the folder: ${readFailure(err)}`);
    }
    const others = entries.filter((f) => !(RUN_OUTPUT_FILES as readonly string[]).includes(f));
    if (others.length > 0 && !options.force) {
      const list = others.slice(0, 5).join(', ') + (others.length > 5 ? `, and ${others.length - 5} more` : '');
      throw new CliError(`--out ${given}: the folder holds other files (${list}); choose an empty or new folder, or add --force to replace everything in it with this run's files`);
    }
    const inputs = (options.inputFiles ?? []).map((f) => resolve(f)).filter((f) => isInside(existsSync(f) ? realpathSync(f) : f, target));
    if (inputs.length > 0 && entries.length > 0) {
      throw new CliError(`--out ${given}: the folder holds ${inputs.map((f) => basename(f)).join(', ')}, which this run reads; the run replaces the folder's whole content, so choose another folder for the results`);
    }
    if (isInside(process.cwd(), target)) throw new CliError(`--out ${given}: is the working folder (or holds it); the run replaces the folder's whole content, so choose a folder for the results, e.g. --out results`);
  } else {
    try {
      mkdirSync(dirname(target), { recursive: true });
    } catch (err) {
      throw new CliError(`--out ${given}: cannot create the folder: ${readFailure(err)}`);
    }
  }
  const staging = join(dirname(target), `.${basename(target)}.${NEW_TAG}-${process.pid}-${Date.now().toString(36)}`);
  try {
    mkdirSync(staging);
  } catch (err) {
    throw new CliError(`--out ${given}: cannot write beside the folder (${dirname(target)}): ${readFailure(err)}`);
  }
  const names: string[] = [];
  let open = true;
  const abandon = () => {
    if (!open) return;
    open = false;
    process.off('SIGINT', onSignal);
    process.off('SIGTERM', onSignal);
    rmSync(staging, { recursive: true, force: true });
  };
  // Ctrl-C or a polite kill: the output folder stays as it was, the staging folder goes.
  const onSignal = (signal: NodeJS.Signals) => {
    abandon();
    process.kill(process.pid, signal);
  };
  process.once('SIGINT', onSignal);
  process.once('SIGTERM', onSignal);
  return {
    dir: given,
    staging,
    write(files) {
      try {
        for (const [name, content] of Object.entries(files)) {
          writeFileSync(join(staging, name), content);
          if (!names.includes(name)) names.push(name);
        }
      } catch (err) {
        abandon();
        throw new CliError(`--out ${given}: cannot write the results: ${readFailure(err)}`);
      }
    },
    commit() {
      for (const f of readdirSync(staging)) if (!names.includes(f)) names.push(f);
      try {
        if (mode !== undefined) chmodSync(staging, mode);
        if (!existsSync(target)) renameSync(staging, target);
        else {
          const aside = join(dirname(target), `.${basename(target)}.${OLD_TAG}-${process.pid}-${Date.now().toString(36)}`);
          renameSync(target, aside);
          try {
            renameSync(staging, target);
          } catch (err) {
            renameSync(aside, target);
            throw err;
          }
          rmSync(aside, { recursive: true, force: true });
        }
      } catch (err) {
        abandon();
        throw new CliError(`--out ${given}: cannot put the results in place: ${readFailure(err)}`);
      }
      open = false;
      process.off('SIGINT', onSignal);
      process.off('SIGTERM', onSignal);
      return names.map((n) => join(given, n));
    },
    abandon,
  };
}
