"use client";

import type { QueryKey } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState, type ReactNode } from "react";
import { Button } from "./button";
import { useAction } from "./use-submit";

/**
 * A record's details page (a customer, a job): edited in place, or deleted after the browser's confirm and
 * left for its list. `remove` asks `question` first.
 */
export function useEditOrRemove({ url, list, question, invalidate }: { url: string; list: string; question: string; invalidate?: QueryKey[] }) {
  const router = useRouter();
  const [editing, setEditing] = useState(false);
  // A list fetched in the browser (the job list) is marked stale first, so the removed record is not shown on the way back.
  const { run, error } = useAction({ url, method: "DELETE", invalidate, onDone: () => router.push(list) });
  async function remove() {
    if (!window.confirm(question)) return;
    await run();
  }
  return { editing, setEditing, remove, error };
}

/** One labelled value of a record; a missing one shows as a muted dash. */
export function Detail({ label, wide = false, className, children }: { label: string; wide?: boolean; className?: string; children: ReactNode }) {
  return (
    <div className={wide ? "sm:col-span-2" : undefined}>
      <dt className="text-note font-bold text-muted">{label}</dt>
      <dd className={className}>{children ?? <span className="text-muted">—</span>}</dd>
    </div>
  );
}

/** Edit and delete, each shown only to whom it is allowed, and the message when a delete is refused. */
export function DetailsActions({
  canEdit,
  canDelete,
  onEdit,
  onDelete,
  deleteLabel,
  error,
}: {
  canEdit: boolean;
  canDelete: boolean;
  onEdit: () => void;
  onDelete: () => void;
  deleteLabel: string;
  error: string | null;
}) {
  return (
    <>
      {canEdit || canDelete ? (
        <div className="mt-5 flex flex-wrap gap-3">
          {canEdit ? (
            <Button variant="secondary" onClick={onEdit}>
              Edit details
            </Button>
          ) : null}
          {canDelete ? (
            <Button variant="destructive" onClick={onDelete}>
              {deleteLabel}
            </Button>
          ) : null}
        </div>
      ) : null}
      <p role="alert" className="mt-2 min-h-5 font-bold text-flag">
        {error ?? ""}
      </p>
    </>
  );
}
