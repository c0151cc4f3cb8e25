import { ROLES, type Role } from "@/lib/vocabulary";

export const ROLE_LABELS: Record<Role, string> = { owner: "Owner", technician: "Technician", apprentice: "Apprentice" };
export const ROLE_OPTIONS = ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }));
