/**
 * Factory numbers as people type them from a worn stamping: any case, with spaces, dashes, dots or slashes,
 * sometimes with the maker's prefix in front. The normalised form keeps letters and digits only.
 */
export function normaliseNumber(input: string): string {
  return input
    .normalize("NFKC")
    .toUpperCase()
    .replace(/[^A-Z0-9]/g, "");
}

/** The number without a leading maker prefix (`CV-`, `HM`), when what is left still has a digit in it. */
export function stripPrefix(normalised: string, prefixes: readonly string[]): string {
  const ordered = prefixes
    .map(normaliseNumber)
    .filter(Boolean)
    .sort((a, b) => b.length - a.length);
  for (const prefix of ordered) {
    const rest = normalised.slice(prefix.length);
    if (normalised.startsWith(prefix) && /\d/.test(rest)) return rest;
  }
  return normalised;
}

/**
 * Characters that look alike on a worn or badly struck stamping are folded together, so that a misreading still
 * finds the part: O/Q/0, I/L/1, S/5, B/8, Z/2, G/6. Common practice (no published source).
 */
const LOOK_ALIKE: Record<string, string> = { O: "0", Q: "0", I: "1", L: "1", S: "5", B: "8", Z: "2", G: "6" };

export function lookAlikeKey(normalised: string): string {
  let key = "";
  for (const c of normalised) key += LOOK_ALIKE[c] ?? c;
  return key;
}

/** Everything a stored number is searched by. */
export function searchForms(number: string, prefixes: readonly string[]): { normalised: string; key: string } {
  const normalised = stripPrefix(normaliseNumber(number), prefixes);
  return { normalised, key: lookAlikeKey(normalised) };
}
