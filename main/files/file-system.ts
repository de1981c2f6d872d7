// The file operations main uses, as an injectable interface (node:fs/promises satisfies it;
// tests inject failures).
import * as fsp from 'node:fs/promises';

export interface FileSystem {
  readFile(path: string, encoding: 'utf8'): Promise<string>;
  readBinary(path: string): Promise<Uint8Array>;
  writeFile(path: string, data: string | Uint8Array): Promise<void>;
  rename(from: string, to: string): Promise<void>;
  unlink(path: string): Promise<void>;
  mkdir(path: string, options: { recursive: true }): Promise<string | undefined>;
  readdir(path: string): Promise<string[]>;
  stat(path: string): Promise<{ size: number; mtimeMs: number }>;
}

export const nodeFileSystem: FileSystem = {
  readFile: (p, e) => fsp.readFile(p, e),
  readBinary: async (p) => new Uint8Array(await fsp.readFile(p)),
  writeFile: (p, d) => fsp.writeFile(p, d),
  rename: (a, b) => fsp.rename(a, b),
  unlink: (p) => fsp.unlink(p),
  mkdir: (p, o) => fsp.mkdir(p, o),
  readdir: (p) => fsp.readdir(p),
  stat: (p) => fsp.stat(p),
};
