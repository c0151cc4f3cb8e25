import Database from "better-sqlite3";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import * as tar from "tar";
import { databasePath, uploadsFolder } from "./env";

/**
 * One dated archive of a running workshop: the database copied with SQLite's online backup API (a
 * consistent snapshot even while the app writes; https://sqlite.org/backup.html) and the uploads folder.
 * The archive holds `glowbench.db`, `uploads/…` and `manifest.json`.
 */

export interface BackupManifest {
  createdAt: string;
  database: string;
  uploads: string;
  /** Rows per table at the moment of the snapshot, so a restore can be checked. */
  rows: Record<string, number>;
}

function stamp(d = new Date()): string {
  return d.toISOString().replace(/[:]/g, "-").replace(/\..+$/, "Z");
}

export function tableCounts(db: Database.Database): Record<string, number> {
  const tables = db.prepare("select name from sqlite_master where type = 'table' and name not like 'sqlite_%' order by name").all() as { name: string }[];
  const rows: Record<string, number> = {};
  for (const { name } of tables) rows[name] = (db.prepare(`select count(*) as n from "${name.replace(/"/g, '""')}"`).get() as { n: number }).n;
  return rows;
}

export async function createBackup(opts: { dbFile?: string; outDir?: string; uploads?: string } = {}): Promise<string> {
  const dbFile = opts.dbFile ?? databasePath();
  if (!fs.existsSync(dbFile)) throw new Error(`No database at ${dbFile}`);
  const uploads = opts.uploads ?? uploadsFolder(dbFile);
  const outDir = path.resolve(opts.outDir ?? path.join(path.dirname(dbFile), "backups"));
  fs.mkdirSync(outDir, { recursive: true });
  const work = fs.mkdtempSync(path.join(os.tmpdir(), "glowbench-backup-"));
  try {
    const source = new Database(dbFile, { fileMustExist: true });
    source.pragma("busy_timeout = 5000");
    try {
      // After the first step, copy the rest in one step: a step holds a read lock, so a busy writer cannot
      // keep restarting the copy (SQLite restarts a stepped backup when another connection writes in between).
      await source.backup(path.join(work, "glowbench.db"), { progress: ({ totalPages }) => Math.max(totalPages, 100) });
    } finally {
      source.close();
    }
    const copy = new Database(path.join(work, "glowbench.db"), { readonly: true });
    const check = copy.pragma("integrity_check", { simple: true });
    const rows = tableCounts(copy);
    copy.close();
    if (check !== "ok") throw new Error(`The snapshot failed SQLite's integrity check: ${String(check)}`);
    if (fs.existsSync(uploads)) fs.cpSync(uploads, path.join(work, "uploads"), { recursive: true });
    else fs.mkdirSync(path.join(work, "uploads"));
    const manifest: BackupManifest = { createdAt: new Date().toISOString(), database: dbFile, uploads, rows };
    fs.writeFileSync(path.join(work, "manifest.json"), JSON.stringify(manifest, null, 2));
    const archive = path.join(outDir, `glowbench-${stamp()}.tar.gz`);
    await tar.create({ gzip: true, file: archive, cwd: work, portable: true }, ["manifest.json", "glowbench.db", "uploads"]);
    return archive;
  } finally {
    fs.rmSync(work, { recursive: true, force: true });
  }
}
