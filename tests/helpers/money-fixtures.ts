import { mailTo } from "./mail";
import Database from "better-sqlite3";
import path from "node:path";
import { inject } from "vitest";
import { Client } from "./http";

/**
 * Arranging rows for the estimate, invoice and payment tests. Acts and assertions go through the real
 * server; only the arrangement (a job in a given state, a workshop's rates) is written straight into the
 * test database the server uses, so these tests do not depend on other areas' editing screens.
 */

let db: Database.Database | undefined;
export function testDb(): Database.Database {
  db ??= new Database(path.join(inject("dataDir"), "glowbench.db"));
  db.pragma("busy_timeout = 5000");
  return db;
}

let counter = 0;
const unique = () => `${Date.now().toString(36)}${(counter++).toString(36)}${Math.random().toString(36).slice(2, 6)}`;

/** A fresh workshop of our own through sign-up, charging £45.00/h with 20% tax. */
export async function ownWorkshop(label: string) {
  const owner = new Client({ "x-forwarded-for": `198.18.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}` });
  const email = `${label}-${unique()}@money.test`;
  const res = await owner.post("/api/auth/sign-up", { workshopName: `${label} Valve Bench`, name: `${label} Owner`, email, password: "a sturdy passphrase" });
  if (res.status !== 201) throw new Error(`sign-up failed: ${res.status} ${await res.text()}`);
  const { workshop } = await res.json();
  testDb().prepare("UPDATE workshops SET currency = 'GBP', hourly_rate_minor = 4500, tax_rate_bp = 2000 WHERE id = ?").run(workshop.id);
  return { owner, workshopId: workshop.id as number, email };
}

export function workshopIdByName(name: string): number {
  return (testDb().prepare("SELECT id FROM workshops WHERE name = ?").get(name) as { id: number }).id;
}

export interface JobFixture {
  status?: string;
  customerEmail?: string | null;
  parts?: { designator: string; unitCostMinor: number | null }[];
}

/** A job with a customer and parts, in the given state. Returns the job and part ids. */
export function createJob(workshopId: number, fixture: JobFixture = {}) {
  const d = testDb();
  const job = d
    .prepare(
      "INSERT INTO jobs (workshop_id, title, equipment_kind, customer_name, customer_email, status) VALUES (?, ?, 'table-radio', 'Iona Testwell', ?, ?) RETURNING id",
    )
    .get(
      workshopId,
      `Test set ${unique()}`,
      fixture.customerEmail === undefined ? `iona-${unique()}@example.com` : fixture.customerEmail,
      fixture.status ?? "inspecting",
    ) as { id: number };
  const partIds = (fixture.parts ?? []).map(
    (p) =>
      (
        d
          .prepare(
            "INSERT INTO parts (job_id, workshop_id, designator, kind, replacement_value, replacement_rating, unit_cost_minor) VALUES (?, ?, ?, 'paper', '0.047 µF', '630 V', ?) RETURNING id",
          )
          .get(job.id, workshopId, p.designator, p.unitCostMinor) as { id: number }
      ).id,
  );
  return { jobId: job.id, partIds };
}

export function setJobStatus(jobId: number, status: string) {
  testDb().prepare("UPDATE jobs SET status = ? WHERE id = ?").run(status, jobId);
}

export function logTexts(jobId: number, kind: string): string[] {
  return (testDb().prepare("SELECT text FROM log_entries WHERE job_id = ? AND kind = ? ORDER BY id").all(jobId, kind) as { text: string }[]).map((r) => r.text);
}

/** The text of the newest e-mail to an address (optionally with a matching subject) the SMTP sink received, waiting briefly for it. */
export async function latestMailText(to: string, subject?: RegExp): Promise<string> {
  for (let i = 0; i < 100; i++) {
    const found = mailTo(to)
      .filter((m) => !subject || subject.test(m.subject))
      .at(-1);
    if (found) return found.text;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`No e-mail to ${to}`);
}

/** The approval link in the newest estimate e-mail to a customer. */
export async function approvalLinkFor(to: string): Promise<string> {
  const text = await latestMailText(to, /estimate/i);
  const link = /https?:\/\/\S+\/estimate\/[\w-]+/.exec(text)?.[0];
  if (!link) throw new Error(`No approval link in the e-mail to ${to}`);
  return link;
}

/**
 * A member of our own with the given role in a workshop, signed in. The demo accounts are shared with the
 * sign-in throttling tests, so role checks here use people of their own.
 */
export async function ownMember(workshopId: number, role: "owner" | "technician" | "apprentice") {
  const { hashPassword } = await import("@/lib/auth/password");
  const email = `${role}-${unique()}@money.test`;
  const d = testDb();
  const user = d
    .prepare("INSERT INTO users (email, name, password_hash) VALUES (?, ?, ?) RETURNING id")
    .get(email, `Test ${role}`, await hashPassword("a sturdy passphrase")) as { id: number };
  d.prepare("INSERT INTO memberships (workshop_id, user_id, role) VALUES (?, ?, ?)").run(workshopId, user.id, role);
  const client = new Client({ "x-forwarded-for": `198.19.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}` });
  const res = await client.post("/api/auth/sign-in", { email, password: "a sturdy passphrase" });
  if (res.status !== 200) throw new Error(`sign-in as ${email} failed: ${res.status}`);
  return { client, email };
}
