"use client";

import Link from "next/link";
import { useEffect, useState } from "react";
import { Notice } from "@/components/ui/notice";
import { queuedEdits, savedLists, savedParts, type SavedList, type SavedPart } from "@/lib/offline/store";
import { fetchedWords } from "@/lib/offline/when";

/** The device's own copies of parts and job lists (IndexedDB), readable with no connection. */
export function KeptOnDevice() {
  const [kept, setKept] = useState<{ parts: SavedPart[]; lists: SavedList[]; waiting: number } | null>(null);
  useEffect(() => {
    void Promise.all([savedParts(), savedLists(), queuedEdits()]).then(([parts, lists, edits]) =>
      setKept({ parts, lists, waiting: edits.length }),
    );
  }, []);
  if (!kept) return <p className="text-ink-soft">Reading what is kept…</p>;
  return (
    <div className="space-y-8">
      {kept.waiting > 0 && (
        <Notice>
          {kept.waiting} job-list {kept.waiting === 1 ? "change is" : "changes are"} waiting to be sent; open the list
          with a connection to send {kept.waiting === 1 ? "it" : "them"}.
        </Notice>
      )}
      <section aria-labelledby="kept-lists" className="space-y-3">
        <h2 id="kept-lists" className="text-2xl">
          Job lists
        </h2>
        {kept.lists.length === 0 && <p className="text-ink-soft">No job list opened on this device yet.</p>}
        {kept.lists.map(({ view, fetchedAt }) => (
          <article key={view.id} className="space-y-2 rounded-lg border border-rule bg-ground-raised p-4">
            <h3 className="text-xl">
              <Link href={`/lists/${view.id}`}>{view.title}</Link>
            </h3>
            <p className="text-sm text-ink-soft">Fetched {fetchedWords(fetchedAt)}</p>
            <ul className="space-y-1">
              {view.lines.map((l) => (
                <li key={l.id} className="num text-sm">
                  {l.quantity} × <span className="whitespace-nowrap">{l.number}</span>
                  {l.chosen && <> → {l.chosen.designation}</>}
                  {l.ordered && <span className="font-sans text-ink-soft"> (ordered)</span>}
                </li>
              ))}
            </ul>
          </article>
        ))}
      </section>
      <section aria-labelledby="kept-parts" className="space-y-3">
        <h2 id="kept-parts" className="text-2xl">
          Parts
        </h2>
        {kept.parts.length === 0 && <p className="text-ink-soft">No part opened on this device yet.</p>}
        <div className="grid gap-3 md:grid-cols-2">
          {kept.parts.map((p) => (
            <article key={p.id} className="space-y-1 rounded-lg border border-rule bg-ground-raised p-4">
              <h3>
                <Link href={`/parts/${p.id}`} className="num text-lg font-bold whitespace-nowrap">
                  {p.number}
                </Link>
              </h3>
              <p className="text-sm text-ink-soft">
                {p.maker} · {p.categoryName} · {p.description}
              </p>
              {p.equivalents.length === 0 ? (
                <p className="text-sm">No approved cross when it was fetched.</p>
              ) : (
                <ul className="space-y-1">
                  {p.equivalents.map((e) => (
                    <li key={e.designation} className="text-sm">
                      <span className="num font-bold">{e.designation}</span>
                      {e.sizes && <span className="num"> · {e.sizes}</span>} · {e.fit}
                    </li>
                  ))}
                </ul>
              )}
              <p className="text-sm text-ink-soft">Fetched {fetchedWords(p.fetchedAt)}</p>
            </article>
          ))}
        </div>
      </section>
    </div>
  );
}
