import type { Metadata } from "next";
import { BillLines } from "@/components/customer/bill-lines";
import { KeepTheBackOn } from "@/components/customer/keep-the-back-on";
import { PayButton } from "@/components/pay/pay-button";
import { Notice } from "@/components/customer/notice";
import { Card } from "@/components/ui/card";
import { openPayLink } from "@/db/queries/invoice-links";
import { formatMoney } from "@/lib/money";
import { EQUIPMENT_KIND_LABELS } from "@/lib/vocabulary";

// The token is the credential: never indexed, never sent on as a referrer (not even to the card payment page).
export const metadata: Metadata = { title: "Your invoice", robots: { index: false, follow: false }, referrer: "no-referrer" };
export const dynamic = "force-dynamic";

const longDate = (d: Date | null) => (d ? d.toLocaleDateString("en-GB", { day: "numeric", month: "long", year: "numeric" }) : "");

type Contact = { name: string; contactEmail: string | null; contactPhone: string | null };
const reach = (w: Contact) => `${w.name}${w.contactEmail ? ` at ${w.contactEmail}` : ""}${w.contactPhone ? ` or on ${w.contactPhone}` : ""}`;

/** The customer's invoice from the e-mailed link: what the work came to and a way to pay by card; once paid, only thanks. */
export default async function PayPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const found = token.length >= 20 && token.length <= 200 ? openPayLink(token) : { state: "unknown" as const };

  if (found.state === "unknown") {
    return <Notice title="This link is not valid">Check that the whole link from the e-mail was opened, or ask the workshop to send the invoice again.</Notice>;
  }
  if (found.state === "paid") {
    return (
      <Notice title="Paid, thank you" testId="paid">
        Invoice {found.number} from {found.workshop.name} was paid{found.paidAt ? ` on ${longDate(found.paidAt)}` : ""}. There is nothing more to do; you can
        close this page.
      </Notice>
    );
  }
  if (found.state === "void") {
    return (
      <Notice title="This invoice was withdrawn">
        {found.workshop.name} has cancelled invoice {found.number}, so there is nothing to pay. Questions? Contact {reach(found.workshop)}.
      </Notice>
    );
  }
  if (found.state === "expired") {
    return (
      <Notice title="This link has expired">
        Ask {reach(found.workshop)} to send invoice {found.number} again.
      </Notice>
    );
  }

  const { workshop, job, invoice } = found;
  const total = formatMoney(invoice.totalMinor, invoice.currency);
  return (
    <div className="flex flex-col gap-6">
      <div>
        <p className="text-note font-bold uppercase tracking-wide text-muted">
          Invoice {invoice.number} from {workshop.name}
        </p>
        <h1 className="break-words text-title font-bold">{job.title}</h1>
        <p className="text-muted">
          {EQUIPMENT_KIND_LABELS[job.equipmentKind]}
          {job.year ? `, ${job.year}` : ""}
          {job.customerName ? ` · for ${job.customerName}` : ""} · issued {longDate(invoice.issuedAt)}
        </p>
      </div>
      <Card>
        <BillLines {...invoice} totalLabel="To pay" />
      </Card>
      <div>
        <PayButton token={token} total={total} />
        <p className="text-note text-muted">
          The card payment page belongs to our payment service; your card details go to them, not to us. This link works until {longDate(invoice.expiresAt)}.
        </p>
      </div>
      <KeepTheBackOn when="home" />
      <p className="text-note text-muted">Questions about the work or the bill? Contact {reach(workshop)}.</p>
    </div>
  );
}
