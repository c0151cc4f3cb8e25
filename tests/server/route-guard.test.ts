import http from "node:http";
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

const CHUNK = Buffer.alloc(64 * 1024, 0x20); // spaces: valid inside JSON, harmless in any body

/**
 * POSTs a chunked body with no Content-Length that goes on for `total` bytes, stopping as soon as an
 * answer arrives. A server that buffers the whole body answers only after the last byte.
 */
function streamPost(path: string, total: number, headers: Record<string, string>): Promise<Streamed> {
  return new Promise((resolve, reject) => {
    const url = new URL(path, baseUrl());
    let sent = 0;
    let answered: Streamed | null = null;
    const req = http.request(url, { method: "POST", agent: false, headers: { ...headers, "transfer-encoding": "chunked" } });
    req.on("response", (res) => {
      answered = { status: res.statusCode ?? 0, body: "", sentBeforeAnswer: sent };
      res.setEncoding("utf8");
      res.on("data", (text: string) => (answered!.body += text));
      res.on("end", () => {
        req.destroy();
        resolve(answered!);
      });
    });
    // Once the server has answered and closed, further writes fail; that is the point.
    req.on("error", (err) => (answered ? undefined : reject(err)));
    const pump = () => {
      while (!answered && sent < total) {
        sent += CHUNK.length;
        if (!req.write(CHUNK)) return void req.once("drain", pump);
      }
      if (!answered) req.end();
    };
    req.write("{");
    pump();
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
  // Far more than any limit: an endless sender would be the same.
  const TOTAL = 48 * 1024 * 1024;

  test.each([
    ["a calculator (no sign-in)", "/api/calculators/ohms-law", /64 KiB/],
    ["sign-in", "/api/auth/sign-in", /64 KiB/],
    ["an estimate answer", "/api/estimates/answer", /64 KiB/],
  ])("%s: 413 long before a 48 MB chunked body without Content-Length is sent", async (_name, path, message) => {
    const res = await streamPost(path, TOTAL, JSON_TYPE);
    expect(res.status).toBe(413);
    expect(JSON.parse(res.body).error.message).toMatch(message);
    expect(res.sentBeforeAnswer).toBeLessThan(TOTAL);
  });

  test("the webhook stops at its own 512 KiB", async () => {
    const res = await streamPost("/api/payments/webhook", TOTAL, { ...JSON_TYPE, "stripe-signature": "t=1,v1=00" });
    expect(res.status).toBe(413);
    expect(JSON.parse(res.body).error.message).toMatch(/too large/);
    expect(res.sentBeforeAnswer).toBeLessThan(TOTAL);
  });

  test("an upload stops at 20 MB and the form's room", async () => {
    const res = await streamPost(`/api/jobs/${job}/files`, 3 * TOTAL, {
      "content-type": "multipart/form-data; boundary=guard",
      cookie: team.technician.cookies,
    });
    expect(res.status).toBe(413);
    expect(JSON.parse(res.body).error.fields.file).toMatch(/20 MB/);
    expect(res.sentBeforeAnswer).toBeLessThan(3 * TOTAL);
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
    ["job", async () => String(await created(team.technician, "/api/jobs", { title: "Origin throwaway", equipmentKind: "other" }, "job")), (p) => `/api/jobs/${p}`],
    ["part", async () => `${job}/parts/${await created(team.technician, `/api/jobs/${job}/parts`, { designator: "C9", kind: "film" }, "part")}`, (p) => `/api/jobs/${p}`],
    [
      "reading",
      async () => `${job}/readings/${await created(team.technician, `/api/jobs/${job}/readings`, { kind: "resistor", designator: "R9", nominal: "1k", measured: "1k" }, "reading")}`,
      (p) => `/api/jobs/${p}`,
    ],
    [
      "calculation",
      async () => `${job}/calculations/${await created(team.technician, `/api/jobs/${job}/calculations`, { slug: "ohms-law", inputs: { voltage: 10, current: 0.01 } }, "calculation")}`,
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
