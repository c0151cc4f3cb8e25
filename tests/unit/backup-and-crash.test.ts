import Database from "better-sqlite3";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { createBackup } from "@/db/backup";
import { openDatabase } from "@/db/client";
import { restoreBackup } from "@/db/restore";
import { startWriter } from "../helpers/writer-process";

const tmp = fs.mkdtempSync(path.join(os.tmpdir(), "glowbench-backup-test-"));
afterAll(() => fs.rmSync(tmp, { recursive: true, force: true }));

/** Writer row numbers present in a database, sorted. */
function writerRows(file: string): number[] {
  const db = new Database(file, { readonly: true });
  expect(db.pragma("integrity_check", { simple: true })).toBe("ok");
  const rows = db.prepare("select name from workshops where name like 'writer-%'").all() as { name: string }[];
  db.close();
  return rows.map((r) => Number(r.name.slice(7))).sort((a, b) => a - b);
}

function fresh(name: string): string {
  const file = path.join(tmp, name, "glowbench.db");
  openDatabase(file).sqlite.close(); // migrate before the writer starts
  return file;
}

describe("crash: writers killed with SIGKILL lose no acknowledged row", () => {
  it("keeps every acknowledged write across three kill -9 and restarts", async () => {
    const file = fresh("crash");
    let expected = 0;
    for (let round = 0; round < 3; round++) {
      const w = startWriter(file);
      await w.waitFor(300 + round * 200);
      w.child.kill("SIGKILL");
      await new Promise((r) => w.child.once("exit", r));
      const rows = writerRows(file);
      // Each round's writer numbers from 0 again; rows of all rounds accumulate.
      expected += w.acked() + 1;
      expect(rows.length).toBeGreaterThanOrEqual(expected);
      expected = rows.length; // a write committed but killed before it was printed also counts from here on
    }
  }, 120_000);
});

describe("npm run backup while writers run, then npm run restore", () => {
  it("restores an intact database holding every row acknowledged before the backup began, as one consistent snapshot", async () => {
    const file = fresh("live");
    const uploads = path.join(tmp, "live", "uploads");
    fs.mkdirSync(uploads, { recursive: true });
    fs.writeFileSync(path.join(uploads, "schematic.pdf"), "%PDF-1.4 test");
    const w = startWriter(file);
    await w.waitFor(500);
    const ackedBefore = w.acked();
    const archive = await createBackup({ dbFile: file, outDir: path.join(tmp, "archives"), uploads });
    await w.waitFor(ackedBefore + 100); // writers kept going during and after the backup
    w.child.kill("SIGKILL");
    await new Promise((r) => w.child.once("exit", r));

    const target = path.join(tmp, "restored", "glowbench.db");
    const restoredUploads = path.join(tmp, "restored", "uploads");
    const { rows } = await restoreBackup(archive, { dbFile: target, uploads: restoredUploads });
    const present = writerRows(target);
    expect(present.length).toBeGreaterThan(ackedBefore); // 0…ackedBefore at least
    // A snapshot has no holes: rows 0…n-1, nothing missing in between.
    expect(present.every((n, i) => n === i)).toBe(true);
    expect(rows.workshops).toBe(present.length);
    expect(fs.readFileSync(path.join(restoredUploads, "schematic.pdf"), "utf8")).toBe("%PDF-1.4 test");
    // The restored file opens and migrates like any other.
    openDatabase(target).sqlite.close();
  }, 120_000);

  it("refuses an archive whose database does not match its manifest, touching nothing", async () => {
    await expect(restoreBackup(path.join(tmp, "missing.tar.gz"), { dbFile: path.join(tmp, "x", "g.db") })).rejects.toThrow(/No archive/);
    expect(fs.existsSync(path.join(tmp, "x", "g.db"))).toBe(false);
  });
});
