import { beforeAll, describe, expect, test } from "vitest";
import { Client, signedIn } from "../helpers/http";
import { createJob, logTexts, ownMember, ownWorkshop, setJobStatus, workshopIdByName } from "../helpers/money-fixtures";

/** Invoices through the real server: owners only, numbered per workshop without gaps, issued → paid | void. */

const lines = [{ kind: "fee", description: "Bench diagnosis", quantity: "1", unitPrice: "30" }];

let A: Awaited<ReturnType<typeof ownWorkshop>>;
beforeAll(async () => {
  A = await ownWorkshop("Corbridge");
});

describe("issuing invoices", () => {
  test("numbers run 1, 2, 3 per workshop with no gaps, even across voids, refusals and parallel requests", async () => {
    const first = createJob(A.workshopId, { status: "at-the-counter" });
    const r1 = await A.owner.post(`/api/jobs/${first.jobId}/invoices`, { lines });
    expect(r1.status).toBe(201);
    const inv1 = await r1.json();
    expect(inv1.number).toBe(1);
    // A second invoice for the same job is refused while the first stands, and burns no number.
    expect((await A.owner.post(`/api/jobs/${first.jobId}/invoices`, { lines })).status).toBe(409);
    // A bad line is refused whole and burns no number either.
    const bad = await A.owner.post(`/api/jobs/${first.jobId}/invoices`, { lines: [{ kind: "fee", description: "", quantity: "0" }] });
    expect(bad.status).toBe(400);
    expect(Object.keys((await bad.json()).error.fields).sort()).toEqual(["lines.0.description", "lines.0.quantity", "lines.0.unitPrice"]);
    expect((await A.owner.post(`/api/invoices/${inv1.id}/void`, {})).status).toBe(200);
    const r2 = await A.owner.post(`/api/jobs/${first.jobId}/invoices`, { lines });
    expect((await r2.json()).number).toBe(2);

    const jobs = [0, 1, 2].map(() => createJob(A.workshopId, { status: "at-the-counter" }).jobId);
    const parallel = await Promise.all(jobs.map((j) => A.owner.post(`/api/jobs/${j}/invoices`, { lines })));
    const numbers = (await Promise.all(parallel.map((r) => r.json()))).map((i) => i.number).sort();
    expect(numbers).toEqual([3, 4, 5]);
    expect(logTexts(first.jobId, "invoice")).toEqual(["Invoice 1 issued.", "Invoice 1 voided.", "Invoice 2 issued."]);
  });

  test("a job is invoiced only once it is at the counter", async () => {
    const { jobId } = createJob(A.workshopId, { status: "recapping" });
    const res = await A.owner.post(`/api/jobs/${jobId}/invoices`, { lines });
    expect(res.status).toBe(409);
    expect((await res.json()).error.message).toMatch(/At the counter/);
    setJobStatus(jobId, "at-the-counter");
    expect((await A.owner.post(`/api/jobs/${jobId}/invoices`, { lines })).status).toBe(201);
  });

  test("without lines and without an approved estimate there is nothing to invoice", async () => {
    const { jobId } = createJob(A.workshopId, { status: "at-the-counter" });
    const res = await A.owner.post(`/api/jobs/${jobId}/invoices`, {});
    expect(res.status).toBe(409);
  });

  test("a paid invoice cannot be voided, a void one not voided twice", async () => {
    const { jobId } = createJob(A.workshopId, { status: "at-the-counter" });
    const inv = await (await A.owner.post(`/api/jobs/${jobId}/invoices`, { lines })).json();
    expect((await A.owner.post(`/api/invoices/${inv.id}/void`, {})).status).toBe(200);
    expect((await A.owner.post(`/api/invoices/${inv.id}/void`, {})).status).toBe(409);
  });
});

describe("who may see invoices", () => {
  let jobId: number;
  let invoiceId: number;
  beforeAll(async () => {
    const lamplight = workshopIdByName("Lamplight Radio Workshop");
    jobId = createJob(lamplight, { status: "at-the-counter" }).jobId;
    const owner = await signedIn("owner@demo.test");
    const res = await owner.post(`/api/jobs/${jobId}/invoices`, { lines });
    expect(res.status).toBe(201);
    invoiceId = (await res.json()).id;
  });

  test.each(["technician", "apprentice"] as const)("the %s role gets 403 from every invoice route", async (role) => {
    const { client } = await ownMember(workshopIdByName("Lamplight Radio Workshop"), role);
    expect((await client.get(`/api/jobs/${jobId}/invoices`)).status).toBe(403);
    expect((await client.post(`/api/jobs/${jobId}/invoices`, { lines })).status).toBe(403);
    expect((await client.get(`/api/invoices/${invoiceId}`)).status).toBe(403);
    expect((await client.get(`/api/invoices/${invoiceId}/pdf`)).status).toBe(403);
    expect((await client.post(`/api/invoices/${invoiceId}/checkout`, {})).status).toBe(403);
    expect((await client.post(`/api/invoices/${invoiceId}/void`, {})).status).toBe(403);
  });

  test("signed out is 401; another workshop's owner gets 404", async () => {
    expect((await new Client().get(`/api/invoices/${invoiceId}`)).status).toBe(401);
    const other = await signedIn("other@demo.test");
    expect((await other.get(`/api/invoices/${invoiceId}`)).status).toBe(404);
    expect((await other.get(`/api/jobs/${jobId}/invoices`)).status).toBe(404);
  });

  test("the owner gets the invoice as a PDF", async () => {
    const owner = await signedIn("owner@demo.test");
    const res = await owner.get(`/api/invoices/${invoiceId}/pdf`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    const bytes = new Uint8Array(await res.arrayBuffer());
    expect(new TextDecoder().decode(bytes.slice(0, 5))).toBe("%PDF-");
  });

  test("bad ids are 404, bad bodies 400/415", async () => {
    const owner = await signedIn("owner@demo.test");
    expect((await owner.get(`/api/invoices/abc`)).status).toBe(404);
    expect((await owner.post(`/api/jobs/${jobId}/invoices`, "lines", { "content-type": "text/plain" })).status).toBe(415);
    expect((await owner.post(`/api/jobs/${jobId}/invoices`, { lines: "all of them" })).status).toBe(400);
  });
});
