"use client";

import { Notice } from "@/components/ui/notice";
import type { QueuedEdit } from "@/lib/offline/store";
import { editWords, type SendOutcome } from "@/lib/offline/sync";
import { fetchedWords } from "@/lib/offline/when";

/** What the job list is with no connection: the kept copy's date, the changes waiting, and what sending them did. */
export function OfflineListNote({
  online,
  savedAt,
  waiting,
  outcome,
}: {
  online: boolean;
  savedAt: string | null;
  waiting: QueuedEdit[];
  outcome: SendOutcome | null;
}) {
  return (
    <div className="space-y-3" data-testid="offline-list-note">
      {!online && savedAt && (
        <Notice>
          Offline: this is the copy kept on this device, fetched {fetchedWords(savedAt)}. Quantities, “ordered” ticks
          and new lines are kept and sent when the connection returns.
        </Notice>
      )}
      {waiting.length > 0 && (
        <Notice>
          <span className="block font-bold">Waiting to be sent ({waiting.length})</span>
          <ul className="mt-1 list-disc pl-5 text-sm">
            {waiting.map((edit) => (
              <li key={edit.seq} className="num">
                {editWords(edit)}
              </li>
            ))}
          </ul>
        </Notice>
      )}
      {outcome && outcome.sent.length > 0 && (
        <Notice tone="success">
          <span className="block">Sent the changes made offline:</span>
          <ul className="mt-1 list-disc pl-5 text-sm">
            {outcome.sent.map((words) => (
              <li key={words} className="num">
                {words}
              </li>
            ))}
          </ul>
        </Notice>
      )}
      {outcome && outcome.conflicts.length > 0 && (
        <Notice tone="caution" role="alert">
          <span className="block">Not made, because the list had changed or the number needs a choice:</span>
          <ul className="mt-1 list-disc pl-5 text-sm">
            {outcome.conflicts.map((words) => (
              <li key={words}>{words}</li>
            ))}
          </ul>
        </Notice>
      )}
    </div>
  );
}
