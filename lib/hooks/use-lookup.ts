"use client";

import type { LookupResult } from "@/lib/catalogue/find-parts";
import { useCalculation, useDebounced } from "@/lib/hooks/use-calculation";

/**
 * Parts matching what is typed (a number, part of one, or words), asked for once typing pauses; an empty box asks
 * nothing.
 */
export function useLookup(query: string, limit = 8, makerId: number | null = null) {
  const settled = useDebounced(query.trim(), 250);
  const params = new URLSearchParams({
    q: settled,
    limit: String(limit),
    ...(makerId ? { maker: String(makerId) } : {}),
  });
  const path = settled ? `/api/parts/lookup?${params}` : null;
  const { data, error, isLoading } = useCalculation<{ results: LookupResult[] }>(path);
  return {
    results: data?.results ?? [],
    error,
    isLoading: isLoading || (query.trim() !== settled && query.trim() !== ""),
    settled,
  };
}
