"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { PART_KINDS, PART_STATES, PART_STATE_LABELS, type PartState } from "@/lib/vocabulary";
import { sendJson } from "@/lib/client/fetch-json";
import { PART_KIND_LABELS } from "@/lib/jobs/part-schemas";
import type { PartRow as Part } from "@/db/queries/parts";

const TEXT_FIELDS = ["designator", "originalValue", "originalRating", "replacementValue", "replacementRating"] as const;
const cell = "px-3 py-2 align-top";
const input = "w-full min-h-9 rounded-chip border border-edge bg-panel px-2 py-1";
const STATE_TONE: Record<PartState, string> = { "to-order": "text-caution", ordered: "text-signal", fitted: "text-ok" };

/** One part, edited in place: click Edit, change the cells, Save (PATCH with only what changed). */
export function PartRow({ jobId, part, canEdit, caution, readingNote }: { jobId: number; part: Part; canEdit: boolean; caution: boolean; readingNote?: string }) {
  const router = useRouter();
  const [editing, setEditing] = useState(false);
  const [draft, setDraft] = useState(part);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<string | null>(null);

  async function save(changes: Partial<Part>) {
    setMessage(null);
    const res = await sendJson(`/api/jobs/${jobId}/parts/${part.id}`, changes, "PATCH");
    if (!res.ok) {
      setErrors(res.fields);
      return setMessage(res.message);
    }
    setErrors({});
    setEditing(false);
    router.refresh();
  }
  async function remove() {
    if (!window.confirm(`Remove ${part.designator} from the parts list?`)) return;
    const res = await sendJson(`/api/jobs/${jobId}/parts/${part.id}`, undefined, "DELETE");
    if (!res.ok) return setMessage(res.message);
    router.refresh();
  }

  if (editing) {
    const changed = Object.fromEntries(Object.entries(draft).filter(([k, v]) => (part as Record<string, unknown>)[k] !== v));
    return (
      <tr className="bg-sunk/50" data-testid={`part-${part.designator}`}>
        {TEXT_FIELDS.slice(0, 1).map((f) => (
          <td key={f} className={cell}>
            <input aria-label="Ref." className={input} value={draft[f] ?? ""} onChange={(e) => setDraft({ ...draft, [f]: e.target.value })} aria-invalid={errors[f] ? true : undefined} />
          </td>
        ))}
        <td className={cell}>
          <select aria-label="Kind" className={input} value={draft.kind} onChange={(e) => setDraft({ ...draft, kind: e.target.value as Part["kind"] })}>
            {PART_KINDS.map((k) => <option key={k} value={k}>{PART_KIND_LABELS[k]}</option>)}
          </select>
        </td>
        {[["originalValue", "originalRating", "Original"], ["replacementValue", "replacementRating", "Replacement"]].map(([v, r, label]) => (
          <td key={v} className={cell}>
            <div className="flex flex-col gap-1">
              <input aria-label={`${label} value`} className={input} value={(draft[v as keyof Part] as string) ?? ""} onChange={(e) => setDraft({ ...draft, [v]: e.target.value })} />
              <input aria-label={`${label} rating`} className={input} value={(draft[r as keyof Part] as string) ?? ""} onChange={(e) => setDraft({ ...draft, [r]: e.target.value })} />
            </div>
          </td>
        ))}
        <td className={cell} colSpan={2}>
          <div className="flex flex-wrap gap-2">
            <button type="button" className="min-h-9 rounded-chip bg-glow px-3 font-bold text-glow-ink" onClick={() => save(changed)}>Save</button>
            <button type="button" className="min-h-9 rounded-chip border border-rule px-3 font-bold" onClick={() => { setDraft(part); setEditing(false); setErrors({}); }}>Cancel</button>
          </div>
          {message ? <p role="alert" className="mt-1 text-note font-bold text-flag">{Object.values(errors)[0] ?? message}</p> : null}
        </td>
      </tr>
    );
  }
  const pair = (v: string | null, r: string | null) => (v || r ? <><span className="font-mono">{v ?? "—"}</span> <span className="text-muted">{r}</span></> : <span className="text-muted">—</span>);
  return (
    <tr className={caution ? "bg-caution-bg/60" : undefined} data-testid={`part-${part.designator}`}>
      <td className={`${cell} font-mono font-bold`}>{part.designator}</td>
      <td className={cell}>{PART_KIND_LABELS[part.kind]}</td>
      <td className={cell}>{pair(part.originalValue, part.originalRating)}</td>
      <td className={cell}>{pair(part.replacementValue, part.replacementRating)}{caution ? <span className="ml-2 font-bold text-caution" title="See the caution above">⚠</span> : null}
        {readingNote ? <span className="block text-note text-muted" data-testid={`reading-note-${part.designator}`}>{readingNote}</span> : null}
      </td>
      <td className={cell}>
        {canEdit ? (
          <select aria-label={`State of ${part.designator}`} className={`${input} font-bold ${STATE_TONE[part.state]}`} value={part.state} onChange={(e) => save({ state: e.target.value as PartState })}>
            {PART_STATES.map((s) => <option key={s} value={s}>{PART_STATE_LABELS[s]}</option>)}
          </select>
        ) : (
          <span className={`font-bold ${STATE_TONE[part.state]}`}>{PART_STATE_LABELS[part.state]}</span>
        )}
      </td>
      <td className={`${cell} whitespace-nowrap text-right`}>
        {canEdit ? (
          <>
            <button type="button" className="min-h-9 rounded-chip px-2 font-bold text-signal hover:bg-sunk" onClick={() => setEditing(true)} aria-label={`Edit ${part.designator}`}>Edit</button>
            <button type="button" className="min-h-9 rounded-chip px-2 font-bold text-flag hover:bg-flag-bg" onClick={remove} aria-label={`Remove ${part.designator}`}>Remove</button>
          </>
        ) : null}
        {message && !editing ? <p role="alert" className="text-note font-bold text-flag">{message}</p> : null}
      </td>
    </tr>
  );
}
