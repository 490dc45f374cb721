"use client";

import { useEffect, useState } from "react";
import { Notice } from "@/components/ui/notice";
import { useOnline } from "@/lib/hooks/use-online";
import { isConnected } from "@/lib/offline/connection";
import { savedPart, savePart, type SavedPart } from "@/lib/offline/store";
import { fetchedWords } from "@/lib/offline/when";

/**
 * Keeps the part's page on this device each time it is opened with a connection; with none, says that the page is
 * the copy kept here and when it was fetched.
 */
export function KeepPart({ part }: { part: Omit<SavedPart, "fetchedAt"> }) {
  const online = useOnline();
  const [fetchedAt, setFetchedAt] = useState<string | null>(null);
  useEffect(() => {
    // Asked of the connection itself: the first run after hydration still sees the server's answer (online).
    if (isConnected()) {
      void savePart({ ...part, fetchedAt: new Date().toISOString() });
      return;
    }
    let current = true;
    void savedPart(part.id).then((saved) => {
      if (current) setFetchedAt(saved?.fetchedAt ?? null);
    });
    return () => {
      current = false;
    };
  }, [online, part]);
  if (online || !fetchedAt) return null;
  return (
    <Notice>
      Offline: this is the copy of this part kept on this device, fetched {fetchedWords(fetchedAt)}. Crosses added since
      then show when the connection returns.
    </Notice>
  );
}
