/**
 * The customer's "ready to collect" message: a template the owner edits in the workshop settings,
 * with {placeholders} filled from the job and the workshop. Pure, so the form previews what is sent.
 */

export const READY_PLACEHOLDERS = ["customer", "set", "workshop", "phone", "address"] as const;
export type ReadyValues = Record<(typeof READY_PLACEHOLDERS)[number], string>;

export const DEFAULT_READY_TEMPLATE = `Hello {customer},

Good news from the bench: your {set} is working again and ready to collect from {workshop}.

The bench sheet attached lists what we replaced and what we measured along the way. Please keep it with the set; it will help whoever opens it next.

With thanks,
{workshop}
{phone}
{address}`;

export function renderReadyMessage(template: string | null | undefined, values: ReadyValues): string {
  const filled = (template?.trim() ? template : DEFAULT_READY_TEMPLATE).replace(/\{(\w+)\}/g, (whole, key: string) =>
    (READY_PLACEHOLDERS as readonly string[]).includes(key) ? values[key as keyof ReadyValues] : whole,
  );
  // A blank phone or address leaves no empty lines behind.
  return filled
    .split("\n")
    .map((l) => l.trimEnd())
    .join("\n")
    .replace(/\n{3,}/g, "\n\n")
    .trim();
}

export function readySubject(workshopName: string, setTitle: string): string {
  return `Your ${setTitle} is waiting at our counter — ${workshopName}`;
}
