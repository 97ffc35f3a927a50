import { createReadStream } from "node:fs";
import { mkdir, rename, rm, stat, writeFile } from "node:fs/promises";
import { dirname, join, resolve, sep } from "node:path";
import type { Readable } from "node:stream";
import { pipeline } from "node:stream/promises";
import { createWriteStream } from "node:fs";
import { randomBytes } from "node:crypto";
import { env } from "~/config/env.server";

// Blobs (packs, later drawings) live behind this interface so app servers stay stateless: the local-disk
// default serves one machine; an object-store implementation is a new class with the same four methods.
export interface BlobStorage {
  put(key: string, body: Buffer | Readable): Promise<void>;
  get(key: string): Promise<{ body: Readable; size: number } | null>;
  exists(key: string): Promise<boolean>;
  remove(key: string): Promise<void>;
}

/** Keys are slash-separated, lower-case words: nothing that could climb out of the root. */
export function assertSafeKey(key: string): void {
  if (!/^[a-z0-9][a-z0-9._-]*(\/[a-z0-9][a-z0-9._-]*)*$/.test(key) || key.includes(".."))
    throw new Error(`unsafe storage key: ${key}`);
}

export class LocalDiskStorage implements BlobStorage {
  readonly root: string;

  constructor(root: string) {
    this.root = resolve(root);
  }

  private path(key: string): string {
    assertSafeKey(key);
    const full = join(this.root, ...key.split("/"));
    if (!full.startsWith(this.root + sep)) throw new Error(`unsafe storage key: ${key}`);
    return full;
  }

  /** Writes to a temporary name and renames, so a reader never sees half a file. */
  async put(key: string, body: Buffer | Readable): Promise<void> {
    const target = this.path(key);
    await mkdir(dirname(target), { recursive: true });
    const temporary = `${target}.${randomBytes(6).toString("hex")}.part`;
    try {
      if (Buffer.isBuffer(body)) await writeFile(temporary, body);
      else await pipeline(body, createWriteStream(temporary));
      await rename(temporary, target);
    } catch (error) {
      await rm(temporary, { force: true });
      throw error;
    }
  }

  async get(key: string): Promise<{ body: Readable; size: number } | null> {
    const target = this.path(key);
    try {
      const info = await stat(target);
      return { body: createReadStream(target), size: info.size };
    } catch {
      return null;
    }
  }

  async exists(key: string): Promise<boolean> {
    try {
      return (await stat(this.path(key))).isFile();
    } catch {
      return false;
    }
  }

  async remove(key: string): Promise<void> {
    await rm(this.path(key), { force: true });
  }
}

let storage: BlobStorage | undefined;

/** The app's storage: local disk under STORAGE_DIR. */
export function blobStorage(): BlobStorage {
  storage ??= new LocalDiskStorage(env().STORAGE_DIR);
  return storage;
}
