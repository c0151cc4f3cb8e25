import { describe, expect, test } from "vitest";
import { Client, signedIn } from "../helpers/http";
import { addMember, ownWorkshop } from "../helpers/workshops";

type Row = { id: number; email: string; role: string };
const members = async (c: Client) => (await (await c.get("/api/workshop/members")).json()).members as Row[];

describe("members and roles through the real server", () => {
  test("every role reads the member list; passwords never appear", async () => {
    const shop = await ownWorkshop("Readers");
    const tech = await addMember(shop.client, "technician");
    const apprentice = await addMember(shop.client, "apprentice");
    for (const client of [shop.client, tech.client, apprentice.client]) {
      const list = await members(client);
      expect(list.map((m) => m.email)).toEqual([shop.owner.email, tech.email, apprentice.email]);
      expect(list.map((m) => m.role)).toEqual(["owner", "technician", "apprentice"]);
      expect(list.map((m) => m.email)).not.toContain("owner@demo.test");
      expect(JSON.stringify(list)).not.toMatch(/hash|scrypt|password/i);
    }
  });

  test("technicians and apprentices cannot change roles, remove members or change settings", async () => {
    const shop = await ownWorkshop("Denied");
    const tech = await addMember(shop.client, "technician");
    const apprentice = await addMember(shop.client, "apprentice");
    const list = await members(shop.client);
    const ownerRow = list.find((m) => m.role === "owner")!;
    const apprenticeRow = list.find((m) => m.email === apprentice.email)!;
    for (const actor of [tech.client, apprentice.client]) {
      const promote = await actor.patch(`/api/workshop/members/${apprenticeRow.id}`, { role: "owner" });
      expect(promote.status).toBe(403);
      expect((await promote.json()).error.message).toMatch(/role does not allow/);
      expect((await actor.patch(`/api/workshop/members/${ownerRow.id}`, { role: "apprentice" })).status).toBe(403);
      expect((await actor.request("DELETE", `/api/workshop/members/${ownerRow.id}`)).status).toBe(403);
      expect(
        (await actor.patch("/api/workshop", { name: "Taken over", contactEmail: "", contactPhone: "", address: "", readyMessageTemplate: "" })).status,
      ).toBe(403);
      expect((await actor.get("/api/workshop/audit")).status).toBe(403);
    }
    expect((await members(shop.client)).map((m) => [m.email, m.role])).toEqual(list.map((m) => [m.email, m.role]));
    // The demo technician cannot touch the demo workshop either.
    const demoTech = await signedIn("tech@demo.test");
    const demoOwner = (await members(demoTech)).find((m) => m.email === "owner@demo.test")!;
    expect((await demoTech.patch(`/api/workshop/members/${demoOwner.id}`, { role: "apprentice" })).status).toBe(403);
  });

  test("the owner changes a role; the member's next request has the new role; the audit trail records it", async () => {
    const shop = await ownWorkshop("Roles");
    const person = await addMember(shop.client, "apprentice");
    const row = (await members(shop.client)).find((m) => m.email === person.email)!;
    const res = await shop.client.patch(`/api/workshop/members/${row.id}`, { role: "technician" });
    expect(res.status).toBe(200);
    expect((await res.json()).member.role).toBe("technician");
    expect((await (await person.client.get("/api/me")).json()).role).toBe("technician");
    const events = (await (await shop.client.get("/api/workshop/audit")).json()).events as { action: string; detail: Record<string, string> }[];
    expect(events[0]).toMatchObject({ action: "member.role-changed", detail: { email: person.email, from: "apprentice", to: "technician" } });
    const bad = await shop.client.patch(`/api/workshop/members/${row.id}`, { role: "manager" });
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.fields.role).toBeTruthy();
  });

  test("the last owner can neither be demoted nor removed; with a second owner they can", async () => {
    const shop = await ownWorkshop("Owners");
    const ownerRow = (await members(shop.client))[0];
    const demote = await shop.client.patch(`/api/workshop/members/${ownerRow.id}`, { role: "technician" });
    expect(demote.status).toBe(409);
    expect((await demote.json()).error.message).toMatch(/at least one owner/);
    const remove = await shop.client.request("DELETE", `/api/workshop/members/${ownerRow.id}`);
    expect(remove.status).toBe(409);
    expect((await (await shop.client.get("/api/me")).json()).role).toBe("owner");

    const second = await addMember(shop.client, "owner");
    expect((await (await second.client.get("/api/me")).json()).role).toBe("owner");
    expect((await shop.client.patch(`/api/workshop/members/${ownerRow.id}`, { role: "technician" })).status).toBe(200);
    // Now the second owner is the last one.
    const secondRow = (await members(second.client)).find((m) => m.email === second.email)!;
    expect((await second.client.request("DELETE", `/api/workshop/members/${secondRow.id}`)).status).toBe(409);
  });

  test("a removed member loses access to the workshop at once", async () => {
    const shop = await ownWorkshop("Remove");
    const person = await addMember(shop.client, "technician");
    expect((await person.client.get("/api/workshop/members")).status).toBe(200);
    const row = (await members(shop.client)).find((m) => m.email === person.email)!;
    const res = await shop.client.request("DELETE", `/api/workshop/members/${row.id}`);
    expect(res.status).toBe(200);
    expect((await members(shop.client)).map((m) => m.email)).not.toContain(person.email);
    expect((await person.client.get("/api/workshop/members")).status).toBe(401);
    const events = (await (await shop.client.get("/api/workshop/audit")).json()).events as { action: string }[];
    expect(events[0].action).toBe("member.removed");
  });

  test("an owner cannot reach another workshop's memberships", async () => {
    const a = await ownWorkshop("Iso A");
    const b = await ownWorkshop("Iso B");
    const bRow = (await members(b.client))[0];
    expect((await a.client.patch(`/api/workshop/members/${bRow.id}`, { role: "apprentice" })).status).toBe(404);
    expect((await a.client.request("DELETE", `/api/workshop/members/${bRow.id}`)).status).toBe(404);
    expect((await a.client.patch(`/api/workshop/members/not-a-number`, { role: "apprentice" })).status).toBe(404);
    expect((await members(b.client))[0].role).toBe("owner");
  });

  test("a foreign origin cannot remove a member", async () => {
    const shop = await ownWorkshop("Origin");
    const person = await addMember(shop.client, "apprentice");
    const row = (await members(shop.client)).find((m) => m.email === person.email)!;
    expect((await shop.client.request("DELETE", `/api/workshop/members/${row.id}`, undefined, { origin: "https://evil.example" })).status).toBe(403);
    expect((await members(shop.client)).map((m) => m.email)).toContain(person.email);
  });
});

describe("workshop settings", () => {
  test("the owner saves name and contact details; blanks become empty; all bad fields are named", async () => {
    const shop = await ownWorkshop("Settings");
    const res = await shop.client.patch("/api/workshop", {
      name: "Kiln Row Wireless",
      contactEmail: "Bench@KilnRow.example",
      contactPhone: "01632 960 001",
      address: "",
      readyMessageTemplate: "Hello {customer}",
    });
    expect(res.status).toBe(200);
    expect((await res.json()).workshop).toMatchObject({
      name: "Kiln Row Wireless",
      contactEmail: "bench@kilnrow.example",
      address: null,
      readyMessageTemplate: "Hello {customer}",
    });
    expect((await (await shop.client.get("/api/me")).json()).workshop.name).toBe("Kiln Row Wireless");
    const bad = await shop.client.patch("/api/workshop", {
      name: "",
      contactEmail: "nope",
      contactPhone: "x".repeat(41),
      address: "",
      readyMessageTemplate: "",
    });
    expect(bad.status).toBe(400);
    expect(Object.keys((await bad.json()).error.fields).sort()).toEqual(["contactEmail", "contactPhone", "name"]);
    const events = (await (await shop.client.get("/api/workshop/audit")).json()).events as { action: string }[];
    expect(events.map((e) => e.action)).toContain("workshop.updated");
  });

  test("signed out, the workshop API is a JSON 401", async () => {
    for (const path of ["/api/workshop", "/api/workshop/members", "/api/workshop/audit"]) {
      const res = await new Client().get(path);
      expect(res.status).toBe(401);
      expect(res.headers.get("content-type")).toMatch(/json/);
    }
  });
});
