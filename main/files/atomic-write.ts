// Atomic file replacement: the text goes to a temporary file in the same directory, which is
// then renamed over the target (rename is atomic within one file system on POSIX and NTFS).
// A failure at any step leaves the previous file untouched and removes the temporary file.
import * as path from 'node:path';
import { randomBytes } from 'node:crypto';
import type { FileSystem } from './file-system.js';

export function temporarySiblingPath(target: string): string {
  return path.join(path.dirname(target), `.zeitlight-tmp-${path.basename(target)}-${randomBytes(6).toString('hex')}`);
}

export async function writeFileAtomic(fs: FileSystem, target: string, data: string | Uint8Array): Promise<void> {
  const temp = temporarySiblingPath(target);
  try {
    await fs.writeFile(temp, data);
    await fs.rename(temp, target);
  } catch (error) {
    await fs.unlink(temp).catch(() => undefined);
    throw error;
  }
}
