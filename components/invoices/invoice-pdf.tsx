import { Document, Page, StyleSheet, Text, View } from "@react-pdf/renderer";
import type { getInvoice } from "@/db/queries/invoices";
import { LINE_KIND_LABELS } from "@/lib/vocabulary";
import { formatMoney, formatQuantity, formatTaxRate } from "@/lib/money";
import { LIGHT } from "@/lib/theme/palette";
import { PDF_BODY, PDF_FIGURES } from "@/server/pdf/fonts";

/**
 * The printable invoice, kept beside the job's bench sheet. Built with @react-pdf/renderer's primitives,
 * set in our shipped faces (server/pdf/fonts.ts): words in Atkinson Hyperlegible, money in JetBrains Mono.
 */

type Invoice = ReturnType<typeof getInvoice>;

const ink = LIGHT.ink;
const muted = LIGHT.muted;
const s = StyleSheet.create({
  page: { padding: 40, fontSize: 10, fontFamily: PDF_BODY, color: ink, lineHeight: 1.3 },
  header: { flexDirection: "row", justifyContent: "space-between", marginBottom: 24 },
  title: { fontSize: 20, fontWeight: 700 },
  muted: { color: muted },
  row: { flexDirection: "row", borderBottomWidth: 0.5, borderBottomColor: LIGHT.rule, paddingVertical: 5 },
  head: { fontWeight: 700, borderBottomWidth: 1, borderBottomColor: ink },
  desc: { flex: 1 },
  kind: { width: 60 },
  qty: { width: 50, textAlign: "right", fontFamily: PDF_FIGURES, fontSize: 9 },
  heading: { fontFamily: PDF_BODY, fontSize: 10, fontWeight: 700 },
  money: { width: 84, textAlign: "right", fontFamily: PDF_FIGURES, fontSize: 9 },
  totals: { marginTop: 12, marginLeft: "auto", width: 230 },
  totalRow: { flexDirection: "row", justifyContent: "space-between", paddingVertical: 2 },
  grand: { fontWeight: 700, fontSize: 12, borderTopWidth: 1, borderTopColor: ink, marginTop: 4, paddingTop: 4 },
  grandMoney: { fontWeight: 600, fontSize: 11 },
  stamp: { marginTop: 24, fontSize: 14, fontWeight: 700 },
  foot: { position: "absolute", bottom: 30, left: 40, right: 40, fontSize: 8, color: muted },
});

const date = (d: Date | string | null) => (d ? new Date(d).toLocaleDateString("en-GB", { day: "numeric", month: "long", year: "numeric" }) : "");

export function InvoicePdf({ invoice }: { invoice: Invoice }) {
  const money = (minor: number) => formatMoney(minor, invoice.currency);
  return (
    <Document title={`Invoice ${invoice.number}`} author={invoice.workshop.name}>
      <Page size="A4" style={s.page}>
        <View style={s.header}>
          <View>
            <Text style={s.title}>{invoice.workshop.name}</Text>
            {invoice.workshop.address ? <Text style={s.muted}>{invoice.workshop.address}</Text> : null}
            {invoice.workshop.contactEmail ? <Text style={s.muted}>{invoice.workshop.contactEmail}</Text> : null}
            {invoice.workshop.contactPhone ? <Text style={s.muted}>{invoice.workshop.contactPhone}</Text> : null}
          </View>
          <View>
            <Text style={s.title}>Invoice {invoice.number}</Text>
            <Text style={s.muted}>Issued {date(invoice.issuedAt)}</Text>
            {invoice.job.customerName ? <Text>For {invoice.job.customerName}</Text> : null}
          </View>
        </View>
        <Text style={{ marginBottom: 12 }}>{invoice.job.title}</Text>
        <View style={[s.row, s.head]}>
          <Text style={s.kind}>Kind</Text>
          <Text style={s.desc}>Description</Text>
          <Text style={[s.qty, s.heading]}>Qty</Text>
          <Text style={[s.money, s.heading]}>Unit</Text>
          <Text style={[s.money, s.heading]}>Amount</Text>
        </View>
        {invoice.lines.map((l) => (
          <View style={s.row} key={l.id} wrap={false}>
            <Text style={s.kind}>{LINE_KIND_LABELS[l.kind]}</Text>
            <Text style={s.desc}>{l.description}</Text>
            <Text style={s.qty}>{formatQuantity(l.quantityMilli)}</Text>
            <Text style={s.money}>{money(l.unitPriceMinor)}</Text>
            <Text style={s.money}>{money(l.amountMinor)}</Text>
          </View>
        ))}
        <View style={s.totals}>
          <View style={s.totalRow}>
            <Text>Subtotal</Text>
            <Text style={s.money}>{money(invoice.subtotalMinor)}</Text>
          </View>
          <View style={s.totalRow}>
            <Text>Tax at {formatTaxRate(invoice.taxRateBp)}</Text>
            <Text style={s.money}>{money(invoice.taxMinor)}</Text>
          </View>
          <View style={[s.totalRow, s.grand]}>
            <Text>Total</Text>
            <Text style={[s.money, s.grandMoney]}>{money(invoice.totalMinor)}</Text>
          </View>
        </View>
        {invoice.status === "paid" ? <Text style={s.stamp}>Paid {date(invoice.paidAt)}. Thank you.</Text> : null}
        {invoice.status === "void" ? <Text style={s.stamp}>VOID: this invoice was cancelled.</Text> : null}
        <Text style={s.foot} fixed>
          Lines are rounded to the nearest {invoice.currency} minor unit (halves away from zero); tax is worked out once on the subtotal.
        </Text>
      </Page>
    </Document>
  );
}
