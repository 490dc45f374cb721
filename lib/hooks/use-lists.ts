"use client";

import { useApi } from "@/lib/hooks/use-api";
import type { ListView } from "@/lib/lists/lists";

/** The member's job lists, for "Add to a job list"; asked for only once the chooser is opened. */
export function useLists(enabled: boolean) {
  const { data, mutate } = useApi<{ lists: Array<{ id: number; title: string }> }>(enabled ? "/api/lists" : null);
  return { lists: data?.lists ?? [], loaded: data !== undefined, revalidate: () => mutate() };
}

/** One job list, starting from what the page was sent with; `mutate` after a change. */
export function useList(initial: ListView) {
  const { data, mutate } = useApi<ListView>(`/api/lists/${initial.id}`, {
    fallbackData: initial,
    revalidateOnMount: false,
  });
  return { view: data ?? initial, mutate };
}
