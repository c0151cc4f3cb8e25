import { createBackup } from "./backup";

/** `npm run backup [-- --out <folder>]`: one dated archive of the database and the uploads. */
const i = process.argv.indexOf("--out");
createBackup({ outDir: i > 0 ? process.argv[i + 1] : undefined })
  .then((archive) => console.log(`Backup written to ${archive}`))
  .catch((err: unknown) => {
    console.error(err instanceof Error ? err.message : err);
    process.exit(1);
  });
