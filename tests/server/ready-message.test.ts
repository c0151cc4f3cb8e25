import { describe, expect, test } from "vitest";
import { Client, signedIn } from "../helpers/http";
import { mailTo, waitForMail } from "../helpers/mail";
import { address, addMember, ownWorkshop } from "../helpers/workshops";

async function readyJob(owner: Client, customerEmail: string | null) {
  const res = await owner.post("/api/jobs", {
    title: "Two-band portable, early 1960s",
    equipmentKind: "table-radio",
    customerName: "Morwenna Kitto",
    customerEmail,
  });
  if (res.status !== 201) throw new Error(`create job: ${res.status} ${await res.text()}`);
  const { job } = await res.json();
  // A finished record, so the checks before "ready" have nothing to say: one power-up session, passed.
  const { session } = await (await owner.post(`/api/jobs/${job.id}/power-ups`, { limiter: "variac", stopCurrent: "1 A" })).json();
  await owner.patch(`/api/jobs/${job.id}/power-ups/${session.id}`, { outcome: "passed" });
  return job.id as number;
}

const setStatus = (c: Client, id: number, status: string) => c.post(`/api/jobs/${id}/status`, { status });

describe("the customer's ready-to-collect e-mail", () => {
  test("at the ready state a technician sends the template message with the bench sheet attached", async () => {
    const shop = await ownWorkshop("Ready");
    await shop.client.patch("/api/workshop", {
      name: shop.workshopName,
      contactEmail: "",
      contactPhone: "01632 960 777",
      address: "",
      readyMessageTemplate: "Dear {customer}, your {set} is ready at {workshop}. Ring {phone}.",
    });
    const tech = await addMember(shop.client, "technician");
    const customer = address("customer");
    const id = await readyJob(shop.client, customer);

    const early = await tech.client.post(`/api/jobs/${id}/ready-message`, { subject: "Ready", text: "Ready" });
    expect(early.status).toBe(409);
    expect((await early.json()).error.message).toMatch(/At the counter/);
    expect(mailTo(customer)).toEqual([]);

    expect((await setStatus(tech.client, id, "at-the-counter")).status).toBe(200);
    const { draft } = await (await tech.client.get(`/api/jobs/${id}/ready-message`)).json();
    expect(draft).toMatchObject({ canSend: true, to: customer });
    expect(draft.text).toBe(`Dear Morwenna Kitto, your Two-band portable, early 1960s is ready at ${shop.workshopName}. Ring 01632 960 777.`);

    const res = await tech.client.post(`/api/jobs/${id}/ready-message`, { subject: draft.subject, text: `${draft.text}\n\nThe dial cord is new too.` });
    expect(res.status).toBe(200);
    const mail = await waitForMail(customer);
    expect(mail.subject).toBe(draft.subject);
    expect(mail.text.trim()).toBe(`${draft.text}\n\nThe dial cord is new too.`);
    expect(mail.attachments).toHaveLength(1);
    expect(mail.attachments[0]).toMatchObject({ filename: `bench-sheet-job-${id}.pdf`, contentType: "application/pdf" });
    expect(mail.attachments[0].content.subarray(0, 5).toString()).toBe("%PDF-");

    const log = await (await tech.client.get(`/api/jobs/${id}/log`)).json();
    expect(JSON.stringify(log)).toContain(`Collection message e-mailed to ${customer}`);
  });

  test("apprentices cannot send; a job without a customer e-mail cannot be sent; bad input names fields", async () => {
    const shop = await ownWorkshop("Ready rules");
    const apprentice = await addMember(shop.client, "apprentice");
    const id = await readyJob(shop.client, null);
    expect((await setStatus(shop.client, id, "at-the-counter")).status).toBe(200);
    expect((await apprentice.client.post(`/api/jobs/${id}/ready-message`, { subject: "Hi", text: "Hi" })).status).toBe(403);
    const noEmail = await shop.client.post(`/api/jobs/${id}/ready-message`, { subject: "Hi", text: "Hi" });
    expect(noEmail.status).toBe(409);
    expect((await noEmail.json()).error.message).toMatch(/customer's e-mail/);
    const bad = await shop.client.post(`/api/jobs/${id}/ready-message`, { subject: "", text: "" });
    expect(bad.status).toBe(400);
    expect(Object.keys((await bad.json()).error.fields).sort()).toEqual(["subject", "text"]);
  });

  test("another workshop's job is not found", async () => {
    const other = await signedIn("other@demo.test");
    const shop = await ownWorkshop("Ready iso");
    const id = await readyJob(shop.client, address("iso-customer"));
    expect((await other.get(`/api/jobs/${id}/ready-message`)).status).toBe(404);
    expect((await other.post(`/api/jobs/${id}/ready-message`, { subject: "x", text: "y" })).status).toBe(404);
  });
});
