"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { TextareaField } from "@/components/ui/textarea-field";
import { useSubmit } from "@/components/ui/use-submit";
import { customerSchema, type CustomerInput, type CustomerValues } from "@/lib/customers/schemas";

const NAMES = ["name", "email", "phone", "address", "notes"] as const;
type Existing = { id: number } & Record<(typeof NAMES)[number], string | null>;

/** Add a customer (POST /api/customers) or edit one (PATCH /api/customers/[id]); one zod schema with the server. */
export function CustomerForm({ customer, onDone }: { customer?: Existing; onDone?: () => void }) {
  const router = useRouter();
  const initial = Object.fromEntries(NAMES.map((n) => [n, customer?.[n] ?? ""])) as CustomerInput;
  const form = useForm<CustomerInput, unknown, CustomerValues>({ resolver: zodResolver(customerSchema), defaultValues: initial });
  const {
    register,
    formState: { errors, isSubmitting },
  } = form;
  // An edit refreshes the page it is on; a new customer opens its own page.
  const { submit: onSubmit, formError } = useSubmit<CustomerInput, { customer: { id: number } }, CustomerValues>(form, {
    url: customer ? `/api/customers/${customer.id}` : "/api/customers",
    method: customer ? "PATCH" : "POST",
    fields: NAMES,
    refresh: Boolean(customer),
    onDone: (data) => {
      if (customer) onDone?.();
      else router.push(`/customers/${data.customer.id}`);
    },
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
