import http from "node:http";
import { setTimeout as sleep } from "node:timers/promises";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { baseUrl, type Client } from "../helpers/http";
import { fileForm, makeTeam, samplePng, type Team } from "../helpers/team";

/**
 * What the one route wrapper promises every route: bodies counted as they arrive and refused at the
 * route's limit, a foreign Origin (scheme included) refused on every state-changing method, and no
 * cache keeping a member's answers.
 */

interface Streamed {
  status: number;
  body: string;
  /** Bytes we had handed to the socket when the answer arrived. */
  sentBeforeAnswer: number;
}

/**
 * POSTs a chunked body with no Content-Length that would go on for `total` bytes, a chunk at a time,
 * pausing briefly after each one and stopping as soon as an answer arrives. A server that buffers the
 * whole body answers only after the last byte; one that counts while reading answers at its limit.
 * (The pause lets the answer be read before the next write: the server closes a connection whose body
 * it left unread, and a write racing that close would fail before the answer is seen.)
 */
function streamPost(path: string, total: number, chunkBytes: number, headers: Record<string, string>): Promise<Streamed> {
  const chunk = Buffer.alloc(chunkBytes, 0x20); // spaces: valid inside JSON, harmless in any body
  return new Promise((resolve, reject) => {
    let sent = 0;
    let answered: Streamed | null = null;
    let signal = () => {};
    const arrived = new Promise<void>((r) => (signal = r));
    const req = http.request(new URL(path, baseUrl()), { method: "POST", agent: false, headers: { ...headers, "transfer-encoding": "chunked" } });
    req.on("response", (res) => {
      const got: Streamed = { status: res.statusCode ?? 0, body: "", sentBeforeAnswer: sent };
      answered = got;
      signal();
      res.setEncoding("utf8");
      res.on("data", (text: string) => (got.body += text));
      res.on("close", () => {
        req.destroy();
        resolve(got);
      });
    });
    // After the answer the server closes the connection; errors from then on are expected.
    req.on("error", (err) => (answered ? undefined : reject(err)));
    void (async () => {
      req.write("{");
      sent = 1;
      while (!answered && sent < total) {
        sent += chunk.length;
        req.write(chunk);
        await Promise.race([arrived, sleep(20)]);
      }
      if (!answered) req.end();
    })();
  });
}

let team: Team;
let job: number;

beforeAll(async () => {
  team = await makeTeam("guard");
  const res = await team.technician.post("/api/jobs", { title: "Guard test receiver", equipmentKind: "table-radio" });
  job = (await res.json()).job.id;
});

afterAll(async () => {
  await team.owner.delete(`/api/jobs/${job}`);
});

describe("bodies are counted while they arrive", () => {
  const JSON_TYPE = { "content-type": "application/json" };
  const KIB = 1024;
  const MIB = 1024 * KIB;

  test.each([
    ["a calculator (no sign-in)", "/api/calculators/ohms-law"],
    ["sign-in", "/api/auth/sign-in"],
    ["an estimate answer", "/api/estimates/answer"],
  ])("%s: 413 long before a 16 MB chunked body without Content-Length is sent", async (_name, path) => {
    const total = 16 * MIB;
    const res = await streamPost(path, total, 64 * KIB, JSON_TYPE);
    expect(res.status).toBe(413);
    expect(JSON.parse(res.body).error.message).toMatch(/64 KiB/);
    expect(res.sentBeforeAnswer).toBeLessThan(total);
  });

  test("the webhook stops at its own 512 KiB", async () => {
    const total = 16 * MIB;
    const res = await streamPost("/api/payments/webhook", total, 64 * KIB, { ...JSON_TYPE, "stripe-signature": "t=1,v1=00" });
    expect(res.status).toBe(413);
    expect(JSON.parse(res.body).error.message).toMatch(/too large/);
    expect(res.sentBeforeAnswer).toBeGreaterThan(512 * KIB);
    expect(res.sentBeforeAnswer).toBeLessThan(total);
  });

  test("an upload stops at 20 MB and the form's room", async () => {
    const total = 128 * MIB;
    const res = await streamPost(`/api/jobs/${job}/files`, total, MIB, {
      "content-type": "multipart/form-data; boundary=guard",
      cookie: team.technician.cookies,
    });
    expect(res.status).toBe(413);
    expect(JSON.parse(res.body).error.fields.file).toMatch(/20 MB/);
    expect(res.sentBeforeAnswer).toBeGreaterThan(20 * MIB);
    expect(res.sentBeforeAnswer).toBeLessThan(total);
  });

  test("the server is still answering afterwards", async () => {
    expect((await fetch(`${baseUrl()}/api/health`)).status).toBe(200);
  });
});

describe("a foreign Origin is refused on every state-changing method", () => {
  const EVIL = { origin: "https://evil.example" };
  const created = async (c: Client, path: string, body: unknown, key: string) => {
    const res = await c.post(path, body);
    if (res.status !== 201) throw new Error(`fixture ${path}: ${res.status} ${await res.text()}`);
    return (await res.json())[key].id as number;
  };
  const fixtures: [string, () => Promise<string>, (id: string) => string][] = [
    [
      "job",
      async () => String(await created(team.technician, "/api/jobs", { title: "Origin throwaway", equipmentKind: "other" }, "job")),
      (p) => `/api/jobs/${p}`,
    ],
    [
      "part",
      async () => `${job}/parts/${await created(team.technician, `/api/jobs/${job}/parts`, { designator: "C9", kind: "film" }, "part")}`,
      (p) => `/api/jobs/${p}`,
    ],
    [
      "reading",
      async () =>
        `${job}/readings/${await created(team.technician, `/api/jobs/${job}/readings`, { kind: "resistor", designator: "R9", nominal: "1k", measured: "1k" }, "reading")}`,
      (p) => `/api/jobs/${p}`,
    ],
    [
      "calculation",
      async () =>
        `${job}/calculations/${await created(team.technician, `/api/jobs/${job}/calculations`, { slug: "ohms-law", inputs: { voltage: 10, current: 0.01 } }, "calculation")}`,
      (p) => `/api/jobs/${p}`,
    ],
    [
      "file",
      async () => {
        const res = await team.technician.request("POST", `/api/jobs/${job}/files`, fileForm(await samplePng(), "origin.png", "image/png"));
        return `${job}/files/${(await res.json()).file.id}`;
      },
      (p) => `/api/jobs/${p}`,
    ],
  ];

  test.each(fixtures)("DELETE of a %s from a foreign site is 403 and the record stays", async (_what, make, address) => {
    const path = address(await make());
    const refused = await team.owner.request("DELETE", path, undefined, EVIL);
    expect(refused.status).toBe(403);
    expect((await refused.json()).error.message).toMatch(/Cross-site/);
    // Still there: the owner's same-site DELETE now removes it.
    expect((await team.owner.delete(path)).status).toBe(200);
  });

  test("the scheme counts: https:// with this server's host is foreign to an http:// server", async () => {
    const host = new URL(baseUrl()).host;
    const res = await team.technician.post("/api/jobs", { title: "Scheme check", equipmentKind: "other" }, { origin: `https://${host}` });
    expect(res.status).toBe(403);
    const same = await team.technician.post(`/api/jobs/${job}/log`, { kind: "note", text: "Same-origin note." }, { origin: new URL(baseUrl()).origin });
    expect(same.status).toBe(201);
  });
});

describe("a member's JSON is never cached", () => {
  test("answers and errors to a signed-in member carry Cache-Control: no-store", async () => {
    for (const path of ["/api/me", "/api/jobs", `/api/jobs/${job}`, `/api/jobs/${job}/parts`, "/api/workshop/members"]) {
      const res = await team.technician.get(path);
      expect(res.status, path).toBe(200);
      expect(res.headers.get("cache-control"), path).toBe("no-store");
    }
    const refused = await team.apprentice.delete(`/api/jobs/${job}`);
    expect(refused.status).toBe(403);
    expect(refused.headers.get("cache-control")).toBe("no-store");
  });
});
