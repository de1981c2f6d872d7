// The recent-files list: most recent first, no duplicates, at most `limit` entries, kept in a
// small JSON file in the user-data folder. A damaged list file is treated as empty.
import { z } from 'zod';
import type { FileSystem } from './file-system.js';
import { writeFileAtomic } from './atomic-write.js';

const storedList = z.object({ recent: z.array(z.string().min(1).max(4096)).max(100) });

export class RecentFiles {
  private entries: string[] = [];

  constructor(
    private readonly fs: FileSystem,
    private readonly storePath: string,
    private readonly limit = 10,
  ) {}

  async load(): Promise<readonly string[]> {
    try {
      const parsed = storedList.safeParse(JSON.parse(await this.fs.readFile(this.storePath, 'utf8')));
      this.entries = parsed.success ? parsed.data.recent.slice(0, this.limit) : [];
    } catch {
      this.entries = [];
    }
    return this.list();
  }

  list(): readonly string[] {
    return [...this.entries];
  }

  async add(filePath: string): Promise<void> {
    this.entries = [filePath, ...this.entries.filter((p) => p !== filePath)].slice(0, this.limit);
    await this.persist();
  }

  async remove(filePath: string): Promise<void> {
    this.entries = this.entries.filter((p) => p !== filePath);
    await this.persist();
  }

  async clear(): Promise<void> {
    this.entries = [];
    await this.persist();
  }

  private async persist(): Promise<void> {
    await writeFileAtomic(this.fs, this.storePath, JSON.stringify({ recent: this.entries }, null, 2));
  }
}
