/**
 * Where uploaded files live. Files are addressed by their SHA-256, so the same bytes are stored once
 * and a write can be repeated safely. The default keeps them in a folder of the project's data
 * directory; another backend (object storage) only has to implement this interface.
 */
import fs from "node:fs/promises";
import path from "node:path";
import { randomBytes } from "node:crypto";
import { filesDir } from "@/lib/env";

export interface FileStorage {
  /** Stores the bytes under their hash and returns the key to read them back with. Idempotent. */
  put(sha256: string, data: Uint8Array): Promise<string>;
  get(key: string): Promise<Uint8Array>;
}

const SHA256 = /^[0-9a-f]{64}$/;
// Uploaded manuscripts can be confidential: only the account that runs Echoline may read them.
export const FILE_MODE = 0o600;
export const DIR_MODE = 0o700;

export function folderStorage(dir = path.join(/*turbopackIgnore: true*/ process.cwd(), ".data", "files")): FileStorage {
  const root = path.resolve(dir);
  // Two levels of fan-out keep any one folder small once the corpus has many thousand files.
  const keyFor = (sha: string) => `${sha.slice(0, 2)}/${sha.slice(2, 4)}/${sha}`;
  const resolveKey = (key: string) => {
    const full = path.resolve(root, key);
    // A key comes from our own database, but never let one walk out of the storage folder.
    if (!full.startsWith(root + path.sep)) throw new Error(`Storage key outside the storage folder: ${key}`);
    return full;
  };
  return {
    async put(sha256, data) {
      if (!SHA256.test(sha256)) throw new Error(`Not a SHA-256 hex digest: ${sha256}`);
      const key = keyFor(sha256);
      const full = resolveKey(key);
      try {
        await fs.access(/*turbopackIgnore: true*/ full);
        return key;
      } catch {
        // not stored yet
      }
      await fs.mkdir(/*turbopackIgnore: true*/ path.dirname(full), { recursive: true, mode: DIR_MODE });
      // Write then rename: a reader (or a concurrent upload of the same file) never sees half a file.
      const tmp = `${full}.${process.pid}.${randomBytes(4).toString("hex")}.tmp`;
      await fs.writeFile(/*turbopackIgnore: true*/ tmp, data, { mode: FILE_MODE });
      await fs.rename(/*turbopackIgnore: true*/ tmp, full);
      return key;
    },
    async get(key) {
      const buf = await fs.readFile(/*turbopackIgnore: true*/ resolveKey(key));
      return new Uint8Array(buf.buffer, buf.byteOffset, buf.byteLength);
    },
  };
}

/** In-memory storage for tests and one-off scripts. */
export function memoryStorage(): FileStorage {
  const files = new Map<string, Uint8Array>();
  return {
    async put(sha256, data) {
      files.set(sha256, data.slice());
      return sha256;
    },
    async get(key) {
      const f = files.get(key);
      if (!f) throw new Error(`No stored file ${key}`);
      return f;
    },
  };
}

let defaultStorage: FileStorage | null = null;
/**
 * The process-wide storage. The web server and the worker must resolve the same folder:
 * ECHOLINE_FILES_DIR, else `files/` inside ECHOLINE_DATA_DIR (set by the process stack), else .data/files.
 */
export function getStorage(): FileStorage {
  defaultStorage ??= folderStorage(storageDir());
  return defaultStorage;
}

/** The folder getStorage() uses (the backup script copies it): lib/env's filesDir(), else .data/files. */
export function storageDir(): string {
  return path.resolve(filesDir() ?? path.join(/*turbopackIgnore: true*/ process.cwd(), ".data", "files"));
}
