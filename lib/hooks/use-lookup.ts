"use client";

import type { LookupResult } from "@/lib/catalogue/find-parts";
import { useApi, useDebounced } from "@/lib/hooks/use-api";

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
  const { data, error, isLoading } = useApi<{ results: LookupResult[] }>(
    settled ? `/api/parts/lookup?${params}` : null,
  );
  return {
    results: data?.results ?? [],
    error,
    isLoading: isLoading || (query.trim() !== settled && query.trim() !== ""),
    settled,
  };
}

/** Standard parts by designation, for the proposal form's picker. */
export function useStandardParts<T>(query: string, kind?: string) {
  const settled = useDebounced(query.trim(), 250);
  const params = new URLSearchParams({ q: settled, limit: "8", ...(kind ? { kind } : {}) });
  const { data, isLoading } = useApi<{ results: T[] }>(settled ? `/api/standard-parts?${params}` : null);
  return { results: data?.results ?? [], isLoading, settled };
}
