import type { Metadata } from "next";
import { LookupResults } from "@/components/lookup/lookup-results";
import { NumberSearch } from "@/components/lookup/number-search";
import { getCurrentSession } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Find by number" };

export default async function LookupPage({ searchParams }: { searchParams: Promise<{ q?: string }> }) {
  const { q = "" } = await searchParams;
  const { user } = await getCurrentSession();
  return (
    <div className="space-y-6">
      <h1 className="text-3xl">Find by number</h1>
      <NumberSearch key={q} defaultValue={q} />
      <LookupResults query={q} signedIn={Boolean(user)} />
    </div>
  );
}
