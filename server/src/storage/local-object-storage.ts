import { randomUUID } from 'node:crypto';
import { createReadStream, createWriteStream } from 'node:fs';
import { mkdir, readFile, rename, rm, stat, writeFile } from 'node:fs/promises';
import { dirname, join } from 'node:path';
import type { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import {
  assertObjectKey,
  assertRange,
  ObjectNotFoundError,
  type ByteRange,
  type ObjectStorage,
  type PutOptions,
  type StoredObjectInfo,
} from './object-storage';

interface MetaFile {
  contentType: string;
}

function isMissing(error: unknown): boolean {
  return (error as NodeJS.ErrnoException | null)?.code === 'ENOENT';
}

// Files under <root>/data/<key>, their content type under <root>/meta/<key>.json; writes go to
// <root>/tmp first and are renamed into place, so a reader never sees half a file.
export class LocalObjectStorage implements ObjectStorage {
  constructor(private readonly root: string) {}

  // Made at boot so a wrong or unwritable STORAGE_DIR fails at once, not at the first upload.
  async ensureRoot(): Promise<void> {
    await mkdir(join(this.root, 'data'), { recursive: true });
  }

  private dataPath(key: string): string {
    assertObjectKey(key);
    return join(this.root, 'data', key);
  }

  private metaPath(key: string): string {
    return join(this.root, 'meta', `${key}.json`);
  }

  async put(key: string, body: Buffer | Readable, options: PutOptions): Promise<void> {
    const target = this.dataPath(key);
    const tmpDir = join(this.root, 'tmp');
    await mkdir(tmpDir, { recursive: true });
    const tmp = join(tmpDir, randomUUID());
    try {
      if (Buffer.isBuffer(body)) await writeFile(tmp, body);
      else await pipeline(body, createWriteStream(tmp));
      const meta: MetaFile = { contentType: options.contentType };
      await mkdir(dirname(this.metaPath(key)), { recursive: true });
      await writeFile(this.metaPath(key), JSON.stringify(meta));
      await mkdir(dirname(target), { recursive: true });
      await rename(tmp, target);
    } finally {
      await rm(tmp, { force: true });
    }
  }

  async get(key: string, range?: ByteRange): Promise<Readable> {
    const path = this.dataPath(key);
    if (range) assertRange(range);
    // Open first so a missing file is an error here, not on the stream later.
    const stream = createReadStream(path, range ? { start: range.start, end: range.end } : {});
    await new Promise<void>((resolveOpen, reject) => {
      stream.once('open', () => resolveOpen());
      stream.once('error', (error) => reject(isMissing(error) ? new ObjectNotFoundError(key) : error));
    });
    return stream;
  }

  async head(key: string): Promise<StoredObjectInfo | null> {
    const path = this.dataPath(key);
    try {
      const [info, metaText] = await Promise.all([stat(path), readFile(this.metaPath(key), 'utf8')]);
      const meta = JSON.parse(metaText) as MetaFile;
      return { sizeBytes: info.size, contentType: meta.contentType };
    } catch (error) {
      if (isMissing(error)) return null;
      throw error;
    }
  }

  async delete(key: string): Promise<void> {
    const path = this.dataPath(key);
    await rm(path, { force: true });
    await rm(this.metaPath(key), { force: true });
  }
}
