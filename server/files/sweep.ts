import "server-only";
import fs from "node:fs/promises";
import path from "node:path";
import { knownStoredNames } from "@/db/queries/files";
import { processSingleton } from "@/lib/singleton";
import { thumbnailName, uploadsDir } from "./uploads";

/**
 * An upload is written to disk before its row is inserted (server/files/uploads.ts, then
 * createFileRecord). If the process dies between the two, or the insert fails and the clean-up fails too,
 * the bytes stay behind with nothing pointing at them. This removes such files once they are older than
 * `graceMs` (an upload in progress is never that old), at start and every hour.
 */

const STORED = /^[0-9a-f]{32}\.(?:jpg|png|webp|pdf)$/;
const HOUR = 60 * 60 * 1000;

export async function sweepOrphanUploads(options: { now?: number; graceMs?: number; dir?: string } = {}): Promise<string[]> {
  const now = options.now ?? Date.now();
  const graceMs = options.graceMs ?? HOUR;
  const dir = options.dir ?? uploadsDir();
  let names: string[];
  try {
    names = await fs.readdir(/*turbopackIgnore: true*/ dir);
  } catch {
    return []; // no uploads yet
  }
  const old: string[] = [];
  for (const name of names) {
    const stored = name.endsWith(".thumb.webp") ? name.slice(0, -".thumb.webp".length) : name;
    if (!STORED.test(stored)) continue; // not ours: never touched
    const stat = await fs.stat(path.join(/*turbopackIgnore: true*/ dir, name)).catch(() => null);
    if (stat && now - stat.mtimeMs >= graceMs && !old.includes(stored)) old.push(stored);
  }
  const known = knownStoredNames(old);
  const orphans = old.filter((n) => !known.has(n));
  for (const n of orphans) {
    await fs.rm(path.join(/*turbopackIgnore: true*/ dir, n), { force: true });
    await fs.rm(path.join(/*turbopackIgnore: true*/ dir, thumbnailName(n)), { force: true });
  }
  if (orphans.length) console.log(`Removed ${orphans.length} upload(s) whose record was never saved.`);
  return orphans;
}

/** Once now (in the background, so it never delays a request) and then hourly, for the life of the process. */
export function startUploadSweeps(): void {
  processSingleton("UploadSweep", () => {
    const run = () => void sweepOrphanUploads().catch((err) => console.error("Upload sweep failed", err));
    run();
    return setInterval(run, HOUR).unref();
  });
}
