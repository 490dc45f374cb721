import { openDB, type DBSchema, type IDBPDatabase } from "idb";
import type { ListView } from "@/lib/lists/lists";

/** A part as kept on this device: what its page says a person should order, and when it was fetched. */
export interface SavedPart {
  id: number;
  number: string;
  maker: string;
  categoryName: string;
  description: string;
  equivalents: Array<{ designation: string; sizes: string; fit: string }>;
  fetchedAt: string;
}

export interface SavedList {
  id: number;
  view: ListView;
  fetchedAt: string;
}

/** A change to a job list made with no connection, waiting to be sent in the order it was made. */
export type QueuedEdit = {
  seq?: number;
  listId: number;
  queuedAt: string;
} & (
  | { kind: "add"; number: string; quantity: number }
  | { kind: "quantity"; lineId: number; number: string; from: number; to: number }
  | { kind: "ordered"; lineId: number; number: string; from: boolean; to: boolean }
);

interface OfflineSchema extends DBSchema {
  parts: { key: number; value: SavedPart };
  lists: { key: number; value: SavedList };
  outbox: { key: number; value: QueuedEdit; indexes: { listId: number } };
}

let opened: Promise<IDBPDatabase<OfflineSchema>> | null = null;

/** The device's own copy of what a person opened, through `idb`; null where the browser has no IndexedDB. */
function database(): Promise<IDBPDatabase<OfflineSchema>> | null {
  if (typeof indexedDB === "undefined") return null;
  opened ??= openDB<OfflineSchema>("understudy-offline", 1, {
    upgrade(db) {
      db.createObjectStore("parts", { keyPath: "id" });
      db.createObjectStore("lists", { keyPath: "id" });
      db.createObjectStore("outbox", { keyPath: "seq", autoIncrement: true }).createIndex("listId", "listId");
    },
  });
  return opened;
}

/** How many parts are kept; the oldest fetched go first beyond it. */
const KEEP_PARTS = 200;

export async function savePart(part: SavedPart): Promise<void> {
  const db = await database();
  if (!db) return;
  await db.put("parts", part);
  const all = await db.getAll("parts");
  if (all.length > KEEP_PARTS) {
    const oldest = all.sort((a, b) => a.fetchedAt.localeCompare(b.fetchedAt)).slice(0, all.length - KEEP_PARTS);
    await Promise.all(oldest.map((p) => db.delete("parts", p.id)));
  }
}

export async function savedParts(): Promise<SavedPart[]> {
  const db = await database();
  if (!db) return [];
  return (await db.getAll("parts")).sort((a, b) => b.fetchedAt.localeCompare(a.fetchedAt));
}

export async function savedPart(id: number): Promise<SavedPart | undefined> {
  return (await database())?.get("parts", id);
}

export async function saveList(view: ListView, fetchedAt = new Date().toISOString()): Promise<void> {
  await (await database())?.put("lists", { id: view.id, view, fetchedAt });
}

export async function savedList(id: number): Promise<SavedList | undefined> {
  return (await database())?.get("lists", id);
}

export async function savedLists(): Promise<SavedList[]> {
  const db = await database();
  if (!db) return [];
  return (await db.getAll("lists")).sort((a, b) => b.view.updatedAt.localeCompare(a.view.updatedAt));
}

export async function queueEdit(edit: QueuedEdit): Promise<void> {
  await (await database())?.add("outbox", edit);
}

/** The changes waiting to be sent, oldest first; of one list when `listId` is given. */
export async function queuedEdits(listId?: number): Promise<QueuedEdit[]> {
  const db = await database();
  if (!db) return [];
  return listId === undefined ? db.getAll("outbox") : db.getAllFromIndex("outbox", "listId", listId);
}

export async function dropEdit(seq: number): Promise<void> {
  await (await database())?.delete("outbox", seq);
}

/** Forgets everything kept on this device (on signing out). */
export async function clearDevice(): Promise<void> {
  const db = await database();
  if (!db) return;
  await Promise.all([db.clear("parts"), db.clear("lists"), db.clear("outbox")]);
}
