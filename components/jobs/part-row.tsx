"use client";

import { useState } from "react";
import { PART_KINDS, PART_STATES, PART_STATE_LABELS, type PartState } from "@/lib/vocabulary";
import { useAction } from "@/components/ui/use-submit";
import { formatMoney, minorExponent, toDecimalString } from "@/lib/money";
import type { PartFlag } from "@/lib/jobs/part-flags";
import { PART_KIND_LABELS } from "@/lib/jobs/part-schemas";
import type { PartRow as Part } from "@/db/queries/parts";

const cell = "px-3 py-2 align-top";
const input = "w-full min-h-11 rounded-chip border border-edge bg-panel px-2 py-1";
const STATE_TONE: Record<PartState, string> = { "to-order": "text-caution", ordered: "text-signal", fitted: "text-ok" };
const TEXTS = [
  "designator",
  "kind",
  "originalValue",
  "originalRating",
  "replacementValue",
  "replacementRating",
  "quantity",
  "supplier",
  "supplierPartNumber",
  "unitCost",
] as const;
type Draft = Record<(typeof TEXTS)[number], string>;

/** The row as the edit fields hold it: every value as text, the unit cost as the exact decimal of its minor units. */
function toDraft(part: Part, currency: string | null): Draft {
  const cost = currency && part.unitCostMinor != null ? toDecimalString(part.unitCostMinor, minorExponent(currency)) : "";
  const text = (v: string | number | null | undefined) => (v == null ? "" : String(v));
  return {
    designator: part.designator,
    kind: part.kind,
    originalValue: text(part.originalValue),
    originalRating: text(part.originalRating),
    replacementValue: text(part.replacementValue),
    replacementRating: text(part.replacementRating),
    quantity: String(part.quantity),
    supplier: text(part.supplier),
    supplierPartNumber: text(part.supplierPartNumber),
    unitCost: cost,
  };
}

/**
 * One part, edited in place: click Edit, change the cells, Save (PATCH with only what changed). The order
 * column shows how many, the supplier and their part number, and the unit cost when `currency` is given
 * (never to apprentices). `flags` are what the read values tell (lib/jobs/part-flags.ts).
 */
export function PartRow({
  jobId,
  part,
  canEdit,
  caution,
  readingNote,
  currency = null,
  flags = [],
}: {
  jobId: number;
  part: Part;
  canEdit: boolean;
  caution: boolean;
  readingNote?: string;
  currency?: string | null;
  flags?: PartFlag[];
}) {
  const [editing, setEditing] = useState(false);
  const [draft, setDraft] = useState(() => toDraft(part, currency));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const { run, error: message } = useAction({ url: `/api/jobs/${jobId}/parts/${part.id}` });

  // The cells are plain inputs, not a react-hook-form form: the field messages are kept here.
  async function save(changes: Record<string, unknown>) {
    const res = await run(changes, { method: "PATCH" });
    setErrors(res.ok ? {} : res.fields);
    if (res.ok) setEditing(false);
  }
  async function remove() {
    if (!window.confirm(`Remove ${part.designator} from the parts list?`)) return;
    await run(undefined, { method: "DELETE" });
  }

  const common = { part, currency, message, save, setEditing };
  if (editing) return <PartEditRow {...common} draft={draft} setDraft={setDraft} errors={errors} onCancel={() => setErrors({})} />;
  return <PartViewRow {...common} canEdit={canEdit} caution={caution} readingNote={readingNote} flags={flags} remove={remove} />;
}

interface RowActions {
  part: Part;
  currency: string | null;
  message: string | null;
  save: (changes: Record<string, unknown>) => Promise<void>;
  setEditing: (editing: boolean) => void;
}

/** The row as edit fields: Save sends only what changed; Cancel puts the stored values back. */
function PartEditRow({
  part,
  currency,
  message,
  save,
  setEditing,
  draft,
  setDraft,
  errors,
  onCancel,
}: RowActions & { draft: Draft; setDraft: (d: Draft) => void; errors: Record<string, string>; onCancel: () => void }) {
  const before = toDraft(part, currency);
  const changed = Object.fromEntries(TEXTS.filter((k) => draft[k] !== before[k]).map((k) => [k, draft[k]]));
  const box = (f: (typeof TEXTS)[number], label: string, extra: React.ComponentProps<"input"> = {}) => (
    <input
      aria-label={label}
      className={input}
      value={draft[f]}
      onChange={(e) => setDraft({ ...draft, [f]: e.target.value })}
      aria-invalid={errors[f] ? true : undefined}
      {...extra}
    />
  );
  return (
    <tr className="bg-sunk/50" data-testid={`part-${part.designator}`}>
      <td className={cell} data-label="Ref.">
        {box("designator", "Ref.")}
      </td>
      <td className={cell} data-label="Kind">
        <select aria-label="Kind" className={input} value={draft.kind} onChange={(e) => setDraft({ ...draft, kind: e.target.value })}>
          {PART_KINDS.map((k) => (
            <option key={k} value={k}>
              {PART_KIND_LABELS[k]}
            </option>
          ))}
        </select>
      </td>
      {(["original", "replacement"] as const).map((side) => (
        <td key={side} className={cell} data-label={side === "original" ? "Original" : "Replacement"}>
          <div className="flex flex-col gap-1">
            {box(`${side}Value`, `${side === "original" ? "Original" : "Replacement"} value`)}
            {box(`${side}Rating`, `${side === "original" ? "Original" : "Replacement"} rating`)}
          </div>
        </td>
      ))}
      <td className={cell} data-label="Order">
        <div className="flex flex-col gap-1">
          {box("quantity", "Quantity", { inputMode: "numeric" })}
          {box("supplier", "Supplier", { list: "part-suppliers" })}
          {box("supplierPartNumber", "Supplier's part number")}
          {currency ? box("unitCost", `Unit cost (${currency})`, { inputMode: "decimal", placeholder: "Unit cost" }) : null}
        </div>
      </td>
      <td className={cell} colSpan={2}>
        <div className="flex flex-wrap gap-2">
          <button type="button" className="min-h-11 rounded-chip bg-glow px-3 font-bold text-glow-ink" onClick={() => save(changed)}>
            Save
          </button>
          <button
            type="button"
            className="min-h-11 rounded-chip border border-rule px-3 font-bold"
            onClick={() => {
              setDraft(before);
              setEditing(false);
              onCancel();
            }}
          >
            Cancel
          </button>
        </div>
        {message ? (
          <p role="alert" className="mt-1 text-note font-bold text-flag">
            {Object.values(errors)[0] ?? message}
          </p>
        ) : null}
      </td>
    </tr>
  );
}

/** The row as read: values, what they tell, the order, the state (a select for editors), Edit and Remove. */
function PartViewRow({
  part,
  currency,
  message,
  save,
  setEditing,
  canEdit,
  caution,
  readingNote,
  flags,
  remove,
}: RowActions & { canEdit: boolean; caution: boolean; readingNote?: string; flags: PartFlag[]; remove: () => Promise<void> }) {
  const pair = (v: string | null | undefined, r: string | null | undefined) =>
    v || r ? (
      <>
        <span className="font-mono">{v ?? "—"}</span> <span className="text-muted">{r}</span>
      </>
    ) : (
      <span className="text-muted">—</span>
    );
  const order = [part.quantity > 1 ? `×${part.quantity}` : null, part.supplier, part.supplierPartNumber].filter(Boolean).join(" · ");
  return (
    <tr className={caution ? "bg-caution-bg/60" : undefined} data-testid={`part-${part.designator}`}>
      <td className={`${cell} font-mono font-bold`}>{part.designator}</td>
      <td className={cell} data-label="Kind">
        {PART_KIND_LABELS[part.kind]}
      </td>
      <td className={cell} data-label="Original">
        {pair(part.originalValue, part.originalRating)}
      </td>
      <td className={cell} data-label="Replacement">
        {pair(part.replacementValue, part.replacementRating)}
        {caution ? (
          <span className="ml-2 font-bold text-caution" title="See the caution above">
            ⚠
          </span>
        ) : null}
        {readingNote ? (
          <span className="block text-note text-muted" data-testid={`reading-note-${part.designator}`}>
            {readingNote}
          </span>
        ) : null}
        {flags.map((f) => (
          <span
            key={f.message}
            className={`block text-note ${f.level === "caution" ? "font-bold text-caution" : "text-muted"}`}
            data-testid={`part-flag-${part.designator}`}
          >
            {f.message}
          </span>
        ))}
      </td>
      <td className={cell} data-label="Order" data-testid={`part-order-${part.designator}`}>
        {order ? <span className="block text-note">{order}</span> : <span className="text-muted">—</span>}
        {currency && part.unitCostMinor != null ? <span className="block font-mono text-note">{formatMoney(part.unitCostMinor, currency)} each</span> : null}
      </td>
      <td className={cell} data-label="State">
        {canEdit ? (
          <select
            aria-label={`State of ${part.designator}`}
            className={`${input} min-w-32 font-bold ${STATE_TONE[part.state]}`}
            value={part.state}
            onChange={(e) => save({ state: e.target.value as PartState })}
          >
            {PART_STATES.map((s) => (
              <option key={s} value={s}>
                {PART_STATE_LABELS[s]}
              </option>
            ))}
          </select>
        ) : (
          <span className={`font-bold ${STATE_TONE[part.state]}`}>{PART_STATE_LABELS[part.state]}</span>
        )}
      </td>
      <td className={`${cell} whitespace-nowrap text-right`}>
        {canEdit ? (
          <>
            <button
              type="button"
              className="min-h-11 rounded-chip px-2 font-bold text-signal hover:bg-sunk"
              onClick={() => setEditing(true)}
              aria-label={`Edit ${part.designator}`}
            >
              Edit
            </button>
            <button
              type="button"
              className="min-h-11 rounded-chip px-2 font-bold text-flag hover:bg-flag-bg"
              onClick={remove}
              aria-label={`Remove ${part.designator}`}
            >
              Remove
            </button>
          </>
        ) : null}
        {message ? (
          <p role="alert" className="text-note font-bold text-flag">
            {message}
          </p>
        ) : null}
      </td>
    </tr>
  );
}
