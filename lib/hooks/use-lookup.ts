"use client";

import type { LookupResult } from "@/lib/catalogue/find-parts";
import { useCalculation, useDebounced } from "@/lib/hooks/use-calculation";

/** Parts matching a typed factory number, asked for once typing pauses; an empty box asks nothing. */
export function useLookup(query: string, limit = 8) {
  const settled = useDebounced(query.trim(), 250);
  const path = settled ? `/api/parts/lookup?${new URLSearchParams({ q: settled, limit: String(limit) })}` : null;
  const { data, error, isLoading } = useCalculation<{ results: LookupResult[] }>(path);
  return { results: data?.results ?? [], error, isLoading: isLoading || (query.trim() !== settled && query.trim() !== ""), settled };
}
