import { deflateSync } from "node:zlib";
import { describe, expect, test } from "vitest";
import { Client, baseUrl } from "../helpers/http";
import { linkIn, waitForMail } from "../helpers/mail";
import { fileForm, makeTeam } from "../helpers/team";
import { addMember, ownWorkshop } from "../helpers/workshops";

/** The hardening issue's items 7 and 9: reset mail, links, HSTS, CSP on prefetches, pixel bombs. */

describe("password-reset mail", () => {
  test("never appears in the owner's outbox, and its link points at the public address, not Next's localhost", async () => {
    const shop = await ownWorkshop("Outbox");
    const member = await addMember(shop.client, "technician");
    expect((await new Client().post("/api/auth/password-reset", { email: member.email })).status).toBe(200);
    const mail = await waitForMail(member.email, { count: 2 }); // the invitation came first
    expect(mail.subject).toBe("Set a new Glowbench password");
    expect(mail.headers["x-glowbench-workshop"]).toBeUndefined();
    expect(linkIn(mail, "/reset-password/").startsWith(`${baseUrl()}/reset-password/`)).toBe(true);

    const outbox = await (await shop.client.get("/workshop/outbox")).text();
    expect(outbox).toContain(`Join ${shop.workshopName}`); // the outbox itself works…
    expect(outbox).not.toContain("/reset-password/"); // …but the reset link is the member's alone
    expect(outbox).not.toContain("Set a new Glowbench password");
  });
});

describe("headers", () => {
  test("HSTS when the trusted proxy says the browser came over HTTPS, and never over plain HTTP", async () => {
    const secure = { "x-forwarded-proto": "https" };
    for (const path of ["/sign-in", "/api/health"]) {
      expect((await fetch(`${baseUrl()}${path}`, { headers: secure })).headers.get("strict-transport-security")).toMatch(/max-age=31536000/);
      expect((await fetch(`${baseUrl()}${path}`)).headers.get("strict-transport-security")).toBeNull();
    }
  });

  test("prefetched pages carry the Content-Security-Policy too", async () => {
    for (const headers of [{ purpose: "prefetch" }, { "next-router-prefetch": "1", rsc: "1" }] as Record<string, string>[]) {
      const res = await fetch(`${baseUrl()}/sign-in`, { headers });
      expect(res.headers.get("content-security-policy") ?? "").toContain("frame-ancestors 'none'");
    }
  });
});

/** A real grayscale PNG of width × height (zeros compress to almost nothing: a pixel bomb in ~64 KB). */
function bigPng(width: number, height: number): Buffer {
  const crcTable = Array.from({ length: 256 }, (_, n) => {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    return c >>> 0;
  });
  const crc = (buf: Buffer) => {
    let c = 0xffffffff;
    for (const b of buf) c = crcTable[(c ^ b) & 255] ^ (c >>> 8);
    return (c ^ 0xffffffff) >>> 0;
  };
  const chunk = (type: string, data: Buffer) => {
    const len = Buffer.alloc(4);
    len.writeUInt32BE(data.length);
    const body = Buffer.concat([Buffer.from(type, "ascii"), data]);
    const sum = Buffer.alloc(4);
    sum.writeUInt32BE(crc(body));
    return Buffer.concat([len, body, sum]);
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr.set([8, 0, 0, 0, 0], 8); // 8-bit grayscale, no interlace
  const raw = Buffer.alloc((width + 1) * height); // filter byte 0 and black pixels on every row
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk("IHDR", ihdr),
    chunk("IDAT", deflateSync(raw, { level: 9 })),
    chunk("IEND", Buffer.alloc(0)),
  ]);
}

describe("images over the pixel limit", () => {
  test("a 64-megapixel PNG of a few kilobytes is refused with 413 before it is decoded", async () => {
    const team = await makeTeam("pixels");
    const job = (await (await team.technician.post("/api/jobs", { title: "Pixel test set", equipmentKind: "console-radio" })).json()).job.id;
    const bomb = bigPng(8000, 8000);
    expect(bomb.length).toBeLessThan(1024 * 1024);
    const res = await team.technician.request("POST", `/api/jobs/${job}/files`, fileForm(bomb, "scan.png", "image/png"));
    expect(res.status).toBe(413);
    expect((await res.json()).error.fields.file).toMatch(/pixels/);
    expect((await (await team.technician.get(`/api/jobs/${job}/files`)).json()).files).toEqual([]);
  });
});
