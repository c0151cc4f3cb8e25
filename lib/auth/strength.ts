import { ZxcvbnFactory } from "@zxcvbn-ts/core";
import { adjacencyGraphs, dictionary as commonWords } from "@zxcvbn-ts/language-common";
import { dictionary as englishWords, translations } from "@zxcvbn-ts/language-en";
import { ValidationError } from "@/lib/errors";

/**
 * How guessable a new password is, by zxcvbn-ts (common passwords, English words and names, keyboard
 * patterns, dates, repeats). The server refuses a weak one; the forms load this module lazily to show
 * the same verdict while typing, so the dictionaries (megabytes) never weigh on a page's first load.
 */

/** zxcvbn's score 3: "safely unguessable: moderate protection from an offline slow-hash scenario". */
export const MIN_SCORE = 3;

/** Only the first 64 characters are analysed: longer phrases are strong by length, and the check stays fast. */
const CHECKED_LENGTH = 64;

let factory: ZxcvbnFactory | undefined;
function checker(): ZxcvbnFactory {
  factory ??= new ZxcvbnFactory({
    dictionary: { ...commonWords, ...englishWords },
    graphs: adjacencyGraphs,
    translations,
    maxLength: CHECKED_LENGTH,
  });
  return factory;
}

export interface Strength {
  score: 0 | 1 | 2 | 3 | 4;
  ok: boolean;
  /** What to do about it, or a word of approval. */
  message: string;
}

const WEAK = "Easy to guess. A few unrelated words make a strong passphrase.";

/** `context`: the person's name, e-mail, workshop: a password built from them is weak. */
export function passwordStrength(password: string, context: string[] = []): Strength {
  const words = context.flatMap((c) => [c, ...c.toLowerCase().split(/[^a-z0-9]+/)]).filter((w) => w.length >= 3);
  const result = checker().check(password, ["glowbench", ...words]);
  const score = result.score as Strength["score"];
  const ok = score >= MIN_SCORE;
  const advice = [result.feedback.warning, ...result.feedback.suggestions].filter(Boolean).join(" ");
  return { score, ok, message: ok ? (score === 4 ? "Strong." : "Good enough; longer would be stronger.") : advice || WEAK };
}

/** The server's check of a new password (after the schema's length rule), naming the field when it fails. */
export function assertStrongPassword(password: string, context: string[] = [], field = "password"): void {
  const s = passwordStrength(password, context);
  if (!s.ok) throw new ValidationError("Choose a harder password.", { [field]: `Too easy to guess. ${s.message}` });
}
