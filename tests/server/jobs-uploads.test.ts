import fs from "node:fs";
import path from "node:path";
import Database from "better-sqlite3";
import { beforeAll, describe, expect, inject, test } from "vitest";
import { fileForm, makeTeam, samplePng, type Team } from "../helpers/team";

/** Uploads: only real photos and PDFs, at most 20 MB, plain names; a refusal leaves nothing on disk. */

let team: Team;
let job: number;
const uploads = () => path.join(inject("dataDir"), "uploads");
const onDisk = () => (fs.existsSync(uploads()) ? fs.readdirSync(uploads()).sort() : []);
/** Stored names the database knows, with their thumbnails; other test files upload in parallel. */
function known(): Set<string> {
  const db = new Database(path.join(inject("dataDir"), "glowbench.db"), { readonly: true });
  try {
    const names = (db.prepare("select stored_name as n from files").all() as { n: string }[]).map((r) => r.n);
    return new Set(names.flatMap((n) => [n, `${n}.thumb.webp`]));
  } finally {
    db.close();
  }
}
/** Files on disk that no record points to: what a half-finished upload would leave behind. */
const orphans = () => {
  const k = known();
  return onDisk().filter((n) => !k.has(n));
};
const storedNameOf = (id: number) => {
  const db = new Database(path.join(inject("dataDir"), "glowbench.db"), { readonly: true });
  try {
    return (db.prepare("select stored_name as n from files where id = ?").get(id) as { n: string }).n;
  } finally {
    db.close();
  }
};
const upload = (form: FormData) => team.technician.request("POST", `/api/jobs/${job}/files`, form);
const fileCount = async () => (await (await team.technician.get(`/api/jobs/${job}/files`)).json()).files.length;

// A minimal PDF (hand-written; file-type knows it by its %PDF- signature).
const PDF = Buffer.from("%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj\n2 0 obj<</Type/Pages/Kids[]/Count 0>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n");
// The start of a Linux executable: ELF magic, 64-bit, little-endian, then padding.
const ELF = Buffer.concat([Buffer.from([0x7f, 0x45, 0x4c, 0x46, 0x02, 0x01, 0x01, 0x00]), Buffer.alloc(4096, 0x90)]);

beforeAll(async () => {
  team = await makeTeam("uploads");
  const res = await team.technician.post("/api/jobs", { title: "Upload test console", equipmentKind: "console-radio" });
  job = (await res.json()).job.id;
});

describe("refused uploads", () => {
  const cases: [string, number, () => Promise<FormData>][] = [
    ["a text file named .png", 415, async () => fileForm(Buffer.from("just some notes, not a picture\n".repeat(20)), "notes.png", "image/png")],
    ["an executable renamed .jpg", 415, async () => fileForm(ELF, "holiday.jpg", "image/jpeg")],
    ["a file over 20 MB", 413, async () => fileForm(Buffer.concat([await samplePng(), Buffer.alloc(20 * 1024 * 1024 + 1)]), "huge.png", "image/png")],
    ["a path-traversal name", 400, async () => fileForm(await samplePng(), "../../escape.png", "image/png")],
    ["a Windows path-traversal name", 400, async () => fileForm(await samplePng(), "..\\..\\escape.png", "image/png")],
    ["an empty file", 400, async () => fileForm(Buffer.alloc(0), "empty.jpg", "image/jpeg")],
  ];
  test.each(cases)("%s gets a clear %i and leaves nothing on disk", async (_name, status, make) => {
    const count = await fileCount();
    const res = await upload(await make());
    expect(res.status).toBe(status);
    const body = await res.json();
    expect(body.error.message).toMatch(/\w{4,}/);
    expect(orphans()).toEqual([]);
    expect(await fileCount()).toBe(count);
    expect(fs.existsSync(path.join(inject("dataDir"), "escape.png"))).toBe(false);
  });

  test("a JSON body is not an upload", async () => {
    const res = await team.technician.post(`/api/jobs/${job}/files`, { file: "x" });
    expect(res.status).toBe(415);
  });

  test("a cross-site form post is refused before reading it", async () => {
    const res = await team.technician.request("POST", `/api/jobs/${job}/files`, fileForm(await samplePng(), "a.png"), { origin: "https://elsewhere.example" });
    expect(res.status).toBe(403);
  });
});

describe("accepted uploads", () => {
  test("a photo is stored under a random name with a thumbnail, and served with its sniffed type", async () => {
    // The browser claims PDF; the bytes are PNG, and PNG is what counts.
    const res = await upload(fileForm(await samplePng(640, 480), "chassis top.png", "application/pdf", "photo"));
    expect(res.status).toBe(201);
    const { file } = await res.json();
    expect(file).toMatchObject({ originalName: "chassis top.png", type: "image/png", kind: "photo", hasThumbnail: true });
    const stored = storedNameOf(file.id);
    expect(stored).toMatch(/^[0-9a-f]{32}\.png$/);
    expect(onDisk()).toEqual(expect.arrayContaining([stored, `${stored}.thumb.webp`]));

    const got = await team.apprentice.get(`/api/jobs/${job}/files/${file.id}`);
    expect(got.status).toBe(200);
    expect(got.headers.get("content-type")).toBe("image/png");
    expect(got.headers.get("x-content-type-options")).toBe("nosniff");
    expect(got.headers.get("content-disposition")).toMatch(/^inline; filename="chassis top.png"/);
    const bytes = Buffer.from(await got.arrayBuffer());
    expect(bytes.subarray(1, 4).toString()).toBe("PNG");

    const thumb = await team.apprentice.get(`/api/jobs/${job}/files/${file.id}?thumb=1`);
    expect(thumb.headers.get("content-type")).toBe("image/webp");
    const sharp = (await import("sharp")).default;
    const meta = await sharp(Buffer.from(await thumb.arrayBuffer())).metadata();
    expect(Math.max(meta.width!, meta.height!)).toBeLessThanOrEqual(480);

    expect((await team.outsider.get(`/api/jobs/${job}/files/${file.id}`)).status).toBe(404);
    expect((await team.owner.delete(`/api/jobs/${job}/files/${file.id}`)).status).toBe(200);
    expect(onDisk().filter((n) => n.startsWith(stored))).toEqual([]);
  });

  test("a PDF schematic is kept as a schematic and downloads as an attachment", async () => {
    const res = await upload(fileForm(PDF, "schematic.pdf", "application/pdf", "photo"));
    expect(res.status).toBe(201);
    const { file } = await res.json();
    expect(file).toMatchObject({ type: "application/pdf", kind: "schematic", hasThumbnail: false });
    const got = await team.technician.get(`/api/jobs/${job}/files/${file.id}`);
    expect(got.headers.get("content-type")).toBe("application/pdf");
    expect(got.headers.get("content-disposition")).toMatch(/^attachment; filename="schematic.pdf"/);
  });

  test("deleting the job removes its files from disk", async () => {
    const res = await team.technician.post("/api/jobs", { title: "Short-lived set", equipmentKind: "other" });
    const other = (await res.json()).job.id;
    const up = await team.technician.request("POST", `/api/jobs/${other}/files`, fileForm(await samplePng(), "a.png"));
    expect(up.status).toBe(201);
    const stored = storedNameOf((await up.json()).file.id);
    expect(onDisk().filter((n) => n.startsWith(stored))).toHaveLength(2);
    expect((await team.owner.delete(`/api/jobs/${other}`)).status).toBe(200);
    expect(onDisk().filter((n) => n.startsWith(stored))).toEqual([]);
  });
});
