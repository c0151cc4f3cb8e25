import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll } from "vitest";
import type { Member } from "@/lib/auth/can";

/**
 * A fresh database file for one test file that calls the query functions. They use the process's one
 * client (getDb), so this points GLOWBENCH_DB (and, when asked, GLOWBENCH_UPLOADS) into a new temporary
 * folder and forgets any client already made; the client migrates the file when it first opens it.
 * Await it at the top of the test file, before importing anything that opens the database. The folder
 * is removed after the file's tests.
 */
export async function tempDatabase(name: string, options: { uploads?: boolean } = {}) {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), `glowbench-${name}-`));
  process.env.GLOWBENCH_DB = path.join(dir, "t.db");
  if (options.uploads) process.env.GLOWBENCH_UPLOADS = path.join(dir, "uploads");
  delete (globalThis as { __glowbenchDb?: unknown }).__glowbenchDb;
  afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));
  const { getDb } = await import("@/db/client");
  return { dir, getDb };
}

/** The four people of the demo scenario (db/seed.ts), signed in as the query functions see them. */
export interface DemoMembers {
  owner: Member;
  tech: Member;
  apprentice: Member;
  other: Member;
}

/**
 * tempDatabase for tests on the demo scenario: `seed()` (in a beforeAll) loads it and returns its
 * members; `member(email)` loads anyone else's.
 */
export async function demoDatabase(name: string) {
  const { dir, getDb } = await tempDatabase(name);
  const { seedDemo, DEMO_USERS } = await import("@/db/seed");
  const { loadMember } = await import("@/db/queries/auth");
  const { users } = await import("@/db/schema");
  const { eq } = await import("drizzle-orm");
  const member = (email: string): Member => loadMember(getDb().select({ id: users.id }).from(users).where(eq(users.email, email)).get()!.id)!;
  async function seed(): Promise<DemoMembers> {
    await seedDemo(getDb());
    return {
      owner: member(DEMO_USERS.owner.email),
      tech: member(DEMO_USERS.technician.email),
      apprentice: member(DEMO_USERS.apprentice.email),
      other: member(DEMO_USERS.other.email),
    };
  }
  return { dir, getDb, DEMO_USERS, member, seed };
}
