import { renderToBuffer } from "@react-pdf/renderer";
import { createElement, type ComponentProps } from "react";
import { describe, expect, test } from "vitest";
import { InvoicePdf } from "@/components/invoices/invoice-pdf";

type Invoice = ComponentProps<typeof InvoicePdf>["invoice"];

// An invented invoice: only the fields the document reads.
const invoice = {
  id: 1,
  number: 7,
  currency: "GBP",
  taxRateBp: 2000,
  status: "issued",
  issuedAt: new Date("2025-03-04T10:00:00Z"),
  paidAt: null,
  subtotalMinor: 15450,
  taxMinor: 3090,
  totalMinor: 18540,
  lines: [
    { id: 1, kind: "labour", description: "Recap and bring-up on a current-limited supply", quantityMilli: 3500, unitPriceMinor: 4000, amountMinor: 14000 },
    { id: 2, kind: "part", description: "Filter capacitor 40 µF 450 V (C14)", quantityMilli: 2000, unitPriceMinor: 725, amountMinor: 1450 },
  ],
  job: { title: "Five-tube table radio, 1950s", customerName: "A. Customer" },
  workshop: { name: "Invented Bench Repairs", address: null, contactEmail: null, contactPhone: null },
} as unknown as Invoice;

/** The /BaseFont names a PDF embeds (pdfkit writes font dictionaries uncompressed). */
const baseFonts = (pdf: Buffer) => [...new Set([...pdf.toString("latin1").matchAll(/\/BaseFont\s*\/([\w+-]+)/g)].map((m) => m[1].replace(/^[A-Z]{6}\+/, "")))];

describe("invoice PDF", () => {
  test("is set in our shipped faces, not the PDF library's built-in Helvetica and Courier", async () => {
    const pdf = await renderToBuffer(createElement(InvoicePdf, { invoice }) as Parameters<typeof renderToBuffer>[0]);
    expect(pdf.subarray(0, 5).toString()).toBe("%PDF-");
    const fonts = baseFonts(pdf);
    expect(fonts.some((f) => /AtkinsonHyperlegible/i.test(f))).toBe(true);
    expect(fonts.some((f) => /JetBrainsMono/i.test(f))).toBe(true);
    expect(fonts.filter((f) => /Helvetica|Courier|Times/i.test(f))).toEqual([]);
  });
});
