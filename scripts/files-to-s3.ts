/**
 * `npm run files:to-s3 [-- FOLDER]`: copies the files of the local-disk store (FOLDER, by default
 * DATA_DIR/files) into the S3 bucket configured by S3_BUCKET, S3_ENDPOINT, S3_REGION and the
 * credentials (README), under the same keys, and checks every file by size and SHA-256 read back
 * from the bucket. Files already there and equal are left alone: running it twice changes nothing.
 * Prints one line per file and a total; exits 1 when any file failed its check.
 */
import fs from "node:fs";
import path from "node:path";
import { config } from "~/lib/config.server";
import { copyFolderToStore } from "~/storage/copy-to-store.server";
import { s3Store } from "~/storage/s3-store.server";

const USAGE = "Usage: npm run files:to-s3 [-- FOLDER (default DATA_DIR/files)]";
const args = process.argv.slice(2);
if (args.length > 1 || args.some((a) => a.startsWith("-"))) {
  console.error(args.includes("--help") ? USAGE : `Unexpected arguments: ${args.join(" ")}. ${USAGE}`);
  process.exit(args.includes("--help") ? 0 : 2);
}
const folder = path.resolve(args[0] ?? path.join(config.dataDir, "files"));
if (!fs.existsSync(folder) || !fs.statSync(folder).isDirectory()) {
  console.error(`${folder}: no such folder. ${USAGE}`);
  process.exit(2);
}
try {
  const store = s3Store();
  await store.check();
  const results = await copyFolderToStore(folder, store);
  for (const r of results)
    console.log(
      `${r.outcome.padEnd(9)} ${r.key} (${r.size} bytes, sha256 ${r.sha256.slice(0, 12)}…)${r.reason ? `: ${r.reason}` : ""}`,
    );
  const count = (o: string) => results.filter((r) => r.outcome === o).length;
  console.log(
    `${folder} -> ${store.describe()}: ${count("copied")} copied, ${count("unchanged")} already there and equal, ${count("failed")} failed.`,
  );
  if (count("failed")) process.exitCode = 1;
} catch (error) {
  console.error(`Copy failed: ${(error as Error).message}`);
  process.exitCode = 1;
}
