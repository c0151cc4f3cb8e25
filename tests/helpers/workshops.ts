import Database from "better-sqlite3";
import { randomUUID } from "node:crypto";
import path from "node:path";
import { inject } from "vitest";
import { Client } from "./http";
import { linkIn, mailTo, waitForMail } from "./mail";

/** A workshop of the test's own, so changing members never touches the shared demo workshop. */
export async function ownWorkshop(label = "Test") {
  const tag = randomUUID().slice(0, 8);
  const owner = { email: `owner-${tag}@example.test`, password: `owner passphrase ${tag}`, name: `Owner ${tag}` };
  const client = new Client();
  const res = await client.post("/api/auth/sign-up", {
    workshopName: `${label} Workshop ${tag}`,
    name: owner.name,
    email: owner.email,
    password: owner.password,
  });
  if (res.status !== 201) throw new Error(`sign-up failed: ${res.status} ${await res.text()}`);
  const { workshop } = await res.json();
  return { client, owner, tag, workshopId: workshop.id as number, workshopName: `${label} Workshop ${tag}` };
}

export function address(prefix: string) {
  return `${prefix}-${randomUUID().slice(0, 8)}@example.test`;
}

/** Invites `email` and returns the path of the link the e-mail carries (e.g. /invite/abc…). */
export async function invite(owner: Client, email: string, role: string) {
  const count = mailTo(email).length + 1; // the next message to this address
  const res = await owner.post("/api/workshop/invitations", { email, role });
  if (res.status !== 201) throw new Error(`invite failed: ${res.status} ${await res.text()}`);
  const { invitation } = await res.json();
  const mail = await waitForMail(email, { count });
  const link = new URL(linkIn(mail, "/invite/"));
  return { invitation, mail, path: link.pathname, token: link.pathname.split("/").pop()! };
}

/** Adds a member by invitation and sign-up; returns a signed-in client for them. */
export async function addMember(owner: Client, role: string) {
  const email = address(role);
  const { token } = await invite(owner, email, role);
  const client = new Client();
  const res = await client.post("/api/invitations/accept", { mode: "sign-up", token, name: `${role} person`, password: "member passphrase" });
  if (res.status !== 200) throw new Error(`accept failed: ${res.status} ${await res.text()}`);
  return { client, email, password: "member passphrase" };
}

/** Direct access to the test server's database, only to simulate the passing of time. */
export function testDb() {
  return new Database(path.join(inject("dataDir"), "glowbench.db"));
}
