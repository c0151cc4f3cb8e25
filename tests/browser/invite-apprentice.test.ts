import type { Browser } from "playwright-core";
import { afterAll, beforeAll, expect, test } from "vitest";
import { launchBrowser } from "../helpers/browser";
import { baseUrl } from "../helpers/http";
import { linkIn, waitForMail } from "../helpers/mail";
import { address } from "../helpers/workshops";

// Pages are opened with waitUntil "networkidle" so React has hydrated the forms before we type.
let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

test("an owner invites an apprentice, who joins from the e-mail and later signs in with the new password", async () => {
  const ownerEmail = address("browser-owner");
  const apprenticeEmail = address("browser-apprentice");
  const workshopName = `Signal Lane Repairs ${Date.now() % 100000}`;

  // The owner opens a workshop of their own, so the demo workshop stays as seeded.
  const owner = await browser.newContext();
  owner.setDefaultTimeout(10_000);
  const page = await owner.newPage();
  await page.goto(`${baseUrl()}/sign-up`, { waitUntil: "networkidle" });
  await page.getByLabel("Workshop name").fill(workshopName);
  await page.getByLabel("Your name").fill("Orla Penrose");
  await page.getByLabel("E-mail").fill(ownerEmail);
  await page.getByLabel("Password").fill("owner passphrase here");
  await page.getByRole("button", { name: "Open my workshop" }).click();
  await page.waitForURL(/\/jobs$/);

  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Workshop" }).click();
  await page.waitForURL(/\/workshop$/);
  const invite = page.getByRole("form", { name: "Invite someone" });
  await invite.getByLabel("E-mail").fill(apprenticeEmail);
  await invite.getByLabel("Role").selectOption("apprentice");
  await invite.getByRole("button", { name: "Send invitation" }).click();
  await expect.poll(() => page.getByRole("status").filter({ hasText: "Invitation sent" }).count()).toBe(1);
  await expect.poll(() => page.getByTestId("invitation-row").filter({ hasText: apprenticeEmail }).count()).toBe(1);

  const mail = await waitForMail(apprenticeEmail);
  expect(mail.subject).toBe(`Join ${workshopName} on Glowbench`);
  const link = linkIn(mail, "/invite/");

  // The apprentice, in a browser of their own, follows the link and chooses a password.
  const apprentice = await browser.newContext();
  apprentice.setDefaultTimeout(10_000);
  const ap = await apprentice.newPage();
  await ap.goto(link, { waitUntil: "networkidle" });
  expect(await ap.getByRole("heading", { level: 1 }).textContent()).toBe(`Join ${workshopName}`);
  await ap.getByLabel("Your name").fill("Dilys Arkwright");
  await ap.getByLabel("Choose a password").fill("apprentice passphrase");
  await ap.getByRole("button", { name: "Create my account and join" }).click();
  await ap.waitForURL(/\/jobs$/);
  await expect.poll(() => ap.getByTestId("member-name").textContent()).toBe("Dilys Arkwright");
  expect(await ap.locator("header").getByTestId("role-badge").textContent()).toBe("apprentice");

  // On /workshop the apprentice sees the members read-only.
  await ap.goto(`${baseUrl()}/workshop`, { waitUntil: "networkidle" });
  await expect.poll(() => ap.getByTestId("member-row").count()).toBe(2);
  expect(await ap.getByRole("combobox").count()).toBe(0);
  expect(await ap.getByRole("button", { name: /Remove/ }).count()).toBe(0);
  expect(await ap.getByRole("form", { name: "Invite someone" }).count()).toBe(0);

  // Signed out, they come back through the ordinary sign-in page.
  await ap.getByRole("button", { name: "Sign out" }).click();
  await ap.waitForURL(/\/sign-in/);
  await ap.getByLabel("E-mail").fill(apprenticeEmail);
  await ap.getByLabel("Password").fill("apprentice passphrase");
  await ap.getByRole("button", { name: "Sign in" }).click();
  await ap.waitForURL(/\/jobs$/);
  expect(await ap.locator("header").getByTestId("role-badge").textContent()).toBe("apprentice");
  expect(await ap.locator("header").textContent()).toContain(workshopName);

  // The owner now sees the apprentice in the list and the join in the audit trail.
  await page.reload();
  await expect.poll(() => page.getByTestId("member-row").filter({ hasText: "Dilys Arkwright" }).count()).toBe(1);
  expect(await page.getByTestId("invitation-row").count()).toBe(0);
  // One join (her sign-in afterwards is a row of its own).
  expect(await page.getByTestId("audit-row").filter({ hasText: "Dilys Arkwright" }).filter({ hasText: "joined" }).count()).toBe(1);

  // The link is spent.
  await ap.goto(link, { waitUntil: "networkidle" });
  expect(await ap.getByRole("heading", { level: 1 }).textContent()).toBe("This invitation cannot be used");
  await owner.close();
  await apprentice.close();
}, 60_000);

test("forgot password: the request page gives one answer and the e-mailed link sets a new password", async () => {
  const ctx = await browser.newContext();
  const page = await ctx.newPage();
  const email = address("browser-reset");
  // An account of the test's own.
  const res = await page.request.post(`${baseUrl()}/api/auth/sign-up`, {
    data: { workshopName: "Reset Row Radios", name: "Cai Pellow", email, password: "old passphrase here" },
  });
  expect(res.status()).toBe(201);
  await ctx.clearCookies();

  await page.goto(`${baseUrl()}/sign-in`, { waitUntil: "networkidle" });
  await page.getByRole("link", { name: "Forgot your password?" }).click();
  await page.waitForURL(/\/forgot-password$/);
  await page.waitForLoadState("networkidle");
  await page.getByLabel("E-mail").fill(email);
  await page.getByRole("button", { name: "Send me a reset link" }).click();
  await expect.poll(() => page.getByRole("status").textContent()).toContain("If that address has a Glowbench account");

  const link = linkIn(await waitForMail(email), "/reset-password/");
  await page.goto(link, { waitUntil: "networkidle" });
  await page.getByLabel("New password").fill("new passphrase here");
  await page.getByLabel("The same again").fill("new passphrase typo");
  await page.getByRole("button", { name: "Set new password" }).click();
  await expect.poll(() => page.locator("#confirm-error").textContent()).toContain("differ");
  await page.getByLabel("The same again").fill("new passphrase here");
  await page.getByRole("button", { name: "Set new password" }).click();
  await page.waitForURL(/\/sign-in\?reset=1$/);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("new passphrase here");
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(/\/jobs$/);
  await expect.poll(() => page.getByTestId("member-name").textContent()).toBe("Cai Pellow");
  await ctx.close();
});
