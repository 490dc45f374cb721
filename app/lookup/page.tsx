import type { Metadata } from "next";
import { LookupResults } from "@/components/lookup/lookup-results";
import { NumberSearch } from "@/components/lookup/number-search";
import { Notice } from "@/components/ui/notice";
import { getCurrentSession } from "@/lib/auth/session";
import { makerChoices } from "@/lib/catalogue/browse";
import { lookUpParts, type LookupResult } from "@/lib/catalogue/find-parts";
import { AppError } from "@/lib/errors";
import { lookupQuery } from "@/lib/validation/catalogue";
import { parseWith } from "@/lib/validation/parse";

export async function generateMetadata({ searchParams }: { searchParams: Promise<{ q?: string }> }): Promise<Metadata> {
  const { q } = await searchParams;
  return { title: q?.trim() ? `Find “${q.trim().slice(0, 60)}”` : "Find by number" };
}

/**
 * The results are worked out here, on the server, and sent with the page: the address can be shared, the page works
 * with scripts off, and the browser does not ask for the same results a second time.
 */
export default async function LookupPage({
  searchParams,
}: {
  searchParams: Promise<{ q?: string | string[]; maker?: string | string[] }>;
}) {
  const params = await searchParams;
  const q = typeof params.q === "string" ? params.q : "";
  const makerText = typeof params.maker === "string" && params.maker !== "" ? params.maker : undefined;
  const [{ user }, makers] = await Promise.all([getCurrentSession(), makerChoices()]);
  let results: LookupResult[] = [];
  let problem: string | null = null;
  if (q.trim()) {
    try {
      const { q: query, maker } = parseWith(lookupQuery, { q, maker: makerText, limit: "30" });
      results = await lookUpParts(query, { limit: 30, makerId: maker ?? null });
    } catch (error) {
      if (!(error instanceof AppError)) throw error;
      problem = error.message;
    }
  }
  const maker = makers.find((m) => String(m.id) === makerText) ?? null;
  return (
    <div className="space-y-6">
      <h1 className="text-3xl">Find by number or words</h1>
      <NumberSearch key={`${q}|${makerText ?? ""}`} defaultValue={q} makers={makers} makerId={maker?.id ?? null} />
      {problem ? (
        <Notice tone="caution" role="alert">
          {problem}
        </Notice>
      ) : (
        <LookupResults query={q.trim()} maker={maker?.name ?? null} results={results} signedIn={Boolean(user)} />
      )}
    </div>
  );
}
