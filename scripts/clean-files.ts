/**
 * `npm run files:clean [-- --dry-run] [--min-age-hours N]`: removes uploaded files that no saved
 * version of any layout uses, and files on disk with no record, when older than N hours (default
 * 24: a photo is uploaded a little before the layout using it is saved). Works on the configured
 * database and data folder (DATABASE_URL, DATA_DIR). Prints every file it removes and the total.
 */
import { closeDb } from "~/db/client.server";
import { config } from "~/lib/config.server";
import { cleanUpFiles, CLEAN_UP_GRACE_MS } from "~/storage/clean-up.server";

const USAGE = "Usage: npm run files:clean [-- --dry-run] [--min-age-hours N (0 to 8760, default 24)]";

function parse(argv: string[]): { dryRun: boolean; graceMs: number } {
  const out = { dryRun: false, graceMs: CLEAN_UP_GRACE_MS };
  for (let i = 0; i < argv.length; i++) {
    if (argv[i] === "--dry-run") out.dryRun = true;
    else if (argv[i] === "--min-age-hours") {
      const hours = Number(argv[++i]);
      if (!(hours >= 0 && hours <= 8760)) {
        console.error(`--min-age-hours: must be a number from 0 to 8760 (got "${argv[i] ?? ""}"). ${USAGE}`);
        process.exit(2);
      }
      out.graceMs = hours * 60 * 60 * 1000;
    } else {
      console.error(`${argv[i]}: unknown option. ${USAGE}`);
      process.exit(2);
    }
  }
  return out;
}

const options = parse(process.argv.slice(2));
try {
  const report = await cleanUpFiles(options);
  const verb = report.dryRun ? "would remove" : "removed";
  for (const f of report.unused)
    console.log(
      `${verb} ${f.storageKey} (${(f.size / 1024).toFixed(0)} kB, club ${f.clubId}): no layout version uses it`,
    );
  for (const key of report.stray) console.log(`${verb} ${key}: on disk with no record`);
  console.log(
    `${config.dataDir}: ${verb} ${report.unused.length} unused file(s), ${(report.bytes / (1024 * 1024)).toFixed(1)} MB, and ${report.stray.length} stray file(s); kept everything younger than ${options.graceMs / 3_600_000} h.`,
  );
} catch (error) {
  console.error(`Clean-up failed: ${(error as Error).message}`);
  process.exitCode = 1;
} finally {
  closeDb();
}
