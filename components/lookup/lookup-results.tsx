"use client";

import Link from "next/link";
import { AddToList } from "@/components/lists/add-to-list";
import { MatchBadge } from "@/components/lookup/match-badge";
import { Notice } from "@/components/ui/notice";
import { CATEGORY_NAMES } from "@/lib/catalogue/kinds";
import { useLookup } from "@/lib/hooks/use-lookup";

export function LookupResults({ query, signedIn = false }: { query: string; signedIn?: boolean }) {
  const { results, error, isLoading } = useLookup(query, 30);
  if (!query.trim()) return <p className="text-ink-soft">Type a factory number above.</p>;
  if (error) return <Notice tone="caution" role="alert">{error.message}</Notice>;
  if (isLoading && results.length === 0) return <p className="text-ink-soft" role="status">Searching the catalogue…</p>;
  if (results.length === 0) {
    return (
      <Notice role="status">
        No factory number like <span className="num font-bold">{query}</span> is in the catalogue yet. Check the stamping under a light at an
        angle, try without the maker&apos;s prefix, or <Link href="/measure/bearing">measure the part</Link> instead.
      </Notice>
    );
  }
  return (
    <section aria-live="polite" aria-label="Results">
      <p className="mb-3 text-ink-soft" role="status">
        {results.length} {results.length === 1 ? "part" : "parts"} for <span className="num font-bold text-ink">{query}</span>, closest first.
      </p>
      <ol className="space-y-3">
        {results.map((r) => (
          <li key={r.id}>
            <Link href={`/parts/${r.id}`} className="block rounded-lg border-2 border-rule bg-ground-raised p-4 text-ink no-underline hover:border-brass">
              <span className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
                <span className="num text-2xl font-bold">{r.number}</span>
                <MatchBadge matchedBy={r.matchedBy} why={r.why} />
              </span>
              <span className="block text-ink-soft">
                {r.maker} · {CATEGORY_NAMES[r.category]} · {r.description}
              </span>
              <span className="mt-1 block text-sm">
                {r.latestNumber !== r.number ? (
                  <>
                    Superseded; latest number <span className="num font-bold">{r.latestNumber}</span>.{" "}
                  </>
                ) : null}
                {r.crossCount > 0 ? `${r.crossCount} approved ${r.crossCount === 1 ? "cross" : "crosses"}` : "No approved cross yet"}
              </span>
            </Link>
            {signedIn && (
              <div className="mt-1 pl-4">
                <AddToList item={{ partId: r.id }} number={r.number} compact />
              </div>
            )}
          </li>
        ))}
      </ol>
    </section>
  );
}
