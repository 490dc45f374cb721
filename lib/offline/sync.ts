import { fetchJson } from "@/lib/hooks/use-api";
import { sendJson } from "@/lib/http/post-json";
import type { ListLine, ListView } from "@/lib/lists/lists";
import { dropEdit, queuedEdits, saveList, type QueuedEdit } from "@/lib/offline/store";

/** What sending the queued changes did: each change sent, each that could not be made (with why), and what waits. */
export interface SendOutcome {
  sent: string[];
  conflicts: string[];
  waiting: number;
}

/** One queued change in words, for the list of what is waiting. */
export function editWords(edit: QueuedEdit): string {
  if (edit.kind === "add") return `Add ${edit.quantity} × ${edit.number}`;
  if (edit.kind === "quantity") return `Quantity of ${edit.number}: ${edit.from} → ${edit.to}`;
  return `${edit.number}: ${edit.to ? "ticked as ordered" : "ordered tick taken off"}`;
}

/** Applies a queued change to the copy on this device, so the list shows it before it is sent. */
export function applyEdit(view: ListView, edit: QueuedEdit): ListView {
  if (edit.kind === "add") return view;
  const lines = view.lines.map((l) =>
    l.id !== edit.lineId ? l : edit.kind === "quantity" ? { ...l, quantity: edit.to } : { ...l, ordered: edit.to },
  );
  return { ...view, lines };
}

const currentList = (listId: number): Promise<ListView | null> =>
  fetchJson<ListView>(`/api/lists/${listId}`).catch(() => null);

/**
 * Sends a list's queued changes in the order they were made, once there is a connection. A quantity or tick that
 * was changed elsewhere meanwhile, or a line since removed, is not overwritten: it is reported as a conflict, and the
 * list keeps the other change. A number the catalogue cannot place is reported with the catalogue's reason. Stops,
 * keeping the rest, at the first change that finds no connection.
 */
export function sendQueued(listId: number): Promise<SendOutcome> {
  // One sending at a time for a list, however many times the connection comes back, and across the tabs open on
  // it (a Web Lock where the browser has them), so that no queued line is added twice.
  const locked = async (): Promise<SendOutcome> => {
    if (typeof navigator === "undefined" || !navigator.locks) return send(listId);
    let outcome: SendOutcome | undefined;
    await navigator.locks.request(`understudy-list-${listId}`, async () => {
      outcome = await send(listId);
    });
    return outcome as SendOutcome;
  };
  const running = sending.get(listId) ?? locked().finally(() => sending.delete(listId));
  sending.set(listId, running);
  return running;
}

const sending = new Map<number, Promise<SendOutcome>>();

async function send(listId: number): Promise<SendOutcome> {
  const outcome: SendOutcome = { sent: [], conflicts: [], waiting: 0 };
  const edits = await queuedEdits(listId);
  if (edits.length === 0) return outcome;
  let server = await currentList(listId);
  if (!server) return { ...outcome, waiting: edits.length };
  for (const [i, edit] of edits.entries()) {
    const words = editWords(edit);
    if (edit.kind === "add") {
      const result = await sendJson("POST", `/api/lists/${listId}/lines`, {
        number: edit.number,
        quantity: edit.quantity,
      });
      if (!result.ok && result.status === 0) return { ...outcome, waiting: edits.length - i };
      if (result.ok) outcome.sent.push(words);
      else outcome.conflicts.push(`Not added: ${edit.number}. ${result.error.message}`);
    } else {
      const line: ListLine | undefined = server.lines.find((l) => l.id === edit.lineId);
      const now = line && (edit.kind === "quantity" ? line.quantity : line.ordered);
      if (!line) {
        outcome.conflicts.push(`${edit.number} is no longer on the list, so “${words}” was not made.`);
      } else if (now !== edit.from && now !== edit.to) {
        const shown = edit.kind === "quantity" ? `quantity ${now}` : now ? "ticked as ordered" : "not ordered";
        outcome.conflicts.push(
          `${edit.number} was changed elsewhere while you were offline (now ${shown}), so “${words}” was not made.`,
        );
      } else if (now !== edit.to) {
        const body = edit.kind === "quantity" ? { quantity: edit.to } : { ordered: edit.to };
        const result = await sendJson("PATCH", `/api/lists/${listId}/lines/${edit.lineId}`, body);
        if (!result.ok && result.status === 0) return { ...outcome, waiting: edits.length - i };
        if (result.ok) outcome.sent.push(words);
        else outcome.conflicts.push(`“${words}” was not made. ${result.error.message}`);
      } else {
        outcome.sent.push(words);
      }
    }
    await dropEdit(edit.seq as number);
    server = (await currentList(listId)) ?? server;
  }
  await saveList(server);
  return outcome;
}
