import { describe, expect, test } from "vitest";
import { Client, DEMO_PASSWORD, baseUrl, signedIn } from "../helpers/http";

describe("sign-in and sessions through the real server", () => {
  test("health answers without a session", async () => {
    const res = await fetch(`${baseUrl()}/api/health`);
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual({ ok: true });
    expect(res.headers.get("x-powered-by")).toBeNull();
  });

  test.each([
    ["owner@demo.test", "owner", "Lamplight Radio Workshop"],
    ["tech@demo.test", "technician", "Lamplight Radio Workshop"],
    ["apprentice@demo.test", "apprentice", "Lamplight Radio Workshop"],
    ["other@demo.test", "owner", "Harbour Street Valve Repairs"],
  ])("%s signs in and /api/me shows role %s", async (email, role, workshop) => {
    const client = new Client();
    const res = await client.post("/api/auth/sign-in", { email, password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.role).toBe(role);
    expect(body.user.email).toBe(email);
    expect(JSON.stringify(body)).not.toMatch(/hash|scrypt/i);
    const me = await (await client.get("/api/me")).json();
    expect(me).toMatchObject({ role, workshop: { name: workshop }, user: { email } });
  });

  test("the session cookie is __Host- prefixed, httpOnly, SameSite=Lax, Secure in production and holds no readable data", async () => {
    const client = new Client();
    const res = await client.post("/api/auth/sign-in", { email: "owner@demo.test", password: DEMO_PASSWORD });
    const cookie = res.headers.getSetCookie().find((c) => c.startsWith("__Host-glowbench_session="))!;
    expect(cookie).toMatch(/Path=\/(;|$)/i);
    expect(cookie).not.toMatch(/Domain=/i);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).toMatch(/Secure/i);
    expect(cookie).toMatch(/Max-Age=\d+/i);
    expect(cookie).not.toContain("owner");
  });

  test("signed out, /api/me is a JSON 401", async () => {
    const res = await new Client().get("/api/me");
    expect(res.status).toBe(401);
    expect(res.headers.get("content-type")).toMatch(/application\/json/);
    expect((await res.json()).error.message).toBeTruthy();
  });

  test("bad sign-in input is a 400 naming each field", async () => {
    const res = await new Client().post("/api/auth/sign-in", { email: "not-an-email" });
    expect(res.status).toBe(400);
    const { error } = await res.json();
    expect(Object.keys(error.fields).sort()).toEqual(["email", "password"]);
  });

  test("a wrong password is a 401 that does not say which part was wrong", async () => {
    const res = await new Client().post("/api/auth/sign-in", { email: "tech@demo.test", password: "wrong-password" }, { "x-forwarded-for": "198.51.100.7" });
    expect(res.status).toBe(401);
    expect((await res.json()).error.message).toBe("E-mail or password is wrong.");
    const unknown = await new Client().post(
      "/api/auth/sign-in",
      { email: "nobody@demo.test", password: "wrong-password" },
      { "x-forwarded-for": "198.51.100.7" },
    );
    expect(unknown.status).toBe(401);
    expect((await unknown.json()).error.message).toBe("E-mail or password is wrong.");
  });

  test("a flood of failures on one account gets a 429 with Retry-After", async () => {
    // An account of the test's own: locking a demo account would fail other files signing in as it.
    const email = `flooded-${Date.now()}@example.test`;
    const password = "flooded account passphrase";
    expect((await new Client().post("/api/auth/sign-up", { workshopName: "Flood Test Works", name: "Flo Oded", email, password })).status).toBe(201);
    const statuses: number[] = [];
    for (let i = 0; i < 7; i++) {
      const res = await new Client().post("/api/auth/sign-in", { email, password: `guess-${i}` }, { "x-forwarded-for": `203.0.113.${i + 1}` });
      statuses.push(res.status);
      if (res.status === 429) expect(Number(res.headers.get("retry-after"))).toBeGreaterThan(0);
    }
    expect(statuses.slice(0, 5).every((s) => s === 401)).toBe(true);
    expect(statuses.at(-1)).toBe(429);
    // Even the right password waits while the account is throttled.
    const right = await new Client().post("/api/auth/sign-in", { email, password }, { "x-forwarded-for": "203.0.113.99" });
    expect(right.status).toBe(429);
  });

  test("a flood from one address across many accounts gets a 429", async () => {
    let last = 0;
    for (let i = 0; i < 22; i++) {
      const res = await new Client().post(
        "/api/auth/sign-in",
        { email: `stranger${i}@example.test`, password: "nope-nope" },
        { "x-forwarded-for": "192.0.2.250" },
      );
      last = res.status;
    }
    expect(last).toBe(429);
  });

  test("sign-out ends the session; sign-out everywhere ends other cookies too", async () => {
    const a = await signedIn("tech@demo.test");
    const b = await signedIn("tech@demo.test");
    expect((await b.get("/api/me")).status).toBe(200);
    expect((await a.post("/api/auth/sign-out", { everywhere: true })).status).toBe(200);
    expect((await a.get("/api/me")).status).toBe(401);
    expect((await b.get("/api/me")).status).toBe(401);
  });

  test("state-changing routes refuse non-JSON bodies and foreign origins", async () => {
    const form = await new Client().post("/api/auth/sign-in", "email=a&password=b", { "content-type": "application/x-www-form-urlencoded" });
    expect(form.status).toBe(415);
    const foreign = await new Client().post("/api/auth/sign-in", { email: "owner@demo.test", password: DEMO_PASSWORD }, { origin: "https://evil.example" });
    expect(foreign.status).toBe(403);
  });

  test("sign-up creates a workshop with its creator as owner", async () => {
    const client = new Client();
    const email = `founder-${Date.now()}@example.test`;
    const res = await client.post("/api/auth/sign-up", {
      workshopName: "Kettle Lane Wireless",
      name: "Ruth Penhallow",
      email,
      password: "a sturdy passphrase",
    });
    expect(res.status).toBe(201);
    const me = await (await client.get("/api/me")).json();
    expect(me).toMatchObject({ role: "owner", workshop: { name: "Kettle Lane Wireless" } });
    expect((await (await client.get("/api/jobs")).json()).jobs).toEqual([]);
    const again = await new Client().post("/api/auth/sign-up", { workshopName: "Dup", name: "X", email, password: "another passphrase" });
    expect(again.status).toBe(409);
    expect((await again.json()).error.fields.email).toBeTruthy();
  });
});

describe("workshop isolation", () => {
  test("each owner lists only their own workshop's jobs", async () => {
    const lamplight = await (await (await signedIn("owner@demo.test")).get("/api/jobs")).json();
    const harbour = await (await (await signedIn("other@demo.test")).get("/api/jobs")).json();
    const titles = (j: { jobs: { title: string }[] }) => j.jobs.map((x) => x.title);
    expect(titles(lamplight)).toContain("Five-tube AC/DC table radio, early 1950s");
    expect(titles(harbour)).toContain("Shortwave receiver, 1960s");
    expect(titles(harbour)).not.toContain("Five-tube AC/DC table radio, early 1950s");
    expect(titles(lamplight)).not.toContain("Shortwave receiver, 1960s");
  });

  test("signed out, /api/jobs is a 401", async () => {
    expect((await new Client().get("/api/jobs")).status).toBe(401);
  });
});

describe("pages", () => {
  test("security headers: nonce CSP, nosniff, referrer policy, no framing", async () => {
    const res = await fetch(`${baseUrl()}/sign-in`);
    expect(res.status).toBe(200);
    const csp = res.headers.get("content-security-policy") ?? "";
    expect(csp).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/=]+'/);
    expect(csp).toContain("frame-ancestors 'none'");
    expect(res.headers.get("x-content-type-options")).toBe("nosniff");
    expect(res.headers.get("referrer-policy")).toBeTruthy();
  });

  test("signed-out visitors of /jobs are sent to sign-in", async () => {
    const res = await fetch(`${baseUrl()}/jobs`, { redirect: "manual" });
    expect([302, 307, 308]).toContain(res.status);
    expect(res.headers.get("location")).toMatch(/\/sign-in/);
  });

  test("an unknown page is our own 404", async () => {
    const res = await fetch(`${baseUrl()}/no-such-page`);
    expect(res.status).toBe(404);
    expect(await res.text()).toContain("Nothing on this bench");
  });
});
