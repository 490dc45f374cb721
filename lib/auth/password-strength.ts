import { ZxcvbnFactory } from "@zxcvbn-ts/core";
import { adjacencyGraphs, dictionary as commonWords } from "@zxcvbn-ts/language-common";
import { dictionary as englishWords, translations } from "@zxcvbn-ts/language-en";

// The zxcvbn estimator with its common-password lists and English words and keyboard patterns. Built once, on the
// server only: the dictionaries are too heavy to send to a phone with every form.
const estimator = new ZxcvbnFactory({
  dictionary: { ...commonWords, ...englishWords },
  graphs: adjacencyGraphs,
  translations,
});

// Words of our own that make a password easy to guess for anyone who knows where it is used.
const SITE_WORDS = ["understudy", "tractor", "crawler", "restorer", "password"];

/**
 * Why a new password is too easy to guess, or null when it is not. zxcvbn scores 0 to 4; below 3 ("safely
 * unguessable: moderate protection from offline slow-hash attacks") is refused, with its own advice.
 */
export function passwordWeakness(password: string, userInputs: string[] = []): string | null {
  if (password.trim().length === 0) return "A password of spaces alone is easy to guess.";
  const result = estimator.check(password, [
    ...SITE_WORDS,
    ...userInputs.flatMap((input) => [input, ...input.split(/[@.+_-]/)]),
  ]);
  if (result.score >= 3) return null;
  const advice = [result.feedback.warning, ...result.feedback.suggestions].filter((text): text is string =>
    Boolean(text),
  );
  return ["This password is easy to guess.", ...advice].join(" ");
}
