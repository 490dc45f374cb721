"use client";

import { useApi } from "@/lib/hooks/use-api";
import type { ImportView } from "@/lib/imports/imports";

const BUSY = ["uploaded", "parsing", "committing"];

/** One import, polled while the server reads or commits it. */
export function useImport(initial: ImportView) {
  const { data, mutate } = useApi<ImportView>(`/api/imports/${initial.id}`, {
    fallbackData: initial,
    refreshInterval: (latest) => (latest && BUSY.includes(latest.status) ? 700 : 0),
  });
  const view = data ?? initial;
  return { view, busy: BUSY.includes(view.status), mutate };
}

/** What a committed import wrote, by line of its file. */
export function useImportRows(id: number) {
  const { data } = useApi<{
    changes: Array<{ line: number; table: string; recordId: number; action: string }>;
    total: number;
  }>(`/api/imports/${id}/rows`);
  return data ?? null;
}
