import { beforeAll, describe, expect, test } from "vitest";
import { ConflictError, ForbiddenError, GoneError, NotFoundError } from "@/lib/errors";
import type { Member } from "@/lib/auth/can";
import { demoDatabase } from "../helpers/temp-db";

// First, before anything opens the database: a fresh migrated file for the process's one client (getDb).
const demo = await demoDatabase("invoice-links");
const { getDb } = demo;
const jobsQ = await import("@/db/queries/jobs");
const invoicesQ = await import("@/db/queries/invoices");
const linksQ = await import("@/db/queries/invoice-links");
const { hashToken } = await import("@/lib/auth/tokens");
const { invoices, logEntries } = await import("@/db/schema");
const { and, eq } = await import("drizzle-orm");

/** The pay link's rules in the query layer: hashed, expiring, retired by a new send, first view recorded once, 410 once paid. */

type M = Member;
let owner: M, tech: M, other: M;

beforeAll(async () => {
  ({ owner, tech, other } = await demo.seed());
});

function issued(customerEmail: string | null = "wren@example.com") {
  // A customer without an e-mail gets a name of their own, so no earlier customer record lends them one.
  const customerName = customerEmail ? "Wren Tally" : "Orla Nomail";
  const job = jobsQ.createJob(tech, { title: "Pay link radio", equipmentKind: "table-radio", customerName, customerEmail } as never);
  jobsQ.changeJobStatus(tech, job.id, "at-the-counter");
  return invoicesQ.issueInvoice(owner, job.id, { lines: [{ kind: "fee", description: "Bench diagnosis", quantity: "1", unitPrice: "30" }] });
}
const row = (id: number) => getDb().select().from(invoices).where(eq(invoices.id, id)).get()!;
const viewedLogs = (jobId: number) =>
  getDb()
    .select({ text: logEntries.text })
    .from(logEntries)
    .where(and(eq(logEntries.jobId, jobId), eq(logEntries.kind, "invoice")))
    .all()
    .filter((e) => / opened by the customer\.$/.test(e.text));

describe("issuing the pay link", () => {
  test("only the owner; only the SHA-256 of a 32-byte token is stored, with a 30-day expiry", () => {
    const invoice = issued();
    expect(() => linksQ.issuePayLink(tech, invoice.id)).toThrow(ForbiddenError);
    expect(() => linksQ.issuePayLink(other, invoice.id)).toThrow(NotFoundError);
    const link = linksQ.issuePayLink(owner, invoice.id);
    expect(Buffer.from(link.token, "base64url")).toHaveLength(32);
    const stored = row(invoice.id);
    expect(stored.payTokenHash).toBe(hashToken(link.token));
    expect(stored.payTokenHash).not.toContain(link.token);
    expect(Math.round((stored.payTokenExpiresAt!.getTime() - Date.now()) / 86_400_000)).toBe(linksQ.PAY_LINK_DAYS);
    expect(linksQ.PAY_LINK_DAYS).toBe(30);
    // The owner's view of the invoice never carries the hash.
    expect(JSON.stringify(invoicesQ.getInvoice(owner, invoice.id))).not.toContain(stored.payTokenHash!);
  });

  test("a job without the customer's e-mail, a void or a paid invoice gets no link", () => {
    expect(() => linksQ.issuePayLink(owner, issued(null).id)).toThrow(/e-mail/);
    const voided = issued();
    invoicesQ.voidInvoice(owner, voided.id);
    expect(() => linksQ.issuePayLink(owner, voided.id)).toThrow(ConflictError);
    const paid = issued();
    getDb().update(invoices).set({ status: "paid", paidAt: new Date() }).where(eq(invoices.id, paid.id)).run();
    expect(() => linksQ.issuePayLink(owner, paid.id)).toThrow(/already paid/);
  });
});

describe("opening and paying", () => {
  test("the first open is recorded once, in viewedAt and the Log; a new send starts it over and retires the old token", () => {
    const invoice = issued();
    const first = linksQ.issuePayLink(owner, invoice.id);
    expect(linksQ.openPayLink(first.token).state).toBe("open");
    const seen = row(invoice.id).viewedAt;
    expect(seen).toBeInstanceOf(Date);
    linksQ.openPayLink(first.token);
    expect(row(invoice.id).viewedAt).toEqual(seen);
    expect(viewedLogs(invoice.jobId)).toHaveLength(1);

    const second = linksQ.issuePayLink(owner, invoice.id);
    expect(row(invoice.id).viewedAt).toBeNull();
    expect(linksQ.openPayLink(first.token).state).toBe("unknown");
    expect(() => linksQ.payableByLink(first.token)).toThrow(NotFoundError);
    const open = linksQ.openPayLink(second.token);
    expect(open.state === "open" && open.invoice.totalMinor).toBe(invoice.totalMinor);
  });

  test("expired, void and paid links are gone (410), each saying why; paid shows its thanks", () => {
    const invoice = issued();
    const { token } = linksQ.issuePayLink(owner, invoice.id);
    expect(linksQ.payableByLink(token).totalMinor).toBe(invoice.totalMinor);

    getDb()
      .update(invoices)
      .set({ payTokenExpiresAt: new Date(Date.now() - 1) })
      .where(eq(invoices.id, invoice.id))
      .run();
    expect(() => linksQ.payableByLink(token)).toThrow(/expired/);
    expect(linksQ.openPayLink(token).state).toBe("expired");

    getDb().update(invoices).set({ status: "paid", paidAt: new Date() }).where(eq(invoices.id, invoice.id)).run();
    // Paid wins over expired: the customer who paid late still sees their thanks.
    expect(linksQ.openPayLink(token).state).toBe("paid");
    expect(() => linksQ.payableByLink(token)).toThrow(GoneError);
    expect(() => linksQ.payableByLink(token)).toThrow(/already paid/);

    const voided = issued();
    const v = linksQ.issuePayLink(owner, voided.id);
    invoicesQ.voidInvoice(owner, voided.id);
    expect(linksQ.openPayLink(v.token).state).toBe("void");
    expect(() => linksQ.payableByLink(v.token)).toThrow(GoneError);
  });

  test("a Checkout Session is stored only over the one the caller saw (of two opened at once, one wins)", () => {
    const invoice = issued();
    const { token } = linksQ.issuePayLink(owner, invoice.id);
    expect(linksQ.recordPayLinkSession(token, "cs_first", null)).toBe(true);
    expect(linksQ.recordPayLinkSession(token, "cs_second", null)).toBe(false);
    expect(row(invoice.id).checkoutSessionId).toBe("cs_first");
    expect(invoicesQ.recordCheckoutSession(owner, invoice.id, "cs_third", "cs_first")).toBe(true);
    expect(linksQ.invoiceForReturn("cs_third")).toMatchObject({ id: invoice.id, status: "issued", workshopId: owner.workshopId });
    expect(linksQ.invoiceForReturn("cs_first")).toBeUndefined();
  });
});
