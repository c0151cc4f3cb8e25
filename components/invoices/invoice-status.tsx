const LABELS = {
  issued: ["Issued, not paid", "bg-caution-bg"],
  paid: ["Paid", "bg-ok-bg"],
  void: ["Void", "bg-sunk"],
} as const;

export function InvoiceStatus({ status }: { status: keyof typeof LABELS }) {
  const [label, style] = LABELS[status];
  return (
    <span className={`rounded-full border border-rule px-3 py-1 text-note font-bold text-ink ${style}`} data-testid="invoice-status">
      {label}
    </span>
  );
}
