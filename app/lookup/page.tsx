import type { Metadata } from "next";
import { NumberSearch } from "@/components/home/number-search";
import { Notice } from "@/components/ui/notice";

export const metadata: Metadata = { title: "Find by number" };

export default async function LookupPage({ searchParams }: { searchParams: Promise<{ q?: string }> }) {
  const { q = "" } = await searchParams;
  return (
    <div className="space-y-6">
      <h1 className="text-3xl">Find by number</h1>
      <NumberSearch defaultValue={q} />
      <Notice role="status">
        The catalogue of crosses is still being loaded, so no number can be found yet
        {q ? (
          <>
            {" "}
            (you searched for <span className="num font-bold">{q}</span>)
          </>
        ) : null}
        . Keep the part and its measurements; this page will answer as soon as the catalogue opens.
      </Notice>
    </div>
  );
}
