import { NextResponse } from "next/server";
import { deleteCustomer, getCustomer, updateCustomer } from "@/db/queries/customers";
import { route } from "@/server/http/route";
import { customerUpdateSchema } from "@/lib/customers/schemas";

const ids = { id: "That customer" };

/** The customer with every job of theirs. */
export const GET = route({ ids }, ({ member, ids }) => NextResponse.json({ customer: getCustomer(member, ids.id) }));

export const PATCH = route({ role: "editJobs", ids, body: customerUpdateSchema }, ({ member, ids, body }) =>
  NextResponse.json({ customer: updateCustomer(member, ids.id, body) }),
);

/** Owners only; a customer with jobs stays (409). */
export const DELETE = route({ role: "deleteJobs", ids }, ({ member, ids }) => {
  deleteCustomer(member, ids.id);
  return NextResponse.json({ deleted: true });
});
