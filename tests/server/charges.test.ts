import { beforeAll, describe, expect, test } from "vitest";
import { Client } from "../helpers/http";
import { createJob, ownWorkshop, testDb } from "../helpers/money-fixtures";
import { makeTeam, type Team } from "../helpers/team";

/**
 * A workshop's charges through the real server: the owner reads and sets them (and estimates then price labour at
 * the new rate), technicians read them, apprentices and strangers get nothing. Every workshop here is a sign-up of
 * this file's own.
 */

let team: Team;
beforeAll(async () => {
  team = await makeTeam("charges");
});

const patch = (client: Client, body: unknown) => client.patch("/api/workshop/charges", body);
const charges = async (client: Client) => (await (await client.get("/api/workshop/charges")).json()).charges;

describe("reading and setting the charges", () => {
  test("a new workshop starts in GBP with no rate; the owner sets one and an estimate prices labour at it", async () => {
    expect(await charges(team.owner)).toEqual({ currency: "GBP", hourlyRateMinor: 0, taxRateBp: 0, currencyLocked: false });

    const res = await patch(team.owner, { currency: "GBP", hourlyRate: "48.50", taxRate: "17.5" });
    expect(res.status).toBe(200);
    expect((await res.json()).charges).toEqual({ currency: "GBP", hourlyRateMinor: 4850, taxRateBp: 1750 });
    expect(await charges(team.owner)).toMatchObject({ currency: "GBP", hourlyRateMinor: 4850, taxRateBp: 1750 });

    // 1.5 h × £48.50 = £72.75; tax 17.5% of 7275 = 1273.125 → 1273; total 8548.
    const { jobId } = createJob(team.workshopId);
    const estimate = await team.owner.request("PUT", `/api/jobs/${jobId}/estimate`, {
      lines: [{ kind: "labour", description: "Realign the IF stages", quantity: "1.5" }],
    });
    expect(estimate.status).toBe(200);
    const body = (await estimate.json()).estimate;
    expect(body.lines[0]).toMatchObject({ unitPriceMinor: 4850, amountMinor: 7275 });
    expect(body).toMatchObject({ currency: "GBP", taxRateBp: 1750, subtotalMinor: 7275, taxMinor: 1273, totalMinor: 8548 });

    // The change is in the audit trail by field name.
    const audit = testDb()
      .prepare("SELECT detail FROM audit_events WHERE workshop_id = ? AND action = 'workshop.charges-updated' ORDER BY id DESC")
      .get(team.workshopId) as { detail: string };
    expect(JSON.parse(audit.detail)).toEqual({ changed: ["hourlyRateMinor", "taxRateBp"] });
  });

  test("a technician reads the charges but cannot change them", async () => {
    const before = await charges(team.owner);
    const read = await team.technician.get("/api/workshop/charges");
    expect(read.status).toBe(200);
    expect((await read.json()).charges).toEqual(before);
    const res = await patch(team.technician, { currency: "GBP", hourlyRate: "1.00", taxRate: "0" });
    expect(res.status).toBe(403);
    expect((await res.json()).error.message).toMatch(/role/i);
    expect(await charges(team.owner)).toEqual(before);
  });

  test("an apprentice can neither read nor change them; signed out is 401", async () => {
    const before = await charges(team.owner);
    const read = await team.apprentice.get("/api/workshop/charges");
    expect(read.status).toBe(403);
    expect(JSON.stringify(await read.json())).not.toMatch(/hourlyRate|currency"/);
    expect((await patch(team.apprentice, { currency: "GBP", hourlyRate: "1.00", taxRate: "0" })).status).toBe(403);
    expect(await charges(team.owner)).toEqual(before);

    const stranger = new Client();
    expect((await stranger.get("/api/workshop/charges")).status).toBe(401);
    expect((await patch(stranger, { currency: "GBP", hourlyRate: "1.00", taxRate: "0" })).status).toBe(401);
  });

  test("another workshop's owner sees and changes only their own charges", async () => {
    const ours = await charges(team.owner);
    expect(ours.hourlyRateMinor).toBeGreaterThan(0);
    const theirs = await charges(team.outsider);
    expect(theirs).toEqual({ currency: "GBP", hourlyRateMinor: 0, taxRateBp: 0, currencyLocked: false });
    expect((await patch(team.outsider, { currency: "EUR", hourlyRate: "1.00", taxRate: "5" })).status).toBe(200);
    expect(await charges(team.outsider)).toMatchObject({ currency: "EUR", hourlyRateMinor: 100, taxRateBp: 500 });
    expect(await charges(team.owner)).toEqual(ours);
  });
});

describe("refusals", () => {
  test("bad input is a 400 naming each field", async () => {
    const before = await charges(team.owner);
    const res = await patch(team.owner, { currency: "XYZ", hourlyRate: "-3", taxRate: "150" });
    expect(res.status).toBe(400);
    const { fields } = (await res.json()).error;
    expect(Object.keys(fields).sort()).toEqual(["currency", "hourlyRate", "taxRate"]);
    expect(fields.currency).toMatch(/GBP/);
    expect(fields.taxRate).toMatch(/100%/);

    const decimals = await patch(team.owner, { currency: "GBP", hourlyRate: "4.567", taxRate: "7.555" });
    expect(decimals.status).toBe(400);
    const second = (await decimals.json()).error.fields;
    expect(Object.keys(second).sort()).toEqual(["hourlyRate", "taxRate"]);
    expect(second.hourlyRate).toMatch(/2 decimals for GBP/);

    const yen = await patch(team.owner, { currency: "JPY", hourlyRate: "45.50", taxRate: "10" });
    expect((await yen.json()).error.fields.hourlyRate).toMatch(/no decimals/);
    const huge = await patch(team.owner, { currency: "GBP", hourlyRate: "250000", taxRate: "10" });
    expect((await huge.json()).error.fields.hourlyRate).toMatch(/at or under/);
    const missing = await patch(team.owner, {});
    expect(Object.keys((await missing.json()).error.fields).sort()).toEqual(["currency", "hourlyRate", "taxRate"]);

    expect(await charges(team.owner)).toEqual(before);
  });

  test("PATCH takes only same-origin JSON", async () => {
    const form = await team.owner.request("PATCH", "/api/workshop/charges", "currency=GBP&hourlyRate=1&taxRate=0", {
      "content-type": "application/x-www-form-urlencoded",
    });
    expect(form.status).toBe(415);
    const foreign = await team.owner.request(
      "PATCH",
      "/api/workshop/charges",
      { currency: "GBP", hourlyRate: "1", taxRate: "0" },
      { origin: "https://elsewhere.example" },
    );
    expect(foreign.status).toBe(403);
    const broken = await team.owner.request("PATCH", "/api/workshop/charges", "{not json", { "content-type": "application/json" });
    expect(broken.status).toBe(400);
    expect((await charges(team.owner)).hourlyRateMinor).not.toBe(100);
  });

  test("the currency stays put once estimates or invoices exist in it", async () => {
    const { owner, workshopId } = await ownWorkshop("Currency");
    // With no documents yet, it may change (and back).
    expect((await patch(owner, { currency: "JPY", hourlyRate: "6000", taxRate: "10" })).status).toBe(200);
    expect(await charges(owner)).toMatchObject({ currency: "JPY", hourlyRateMinor: 6000, currencyLocked: false });
    expect((await patch(owner, { currency: "GBP", hourlyRate: "45.00", taxRate: "20" })).status).toBe(200);

    const { jobId } = createJob(workshopId);
    expect((await owner.request("PUT", `/api/jobs/${jobId}/estimate`, { lines: [{ kind: "labour", description: "Bench test", quantity: "1" }] })).status).toBe(
      200,
    );
    expect((await charges(owner)).currencyLocked).toBe(true);

    const refused = await patch(owner, { currency: "EUR", hourlyRate: "50.00", taxRate: "20" });
    expect(refused.status).toBe(409);
    const { error } = await refused.json();
    expect(Object.keys(error.fields)).toEqual(["currency"]);
    expect(error.message).toMatch(/GBP/);
    expect(await charges(owner)).toMatchObject({ currency: "GBP", hourlyRateMinor: 4500 });

    // The rate and tax may still change in the same currency.
    expect((await patch(owner, { currency: "GBP", hourlyRate: "50.00", taxRate: "20" })).status).toBe(200);
    expect((await charges(owner)).hourlyRateMinor).toBe(5000);
  });

  test("an invoice alone also holds the currency", async () => {
    const { owner, workshopId } = await ownWorkshop("Invoiced");
    const { jobId } = createJob(workshopId);
    // Arranged straight in the database: an issued invoice in GBP, as the invoice tests' flow would leave it.
    testDb()
      .prepare(
        "INSERT INTO invoices (job_id, workshop_id, number, status, currency, tax_rate_bp, subtotal_minor, tax_minor, total_minor, issued_at) VALUES (?, ?, 1, 'issued', 'GBP', 2000, 1000, 200, 1200, ?)",
      )
      .run(jobId, workshopId, Date.now());
    const refused = await patch(owner, { currency: "USD", hourlyRate: "45.00", taxRate: "20" });
    expect(refused.status).toBe(409);
    expect((await refused.json()).error.fields.currency).toMatch(/GBP/);
  });
});
