import type { Browser } from "playwright-core";
import { afterAll, beforeAll, expect, test } from "vitest";
import { contextFor, launchBrowser } from "../helpers/browser";
import { baseUrl } from "../helpers/http";
import { waitForMail } from "../helpers/mail";
import { makeTeam, type Team } from "../helpers/team";

/** A technician tells the customer their set is ready, from the job's Overview, and the mail arrives with the bench sheet. */

let browser: Browser;
let team: Team;
beforeAll(async () => {
  [browser, team] = await Promise.all([launchBrowser(), makeTeam("ready")]);
});
afterAll(async () => {
  await browser?.close();
});

test("the collection message panel appears only at the counter and sends the bench sheet", async () => {
  const customer = `customer-${Date.now()}@example.test`;
  const created = await team.technician.post("/api/jobs", {
    title: "Console radio, 1950s",
    equipmentKind: "console-radio",
    customerName: "Wren Halloway",
    customerEmail: customer,
  });
  expect(created.status).toBe(201);
  const { job } = await created.json();
  // A finished record, so the checks before "ready" have nothing to say: one power-up session, passed.
  const { session } = await (await team.technician.post(`/api/jobs/${job.id}/power-ups`, { limiter: "variac", stopCurrent: "1 A" })).json();
  expect((await team.technician.patch(`/api/jobs/${job.id}/power-ups/${session.id}`, { outcome: "passed" })).status).toBe(200);

  const context = await contextFor(browser, team.technician);
  const page = await context.newPage();

  await page.goto(`${baseUrl()}/jobs/${job.id}`);
  await page.getByRole("heading", { name: "Where it is" }).waitFor();
  expect(await page.getByRole("button", { name: "Send to customer" }).count()).toBe(0);

  expect((await team.technician.post(`/api/jobs/${job.id}/status`, { status: "at-the-counter" })).status).toBe(200);
  await page.reload();
  await page.getByRole("button", { name: "Send to customer" }).click();
  await expect.poll(() => page.getByText(`Sent to ${customer} with the bench sheet attached.`).count()).toBe(1);

  const mail = await waitForMail(customer);
  expect(mail.text).toContain("Wren Halloway");
  expect(mail.attachments.map((a) => a.contentType)).toContain("application/pdf");
  await context.close();
});
