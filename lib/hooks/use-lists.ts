"use client";

import { useCallback, useEffect, useState } from "react";
import { useApi } from "@/lib/hooks/use-api";
import { useOnline } from "@/lib/hooks/use-online";
import { isConnected } from "@/lib/offline/connection";
import type { ListView } from "@/lib/lists/lists";
import { queuedEdits, queueEdit, saveList, savedList, type QueuedEdit } from "@/lib/offline/store";
import { applyEdit, sendQueued, type SendOutcome } from "@/lib/offline/sync";

/** The member's job lists, for "Add to a job list"; asked for only once the chooser is opened. */
export function useLists(enabled: boolean) {
  const { data, mutate } = useApi<{ lists: Array<{ id: number; title: string }> }>(enabled ? "/api/lists" : null);
  return { lists: data?.lists ?? [], loaded: data !== undefined, revalidate: () => mutate() };
}

type NewEdit = QueuedEdit extends infer E
  ? E extends QueuedEdit
    ? Omit<E, "listId" | "queuedAt" | "seq">
    : never
  : never;

/**
 * One job list, starting from what the page was sent with; `mutate` after a change. A copy is kept on this device
 * each time it is fetched. With no connection the list shows that copy (`savedAt` says when it was fetched), and
 * `queue` keeps an added line, a quantity or an "ordered" tick to send when the connection returns; `waiting` and
 * `outcome` say what is still to go and what happened when it went.
 */
export function useList(initial: ListView) {
  const online = useOnline();
  const { data, mutate } = useApi<ListView>(`/api/lists/${initial.id}`, {
    fallbackData: initial,
    revalidateOnMount: false,
  });
  const view = data ?? initial;
  const [savedAt, setSavedAt] = useState<string | null>(null);
  const [waiting, setWaiting] = useState<QueuedEdit[]>([]);
  const [outcome, setOutcome] = useState<SendOutcome | null>(null);

  // `online` re-runs these; each asks the connection itself, since the first run after hydration still sees the
  // server's answer (online) even on a page the device served with no connection.
  useEffect(() => {
    let current = true;
    void (async () => {
      if (!isConnected()) {
        const saved = await savedList(initial.id);
        if (!current) return;
        if (saved) await mutate(saved.view, { revalidate: false });
        setSavedAt(saved?.fetchedAt ?? initial.updatedAt);
        setWaiting(await queuedEdits(initial.id));
        return;
      }
      setSavedAt(null);
      if ((await queuedEdits(initial.id)).length > 0) {
        const sent = await sendQueued(initial.id);
        if (!current) return;
        setOutcome(sent);
        await mutate();
      }
      setWaiting(await queuedEdits(initial.id));
    })();
    return () => {
      current = false;
    };
  }, [online, initial.id, initial.updatedAt, mutate]);

  // Each view fetched with a connection is the copy kept for the next time there is none.
  useEffect(() => {
    if (online && savedAt === null && isConnected()) void saveList(view);
  }, [online, savedAt, view]);

  const queue = useCallback(
    async (edit: NewEdit) => {
      const queued = { ...edit, listId: view.id, queuedAt: new Date().toISOString() } as QueuedEdit;
      await queueEdit(queued);
      const next = applyEdit(view, queued);
      await mutate(next, { revalidate: false });
      const saved = await savedList(view.id);
      await saveList(next, saved?.fetchedAt ?? savedAt ?? view.updatedAt);
      setWaiting(await queuedEdits(view.id));
    },
    [view, mutate, savedAt],
  );

  // With no connection there is nothing to fetch again: the copy on screen stays (a failed fetch would drop it).
  const refresh = useCallback(
    (...args: Parameters<typeof mutate>) =>
      args.length === 0 && !isConnected() ? Promise.resolve(view) : mutate(...args),
    [mutate, view],
  );

  return { view, mutate: refresh, online, savedAt, waiting, outcome, clearOutcome: () => setOutcome(null), queue };
}
