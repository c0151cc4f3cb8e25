import Database from "better-sqlite3";
import { drizzle } from "drizzle-orm/better-sqlite3";
import { migrate } from "drizzle-orm/better-sqlite3/migrator";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { MIGRATIONS_FOLDER } from "@/db/client";

/**
 * Migration 0007 numbers every workshop's jobs in the order they were booked in, continues each workshop's
 * counter from there, and turns the jobs' own customer name and e-mail into customer records, one per
 * e-mail address (else per name) in a workshop. A database made by the migrations before it is filled,
 * migrated through 0007, and checked row by row.
 */

const TAG = "0007_customers-and-ordering";
const dir = fs.mkdtempSync(path.join(os.tmpdir(), "glowbench-customers-migration-"));
let sqlite: Database.Database;

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

beforeAll(() => {
  sqlite = new Database(path.join(dir, "t.db"));
  sqlite.pragma("foreign_keys = ON");
  migrate(drizzle(sqlite), { migrationsFolder: migrationsUpTo(TAG, false) });
  sqlite.prepare("insert into workshops (id, name) values (1, 'North'), (2, 'South')").run();
  const job = sqlite.prepare(
    "insert into jobs (workshop_id, title, equipment_kind, customer_name, customer_email, created_at) values (?, ?, 'other', ?, ?, ?)",
  );
  // Inserted out of date order on purpose: numbers follow created_at, not the id.
  job.run(1, "n-third", "Edith Marlow", "Edith@Example.com", 3000);
  job.run(1, "n-first", "Edith M.", " edith@example.com ", 1000);
  job.run(1, "n-second", "edith marlow", null, 2000);
  job.run(1, "n-fourth", "Bert Ives", null, 4000);
  job.run(1, "n-fifth", "bert ives ", "", 5000);
  job.run(1, "n-sixth", null, null, 6000);
  job.run(2, "s-first", "Edith Marlow", "edith@example.com", 500);
  migrate(drizzle(sqlite), { migrationsFolder: migrationsUpTo(TAG, true) });
});
afterAll(() => {
  sqlite.close();
  fs.rmSync(dir, { recursive: true, force: true });
});

const jobsByTitle = () =>
  Object.fromEntries(
    (
      sqlite.prepare("select title, number, customer_id, customer_name, customer_email from jobs").all() as {
        title: string;
        number: number;
        customer_id: number | null;
        customer_name: string | null;
        customer_email: string | null;
      }[]
    ).map((j) => [j.title, j]),
  );

describe("migration 0007", () => {
  test("numbers each workshop's jobs from 1 in booking order, and the counters continue from there", () => {
    const j = jobsByTitle();
    expect(["n-first", "n-second", "n-third", "n-fourth", "n-fifth", "n-sixth"].map((t) => j[t].number)).toEqual([1, 2, 3, 4, 5, 6]);
    expect(j["s-first"].number).toBe(1);
    expect(sqlite.prepare("select id, last_job_number from workshops order by id").all()).toEqual([
      { id: 1, last_job_number: 6 },
      { id: 2, last_job_number: 1 },
    ]);
  });

  test("one customer per e-mail (any case or spacing), then per name; each workshop its own", () => {
    const rows = sqlite.prepare("select workshop_id, name, email from customers order by workshop_id, id").all();
    expect(rows).toEqual([
      { workshop_id: 1, name: "Edith Marlow", email: "edith@example.com" }, // named as on the latest job with that address
      { workshop_id: 1, name: "bert ives", email: null },
      { workshop_id: 2, name: "Edith Marlow", email: "edith@example.com" },
    ]);
  });

  test("jobs point at their customer and carry its name and e-mail; a job with neither has none", () => {
    const j = jobsByTitle();
    const edith = j["n-first"].customer_id;
    expect([j["n-second"].customer_id, j["n-third"].customer_id]).toEqual([edith, edith]); // "edith marlow" with no e-mail joins her by name
    expect(j["n-second"]).toMatchObject({ customer_name: "Edith Marlow", customer_email: "edith@example.com" });
    expect(j["n-fourth"].customer_id).toBe(j["n-fifth"].customer_id);
    expect(j["n-sixth"]).toMatchObject({ customer_id: null, customer_name: null });
    expect(j["s-first"].customer_id).not.toBe(edith);
  });

  test("a job inserted without a number takes its workshop's next one", () => {
    sqlite.prepare("insert into jobs (workshop_id, title, equipment_kind) values (2, 's-second', 'other')").run();
    sqlite.prepare("insert into jobs (workshop_id, title, equipment_kind) values (1, 'n-seventh', 'other')").run();
    expect(jobsByTitle()["s-second"].number).toBe(2);
    expect(jobsByTitle()["n-seventh"].number).toBe(7);
    expect(() => sqlite.prepare("insert into jobs (workshop_id, title, equipment_kind, number) values (1, 'clash', 'other', 3)").run()).toThrow(/UNIQUE/);
  });
});
