import type { ReactNode } from "react";

export function Card({ children, className = "" }: { children: ReactNode; className?: string }) {
  return <section className={`rounded-card border border-rule bg-panel p-6 shadow-card ${className}`}>{children}</section>;
}

/** Says what is missing and what to do next. */
export function EmptyState({ title, children, action }: { title: string; children: ReactNode; action?: ReactNode }) {
  return (
    <div className="rounded-card border-2 border-dashed border-rule bg-panel/60 p-10 text-center">
      <h2 className="text-lead font-bold">{title}</h2>
      <div className="mx-auto mt-2 max-w-prose text-muted">{children}</div>
      {action ? <div className="mt-6 flex justify-center">{action}</div> : null}
    </div>
  );
}

export function RoleBadge({ role }: { role: string }) {
  return (
    <span className="rounded-full border border-rule bg-sunk px-2.5 py-0.5 text-note font-bold capitalize text-ink" data-testid="role-badge">
      {role}
    </span>
  );
}
