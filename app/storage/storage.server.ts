import { createReadStream } from "node:fs";
import fs from "node:fs/promises";
import path from "node:path";
import { Readable } from "node:stream";
import { config } from "~/lib/config.server";
import { s3Store } from "./s3-store.server";
import { SAFE_KEY, StoreUnavailableError, checkKey, type FileStore } from "./store.server";

export { StoreUnavailableError, type FileStore } from "./store.server";

/** Files under `${DATA_DIR}/files/<key>` (FILE_STORE=local: one machine only). */
export function localDiskStore(root = path.join(config.dataDir, "files")): FileStore {
  const resolve = (key: string) => path.join(root, checkKey(key));
  return {
    describe: () => `the folder ${root}`,
    async check() {
      try {
        await fs.mkdir(root, { recursive: true });
        await fs.access(root, fs.constants.W_OK);
      } catch (err) {
        throw new StoreUnavailableError(`the folder ${root} cannot be written`, err);
      }
    },
    async put(key, bytes) {
      const file = resolve(key);
      await fs.mkdir(path.dirname(file), { recursive: true });
      // Write then rename, so a reader never sees half a file.
      const tmp = `${file}.${process.pid}.tmp`;
      await fs.writeFile(tmp, bytes);
      await fs.rename(tmp, file);
    },
    async get(key) {
      try {
        return new Uint8Array(await fs.readFile(resolve(key)));
      } catch (err) {
        if ((err as NodeJS.ErrnoException).code === "ENOENT") return null;
        throw err;
      }
    },
    async open(key) {
      const file = resolve(key);
      try {
        const { size } = await fs.stat(file);
        return { body: Readable.toWeb(createReadStream(file)) as ReadableStream<Uint8Array>, size };
      } catch (err) {
        if ((err as NodeJS.ErrnoException).code === "ENOENT") return null;
        throw err;
      }
    },
    async delete(key) {
      await fs.rm(resolve(key), { force: true });
    },
    async list() {
      let names: string[];
      try {
        names = await fs.readdir(root, { recursive: true });
      } catch (err) {
        if ((err as NodeJS.ErrnoException).code === "ENOENT") return [];
        throw err;
      }
      const out: { key: string; modifiedMs: number; size: number }[] = [];
      for (const name of names) {
        const key = name.split(path.sep).join("/");
        if (!SAFE_KEY.test(key) || key.includes("..")) continue;
        const stat = await fs.stat(path.join(root, name));
        if (stat.isFile()) out.push({ key, modifiedMs: stat.mtimeMs, size: stat.size });
      }
      return out;
    },
  };
}

let store: FileStore | undefined;

/** The configured store: S3 (FILE_STORE=s3, the default when S3_BUCKET is set) or the local disk. */
export function fileStore(): FileStore {
  store ??= config.fileStore === "s3" ? s3Store() : localDiskStore();
  return store;
}

/** Forgets the configured store (tests that change the environment). */
export function resetFileStore(): void {
  store = undefined;
}
