"use client";

import { useFieldArray, useFormContext, useWatch } from "react-hook-form";
import { Field } from "@/components/ui/field";
import { buttonClass } from "@/components/ui/button";
import type { InputMeta } from "@/lib/calc/types";
import { errorAt } from "@/lib/bench/errors";
import { DEFAULT_CHOKE_RESISTANCE } from "@/lib/calc/choke-default";
import { BAND_PAINT } from "./band-paint";
import { PilotLampInput } from "./pilot-lamp-input";

/** The list inputs: filter stages, heaters, tube types and colour bands, each editable row by row. */

const small = buttonClass("secondary", "!min-h-11 !px-3 !py-1 text-note");
const remove = "inline-flex min-h-11 items-center rounded-chip px-3 text-note font-bold text-flag hover:bg-flag-bg";

export function ListInput({ meta }: { meta: InputMeta; slug: string }) {
  if (meta.name === "stages") return <StagesInput meta={meta} />;
  if (meta.name === "heaters") return <HeatersInput meta={meta} />;
  if (meta.name === "bands") return <BandsInput meta={meta} />;
  if (meta.name === "pilotLamp") return <PilotLampInput meta={meta} />;
  return <NamesInput meta={meta} />;
}

function ListFrame({ meta, children, actions }: { meta: InputMeta; children: React.ReactNode; actions: React.ReactNode }) {
  const { formState } = useFormContext();
  const error = errorAt(formState.errors, meta.name);
  const id = `in-${meta.name}`;
  return (
    <fieldset className="rounded-card border border-rule bg-sunk/40 p-4" aria-describedby={`${id}-error`}>
      <legend className="px-1 font-bold">{meta.label}</legend>
      {meta.help ? <p className="mb-3 text-note text-muted">{listHelp(meta)}</p> : null}
      <div className="flex flex-col gap-3">{children}</div>
      <div className="mt-3 flex flex-wrap gap-2">{actions}</div>
      <p id={`${id}-error`} role="alert" className="mt-1 min-h-5 text-note font-bold text-flag">
        {error ?? ""}
      </p>
    </fieldset>
  );
}

/** The module's help describes the JSON shape; on a form, say it in words. */
function listHelp(meta: InputMeta): string {
  if (meta.name === "stages")
    return "In order after the reservoir capacitor: a resistor or a choke, each followed by a capacitor to ground, and the current each one carries.";
  if (meta.name === "heaters") return "Each heater's rated voltage and current, from the tube's data.";
  if (meta.name === "bands")
    return "From the end nearest a lead: figures, multiplier, then the tolerance band (gold, silver, …) and, on six-band parts, the temperature-coefficient band last.";
  return meta.help ?? "";
}

function StagesInput({ meta }: { meta: InputMeta }) {
  const { control, register, formState } = useFormContext();
  const { fields, append, remove: drop } = useFieldArray({ control, name: "stages" });
  const kinds = (useWatch({ control, name: "stages" }) as { kind: string }[] | undefined) ?? [];
  return (
    <ListFrame
      meta={meta}
      actions={
        <>
          <button
            type="button"
            className={small}
            onClick={() => append({ kind: "rc", resistance: "1k", chokeResistance: "", inductance: "", capacitance: "20 uF", current: "" })}
          >
            Add RC stage
          </button>
          <button
            type="button"
            className={small}
            onClick={() => append({ kind: "lc", resistance: "", chokeResistance: "", inductance: "10 H", capacitance: "20 uF", current: "" })}
          >
            Add LC stage
          </button>
        </>
      }
    >
      {fields.length === 0 ? <p className="text-note text-muted">No stages: the ripple shown is on the reservoir capacitor.</p> : null}
      {fields.map((f, i) => {
        const lc = kinds[i]?.kind === "lc";
        const base = `stages.${i}`;
        const idBase = `in-stages-${i}`;
        return (
          <div key={f.id} className="rounded-chip border border-rule bg-panel p-3" role="group" aria-label={`Stage ${i + 1}`}>
            <div className="mb-2 flex items-center gap-3">
              <span className="font-bold">Stage {i + 1}</span>
              <label className="sr-only" htmlFor={`${idBase}-kind`}>
                Stage {i + 1} kind
              </label>
              <select id={`${idBase}-kind`} className="min-h-11 rounded-chip border border-edge bg-panel px-2 text-ink" {...register(`${base}.kind`)}>
                <option value="rc">RC (resistor)</option>
                <option value="lc">LC (choke)</option>
              </select>
              <button type="button" className={`${remove} ml-auto`} onClick={() => drop(i)}>
                Remove<span className="sr-only"> stage {i + 1}</span>
              </button>
            </div>
            <div className="grid gap-x-3 sm:grid-cols-2">
              {lc ? (
                <Field
                  id={`${idBase}-inductance`}
                  label={`Stage ${i + 1} choke`}
                  suffix="H"
                  autoComplete="off"
                  error={errorAt(formState.errors, `${base}.inductance`)}
                  {...register(`${base}.inductance`)}
                />
              ) : (
                <Field
                  id={`${idBase}-resistance`}
                  label={`Stage ${i + 1} resistor`}
                  suffix="Ω"
                  autoComplete="off"
                  error={errorAt(formState.errors, `${base}.resistance`)}
                  {...register(`${base}.resistance`)}
                />
              )}
              <Field
                id={`${idBase}-capacitance`}
                label={`Stage ${i + 1} capacitor`}
                suffix="F"
                autoComplete="off"
                error={errorAt(formState.errors, `${base}.capacitance`)}
                {...register(`${base}.capacitance`)}
              />
              {lc ? (
                // The form keeps the winding apart from an RC stage's resistor; the schema calls both "resistance".
                <Field
                  id={`${idBase}-choke-resistance`}
                  label={`Stage ${i + 1} choke resistance`}
                  suffix="Ω"
                  autoComplete="off"
                  placeholder={`${DEFAULT_CHOKE_RESISTANCE}`}
                  hint={`Measured across the choke, set off and discharged. Blank: ${DEFAULT_CHOKE_RESISTANCE} Ω, typical.`}
                  error={errorAt(formState.errors, `${base}.resistance`)}
                  {...register(`${base}.chokeResistance`)}
                />
              ) : null}
              <Field
                id={`${idBase}-current`}
                label={`Stage ${i + 1} current`}
                suffix="A"
                autoComplete="off"
                placeholder="whole load"
                hint="Only what flows through this stage (later stages often feed just the preamp). Blank: the whole load current."
                error={errorAt(formState.errors, `${base}.current`)}
                {...register(`${base}.current`)}
              />
            </div>
          </div>
        );
      })}
    </ListFrame>
  );
}

function HeatersInput({ meta }: { meta: InputMeta }) {
  const { control, register, formState } = useFormContext();
  const { fields, append, remove: drop } = useFieldArray({ control, name: "heaters" });
  return (
    <ListFrame
      meta={meta}
      actions={
        <button type="button" className={small} onClick={() => append({ voltage: "12.6", current: "150m" })}>
          Add heater
        </button>
      }
    >
      {fields.length === 0 ? <p className="text-note text-muted">No heaters yet: add one for each tube in the string.</p> : null}
      {fields.map((f, i) => (
        <div key={f.id} className="grid items-start gap-x-3 sm:grid-cols-[1fr_1fr_auto]" role="group" aria-label={`Heater ${i + 1}`}>
          <Field
            id={`in-heaters-${i}-voltage`}
            label={`Heater ${i + 1} voltage`}
            suffix="V"
            autoComplete="off"
            error={errorAt(formState.errors, `heaters.${i}.voltage`)}
            {...register(`heaters.${i}.voltage`)}
          />
          <Field
            id={`in-heaters-${i}-current`}
            label={`Heater ${i + 1} current`}
            suffix="A"
            autoComplete="off"
            error={errorAt(formState.errors, `heaters.${i}.current`)}
            {...register(`heaters.${i}.current`)}
          />
          <button type="button" className={`${remove} sm:mt-7`} onClick={() => drop(i)}>
            Remove<span className="sr-only"> heater {i + 1}</span>
          </button>
        </div>
      ))}
    </ListFrame>
  );
}

/** A list of plain strings (tube type numbers), edited as a whole array. */
function useStringList(name: string) {
  const { control, setValue } = useFormContext();
  const list = ((useWatch({ control, name }) as string[] | undefined) ?? []).map(String);
  const set = (next: string[]) => setValue(name, next, { shouldDirty: true, shouldTouch: true });
  return { list, set };
}

function NamesInput({ meta }: { meta: InputMeta }) {
  const { formState } = useFormContext();
  const { list, set } = useStringList(meta.name);
  const listId = `in-${meta.name}-options`;
  return (
    <ListFrame
      meta={meta}
      actions={
        <button type="button" className={small} onClick={() => set([...list, ""])}>
          Add tube
        </button>
      }
    >
      <datalist id={listId}>
        {(meta.options ?? []).map((o) => (
          <option key={o} value={o} />
        ))}
      </datalist>
      {list.length === 0 ? <p className="text-note text-muted">No tubes yet: add each tube in the string.</p> : null}
      <div className="grid gap-x-3 sm:grid-cols-2">
        {list.map((name, i) => (
          <div key={i} className="flex items-start gap-1">
            <Field
              id={`in-${meta.name}-${i}`}
              label={`Tube ${i + 1}`}
              list={listId}
              value={name}
              autoComplete="off"
              spellCheck={false}
              className="flex-1"
              error={errorAt(formState.errors, `${meta.name}.${i}`)}
              onChange={(e) => set(list.map((x, j) => (j === i ? e.target.value : x)))}
            />
            <button type="button" className={`${remove} mt-7`} onClick={() => set(list.filter((_, j) => j !== i))}>
              Remove<span className="sr-only"> tube {i + 1}</span>
            </button>
          </div>
        ))}
      </div>
    </ListFrame>
  );
}

function BandsInput({ meta }: { meta: InputMeta }) {
  const { formState } = useFormContext();
  const { list, set } = useStringList(meta.name);
  const colours = (meta.options ?? []).filter((c) => c !== "none");
  const error = errorAt(formState.errors, meta.name);
  return (
    <ListFrame
      meta={meta}
      actions={
        <>
          <button type="button" className={small} disabled={list.length >= 6} onClick={() => set(addBand(list))}>
            Add band
          </button>
          <button type="button" className={small} disabled={list.length <= 3} onClick={() => set(removeBand(list))}>
            Remove band
          </button>
        </>
      }
    >
      <ResistorPicture bands={list} />
      <div className="grid gap-3 sm:grid-cols-3">
        {list.map((c, i) => (
          <div key={i} className="flex flex-col gap-1">
            <label htmlFor={`in-bands-${i}`} className="text-note font-bold">
              {bandName(i, list.length)}
            </label>
            <div className="flex items-center gap-2">
              <span className="h-6 w-3 shrink-0 rounded-sm border border-rule" style={{ background: BAND_PAINT[c] ?? "transparent" }} aria-hidden="true" />
              <select
                id={`in-bands-${i}`}
                value={c}
                aria-invalid={error ? true : undefined}
                aria-describedby={error ? "in-bands-error" : undefined}
                onChange={(e) => set(list.map((x, j) => (j === i ? e.target.value : x)))}
                className="min-h-11 w-full rounded-chip border border-edge bg-panel px-2 text-ink"
              >
                {colours.map((o) => (
                  <option key={o} value={o}>
                    {o}
                  </option>
                ))}
              </select>
            </div>
          </div>
        ))}
      </div>
    </ListFrame>
  );
}

/** 3 → 4 bands adds a tolerance band, 4 → 5 a third figure, 5 → 6 a temperature-coefficient band (IEC 60062:2016). */
function addBand(list: string[]): string[] {
  if (list.length === 3) return [...list, "gold"];
  if (list.length === 4) return [...list.slice(0, 2), "black", ...list.slice(2)];
  return [...list, "brown"];
}

function removeBand(list: string[]): string[] {
  if (list.length === 6) return list.slice(0, 5);
  if (list.length === 5) return list.filter((_, j) => j !== 2);
  return list.slice(0, 3);
}

function bandName(i: number, n: number): string {
  const figures = n >= 5 ? 3 : 2;
  if (i < figures) return `Band ${i + 1}: figure`;
  if (i === figures) return `Band ${i + 1}: multiplier`;
  if (i === figures + 1) return `Band ${i + 1}: tolerance`;
  return `Band ${i + 1}: temperature coefficient`;
}

/** A resistor body with its bands, drawn from the chosen colours. */
export function ResistorPicture({ bands }: { bands: readonly string[] }) {
  // Figure and multiplier bands bunched at one end, the tolerance band apart at the other, as on the part.
  // Six bands: tolerance and temperature coefficient both sit apart.
  const apart = bands.length === 6 ? 2 : bands.length > 3 ? 1 : 0;
  const x = (i: number) => (i >= bands.length - apart ? 142 - (bands.length - 1 - i) * 14 : 54 + i * 14);
  return (
    <svg viewBox="0 0 200 44" className="h-12 w-full max-w-xs" role="img" aria-label={`Resistor with bands ${bands.join(", ")}`}>
      <line x1="0" y1="22" x2="200" y2="22" stroke="rgb(var(--gb-muted))" strokeWidth="3" />
      <rect x="40" y="6" width="120" height="32" rx="12" fill="#d9c7a3" stroke="rgb(var(--gb-rule))" />
      {bands.map((c, i) => (
        <rect key={i} x={x(i)} y="6" width="8" height="32" fill={BAND_PAINT[c] ?? "transparent"} />
      ))}
    </svg>
  );
}
