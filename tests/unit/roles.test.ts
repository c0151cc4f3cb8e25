import { describe, expect, test } from "vitest";
import { assertCan, can, type Action, type Member } from "@/lib/auth/can";
import { ForbiddenError } from "@/lib/errors";

const member = (role: Member["role"]): Member => ({ userId: 1, email: "a@b.test", name: "A", workshopId: 1, workshopName: "W", role });

// The role rules of docs/PRODUCT.md, "Users and roles": owners everything; technicians edit jobs, change status and
// prepare estimates but neither delete nor see invoices; apprentices add to the record and nothing more.
const EXPECTED: Record<Action, [owner: boolean, technician: boolean, apprentice: boolean]> = {
  editJobs: [true, true, false],
  changeStatus: [true, true, false],
  deleteJobs: [true, false, false],
  addNotes: [true, true, true],
  prepareEstimates: [true, true, false],
  seeCharges: [true, true, false],
  seeMoney: [true, false, false],
  manageMembers: [true, false, false],
  manageWorkshop: [true, false, false],
  // Drills: apprentices do them; owners and technicians set them and follow apprentices' progress.
  doDrills: [true, true, true],
  assignDrills: [true, true, false],
  followDrills: [true, true, false],
};

describe("role rules", () => {
  test.each(Object.entries(EXPECTED) as [Action, [boolean, boolean, boolean]][])("%s", (action, [owner, technician, apprentice]) => {
    expect([can(member("owner"), action), can(member("technician"), action), can(member("apprentice"), action)]).toEqual([owner, technician, apprentice]);
    // The by-name form reads the same table.
    for (const role of ["owner", "technician", "apprentice"] as const) expect(can[action](member(role))).toBe(can(member(role), action));
  });

  test("assertCan refuses with a ForbiddenError naming what was refused, and passes an allowed role", () => {
    expect(() => assertCan(member("apprentice"), "editJobs", "remove parts")).toThrow(ForbiddenError);
    try {
      assertCan(member("technician"), "seeMoney");
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(ForbiddenError);
      expect((e as ForbiddenError).message).toBe("Your role does not allow you to see invoices.");
    }
    expect(() => assertCan(member("owner"), "deleteJobs")).not.toThrow();
  });
});
