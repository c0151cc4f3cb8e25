import { describe, expect, test } from "vitest";
import { PASSWORD_MIN, newPasswordField, signInSchema } from "@/lib/auth/schemas";
import { MIN_SCORE, assertStrongPassword, passwordStrength } from "@/lib/auth/strength";
import { ValidationError } from "@/lib/errors";

describe("new passwords", () => {
  test("need 12 characters (sign-in takes any length, so older and demo passwords still work)", () => {
    expect(PASSWORD_MIN).toBe(12);
    expect(newPasswordField.safeParse("eleven-char").success).toBe(false);
    expect(newPasswordField.safeParse("twelve chars").success).toBe(true);
    expect(signInSchema.safeParse({ email: "owner@demo.test", password: "short" }).success).toBe(true);
  });

  // zxcvbn-ts scores 0–4; 3 is "safely unguessable" in its documentation. The weak ones are entries of
  // its common-password and keyboard-pattern lists, or repeats.
  test.each(["password1234", "qwertyuiop12", "aaaaaaaaaaaaaa", "123456789012"])("%s is refused as guessable", (pw) => {
    const s = passwordStrength(pw);
    expect(s.score).toBeLessThan(MIN_SCORE);
    expect(s.ok).toBe(false);
    expect(s.message.length).toBeGreaterThan(10);
  });

  test.each(["solder smoke over the chassis", "kettle lane wireless", "a sturdy passphrase"])("%s is accepted", (pw) => {
    expect(passwordStrength(pw).ok).toBe(true);
  });

  test("a password made of the person's own name and workshop counts as weaker", () => {
    const plain = passwordStrength("penhallow kettlelane");
    const own = passwordStrength("penhallow kettlelane", ["Ruth Penhallow", "ruth@kettlelane.example", "Kettle Lane Wireless"]);
    expect(own.score).toBeLessThanOrEqual(plain.score);
    expect(passwordStrength("glowbench-demo").score).toBeLessThan(MIN_SCORE); // the app's own name is in the context
  });

  test("the server's check names the field", () => {
    try {
      assertStrongPassword("password1234", [], "newPassword");
      expect.unreachable();
    } catch (err) {
      expect(err).toBeInstanceOf(ValidationError);
      expect((err as ValidationError).fields.newPassword).toMatch(/guess/i);
    }
    expect(() => assertStrongPassword("solder smoke over the chassis")).not.toThrow();
  });

  test("stays fast on the longest password the schema allows (only 64 characters are analysed)", () => {
    passwordStrength("warm up the dictionaries");
    const started = performance.now();
    passwordStrength("x".repeat(128));
    passwordStrength("a long passphrase typed at the bench with a hot iron in the other hand and more");
    expect(performance.now() - started).toBeLessThan(1000);
  });
});
