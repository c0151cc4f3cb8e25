/** How far the invoice has got with the customer: e-mailed, opened, paid. Read from the invoice row, shown to the owner. */

const when = (d: Date | null) =>
  d ? d.toLocaleString("en-GB", { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit" }) : null;

export function InvoiceDelivery({
  sentTo,
  sentAt,
  viewedAt,
  paidAt,
  linkExpired,
}: {
  sentTo: string | null;
  sentAt: Date | null;
  viewedAt: Date | null;
  paidAt: Date | null;
  linkExpired: boolean;
}) {
  const steps = [
    { id: "sent", label: "E-mailed", done: when(sentAt), detail: sentTo ? `to ${sentTo}` : null, pending: "Not sent yet" },
    {
      id: "viewed",
      label: "Opened by the customer",
      done: when(viewedAt),
      detail: null,
      pending: sentAt ? (linkExpired ? "Not opened; the link has expired" : "Not opened yet") : "—",
    },
    { id: "paid", label: "Paid", done: when(paidAt), detail: null, pending: "Not paid yet" },
  ];
  return (
    <ol className="grid gap-3 sm:grid-cols-3" aria-label="Sent, opened, paid">
      {steps.map((s) => (
        <li
          key={s.id}
          className={`rounded-chip border px-3 py-2 ${s.done ? "border-ok/40 bg-ok-bg" : "border-rule bg-sunk"}`}
          data-testid={`delivery-${s.id}`}
          data-done={s.done ? "yes" : "no"}
        >
          <p className="font-bold">{s.label}</p>
          <p className="text-note text-muted">{s.done ? `${s.done}${s.detail ? ` ${s.detail}` : ""}` : s.pending}</p>
        </li>
      ))}
    </ol>
  );
}
