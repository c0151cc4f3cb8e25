import { NextResponse } from "next/server";
import { createCustomer, listCustomers } from "@/db/queries/customers";
import { route } from "@/server/http/route";
import { customerListQuerySchema, customerSchema } from "@/lib/customers/schemas";

export const GET = route({ query: customerListQuerySchema }, ({ member, query }) => NextResponse.json({ customers: listCustomers(member, query.q) }));

export const POST = route({ role: "editJobs", body: customerSchema }, ({ member, body }) =>
  NextResponse.json({ customer: createCustomer(member, body) }, { status: 201 }),
);
