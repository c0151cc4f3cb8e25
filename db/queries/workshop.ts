import { eq } from "drizzle-orm";
import { assertRole, type Member } from "@/lib/auth/member";
import type { WorkshopSettingsInput } from "@/lib/workshop/schemas";
import { getDb } from "../client";
import { workshops } from "../schema";
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
  assertRole(member, ["owner"], "change the workshop's settings");
  return getDb().transaction((tx) => {
    const before = tx.select(settingsColumns).from(workshops).where(eq(workshops.id, member.workshopId)).get();
    const updated = tx.update(workshops).set(input).where(eq(workshops.id, member.workshopId)).returning(settingsColumns).get();
    const changed = (Object.keys(input) as (keyof WorkshopSettingsInput)[]).filter((k) => before?.[k] !== updated[k]);
    if (changed.length) recordAudit(tx, { workshopId: member.workshopId, actorUserId: member.userId, action: "workshop.updated", detail: { changed } });
    return updated;
  });
}
