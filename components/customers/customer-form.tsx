"use client";

import { useRouter } from "next/navigation";
import { Field } from "@/components/ui/field";
import { FormActions } from "@/components/ui/form-actions";
import { TextareaField } from "@/components/ui/textarea-field";
import { useSchemaForm } from "@/components/ui/use-schema-form";
import { formText } from "@/lib/client/form-text";
import { customerSchema } from "@/lib/customers/schemas";

const NAMES = ["name", "email", "phone", "address", "notes"] as const;
type Existing = { id: number } & Record<(typeof NAMES)[number], string | null>;

/** Add a customer (POST /api/customers) or edit one (PATCH /api/customers/[id]); one zod schema with the server. */
export function CustomerForm({ customer, onDone }: { customer?: Existing; onDone?: () => void }) {
  const router = useRouter();
  // An edit refreshes the page it is on; a new customer opens its own page.
  const { register, errors, submit, formError, pending } = useSchemaForm(customerSchema, formText(NAMES, customer), {
    url: customer ? `/api/customers/${customer.id}` : "/api/customers",
    method: customer ? "PATCH" : "POST",
    fields: NAMES,
    refresh: Boolean(customer),
    onDone: (data: { customer: { id: number } }) => {
      if (customer) onDone?.();
      else router.push(`/customers/${data.customer.id}`);
    },
  });
  const id = (n: string) => `customer-${n}`;
  return (
    <form
      onSubmit={submit}
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
      <FormActions formError={formError} pending={pending} busy="Saving…" onCancel={onDone}>
        {customer ? "Save customer" : "Add customer"}
      </FormActions>
    </form>
  );
}
