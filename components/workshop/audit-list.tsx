import type { AuditEventRow } from "@/db/queries/audit";

/** Turns an audit row into a sentence in our own words. */
function describe(e: AuditEventRow): string {
  const d = (e.detail ?? {}) as Record<string, string | string[] | undefined>;
  const who = e.actorName ?? "Someone no longer here";
  switch (e.action) {
    case "workshop.created":
      return `${who} opened the workshop.`;
    case "workshop.updated":
      return `${who} changed the workshop settings (${[d.changed ?? []]
        .flat()
        .map((k) => SETTING_NAMES[k] ?? k)
        .join(", ")}).`;
    case "workshop.charges-updated":
      return `${who} changed the workshop's charges (${[d.changed ?? []]
        .flat()
        .map((k) => SETTING_NAMES[k] ?? k)
        .join(", ")}).`;
    case "invitation.created":
      return `${who} invited ${d.email} as ${d.role}.`;
    case "invitation.revoked":
      return d.reason === "undeliverable"
        ? `The invitation to ${d.email} could not be e-mailed and was withdrawn.`
        : `${who} withdrew the invitation to ${d.email}.`;
    case "member.joined":
      return `${d.name} (${d.email}) joined as ${d.role}.`;
    case "member.role-changed":
      return `${who} changed ${d.name}'s role from ${d.from} to ${d.to}.`;
    case "member.removed":
      return `${who} removed ${d.name} (${d.role}).`;
    case "password.reset-requested":
      return `${d.name} asked for a password reset link.`;
    case "password.reset":
      return `${d.name} set a new password; their sessions were ended.`;
    case "password.changed":
      return `${d.name} changed their password; their other sessions were ended.`;
    case "session.signed-in":
      return `${d.name} signed in.`;
    case "session.signed-out":
      return `${d.name} signed out.`;
    case "session.signed-out-everywhere":
      return `${d.name} signed out everywhere.`;
    case "sign-in.delayed":
      return `Sign-ins to ${d.name}'s account were slowed after ${d.failures} wrong passwords in a row.`;
    default:
      return `${who}: ${e.action}`;
  }
}

const SETTING_NAMES: Record<string, string> = {
  name: "name",
  contactEmail: "contact e-mail",
  contactPhone: "phone",
  address: "address",
  readyMessageTemplate: "ready message",
  currency: "currency",
  hourlyRateMinor: "hourly rate",
  taxRateBp: "tax rate",
};

const when = (d: Date) => d.toLocaleString("en-GB", { day: "numeric", month: "short", hour: "2-digit", minute: "2-digit" });

export function AuditList({ events }: { events: AuditEventRow[] }) {
  if (events.length === 0) return <p className="text-muted">Nothing recorded yet. Invitations, role changes and password resets will appear here.</p>;
  return (
    <ol className="divide-y divide-rule" aria-label="Audit trail">
      {events.map((e) => (
        <li key={e.id} className="flex flex-wrap gap-x-4 py-2" data-testid="audit-row">
          <time dateTime={e.createdAt.toISOString()} className="w-32 shrink-0 font-mono text-note text-muted">
            {when(e.createdAt)}
          </time>
          <span className="min-w-0 flex-1">{describe(e)}</span>
        </li>
      ))}
    </ol>
  );
}
