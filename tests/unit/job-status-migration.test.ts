import Database from "better-sqlite3";
import { drizzle } from "drizzle-orm/better-sqlite3";
import { migrate } from "drizzle-orm/better-sqlite3/migrator";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { MIGRATIONS_FOLDER } from "@/db/client";
import { JOB_STATUSES } from "@/lib/vocabulary";

/**
 * Migration 0006 renames the opening, waiting and collection job statuses. A database made by the
 * migrations before it, holding jobs in the old values (with parts and a Log, which a rebuilt `jobs` table
 * would have cascade-deleted), is migrated through 0006 and checked value by value.
 */

const RENAME = "0006_invoice-link-and-states";
const dir = fs.mkdtempSync(path.join(os.tmpdir(), "glowbench-status-migration-"));
let sqlite: Database.Database;

/**
 * The migrations folder cut at a migration: the same SQL files, the journal ending before it (or with it).
 * Later migrations are left out so this test checks 0006 alone.
 */
function migrationsUpTo(tag: string, including: boolean): string {
  const folder = path.join(dir, `${including ? "with" : "before"}-${tag}`);
  fs.cpSync(MIGRATIONS_FOLDER, folder, { recursive: true });
  const journalPath = path.join(folder, "meta", "_journal.json");
  const journal = JSON.parse(fs.readFileSync(journalPath, "utf8")) as { entries: { tag: string }[] };
  const at = journal.entries.findIndex((e) => e.tag === tag);
  expect(at).toBeGreaterThan(0);
  journal.entries = journal.entries.slice(0, including ? at + 1 : at);
  fs.writeFileSync(journalPath, JSON.stringify(journal));
  return folder;
}

const OLD = ["booked-in", "inspecting", "awaiting-go-ahead", "recapping", "slow-start", "fault-finding", "aligning", "ready", "returned"];
const EXPECTED: Record<string, string> = {
  "booked-in": "on-the-rack",
  "awaiting-go-ahead": "customer-weighing-up",
  ready: "at-the-counter",
};

beforeAll(() => {
  sqlite = new Database(path.join(dir, "t.db"));
  sqlite.pragma("foreign_keys = ON"); // as db/client.ts opens it
  migrate(drizzle(sqlite), { migrationsFolder: migrationsUpTo(RENAME, false) });
  const w = sqlite.prepare("INSERT INTO workshops (name) VALUES ('Old Values Bench') RETURNING id").get() as { id: number };
  const insertJob = sqlite.prepare("INSERT INTO jobs (workshop_id, title, equipment_kind, status) VALUES (?, ?, 'table-radio', ?) RETURNING id");
  for (const status of OLD) {
    const job = insertJob.get(w.id, `Set at ${status}`, status) as { id: number };
    sqlite.prepare("INSERT INTO parts (job_id, workshop_id, designator, kind) VALUES (?, ?, 'C1', 'paper')").run(job.id, w.id);
    sqlite
      .prepare("INSERT INTO log_entries (job_id, workshop_id, kind, text, data) VALUES (?, ?, 'status', ?, ?)")
      .run(job.id, w.id, `Status: old → ${status}.`, JSON.stringify({ from: "booked-in", to: status }));
  }
  // A job made without a status took the old default.
  sqlite.prepare("INSERT INTO jobs (workshop_id, title, equipment_kind) VALUES (?, 'Defaulted set', 'tuner')").run(w.id);
  migrate(drizzle(sqlite), { migrationsFolder: migrationsUpTo(RENAME, true) });
});
afterAll(() => {
  sqlite?.close();
  fs.rmSync(dir, { recursive: true, force: true });
});

describe("migration 0006: job statuses", () => {
  test("each old value becomes its new one; the trade steps in the middle keep theirs", () => {
    const rows = sqlite.prepare("SELECT title, status FROM jobs WHERE title LIKE 'Set at %'").all() as { title: string; status: string }[];
    expect(rows).toHaveLength(OLD.length);
    for (const { title, status } of rows) {
      const old = title.slice("Set at ".length);
      expect(status).toBe(EXPECTED[old] ?? old);
      expect(JOB_STATUSES).toContain(status);
    }
    expect((sqlite.prepare("SELECT status FROM jobs WHERE title = 'Defaulted set'").get() as { status: string }).status).toBe("on-the-rack");
  });

  test("no job is left in a value the vocabulary does not know", () => {
    const all = (sqlite.prepare("SELECT DISTINCT status FROM jobs").all() as { status: string }[]).map((r) => r.status);
    for (const s of all) expect(JOB_STATUSES).toContain(s);
  });

  test("the jobs' parts and Log survive (no table rebuild cascaded into them)", () => {
    const jobs = (sqlite.prepare("SELECT count(*) AS n FROM jobs").get() as { n: number }).n;
    expect((sqlite.prepare("SELECT count(*) AS n FROM parts").get() as { n: number }).n).toBe(OLD.length);
    expect((sqlite.prepare("SELECT count(*) AS n FROM log_entries").get() as { n: number }).n).toBe(OLD.length);
    expect(jobs).toBe(OLD.length + 1);
    expect(sqlite.pragma("foreign_key_check")).toEqual([]);
  });

  test("status Log entries keep their words and carry the new values", () => {
    const rows = sqlite.prepare("SELECT text, data FROM log_entries ORDER BY id").all() as { text: string; data: string }[];
    for (const row of rows) {
      const data = JSON.parse(row.data) as { from: string; to: string };
      const old = /→ (.+)\.$/.exec(row.text)![1];
      expect(data).toEqual({ from: "on-the-rack", to: EXPECTED[old] ?? old });
    }
  });

  test("a new job without a status starts on the rack, and the status index is back", () => {
    const w = sqlite.prepare("SELECT id FROM workshops LIMIT 1").get() as { id: number };
    sqlite.prepare("INSERT INTO jobs (workshop_id, title, equipment_kind) VALUES (?, 'New arrival', 'amplifier')").run(w.id);
    expect((sqlite.prepare("SELECT status FROM jobs WHERE title = 'New arrival'").get() as { status: string }).status).toBe("on-the-rack");
    const indexes = (sqlite.prepare("SELECT name FROM sqlite_master WHERE type = 'index' AND tbl_name = 'jobs'").all() as { name: string }[]).map(
      (r) => r.name,
    );
    expect(indexes).toEqual(expect.arrayContaining(["jobs_workshop_status_updated", "jobs_workshop_updated", "jobs_workshop_kind"]));
    const columns = (sqlite.prepare("SELECT name FROM pragma_table_info('jobs')").all() as { name: string }[]).map((r) => r.name);
    expect(columns).toContain("status");
    expect(columns).not.toContain("status_renamed");
  });
});
