import { describe, expect, it } from "vitest";
import { dottedPath, fieldErrorsOf, readFailure } from "@/lib/client/submit-errors";

// The error body is docs/PRODUCT.md's route shape: { error: { message, fields } }, fields keyed by input path.
describe("readFailure", () => {
  it("reads the message and every field message of a 400", () => {
    const f = readFailure(400, {
      error: { message: "Check the marked fields.", fields: { email: "Enter an e-mail address.", "lines.0.description": "Describe the line." } },
    });
    expect(f).toMatchObject({ ok: false, status: 400, message: "Check the marked fields." });
    expect(f.fields).toEqual({ email: "Enter an e-mail address.", "lines.0.description": "Describe the line." });
  });

  it("keeps extra members of the error beside message and fields (the checks before ready)", () => {
    const f = readFailure(409, { error: { message: "Not yet.", fields: {}, checks: [{ id: "powerUp" }] } });
    expect(f.details).toEqual({ checks: [{ id: "powerUp" }] });
  });

  it("falls back to the status when the body is not the JSON shape", () => {
    for (const body of [null, "oops", { error: "text" }, { error: { message: "" } }, {}]) {
      const f = readFailure(502, body);
      expect(f.message).toBe("Request failed (502).");
      expect(f.fields).toEqual({});
    }
  });

  it("drops field messages that are not text", () => {
    expect(readFailure(400, { error: { message: "x", fields: { a: 3, b: "", c: "Say something." } } }).fields).toEqual({ c: "Say something." });
  });
});

describe("fieldErrorsOf", () => {
  it("turns bracketed indices into react-hook-form's dotted paths", () => {
    expect(dottedPath("lines[2].price")).toBe("lines.2.price");
    expect(dottedPath("lines.2.price")).toBe("lines.2.price");
    expect(fieldErrorsOf({ "lines[0].quantity": "Too many." })).toEqual([["lines.0.quantity", "Too many."]]);
  });

  it("keeps only the names the form holds, a nested path by its first segment", () => {
    const fields = { email: "Taken.", role: "Pick one.", "test.reading": "A number.", "": "Whole form." };
    expect(fieldErrorsOf(fields, ["email", "test"])).toEqual([
      ["email", "Taken."],
      ["test.reading", "A number."],
    ]);
  });

  it("without a list of names passes every named field and never a nameless one", () => {
    expect(fieldErrorsOf({ a: "1", b: "2", "": "3" })).toEqual([
      ["a", "1"],
      ["b", "2"],
    ]);
  });
});
