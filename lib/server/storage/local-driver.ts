import "server-only";
import { mkdir, readdir, readFile, rename, rm, writeFile } from "node:fs/promises";
import { randomUUID } from "node:crypto";
import path from "node:path";
import { checkKey, type BlobStorage, type StoredObject } from "./types";

/**
 * Files under one folder (outside public/, so nothing is served without our headers).
 * Each object is its bytes plus a small ".type" file with the content type. Writes go to a
 * temporary name first and are renamed into place, so a reader never sees half a file.
 */
export function localDriver(root: string): BlobStorage {
  const base = path.resolve(root);
  const fileFor = (key: string) => {
    const file = path.join(base, checkKey(key));
    if (!file.startsWith(base + path.sep)) throw new Error("Storage key escapes the storage folder");
    return file;
  };

  async function writeAtomically(file: string, data: Buffer | string) {
    const temp = `${file}.${randomUUID()}.partial`;
    await writeFile(temp, data, { mode: 0o640 });
    await rename(temp, file);
  }

  return {
    async put(key, bytes, contentType) {
      const file = fileFor(key);
      await mkdir(path.dirname(file), { recursive: true, mode: 0o750 });
      await writeAtomically(`${file}.type`, contentType);
      await writeAtomically(file, bytes);
    },
    async get(key): Promise<StoredObject | null> {
      const file = fileFor(key);
      try {
        const [bytes, contentType] = await Promise.all([readFile(file), readFile(`${file}.type`, "utf8")]);
        return { bytes, contentType };
      } catch (error) {
        if ((error as NodeJS.ErrnoException).code === "ENOENT") return null;
        throw error;
      }
    },
    async delete(key) {
      const file = fileFor(key);
      await Promise.all([rm(file, { force: true }), rm(`${file}.type`, { force: true })]);
    },
    async list(prefix = "") {
      try {
        const entries = await readdir(base, { recursive: true, withFileTypes: true });
        return entries
          .filter((e) => e.isFile() && !e.name.endsWith(".type") && !e.name.endsWith(".partial"))
          .map((e) => path.relative(base, path.join(e.parentPath, e.name)).split(path.sep).join("/"))
          .filter((key) => key.startsWith(prefix))
          .sort();
      } catch (error) {
        if ((error as NodeJS.ErrnoException).code === "ENOENT") return [];
        throw error;
      }
    },
  };
}
