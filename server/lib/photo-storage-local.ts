import fs from 'node:fs/promises';
import path from 'node:path';
import { PhotoNotStoredError, assertSafeKey, type PhotoStorage } from '@/server/lib/photo-storage';

/** Photos as files under one folder (DATA_DIR/photos by default). */
export class LocalPhotoStorage implements PhotoStorage {
  constructor(private readonly root: string) {}

  private file(key: string) {
    assertSafeKey(key);
    return path.join(this.root, ...key.split('/'));
  }

  async put(key: string, body: Buffer): Promise<void> {
    const file = this.file(key);
    await fs.mkdir(path.dirname(file), { recursive: true });
    // Written under a temporary name and renamed, so a reader never sees half a file.
    const tmp = `${file}.${process.pid}.${Date.now()}.part`;
    await fs.writeFile(tmp, body, { mode: 0o640 });
    await fs.rename(tmp, file);
  }

  async get(key: string): Promise<Buffer> {
    try {
      return await fs.readFile(this.file(key));
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code === 'ENOENT') throw new PhotoNotStoredError(key);
      throw err;
    }
  }
}
