import type { MatchedBy } from "@/lib/catalogue/find-parts";

const WORDS: Record<MatchedBy, string> = {
  exact: "exact",
  normalised: "same number",
  misread: "misread?",
  prefix: "starts with",
  similar: "similar",
  words: "words",
};

/** Why a result matched, in a word; the full reason is in the title and for screen readers. */
export function MatchBadge({ matchedBy, why }: { matchedBy: MatchedBy; why: string }) {
  return (
    <span
      title={why}
      className="inline-block rounded border border-rule-strong px-1.5 text-xs tracking-wide text-ink-soft uppercase"
    >
      {WORDS[matchedBy]}
      <span className="sr-only">: {why}</span>
    </span>
  );
}
