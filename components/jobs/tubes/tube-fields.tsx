"use client";

import type { FieldErrors, UseFormRegister } from "react-hook-form";
import { Field } from "@/components/ui/field";
import { SelectField } from "@/components/ui/select-field";
import { TUBE_VERDICTS, TUBE_VERDICT_LABELS, type TubeVerdict } from "@/lib/vocabulary";
import { fieldError } from "../record-form";

/** What a tube form holds: text as typed; the tester's two numbers sit together as `test`. */
export interface TubeForm {
  position: string;
  type: string;
  function: string;
  test: { reading: string; minimum: string };
  verdict: TubeVerdict;
  substitute: string;
}

export const EMPTY_TUBE: TubeForm = { position: "", type: "", function: "", test: { reading: "", minimum: "" }, verdict: "not-tested", substitute: "" };

/** Blank tester numbers mean no test: absent when adding, cleared (null) when editing. */
export function tubeBody(v: TubeForm, blankTest: null | undefined) {
  const blank = !v.test.reading.trim() && !v.test.minimum.trim();
  return { ...v, test: blank ? blankTest : v.test };
}

export const TYPES_LIST_ID = "gb-tube-types";

/** The types the built-in tables know, offered as the person types (any type may still be entered). */
export function TubeTypeOptions({ types }: { types: readonly string[] }) {
  return (
    <datalist id={TYPES_LIST_ID}>
      {types.map((t) => (
        <option key={t} value={t} />
      ))}
    </datalist>
  );
}

export function TubeFields({
  idPrefix,
  register,
  errors,
  withPlace = true,
}: {
  idPrefix: string;
  register: UseFormRegister<TubeForm>;
  errors: FieldErrors<TubeForm>;
  withPlace?: boolean;
}) {
  const id = (n: string) => `${idPrefix}-${n}`;
  const err = (n: string) => fieldError(errors as Record<string, unknown>, n);
  return (
    <>
      {withPlace ? (
        <>
          <Field id={id("position")} label="Position" placeholder="V3 or CRT" autoComplete="off" error={err("position")} {...register("position")} />
          <Field id={id("type")} label="Type" placeholder="6SN7GT" list={TYPES_LIST_ID} autoComplete="off" error={err("type")} {...register("type")} />
          <Field id={id("function")} label="Function" placeholder="Vertical oscillator" error={err("function")} {...register("function")} />
        </>
      ) : null}
      <Field
        id={id("reading")}
        label="Tester reading"
        placeholder="42"
        inputMode="decimal"
        hint="On the tester's own scale"
        error={err("test.reading") ?? err("test")}
        {...register("test.reading")}
      />
      <Field
        id={id("minimum")}
        label="Tester minimum"
        placeholder="35"
        inputMode="decimal"
        hint="From the tester's roll chart"
        error={err("test.minimum")}
        {...register("test.minimum")}
      />
      <SelectField
        id={id("verdict")}
        label="Verdict"
        options={TUBE_VERDICTS.map((v) => ({ value: v, label: TUBE_VERDICT_LABELS[v] }))}
        error={err("verdict")}
        {...register("verdict")}
      />
      <Field
        id={id("substitute")}
        label="Substitute"
        placeholder="Blank for none"
        list={TYPES_LIST_ID}
        autoComplete="off"
        error={err("substitute")}
        {...register("substitute")}
      />
    </>
  );
}
