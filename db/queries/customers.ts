import { and, asc, desc, eq, or, sql } from "drizzle-orm";
import { assertCan, type Member } from "@/lib/auth/can";
import { ConflictError, ValidationError, notFound } from "@/lib/errors";
import type { CustomerUpdate, CustomerValues } from "@/lib/customers/schemas";
import { getDb, type DbOrTx } from "../client";
import { customers, jobs } from "../schema";

/**
 * A workshop's customers and their jobs. Every member reads them (names and contact details are not
 * prices); technicians and owners add and edit; only an owner removes one, and only with no jobs.
 * A job keeps its customer's name and e-mail as a copy (jobs.customerName / customerEmail), so
 * everything that reads those (estimates, the ready message, search) keeps working; editing a
 * customer updates the copy on every job of theirs in the same transaction.
 */

const columns = {
  id: customers.id,
  name: customers.name,
  email: customers.email,
  phone: customers.phone,
  address: customers.address,
  notes: customers.notes,
  createdAt: customers.createdAt,
  updatedAt: customers.updatedAt,
};

const normalEmail = (email: string | null | undefined) => (email ? email.trim().toLowerCase() : email);

function likePattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/** Every customer with how many jobs they have and when one last came in; most recent first. */
export function listCustomers(member: Member, q?: string) {
  // Spelt out: in a one-table select Drizzle leaves columns unqualified, and inside the subquery "id" would be the job's.
  const jobCount = sql<number>`(select count(*) from "jobs" as "j" where "j"."customer_id" = "customers"."id")`;
  const lastJobAt = sql<number | null>`(select max("j"."created_at") from "jobs" as "j" where "j"."customer_id" = "customers"."id")`;
  const where = [eq(customers.workshopId, member.workshopId)];
  if (q) {
    const p = likePattern(q);
    where.push(or(sql`${customers.name} like ${p} escape '\\'`, sql`${customers.email} like ${p} escape '\\'`, sql`${customers.phone} like ${p} escape '\\'`)!);
  }
  return getDb()
    .select({ ...columns, jobCount, lastJobAt })
    .from(customers)
    .where(and(...where))
    .orderBy(desc(sql`coalesce(${lastJobAt}, ${customers.createdAt})`), asc(customers.name))
    .limit(500)
    .all()
    .map((c) => ({ ...c, lastJobAt: c.lastJobAt === null ? null : new Date(c.lastJobAt) }));
}

export type CustomerListRow = ReturnType<typeof listCustomers>[number];

/** A customer and every job of theirs, newest first. */
export function getCustomer(member: Member, customerId: number) {
  const customer = getDb()
    .select(columns)
    .from(customers)
    .where(and(eq(customers.id, customerId), eq(customers.workshopId, member.workshopId)))
    .get();
  if (!customer) throw notFound("That customer");
  const theirJobs = getDb()
    .select({
      id: jobs.id,
      number: jobs.number,
      title: jobs.title,
      equipmentKind: jobs.equipmentKind,
      status: jobs.status,
      createdAt: jobs.createdAt,
      updatedAt: jobs.updatedAt,
    })
    .from(jobs)
    .where(and(eq(jobs.customerId, customerId), eq(jobs.workshopId, member.workshopId)))
    .orderBy(desc(jobs.number))
    .all();
  return { ...customer, jobs: theirJobs };
}

export type CustomerDetail = ReturnType<typeof getCustomer>;

function assertEmailFree(db: DbOrTx, workshopId: number, email: string | null | undefined, except?: number) {
  if (!email) return;
  const taken = db
    .select({ id: customers.id, name: customers.name })
    .from(customers)
    .where(and(eq(customers.workshopId, workshopId), eq(customers.email, email)))
    .get();
  if (taken && taken.id !== except)
    throw new ConflictError(`${taken.name} already has this e-mail address.`, { email: `${taken.name} already has this address; open their record instead.` });
}

export function createCustomer(member: Member, input: CustomerValues) {
  assertCan(member, "editJobs", "add customers");
  return getDb().transaction((tx) => {
    const email = normalEmail(input.email);
    assertEmailFree(tx, member.workshopId, email);
    return tx
      .insert(customers)
      .values({ ...input, email, workshopId: member.workshopId })
      .returning(columns)
      .get();
  });
}

export function updateCustomer(member: Member, customerId: number, input: CustomerUpdate) {
  assertCan(member, "editJobs", "edit customers");
  return getDb().transaction((tx) => {
    const changes = Object.fromEntries(Object.entries({ ...input, email: normalEmail(input.email) }).filter(([, v]) => v !== undefined));
    if (changes.email !== undefined) assertEmailFree(tx, member.workshopId, changes.email as string | null, customerId);
    const customer = tx
      .update(customers)
      .set({ ...changes, updatedAt: new Date() })
      .where(and(eq(customers.id, customerId), eq(customers.workshopId, member.workshopId)))
      .returning(columns)
      .get();
    if (!customer) throw notFound("That customer");
    // The jobs' copy of the name and e-mail follows the record.
    tx.update(jobs)
      .set({ customerName: customer.name, customerEmail: customer.email })
      .where(and(eq(jobs.customerId, customerId), eq(jobs.workshopId, member.workshopId)))
      .run();
    return customer;
  });
}

/** Owners only, and only a customer with no jobs: a job's history keeps its customer. */
export function deleteCustomer(member: Member, customerId: number) {
  assertCan(member, "deleteJobs", "remove customers");
  getDb().transaction((tx) => {
    const { id } =
      tx
        .select({ id: customers.id })
        .from(customers)
        .where(and(eq(customers.id, customerId), eq(customers.workshopId, member.workshopId)))
        .get() ?? {};
    if (!id) throw notFound("That customer");
    const n =
      tx
        .select({ n: sql<number>`count(*)` })
        .from(jobs)
        .where(eq(jobs.customerId, id))
        .get()?.n ?? 0;
    if (n > 0) throw new ConflictError(`This customer has ${n} job${n === 1 ? "" : "s"}; a customer with jobs stays on file.`);
    tx.delete(customers).where(eq(customers.id, id)).run();
  });
}

export interface JobCustomerInput {
  customerId?: number | null;
  customerName?: string | null;
  customerEmail?: string | null;
  customerPhone?: string | null;
}

type JobCustomerColumns = { customerId: number | null; customerName: string | null; customerEmail: string | null };

/**
 * The customer a job is booked for, inside the job's transaction: a chosen record (customerId), else the
 * record with the typed e-mail, else with the typed name when no e-mail is typed, else a new record made
 * from what was typed. Returns undefined when the input says nothing about the customer (a PATCH of
 * other fields), and all nulls when it clears them (the workshop's own set).
 */
export function resolveJobCustomer(tx: DbOrTx, member: Member, input: JobCustomerInput): JobCustomerColumns | undefined {
  const w = member.workshopId;
  const pick = (c: { id: number; name: string; email: string | null }) => ({ customerId: c.id, customerName: c.name, customerEmail: c.email });
  const found = { id: customers.id, name: customers.name, email: customers.email };
  if (typeof input.customerId === "number") {
    const chosen = tx
      .select(found)
      .from(customers)
      .where(and(eq(customers.id, input.customerId), eq(customers.workshopId, w)))
      .get();
    if (!chosen) throw new ValidationError("Some fields need attention.", { customerId: "That customer is not on your workshop's list." });
    return pick(chosen);
  }
  const name = input.customerName?.trim() || null;
  const email = normalEmail(input.customerEmail) || null;
  if (!name && !email) {
    const said = ["customerId", "customerName", "customerEmail"].some((k) => k in input && input[k as keyof JobCustomerInput] !== undefined);
    return said ? { customerId: null, customerName: null, customerEmail: null } : undefined;
  }
  const existing = email
    ? tx
        .select(found)
        .from(customers)
        .where(and(eq(customers.workshopId, w), eq(customers.email, email)))
        .get()
    : tx
        .select(found)
        .from(customers)
        .where(and(eq(customers.workshopId, w), sql`lower(${customers.name}) = lower(${name})`))
        .orderBy(asc(customers.id))
        .get();
  if (existing) return pick(existing);
  const phone = input.customerPhone?.trim() || null;
  return pick(
    tx
      .insert(customers)
      .values({ workshopId: w, name: name ?? email!, email, phone })
      .returning(found)
      .get(),
  );
}
