const LABELS = {
  draft: ["Draft", "bg-sunk text-ink"],
  sent: ["Waiting for the customer", "bg-glow-bg text-ink"],
  approved: ["Approved by the customer", "bg-ok-bg text-ink"],
  declined: ["Declined by the customer", "bg-flag-bg text-ink"],
} as const;

export function EstimateStatus({ status }: { status: keyof typeof LABELS }) {
  const [label, style] = LABELS[status];
  return (
    <span className={`rounded-full border border-rule px-3 py-1 text-note font-bold ${style}`} data-testid="estimate-status">
      {label}
    </span>
  );
}
