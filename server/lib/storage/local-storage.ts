import { createReadStream } from "node:fs";
import { mkdir, readdir, rename, stat, unlink, writeFile } from "node:fs/promises";
import { randomUUID } from "node:crypto";
import path from "node:path";
import { assertKey, type Storage } from "./storage.ts";

const isMissing = (err: unknown) => (err as { code?: string }).code === "ENOENT";

/** Files on local disk under one folder (git-ignored `.var/files` by default). */
export function createLocalStorage(rootDir: string): Storage {
  const root = path.resolve(rootDir);
  const fileOf = (key: string) => {
    assertKey(key);
    return path.join(root, ...key.split("/"));
  };
  return {
    async put(key, bytes) {
      const file = fileOf(key);
      await mkdir(path.dirname(file), { recursive: true });
      // Write aside and rename, so a reader never sees half a file.
      const temp = `${file}.${randomUUID()}.part`;
      await writeFile(temp, bytes);
      await rename(temp, file);
    },
    async get(key) {
      const file = fileOf(key);
      try {
        const info = await stat(file);
        return { body: createReadStream(file), sizeBytes: info.size };
      } catch (err) {
        if (isMissing(err)) return null;
        throw err;
      }
    },
    async delete(key) {
      try {
        await unlink(fileOf(key));
      } catch (err) {
        if (!isMissing(err)) throw err;
      }
    },
    async *list() {
      let entries: string[];
      try {
        entries = await readdir(root, { recursive: true });
      } catch (err) {
        if (isMissing(err)) return;
        throw err;
      }
      for (const entry of entries) {
        const key = entry.split(path.sep).join("/");
        // Half-written files (put's ".part") and folders are not objects.
        if (key.endsWith(".part") || !(await stat(path.join(root, entry))).isFile()) continue;
        yield key;
      }
    },
  };
}
