import { describe, expect, test } from "vitest";
import { assertRole, can, type Member } from "@/lib/auth/member";
import { AuthError } from "@/lib/auth/errors";

const member = (role: Member["role"]): Member => ({ userId: 1, email: "a@b.test", name: "A", workshopId: 1, workshopName: "W", role });

// The role rules of PRODUCT.md, "Users and roles".
describe("role capabilities", () => {
  test.each([
    ["owner", true, true, true, true],
    ["technician", true, true, false, false],
    ["apprentice", false, false, false, false],
  ] as const)("%s: edit jobs %s, change status %s, delete %s, members %s", (role, edit, status, del, members) => {
    const m = member(role);
    expect(can.editJobs(m)).toBe(edit);
    expect(can.changeStatus(m)).toBe(status);
    expect(can.deleteJobs(m)).toBe(del);
    expect(can.manageMembers(m)).toBe(members);
    expect(can.seeMoney(m)).toBe(role === "owner");
  });

  test("assertRole throws a 403 for a role not allowed", () => {
    expect(() => assertRole(member("apprentice"), ["owner", "technician"])).toThrow(AuthError);
    try {
      assertRole(member("apprentice"), ["owner"]);
    } catch (e) {
      expect((e as AuthError).status).toBe(403);
    }
    expect(() => assertRole(member("owner"), ["owner"])).not.toThrow();
  });
});
