import { randomUUID } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { mkdir, rename, rm, stat, writeFile } from 'node:fs/promises';
import { dirname, join, resolve, sep } from 'node:path';
import { type Readable } from 'node:stream';

export const FILE_STORAGE = Symbol('FILE_STORAGE');

/** Where uploaded bytes live. Local disk by default; an object store can implement the same four calls. */
export interface FileStorage {
  put(key: string, bytes: Buffer): Promise<void>;
  open(key: string): Promise<Readable>;
  exists(key: string): Promise<boolean>;
  delete(key: string): Promise<void>;
}

const keyPattern = /^[0-9a-f]{2}\/[0-9a-f]{2}\/[0-9a-f-]{36}$/;

/** The storage key of a file id: two levels of folders keep directories small. */
export function storageKeyFor(fileId: string): string {
  return `${fileId.slice(0, 2)}/${fileId.slice(2, 4)}/${fileId}`;
}

/** Files under `<root>/<key>`; writes go to a temporary name first, so a crash never leaves half a file under a real key. */
export class LocalFileStorage implements FileStorage {
  private readonly root: string;

  constructor(root: string) {
    this.root = resolve(root);
  }

  private pathOf(key: string): string {
    if (!keyPattern.test(key)) throw new Error(`Not a storage key: ${key}`);
    const path = resolve(this.root, key);
    if (!path.startsWith(this.root + sep)) throw new Error(`Storage key leaves the storage folder: ${key}`);
    return path;
  }

  async put(key: string, bytes: Buffer): Promise<void> {
    const path = this.pathOf(key);
    await mkdir(dirname(path), { recursive: true });
    const temporary = join(dirname(path), `.${randomUUID()}.part`);
    await writeFile(temporary, bytes, { flag: 'wx' });
    await rename(temporary, path);
  }

  async open(key: string): Promise<Readable> {
    const path = this.pathOf(key);
    await stat(path);
    return createReadStream(path);
  }

  async exists(key: string): Promise<boolean> {
    try {
      await stat(this.pathOf(key));
      return true;
    } catch {
      return false;
    }
  }

  async delete(key: string): Promise<void> {
    await rm(this.pathOf(key), { force: true });
  }
}
