/**
 * Uploaded files may be confidential manuscripts: the storage folder keeps them readable by the
 * account that runs Echoline only. Reference: POSIX permission bits as reported by stat(2) (Node's
 * fs.stat), 0600 for files and 0700 for folders; checked under the common umask 022, which on its own
 * would leave files 0644 and folders 0755.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { createHash } from "node:crypto";
import { folderStorage } from "@/lib/storage";

let dir: string;
let oldMask: number;
beforeAll(() => {
  oldMask = process.umask(0o022);
  dir = fs.mkdtempSync(path.join(os.tmpdir(), "echoline-storage-"));
});
afterAll(() => {
  process.umask(oldMask);
  fs.rmSync(dir, { recursive: true, force: true });
});

const mode = (p: string) => fs.statSync(p).mode & 0o777;

describe("stored files are private to the owner", () => {
  it("creates files 0600 and every folder it creates 0700", async () => {
    const root = path.join(dir, "files");
    const storage = folderStorage(root);
    const data = new TextEncoder().encode("%PDF-1.4 an invented confidential manuscript");
    const sha = createHash("sha256").update(data).digest("hex");
    const key = await storage.put(sha, data);
    const full = path.join(root, key);
    expect(Buffer.from(await storage.get(key)).toString()).toContain("confidential");
    expect(mode(full).toString(8)).toBe("600");
    // Every folder from the storage root down to the file.
    for (let d = path.dirname(full); d.startsWith(root); d = path.dirname(d)) expect(mode(d).toString(8)).toBe("700");
    // No temporary file left behind, and nothing else in the folder is more open.
    const all = fs.readdirSync(root, { recursive: true, withFileTypes: true });
    expect(all.filter((e) => e.isFile()).map((e) => e.name)).toEqual([sha]);
  });
});
