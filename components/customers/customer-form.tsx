"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { TextareaField } from "@/components/ui/textarea-field";
import { sendJson } from "@/lib/client/fetch-json";
import { customerSchema, type CustomerInput, type CustomerValues } from "@/lib/customers/schemas";

const NAMES = ["name", "email", "phone", "address", "notes"] as const;
type Existing = { id: number } & Record<(typeof NAMES)[number], string | null>;

/** Add a customer (POST /api/customers) or edit one (PATCH /api/customers/[id]); one zod schema with the server. */
export function CustomerForm({ customer, onDone }: { customer?: Existing; onDone?: () => void }) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const initial = Object.fromEntries(NAMES.map((n) => [n, customer?.[n] ?? ""])) as CustomerInput;
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<CustomerInput, unknown, CustomerValues>({ resolver: zodResolver(customerSchema), defaultValues: initial });
  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const res = customer
      ? await sendJson<{ customer: { id: number } }>(`/api/customers/${customer.id}`, values, "PATCH")
      : await sendJson<{ customer: { id: number } }>("/api/customers", values);
    if (!res.ok) {
      for (const [name, message] of Object.entries(res.fields))
        if ((NAMES as readonly string[]).includes(name)) setError(name as (typeof NAMES)[number], { message });
      return setFormError(res.message);
    }
    if (customer) {
      router.refresh();
      onDone?.();
    } else router.push(`/customers/${res.data.customer.id}`);
  });
  const id = (n: string) => `customer-${n}`;
  return (
    <form
      onSubmit={onSubmit}
      noValidate
      aria-label={customer ? "Edit the customer" : "Add a customer"}
      className="grid grid-cols-1 gap-x-4 gap-y-1 sm:grid-cols-2"
    >
      <Field id={id("name")} label="Name" autoComplete="off" className="sm:col-span-2" error={errors.name?.message} {...register("name")} />
      <Field id={id("email")} label="E-mail" type="email" inputMode="email" autoComplete="off" error={errors.email?.message} {...register("email")} />
      <Field id={id("phone")} label="Phone" type="tel" inputMode="tel" autoComplete="off" error={errors.phone?.message} {...register("phone")} />
      <TextareaField id={id("address")} label="Address" rows={2} className="sm:col-span-2" error={errors.address?.message} {...register("address")} />
      <TextareaField
        id={id("notes")}
        label="Notes"
        className="sm:col-span-2"
        hint="How they like to be reached, what they collect."
        error={errors.notes?.message}
        {...register("notes")}
      />
      <p role="alert" aria-live="polite" className="min-h-6 font-bold text-flag sm:col-span-2">
        {formError ?? ""}
      </p>
      <div className="flex flex-wrap gap-3 sm:col-span-2">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? "Saving…" : customer ? "Save customer" : "Add customer"}
        </Button>
        {onDone ? (
          <Button type="button" variant="secondary" onClick={onDone}>
            Cancel
          </Button>
        ) : null}
      </div>
    </form>
  );
}
