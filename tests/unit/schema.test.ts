import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { eq } from "drizzle-orm";
import { afterAll, describe, expect, test } from "vitest";
import { openDatabase } from "@/db/client";
import { jobs, memberships, users, workshops } from "@/db/schema";
import { DEMO_USERS, seedDemo } from "@/db/seed";

const dir = fs.mkdtempSync(path.join(os.tmpdir(), "glowbench-schema-"));
const { db, sqlite } = openDatabase(path.join(dir, "t.db"));
afterAll(() => sqlite.close());

describe("database", () => {
  test("migrations create every table of docs/PRODUCT.md's data section", () => {
    const names = sqlite
      .prepare("select name from sqlite_master where type='table'")
      .all()
      .map((r) => (r as { name: string }).name);
    for (const t of ["workshops", "users", "memberships", "invitations", "jobs", "parts", "readings", "calculations", "files", "log_entries"]) {
      expect(names).toContain(t);
    }
  });

  test("opens with WAL, foreign keys on and a busy timeout", () => {
    expect(sqlite.pragma("journal_mode", { simple: true })).toBe("wal");
    expect(sqlite.pragma("foreign_keys", { simple: true })).toBe(1);
    expect(Number(sqlite.pragma("busy_timeout", { simple: true }))).toBeGreaterThan(0);
  });

  test("foreign keys are enforced: a job needs a real workshop", () => {
    expect(() => db.insert(jobs).values({ workshopId: 9999, title: "x", equipmentKind: "other" }).run()).toThrow(/FOREIGN KEY/);
  });

  test("seeding twice does not duplicate the demo scenario", async () => {
    expect((await seedDemo(db)).created).toBe(true);
    const count = () => ({
      users: db.select().from(users).all().length,
      workshops: db.select().from(workshops).all().length,
      jobs: db.select().from(jobs).all().length,
    });
    const first = count();
    expect((await seedDemo(db)).created).toBe(false);
    expect(count()).toEqual(first);
    expect(first.workshops).toBe(2);
  });

  test("demo users have the roles docs/PRODUCT.md lists", () => {
    const role = (email: string) =>
      db.select({ role: memberships.role }).from(memberships).innerJoin(users, eq(users.id, memberships.userId)).where(eq(users.email, email)).get()?.role;
    expect(role(DEMO_USERS.owner.email)).toBe("owner");
    expect(role(DEMO_USERS.technician.email)).toBe("technician");
    expect(role(DEMO_USERS.apprentice.email)).toBe("apprentice");
    expect(role(DEMO_USERS.other.email)).toBe("owner");
  });
});
