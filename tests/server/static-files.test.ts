import { describe, expect, test } from "vitest";
import { Client } from "../helpers/http";

/** public/ is served as it stands: robots.txt keeps token links and member pages out of search engines. */
describe("static files from public/", () => {
  test("robots.txt disallows the estimate, pay, invitation and reset links and the member areas, and leaves the Bench open", async () => {
    const res = await new Client().get("/robots.txt");
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/^text\/plain/);
    const rules = (await res.text())
      .split("\n")
      .filter((l) => l.startsWith("Disallow:"))
      .map((l) => l.slice("Disallow:".length).trim());
    for (const path of ["/estimate/", "/pay/", "/invite/", "/reset-password/", "/jobs/", "/invoices/", "/workshop/"]) expect(rules).toContain(path);
    expect(rules.some((p) => "/bench/cathode-bias".startsWith(p) || p === "/")).toBe(false);
  });
});
