import type { Role } from "@/lib/vocabulary";
import { forbidden } from "@/lib/errors";

/** The signed-in person as every query function sees them. Never carries the password hash. */
export interface Member {
  userId: number;
  email: string;
  name: string;
  workshopId: number;
  workshopName: string;
  role: Role;
}

/**
 * The role rules of PRODUCT.md ("Users and roles"), the only place they are written. Pages, the route
 * wrapper and the query functions all ask `can(member, action)`; each action names who may do it and the
 * words a refusal uses ("Your role does not allow you to …").
 */
const RULES = {
  editJobs: { roles: ["owner", "technician"], what: "edit jobs" },
  changeStatus: { roles: ["owner", "technician"], what: "change a job's status" },
  deleteJobs: { roles: ["owner"], what: "delete jobs" },
  addNotes: { roles: ["owner", "technician", "apprentice"], what: "add to a job's record" },
  prepareEstimates: { roles: ["owner", "technician"], what: "prepare estimates" },
  seeCharges: { roles: ["owner", "technician"], what: "see the workshop's charges" },
  seeMoney: { roles: ["owner"], what: "see invoices" },
  manageMembers: { roles: ["owner"], what: "manage the workshop's members" },
  manageWorkshop: { roles: ["owner"], what: "change the workshop's settings" },
  // Drills (PRODUCT.md "Drills"): every member may practise; mentors set drills and follow every apprentice's progress.
  doDrills: { roles: ["owner", "technician", "apprentice"], what: "do drills" },
  assignDrills: { roles: ["owner", "technician"], what: "set drills for apprentices" },
  followDrills: { roles: ["owner", "technician"], what: "see other members' drill progress" },
} as const satisfies Record<string, { roles: readonly Role[]; what: string }>;

export type Action = keyof typeof RULES;

function allowed(member: Pick<Member, "role">, action: Action): boolean {
  return (RULES[action].roles as readonly Role[]).includes(member.role);
}

type Named = { readonly [A in Action]: (member: Pick<Member, "role">) => boolean };

/**
 * `can(member, "editJobs")`. The same rules are reachable by name (`can.editJobs(member)`), which reads
 * better in JSX; both read the one table above.
 */
export const can: ((member: Pick<Member, "role">, action: Action) => boolean) & Named = Object.assign(
  allowed,
  Object.fromEntries((Object.keys(RULES) as Action[]).map((a) => [a, (m: Pick<Member, "role">) => allowed(m, a)])) as Named,
);

/** Refuses with a 403 naming what was refused; `what` overrides the action's own words. */
export function assertCan(member: Pick<Member, "role">, action: Action, what: string = RULES[action].what): void {
  if (!allowed(member, action)) throw forbidden(what);
}
