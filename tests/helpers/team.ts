import path from "node:path";
import Database from "better-sqlite3";
import { inject } from "vitest";
import { hashPassword } from "@/lib/auth/password";
import { Client } from "./http";

/**
 * A workshop of our own for tests that mutate: its owner signs up through the API; a technician
 * and an apprentice are added to it straight in the test database (the same rows an accepted
 * invitation writes), then sign in through the API like anyone else. A second sign-up is the
 * outsider from another workshop. Nothing here touches the shared demo accounts.
 */

export interface Team {
  owner: Client;
  technician: Client;
  apprentice: Client;
  outsider: Client;
  workshopId: number;
}

const PASSWORD = "team test passphrase";
let counter = 0;

async function signUp(label: string): Promise<{ client: Client; workshopId: number }> {
  const client = new Client({ "x-forwarded-for": `198.18.${(process.pid % 250) + 1}.${(counter++ % 250) + 1}` });
  const email = `${label}-${process.pid}-${Date.now()}-${counter}@example.test`;
  const res = await client.post("/api/auth/sign-up", { workshopName: `Test bench ${label}`, name: `Owner ${label}`, email, password: PASSWORD });
  if (res.status !== 201) throw new Error(`sign-up failed: ${res.status} ${await res.text()}`);
  return { client, workshopId: (await res.json()).workshop.id };
}

async function addMember(workshopId: number, role: "technician" | "apprentice", label: string): Promise<Client> {
  const email = `${label}-${role}-${process.pid}-${Date.now()}-${counter++}@example.test`;
  const db = new Database(path.join(inject("dataDir"), "glowbench.db"));
  db.pragma("busy_timeout = 5000");
  try {
    const hash = await hashPassword(PASSWORD);
    const user = db.prepare("insert into users (email, name, password_hash) values (?, ?, ?) returning id").get(email, `${role} ${label}`, hash) as {
      id: number;
    };
    db.prepare("insert into memberships (workshop_id, user_id, role) values (?, ?, ?)").run(workshopId, user.id, role);
  } finally {
    db.close();
  }
  const client = new Client({ "x-forwarded-for": `198.19.${(process.pid % 250) + 1}.${(counter++ % 250) + 1}` });
  const res = await client.post("/api/auth/sign-in", { email, password: PASSWORD });
  if (res.status !== 200) throw new Error(`sign-in as ${role} failed: ${res.status} ${await res.text()}`);
  return client;
}

export async function makeTeam(label = "team"): Promise<Team> {
  const { client: owner, workshopId } = await signUp(label);
  const { client: outsider } = await signUp(`${label}-outsider`);
  const technician = await addMember(workshopId, "technician", label);
  const apprentice = await addMember(workshopId, "apprentice", label);
  return { owner, technician, apprentice, outsider, workshopId };
}

/** A tiny valid PNG (solid amber) made with sharp, for upload tests. */
export async function samplePng(width = 64, height = 48): Promise<Buffer> {
  const sharp = (await import("sharp")).default;
  return sharp({ create: { width, height, channels: 3, background: { r: 180, g: 83, b: 9 } } })
    .png()
    .toBuffer();
}

export function fileForm(bytes: Uint8Array, name: string, type = "application/octet-stream", kind?: string): FormData {
  const form = new FormData();
  form.set("file", new Blob([new Uint8Array(bytes)], { type }), name);
  if (kind) form.set("kind", kind);
  return form;
}
