import { beforeAll, describe, expect, test } from "vitest";
import { Client, baseUrl, signedIn } from "../helpers/http";
import { approvalLinkFor, createJob, latestMailText, logTexts, ownMember, testDb, workshopIdByName } from "../helpers/money-fixtures";

/**
 * Estimates through the real server: prepared by technicians, priced on the server, sent as a single-use
 * link the customer answers without an account; the answer lands in the Log and reaches the technician.
 */

let tech: Client;
let lamplight: number;
beforeAll(async () => {
  tech = await signedIn("tech@demo.test");
  lamplight = workshopIdByName("Lamplight Radio Workshop");
});

async function preparedJob(customerEmail?: string | null) {
  const { jobId, partIds } = createJob(lamplight, {
    customerEmail,
    parts: [
      { designator: "C1", unitCostMinor: 85 },
      { designator: "C5a", unitCostMinor: 240 },
      { designator: "R7", unitCostMinor: null },
    ],
  });
  // Lamplight charges £45.00/h with 20% tax (demo seed).
  // labour 2.5 h → 11250; C1 ×2 at its £0.85 → 170; C5a at a typed £2.40 → 240; fee £25 → 2500
  // subtotal 14160; tax 2832; total 16992 (£169.92)
  const res = await tech.request("PUT", `/api/jobs/${jobId}/estimate`, {
    lines: [
      { kind: "labour", description: "Recap and slow start", quantity: "2.5" },
      { kind: "part", description: "C1 paper cap", quantity: "2", partId: partIds[0] },
      { kind: "part", description: "C5a can", quantity: "1", unitPrice: "2.40", partId: partIds[1] },
      { kind: "fee", description: "Bench diagnosis", quantity: "1", unitPrice: "25" },
    ],
  });
  expect(res.status).toBe(200);
  return { jobId, partIds, estimate: (await res.json()).estimate };
}

async function answer(token: string, decision: string) {
  return new Client().post("/api/estimates/answer", { token, decision });
}

describe("preparing an estimate", () => {
  test("the server prices labour at the workshop rate, parts from the Parts list, and totals with tax", async () => {
    const { estimate } = await preparedJob();
    expect(estimate.status).toBe("draft");
    expect(estimate.lines.map((l: { amountMinor: number }) => l.amountMinor)).toEqual([11250, 170, 240, 2500]);
    expect(estimate).toMatchObject({ subtotalMinor: 14160, taxMinor: 2832, totalMinor: 16992, currency: "GBP", taxRateBp: 2000 });
    expect(JSON.stringify(estimate)).not.toMatch(/approvalTokenHash/);
  });

  test("every line that cannot be priced is named", async () => {
    const { jobId, partIds } = await preparedJob();
    const other = createJob(lamplight, { parts: [{ designator: "C9", unitCostMinor: 100 }] });
    const res = await tech.request("PUT", `/api/jobs/${jobId}/estimate`, {
      lines: [
        { kind: "part", description: "R7", quantity: "1", partId: partIds[2] },
        { kind: "part", description: "someone else's part", quantity: "1", partId: other.partIds[0] },
        { kind: "fee", description: "Fee", quantity: "1", unitPrice: "1.234" },
      ],
    });
    expect(res.status).toBe(400);
    const { fields } = (await res.json()).error;
    expect(Object.keys(fields).sort()).toEqual(["lines.0.unitPrice", "lines.1.partId", "lines.2.unitPrice"]);
    expect(fields["lines.0.unitPrice"]).toMatch(/no unit cost/);
    expect(fields["lines.2.unitPrice"]).toMatch(/2 decimals/);
    // Malformed lines are refused by the schema, every field named.
    const malformed = await tech.request("PUT", `/api/jobs/${jobId}/estimate`, {
      lines: [{ kind: "labour", description: "", quantity: "-1" }, { kind: "fee", description: "Fee", quantity: "1" }, { kind: "gift" }],
    });
    expect(malformed.status).toBe(400);
    expect(Object.keys((await malformed.json()).error.fields).sort()).toEqual(
      ["lines.0.description", "lines.0.quantity", "lines.1.unitPrice", "lines.2.description", "lines.2.kind", "lines.2.quantity"].sort(),
    );
  });

  test("apprentices never see prices; other workshops see nothing", async () => {
    const { jobId } = await preparedJob();
    const { client: apprentice } = await ownMember(lamplight, "apprentice");
    expect((await apprentice.get(`/api/jobs/${jobId}/estimate`)).status).toBe(403);
    expect((await apprentice.request("PUT", `/api/jobs/${jobId}/estimate`, { lines: [] })).status).toBe(403);
    expect((await apprentice.post(`/api/jobs/${jobId}/estimate/send`, {})).status).toBe(403);
    const other = await signedIn("other@demo.test");
    expect((await other.get(`/api/jobs/${jobId}/estimate`)).status).toBe(404);
    expect((await other.post(`/api/jobs/${jobId}/estimate/send`, {})).status).toBe(404);
    expect((await new Client().get(`/api/jobs/${jobId}/estimate`)).status).toBe(401);
  });

  test("without a customer e-mail it cannot be sent", async () => {
    const { jobId } = await preparedJob(null);
    const res = await tech.post(`/api/jobs/${jobId}/estimate/send`, {});
    expect(res.status).toBe(409);
    expect((await res.json()).error.message).toMatch(/e-mail/);
  });
});

describe("the customer's approval link", () => {
  test("approve once: logged, technician told, the link cannot be reused", async () => {
    const email = `approve-${Date.now()}@example.com`;
    const { jobId } = await preparedJob(email);
    const sent = await tech.post(`/api/jobs/${jobId}/estimate/send`, {});
    expect(sent.status).toBe(200);
    const body = await sent.json();
    expect(body.sentTo).toBe(email);
    expect(JSON.stringify(body)).not.toMatch(/token/i);
    const link = await approvalLinkFor(email);
    const token = link.split("/estimate/")[1];
    expect(token.length).toBeGreaterThanOrEqual(40);
    // Only the hash is stored.
    const stored = testDb().prepare("SELECT approval_token_hash AS h FROM estimates WHERE job_id = ?").get(jobId) as { h: string };
    expect(stored.h).toMatch(/^[0-9a-f]{64}$/);
    expect(stored.h).not.toContain(token);

    const page = await fetch(link);
    const html = await page.text();
    expect(page.status).toBe(200);
    expect(html).toContain("Lamplight Radio Workshop");
    expect(html).toContain("£169.92");
    // Written to the customer: a plain reminder about their set, not the bench's safety procedure.
    expect(html).toContain("Please keep the back on");
    expect(html).not.toMatch(/current-limited|Discharge every filter capacitor/);

    const first = await answer(token, "approve");
    expect(first.status).toBe(200);
    expect((await first.json()).status).toBe("approved");
    const again = await answer(token, "decline");
    expect(again.status).toBe(410);
    expect((await tech.get(`/api/jobs/${jobId}/estimate`).then((r) => r.json())).estimate.status).toBe("approved");
    expect(logTexts(jobId, "estimate")).toEqual([`Estimate sent to ${email} for approval.`, "Iona Testwell approved the estimate."]);
    expect(await latestMailText("tech@demo.test", /Estimate approved/)).toContain(`/jobs/${jobId}`);
    // The page no longer shows the prices.
    expect(await (await fetch(link)).text()).not.toContain("£169.92");
    // An approved estimate stays as the customer saw it.
    expect((await tech.request("PUT", `/api/jobs/${jobId}/estimate`, { lines: [] })).status).toBe(409);
  });

  test("a guessed, truncated or superseded token gets nothing", async () => {
    const email = `guess-${Date.now()}@example.com`;
    const { jobId } = await preparedJob(email);
    await tech.post(`/api/jobs/${jobId}/estimate/send`, {});
    const token = (await approvalLinkFor(email)).split("/estimate/")[1];
    const guessed = token.slice(0, -4) + (token.endsWith("AAAA") ? "BBBB" : "AAAA");
    expect((await answer(guessed, "approve")).status).toBe(404);
    expect((await answer(token.slice(0, 30), "approve")).status).toBe(404);
    expect((await answer("short", "approve")).status).toBe(400);
    expect(await (await fetch(`${baseUrl()}/estimate/${guessed}`)).text()).toContain("not valid");
    // Sending again makes a new link; the first one stops working.
    await tech.post(`/api/jobs/${jobId}/estimate/send`, {});
    const second = (await approvalLinkFor(email)).split("/estimate/")[1];
    expect(second).not.toBe(token);
    expect((await answer(token, "approve")).status).toBe(404);
    expect((await answer(second, "decline")).status).toBe(200);
    expect(logTexts(jobId, "estimate").at(-1)).toBe("Iona Testwell declined the estimate.");
  });

  test("an expired link cannot be answered", async () => {
    const email = `late-${Date.now()}@example.com`;
    const { jobId } = await preparedJob(email);
    await tech.post(`/api/jobs/${jobId}/estimate/send`, {});
    const token = (await approvalLinkFor(email)).split("/estimate/")[1];
    testDb()
      .prepare("UPDATE estimates SET token_expires_at = ? WHERE job_id = ?")
      .run(Date.now() - 1000, jobId);
    const res = await answer(token, "approve");
    expect(res.status).toBe(410);
    expect(await (await fetch(`${baseUrl()}/estimate/${token}`)).text()).toContain("expired");
  });

  test("the approved estimate becomes the invoice once the set is ready", async () => {
    const email = `invoice-${Date.now()}@example.com`;
    const { jobId } = await preparedJob(email);
    await tech.post(`/api/jobs/${jobId}/estimate/send`, {});
    const token = (await approvalLinkFor(email)).split("/estimate/")[1];
    await answer(token, "approve");
    testDb().prepare("UPDATE jobs SET status = 'at-the-counter' WHERE id = ?").run(jobId);
    const owner = await signedIn("owner@demo.test");
    const res = await owner.post(`/api/jobs/${jobId}/invoices`, {});
    expect(res.status).toBe(201);
    const invoice = await res.json();
    expect(invoice).toMatchObject({ subtotalMinor: 14160, taxMinor: 2832, totalMinor: 16992, status: "issued" });
    expect(invoice.lines).toHaveLength(4);
  });
});
