// Recovery copies of unsaved work. Each open window writes its current text to its own file in
// the recovery folder while it has unsaved edits; the file is removed when the work is saved or
// the window closes normally. Files still present at startup therefore mean the previous run
// ended without closing cleanly (a crash or power loss), and the app offers to restore them.
import * as path from 'node:path';
import { z } from 'zod';
import type { FileSystem } from './file-system.js';
import { writeFileAtomic } from './atomic-write.js';

const RECOVERY_SUFFIX = '.recovery.json';

const recoveryRecord = z.object({
  format: z.literal('zeitlight-recovery-1'),
  originalPath: z.string().nullable(),
  savedAt: z.string(),
  text: z.string(),
});

export type RecoveryRecord = z.infer<typeof recoveryRecord>;
export interface RecoveredDraft extends RecoveryRecord {
  readonly recoveryFile: string;
}

export class RecoveryStore {
  constructor(
    private readonly fs: FileSystem,
    readonly folder: string,
  ) {}

  fileFor(windowKey: string): string {
    return path.join(this.folder, `${windowKey.replace(/[^A-Za-z0-9_-]/g, '_')}${RECOVERY_SUFFIX}`);
  }

  async write(windowKey: string, originalPath: string | null, text: string, now: Date): Promise<void> {
    await this.fs.mkdir(this.folder, { recursive: true });
    const record: RecoveryRecord = { format: 'zeitlight-recovery-1', originalPath, savedAt: now.toISOString(), text };
    await writeFileAtomic(this.fs, this.fileFor(windowKey), JSON.stringify(record));
  }

  async discard(windowKey: string): Promise<void> {
    await this.fs.unlink(this.fileFor(windowKey)).catch(() => undefined);
  }

  /** Drafts left behind by a run that did not close cleanly; unreadable files are skipped. */
  async leftovers(): Promise<RecoveredDraft[]> {
    let names: string[];
    try {
      names = await this.fs.readdir(this.folder);
    } catch {
      return [];
    }
    const drafts: RecoveredDraft[] = [];
    for (const name of names.filter((n) => n.endsWith(RECOVERY_SUFFIX)).sort()) {
      const file = path.join(this.folder, name);
      try {
        const parsed = recoveryRecord.safeParse(JSON.parse(await this.fs.readFile(file, 'utf8')));
        if (parsed.success) drafts.push({ ...parsed.data, recoveryFile: file });
      } catch {
        // A half-written or foreign file is not a draft; leave it for the user to inspect.
      }
    }
    return drafts;
  }

  async removeFile(recoveryFile: string): Promise<void> {
    await this.fs.unlink(recoveryFile).catch(() => undefined);
  }
}
