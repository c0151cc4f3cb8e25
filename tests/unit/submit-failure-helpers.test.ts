import { describe, expect, it } from "vitest";
import { firstMessage, messageFor, readFailure, readyChecksOf } from "@/lib/client/submit-errors";

// Bodies in docs/PRODUCT.md's error shape ({ error: { message, fields } }); the 409 of a refused "ready"
// carries `checks` beside them (server/http/errors.ts apiError, lib/jobs/ready-checks.ts ReadyChecksError).
describe("messageFor and firstMessage", () => {
  const named = readFailure(400, { error: { message: "Check the marked fields.", fields: { reason: "Say why.", status: "Pick a status." } } });
  const bare = readFailure(403, { error: { message: "Only owners may do this." } });

  it("prefer what the server said of the named input", () => {
    expect(messageFor(named, "reason")).toBe("Say why.");
    expect(messageFor(named, "status")).toBe("Pick a status.");
  });

  it("fall back to the whole message when that input is not named", () => {
    expect(messageFor(named, "subject")).toBe("Check the marked fields.");
    expect(messageFor(bare, "reason")).toBe("Only owners may do this.");
    expect(firstMessage(bare)).toBe("Only owners may do this.");
  });

  it("firstMessage takes the first input message in the body's order", () => {
    expect(firstMessage(named)).toBe("Say why.");
  });
});

describe("readyChecksOf", () => {
  const checks = [
    { id: "parts-not-fitted", message: "2 parts on the list are not fitted yet: C7, R4." },
    { id: "no-passed-power-up", message: "No power-up session has been marked passed." },
  ];

  it("reads the list a 409 carries beside its message", () => {
    const f = readFailure(409, { error: { checks, message: "Before “ready”: …", fields: {} } });
    expect(readyChecksOf(f)).toEqual(checks);
  });

  it("drops list entries without an id and a message", () => {
    const f = readFailure(409, { error: { message: "x", checks: [checks[0], { id: "open-faults" }, null, "text"] } });
    expect(readyChecksOf(f)).toEqual([checks[0]]);
  });

  it("reads checks named as fields when there is no list, and only check names", () => {
    const f = readFailure(409, { error: { message: "x", fields: { "open-faults": "“Hum bars” is not fixed.", reason: "Say why." } } });
    expect(readyChecksOf(f)).toEqual([{ id: "open-faults", message: "“Hum bars” is not fixed." }]);
  });

  it("finds none in any refusal but a 409, so a 400 stays a plain message", () => {
    for (const status of [400, 403, 410, 500, 0]) expect(readyChecksOf(readFailure(status, { error: { message: "x", checks } }))).toEqual([]);
    // A 409 without checks (a draft that cannot be sent) is a plain message too.
    expect(readyChecksOf(readFailure(409, { error: { message: "No e-mail for this customer." } }))).toEqual([]);
  });
});
