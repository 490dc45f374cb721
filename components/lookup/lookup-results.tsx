import Link from "next/link";
import { AddToList } from "@/components/lists/add-to-list";
import { MatchBadge } from "@/components/lookup/match-badge";
import { FitBadge } from "@/components/parts/fit-badge";
import { Notice } from "@/components/ui/notice";
import type { LookupResult } from "@/lib/catalogue/find-parts";
import { CATEGORY_NAMES } from "@/lib/catalogue/kinds";
import { Unbroken } from "@/components/ui/unbroken";

const members = (n: number) =>
  n === 0 ? "not yet confirmed by a member" : `${n} ${n === 1 ? "member" : "members"} fitted it`;

/** The best standard part on a result card, so a person need not open each part to know what to order. */
function Best({ result }: { result: LookupResult }) {
  if (!result.best)
    return (
      <span className="mt-2 block text-sm text-ink-soft">
        No approved standard part yet: measure it, or propose one you have fitted.
      </span>
    );
  return (
    <span className="mt-2 block space-y-1" data-testid="best">
      <span className="block">
        <span className="mr-2 text-sm text-ink-soft">Order</span>{" "}
        <span className="num text-xl font-bold">{result.best.label}</span>
      </span>
      <span className="flex flex-wrap items-center gap-x-3 gap-y-1 text-sm">
        <FitBadge fit={result.best.fit} />
        <span>{members(result.best.confirmations)}</span>
        {result.best.viaNumber && (
          <span className="text-ink-soft">
            <Unbroken text={`recorded on ${result.best.viaNumber}`} />
          </span>
        )}
        {result.crossCount > 1 && <span className="text-ink-soft">{result.crossCount - 1} more on its page</span>}
      </span>
    </span>
  );
}

/** The results of a look-up, worked out on the server. */
export function LookupResults({
  query,
  maker,
  results,
  signedIn = false,
}: {
  query: string;
  maker: string | null;
  results: LookupResult[];
  signedIn?: boolean;
}) {
  if (!query)
    return (
      <p className="text-ink-soft">
        Type a factory number as stamped, part of one, or words such as “water pump bearing model 22”.
      </p>
    );
  if (results.length === 0) {
    return (
      <Notice role="status">
        Nothing like <span className="num font-bold">{query}</span> is in the catalogue
        {maker ? ` for ${maker}` : ""} yet. Check the stamping under a light at an angle, try fewer characters or
        without the maker&apos;s prefix, or measure the part: <Link href="/measure/bearing">bearing</Link>,{" "}
        <Link href="/measure/seal">lip seal</Link>, <Link href="/measure/belt">V-belt</Link>.
      </Notice>
    );
  }
  const exact = results.filter((r) => ["exact", "normalised", "misread"].includes(r.matchedBy)).length;
  return (
    <section aria-label="Results">
      <p className="mb-3 text-ink-soft" role="status">
        {results.length} {results.length === 1 ? "part" : "parts"} for{" "}
        <span className="num font-bold text-ink">{query}</span>
        {maker ? ` from ${maker}` : ""}, closest first.
        {exact > 0 &&
          results.length > exact &&
          " Similar numbers follow the match: check the stamping if the match is not your part."}
      </p>
      <ol className="space-y-3">
        {results.map((r) => (
          <li key={r.id} data-testid="result" data-matched-by={r.matchedBy}>
            <Link
              href={`/parts/${r.id}`}
              className={
                "block rounded-lg border-2 border-rule bg-ground-raised p-4 text-ink " +
                "no-underline hover:border-brass"
              }
            >
              <span className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
                <span className="num text-2xl font-bold whitespace-nowrap">{r.number}</span>
                <MatchBadge matchedBy={r.matchedBy} why={r.why} />
              </span>
              <span className="block text-ink-soft">
                {r.maker} · {CATEGORY_NAMES[r.category]} · {r.description}
              </span>
              {r.latestNumber !== r.number && (
                <span className="mt-1 block text-sm">
                  Superseded; latest number <span className="num font-bold whitespace-nowrap">{r.latestNumber}</span>.
                </span>
              )}
              <Best result={r} />
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
