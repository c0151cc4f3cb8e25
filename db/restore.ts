import Database from "better-sqlite3";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import * as tar from "tar";
import { tableCounts, type BackupManifest } from "./backup";
import { databasePath, uploadsFolder } from "./env";

/**
 * Puts an archive of db/backup.ts back: checks the snapshot (integrity and the row counts its manifest
 * recorded) before touching anything, then moves the current database and uploads aside (never deletes
 * them) and puts the archive's copies in their place. Stop the app first.
 */
export async function restoreBackup(
  archive: string,
  opts: { dbFile?: string; uploads?: string } = {},
): Promise<{ dbFile: string; rows: Record<string, number>; setAside: string[] }> {
  const dbFile = path.resolve(opts.dbFile ?? databasePath());
  const uploads = opts.uploads ?? uploadsFolder(dbFile);
  if (!fs.existsSync(archive)) throw new Error(`No archive at ${archive}`);
  const work = fs.mkdtempSync(path.join(os.tmpdir(), "glowbench-restore-"));
  try {
    await tar.extract({ file: archive, cwd: work, strict: true });
    const manifest = JSON.parse(fs.readFileSync(path.join(work, "manifest.json"), "utf8")) as BackupManifest;
    const snapshot = path.join(work, "glowbench.db");
    const db = new Database(snapshot, { readonly: true, fileMustExist: true });
    const check = db.pragma("integrity_check", { simple: true });
    const rows = tableCounts(db);
    db.close();
    if (check !== "ok") throw new Error(`The archive's database failed SQLite's integrity check: ${String(check)}`);
    for (const [table, n] of Object.entries(manifest.rows)) {
      if (rows[table] !== n) throw new Error(`The archive's ${table} table has ${rows[table]} rows; its manifest says ${n}.`);
    }
    const suffix = `.before-restore-${new Date().toISOString().replace(/[:.]/g, "-")}`;
    const setAside: string[] = [];
    fs.mkdirSync(path.dirname(dbFile), { recursive: true });
    for (const f of [dbFile, `${dbFile}-wal`, `${dbFile}-shm`, uploads]) {
      if (fs.existsSync(f)) {
        fs.renameSync(f, f + suffix);
        setAside.push(f + suffix);
      }
    }
    fs.copyFileSync(snapshot, dbFile);
    fs.cpSync(path.join(work, "uploads"), uploads, { recursive: true });
    return { dbFile, rows, setAside };
  } finally {
    fs.rmSync(work, { recursive: true, force: true });
  }
}
