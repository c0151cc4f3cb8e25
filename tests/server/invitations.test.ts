import { describe, expect, test } from "vitest";
import { Client } from "../helpers/http";
import { mailTo } from "../helpers/mail";
import { addMember, address, invite, ownWorkshop, testDb } from "../helpers/workshops";

describe("invitations through the real server and SMTP", () => {
  test("the owner invites by e-mail; the link signs a new person up with that role", async () => {
    const shop = await ownWorkshop("Invite");
    const email = address("apprentice");
    const { mail, token, invitation } = await invite(shop.client, email, "apprentice");
    expect(invitation).toMatchObject({ email, role: "apprentice", state: "pending" });
    expect(JSON.stringify(invitation)).not.toContain(token);
    expect(mail.subject).toBe(`Join ${shop.workshopName} on Glowbench`);
    expect(mail.text).toContain(shop.owner.name);
    expect(mail.text).toContain("apprentice");
    expect(mail.headers["x-glowbench-workshop"]).toBe(String(shop.workshopId));

    // The database holds only the SHA-256 of the token.
    const db = testDb();
    const stored = db.prepare("select token_hash from invitations where email = ?").get(email) as { token_hash: string };
    db.close();
    expect(stored.token_hash).toMatch(/^[0-9a-f]{64}$/);
    expect(stored.token_hash).not.toContain(token);

    const invitee = new Client();
    const page = await invitee.get(`/invite/${token}`);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain(`Join ${shop.workshopName}`);
    expect(html).toContain("Create my account and join");

    const res = await invitee.post("/api/invitations/accept", { mode: "sign-up", token, name: "Wren Tolley", password: "valve glow passphrase" });
    expect(res.status).toBe(200);
    const me = await (await invitee.get("/api/me")).json();
    expect(me).toMatchObject({ role: "apprentice", user: { email, name: "Wren Tolley" }, workshop: { id: shop.workshopId } });

    const members = (await (await shop.client.get("/api/workshop/members")).json()).members as { email: string; role: string }[];
    expect(members.find((m) => m.email === email)?.role).toBe("apprentice");
    expect(JSON.stringify(members)).not.toMatch(/hash|scrypt/i);
    const pending = (await (await shop.client.get("/api/workshop/invitations")).json()).invitations as { email: string }[];
    expect(pending.map((i) => i.email)).not.toContain(email);

    const events = (await (await shop.client.get("/api/workshop/audit")).json()).events as { action: string; detail: { email?: string } }[];
    expect(events.filter((e) => e.detail?.email === email).map((e) => e.action)).toEqual(["member.joined", "invitation.created"]);
  });

  test("a link works once: a second use is refused, and the page says so", async () => {
    const shop = await ownWorkshop("Reuse");
    const email = address("tech");
    const { token } = await invite(shop.client, email, "technician");
    expect((await new Client().post("/api/invitations/accept", { mode: "sign-up", token, name: "First", password: "first passphrase" })).status).toBe(200);
    const again = await new Client().post("/api/invitations/accept", { mode: "sign-in", token, password: "first passphrase" });
    expect(again.status).toBe(410);
    expect((await again.json()).error.message).toMatch(/already been used/);
    expect(await (await new Client().get(`/invite/${token}`)).text()).toContain("already been used");
  });

  test("an expired invitation cannot be accepted", async () => {
    const shop = await ownWorkshop("Expiry");
    const email = address("late");
    const { token, invitation } = await invite(shop.client, email, "technician");
    const db = testDb();
    db.prepare("update invitations set expires_at = ? where id = ?").run(Date.now() - 1000, invitation.id);
    db.close();
    const res = await new Client().post("/api/invitations/accept", { mode: "sign-up", token, name: "Late", password: "late passphrase" });
    expect(res.status).toBe(410);
    expect((await res.json()).error.message).toMatch(/expired/);
    expect(await (await new Client().get(`/invite/${token}`)).text()).toContain("expired");
    const listed = (await (await shop.client.get("/api/workshop/invitations")).json()).invitations as { id: number; state: string }[];
    expect(listed.find((i) => i.id === invitation.id)?.state).toBe("expired");
  });

  test("a revoked invitation cannot be accepted, and a fresh invitation replaces an older link", async () => {
    const shop = await ownWorkshop("Revoke");
    const email = address("withdrawn");
    const first = await invite(shop.client, email, "technician");
    const second = await invite(shop.client, email, "apprentice");
    expect(second.token).not.toBe(first.token);
    expect(mailTo(email)).toHaveLength(2);
    expect((await new Client().post("/api/invitations/accept", { mode: "sign-up", token: first.token, name: "X", password: "some passphrase" })).status).toBe(
      410,
    );

    const revoke = await shop.client.request("DELETE", `/api/workshop/invitations/${second.invitation.id}`);
    expect(revoke.status).toBe(200);
    const res = await new Client().post("/api/invitations/accept", { mode: "sign-up", token: second.token, name: "X", password: "some passphrase" });
    expect(res.status).toBe(410);
    expect((await res.json()).error.message).toMatch(/withdrawn/);
    const events = (await (await shop.client.get("/api/workshop/audit")).json()).events as { action: string }[];
    expect(events.map((e) => e.action)).toContain("invitation.revoked");
  });

  test("someone with an account joins with their password and works in the new workshop", async () => {
    const home = await ownWorkshop("Home");
    const shop = await ownWorkshop("Host");
    const { token } = await invite(shop.client, home.owner.email, "technician");
    const wrong = await new Client().post("/api/invitations/accept", { mode: "sign-in", token, password: "not the password" });
    expect(wrong.status).toBe(401);
    expect((await wrong.json()).error.fields.password).toBeTruthy();
    const client = new Client();
    expect((await client.post("/api/invitations/accept", { mode: "sign-in", token, password: home.owner.password })).status).toBe(200);
    expect(await (await client.get("/api/me")).json()).toMatchObject({ role: "technician", workshop: { id: shop.workshopId } });
    // Their own workshop is untouched: signing in normally still lands there as owner.
    expect(await (await home.client.get("/api/me")).json()).toMatchObject({ role: "owner", workshop: { id: home.workshopId } });
  });

  test("bad input is a 400 naming each field; unknown tokens are 404; an existing member cannot be invited", async () => {
    const shop = await ownWorkshop("Input");
    const bad = await shop.client.post("/api/workshop/invitations", { email: "nope", role: "boss" });
    expect(bad.status).toBe(400);
    expect(Object.keys((await bad.json()).error.fields).sort()).toEqual(["email", "role"]);
    const self = await shop.client.post("/api/workshop/invitations", { email: shop.owner.email, role: "technician" });
    expect(self.status).toBe(409);
    const badAccept = await new Client().post("/api/invitations/accept", { mode: "sign-up", token: "short", name: "", password: "x" });
    expect(badAccept.status).toBe(400);
    expect(Object.keys((await badAccept.json()).error.fields).sort()).toEqual(["name", "password", "token"]);
    const unknown = await new Client().post("/api/invitations/accept", { mode: "sign-up", token: "A".repeat(43), name: "N", password: "long enough pass" });
    expect(unknown.status).toBe(404);
  });

  test("only owners invite or see invitations", async () => {
    const shop = await ownWorkshop("Owners only");
    for (const role of ["technician", "apprentice"]) {
      const { client } = await addMember(shop.client, role);
      expect((await client.post("/api/workshop/invitations", { email: address("x"), role: "apprentice" })).status).toBe(403);
      expect((await client.get("/api/workshop/invitations")).status).toBe(403);
    }
    expect((await new Client().post("/api/workshop/invitations", { email: address("x"), role: "apprentice" })).status).toBe(401);
  });

  test("an owner cannot withdraw another workshop's invitation", async () => {
    const a = await ownWorkshop("A");
    const b = await ownWorkshop("B");
    const { invitation, token } = await invite(a.client, address("isolated"), "technician");
    expect((await b.client.request("DELETE", `/api/workshop/invitations/${invitation.id}`)).status).toBe(404);
    expect((await new Client().get(`/invite/${token}`)).status).toBe(200);
    expect(await (await new Client().get(`/invite/${token}`)).text()).toContain("Create my account and join");
  });
});
