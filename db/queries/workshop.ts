import { and, eq, ne } from "drizzle-orm";
import { assertCan, type Member } from "@/lib/auth/can";
import { ConflictError } from "@/lib/errors";
import type { ChargesInput } from "@/lib/workshop/charges-schema";
import type { WorkshopSettingsInput } from "@/lib/workshop/schemas";
import { getDb } from "../client";
import { estimates, invoices, workshops } from "../schema";
import { recordAudit } from "./audit";

const settingsColumns = {
  id: workshops.id,
  name: workshops.name,
  contactEmail: workshops.contactEmail,
  contactPhone: workshops.contactPhone,
  address: workshops.address,
  readyMessageTemplate: workshops.readyMessageTemplate,
};

/** Name and contact details; every member may read them. */
export function getWorkshopSettings(member: Member) {
  const row = getDb().select(settingsColumns).from(workshops).where(eq(workshops.id, member.workshopId)).get();
  if (!row) throw new Error("Member's workshop is missing");
  return row;
}
export type WorkshopSettings = ReturnType<typeof getWorkshopSettings>;

export function updateWorkshopSettings(member: Member, input: WorkshopSettingsInput) {
  assertCan(member, "manageWorkshop", "change the workshop's settings");
  return getDb().transaction((tx) => {
    const before = tx.select(settingsColumns).from(workshops).where(eq(workshops.id, member.workshopId)).get();
    const updated = tx.update(workshops).set(input).where(eq(workshops.id, member.workshopId)).returning(settingsColumns).get();
    const changed = (Object.keys(input) as (keyof WorkshopSettingsInput)[]).filter((k) => before?.[k] !== updated[k]);
    if (changed.length) recordAudit(tx, { workshopId: member.workshopId, actorUserId: member.userId, action: "workshop.updated", detail: { changed } });
    return updated;
  });
}

const chargesColumns = { currency: workshops.currency, hourlyRateMinor: workshops.hourlyRateMinor, taxRateBp: workshops.taxRateBp };

type Reader = Pick<ReturnType<typeof getDb>, "select">;

/** The currency of any estimate or invoice of the workshop (other than `except`), or null when there is none. */
function documentCurrency(tx: Reader, workshopId: number, except?: string): string | null {
  for (const table of [estimates, invoices]) {
    const where = except ? and(eq(table.workshopId, workshopId), ne(table.currency, except)) : eq(table.workshopId, workshopId);
    const row = tx.select({ currency: table.currency }).from(table).where(where).limit(1).get();
    if (row) return row.currency;
  }
  return null;
}

/** Currency, hourly rate and tax rate. Technicians prepare estimates, so they may read them; apprentices see no prices. */
export function getCharges(member: Member) {
  assertCan(member, "seeCharges");
  const db = getDb();
  const row = db.select(chargesColumns).from(workshops).where(eq(workshops.id, member.workshopId)).get();
  if (!row) throw new Error("Member's workshop is missing");
  return { ...row, currencyLocked: documentCurrency(db, member.workshopId) !== null };
}
export type Charges = ReturnType<typeof getCharges>;

/**
 * Owner only. Estimates and invoices copy the currency when they are made, and their amounts are minor units of
 * it, so the currency cannot change while any of them is in another one (a different currency would leave the
 * workshop's documents in two).
 */
export function updateCharges(member: Member, input: ChargesInput) {
  assertCan(member, "manageWorkshop", "change the workshop's charges");
  return getDb().transaction((tx) => {
    const before = tx.select(chargesColumns).from(workshops).where(eq(workshops.id, member.workshopId)).get();
    if (!before) throw new Error("Member's workshop is missing");
    if (input.currency !== before.currency) {
      const held = documentCurrency(tx, member.workshopId, input.currency);
      if (held) {
        const message = `The workshop already has estimates or invoices in ${held}, so the currency stays ${before.currency}.`;
        throw new ConflictError(message, { currency: message });
      }
    }
    const updated = tx.update(workshops).set(input).where(eq(workshops.id, member.workshopId)).returning(chargesColumns).get();
    // Field names only: the trail says what changed, not the figures.
    const changed = (Object.keys(chargesColumns) as (keyof typeof chargesColumns)[]).filter((k) => before[k] !== updated[k]);
    if (changed.length) recordAudit(tx, { workshopId: member.workshopId, actorUserId: member.userId, action: "workshop.charges-updated", detail: { changed } });
    return updated;
  });
}
