/**
 * Files on disk: one flat directory, names chosen by the server (128 random bits + an extension
 * the server picked from the content), written with O_EXCL and mode 0600 (ASVS 5.3.2). Every
 * path is rebuilt from a name that must match STORED_NAME, so nothing a client sends can reach
 * the file system.
 */
import { randomBytes } from "node:crypto";
import fs from "node:fs/promises";
import path from "node:path";

export const STORED_NAME = /^[a-f0-9]{32}(-t)?\.(jpg|webp|pdf)$/;
export type StoredExt = "jpg" | "webp" | "pdf";

/**
 * How bytes reach the disk. A seam for tests: a test swaps `writeFile` to simulate a full disk
 * (ENOSPC after part of the bytes were written), which needs no root and no small file system.
 */
export const uploadDisk = {
  writeFile: (file: string, data: Buffer, options: { flag: string; mode: number }): Promise<void> => fs.writeFile(file, data, options),
};

export class UploadStore {
  constructor(readonly dir: string) {}

  async ensureDir(): Promise<void> {
    await fs.mkdir(this.dir, { recursive: true, mode: 0o700 });
  }

  pathOf(name: string): string {
    if (!STORED_NAME.test(name)) throw new Error("invalid stored file name");
    return path.join(this.dir, name);
  }

  /** Write bytes under a new random name; returns the name. `thumb` names end in "-t". */
  async write(data: Buffer, ext: StoredExt, options: { thumb?: boolean; base?: string } = {}): Promise<string> {
    const base = options.base ?? randomBytes(16).toString("hex");
    const name = `${base}${options.thumb ? "-t" : ""}.${ext}`;
    const file = this.pathOf(name);
    try {
      await uploadDisk.writeFile(file, data, { flag: "wx", mode: 0o600 });
    } catch (err) {
      // A failed write (e.g. ENOSPC part-way) can leave a partial file under our new name: remove
      // it, unless the name already existed (EEXIST: not ours to remove).
      if ((err as NodeJS.ErrnoException).code !== "EEXIST") await fs.unlink(file).catch(() => undefined);
      throw err;
    }
    return name;
  }

  /** Remove files, ignoring ones already gone. */
  async remove(names: (string | null | undefined)[]): Promise<void> {
    await Promise.all(
      names
        .filter((n): n is string => typeof n === "string" && STORED_NAME.test(n))
        .map((n) => fs.unlink(this.pathOf(n)).catch((err: NodeJS.ErrnoException) => (err.code === "ENOENT" ? undefined : Promise.reject(err)))),
    );
  }
}
