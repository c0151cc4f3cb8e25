import { describe, expect, test } from "vitest";
import { Client } from "../helpers/http";
import { linkIn, mailTo, waitForMail } from "../helpers/mail";
import { address, ownWorkshop, testDb } from "../helpers/workshops";

const ANSWER = "If that address has a Glowbench account, a link to set a new password is on its way. It works for an hour.";

async function requestReset(email: string, ip = "198.51.100.40") {
  return new Client().post("/api/auth/password-reset", { email }, { "x-forwarded-for": ip });
}

describe("password reset by e-mail", () => {
  test("known and unknown addresses get the same answer; only the known one gets mail", async () => {
    const shop = await ownWorkshop("Reset");
    const unknown = address("nobody");
    const a = await requestReset(unknown, "198.51.100.41");
    const b = await requestReset(shop.owner.email, "198.51.100.41");
    expect(a.status).toBe(200);
    expect(b.status).toBe(200);
    expect(await a.json()).toEqual({ ok: true, message: ANSWER });
    expect(await b.json()).toEqual({ ok: true, message: ANSWER });
    const mail = await waitForMail(shop.owner.email);
    expect(mail.subject).toBe("Set a new Glowbench password");
    // The unknown request came first and was handled first; nothing was sent for it.
    expect(mailTo(unknown)).toEqual([]);
    const db = testDb();
    const rows = db.prepare("select count(*) as n from password_resets r join users u on u.id = r.user_id where u.email = ?").get(unknown) as { n: number };
    db.close();
    expect(rows.n).toBe(0);
  });

  test("the link sets a new password, ends every session, and works only once", async () => {
    const shop = await ownWorkshop("Sessions");
    const other = new Client();
    expect((await other.post("/api/auth/sign-in", { email: shop.owner.email, password: shop.owner.password })).status).toBe(200);
    expect((await requestReset(shop.owner.email, "198.51.100.42")).status).toBe(200);
    const mail = await waitForMail(shop.owner.email);
    const link = new URL(linkIn(mail, "/reset-password/"));
    const token = link.pathname.split("/").pop()!;
    const page = await new Client().get(link.pathname);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain("Choose a new password");

    const short = await new Client().post("/api/auth/password-reset/complete", { token, password: "short" });
    expect(short.status).toBe(400);
    expect((await short.json()).error.fields.password).toBeTruthy();

    const done = await new Client().post("/api/auth/password-reset/complete", { token, password: "a brand new passphrase" });
    expect(done.status).toBe(200);
    expect((await shop.client.get("/api/me")).status).toBe(401);
    expect((await other.get("/api/me")).status).toBe(401);
    expect(
      (await new Client().post("/api/auth/sign-in", { email: shop.owner.email, password: shop.owner.password }, { "x-forwarded-for": "198.51.100.43" })).status,
    ).toBe(401);
    const fresh = new Client();
    expect((await fresh.post("/api/auth/sign-in", { email: shop.owner.email, password: "a brand new passphrase" })).status).toBe(200);

    const reuse = await new Client().post("/api/auth/password-reset/complete", { token, password: "yet another passphrase" });
    expect(reuse.status).toBe(410);
    expect(await (await new Client().get(link.pathname)).text()).toContain("expired or was already used");
    const events = (await (await fresh.get("/api/workshop/audit")).json()).events as { action: string }[];
    // The fresh sign-in is recorded too (session.signed-in); the password events come just before it.
    expect(
      events
        .map((e) => e.action)
        .filter((a) => a.startsWith("password."))
        .slice(0, 2),
    ).toEqual(["password.reset", "password.reset-requested"]);
  });

  test("an expired link and an unknown token are refused", async () => {
    const shop = await ownWorkshop("Expired reset");
    await requestReset(shop.owner.email, "198.51.100.44");
    const token = new URL(linkIn(await waitForMail(shop.owner.email), "/reset-password/")).pathname.split("/").pop()!;
    const db = testDb();
    db.prepare("update password_resets set expires_at = ? where user_id = (select id from users where email = ?)").run(Date.now() - 1000, shop.owner.email);
    db.close();
    expect((await new Client().post("/api/auth/password-reset/complete", { token, password: "a brand new passphrase" })).status).toBe(410);
    expect((await new Client().post("/api/auth/password-reset/complete", { token: "B".repeat(43), password: "a brand new passphrase" })).status).toBe(404);
    expect((await shop.client.get("/api/me")).status).toBe(200);
  });

  test("a newer link replaces an older one", async () => {
    const shop = await ownWorkshop("Newer");
    await requestReset(shop.owner.email, "198.51.100.45");
    const first = new URL(linkIn(await waitForMail(shop.owner.email), "/reset-password/")).pathname.split("/").pop()!;
    await requestReset(shop.owner.email, "198.51.100.45");
    const second = new URL(linkIn(await waitForMail(shop.owner.email, { count: 2 }), "/reset-password/")).pathname.split("/").pop()!;
    expect((await new Client().post("/api/auth/password-reset/complete", { token: first, password: "a brand new passphrase" })).status).toBe(410);
    expect((await new Client().post("/api/auth/password-reset/complete", { token: second, password: "a brand new passphrase" })).status).toBe(200);
  });

  test("a bad address is a 400 naming the field", async () => {
    const res = await requestReset("not-an-address", "198.51.100.46");
    expect(res.status).toBe(400);
    expect(Object.keys((await res.json()).error.fields)).toEqual(["email"]);
  });
});
