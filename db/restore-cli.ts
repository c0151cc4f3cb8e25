import { restoreBackup } from "./restore";

/** `npm run restore -- <archive>`: stop the app first; the current database and uploads are kept beside, renamed. */
const archive = process.argv[2];
if (!archive) {
  console.error("Usage: npm run restore -- <path to glowbench-….tar.gz>");
  process.exit(2);
}
restoreBackup(archive)
  .then(({ dbFile, rows, setAside }) => {
    console.log(
      `Restored ${dbFile}: ${Object.entries(rows)
        .map(([t, n]) => `${t} ${n}`)
        .join(", ")}`,
    );
    for (const f of setAside) console.log(`Kept the previous copy as ${f}`);
  })
  .catch((err: unknown) => {
    console.error(err instanceof Error ? err.message : err);
    process.exit(1);
  });
