import type { SupersessionKind } from "@/lib/catalogue/kinds";

export interface SupersessionEdge {
  oldPartId: number;
  newPartId: number;
  kind: SupersessionKind;
  note: string | null;
}

export interface ChainResult {
  /** Older numbers, oldest first, ending just before the part itself. */
  before: number[];
  /** Newer numbers, in order, after the part itself. */
  after: number[];
  latestId: number;
  /** The edges walked, for their kinds and notes. */
  edges: SupersessionEdge[];
  /** True when the records point back on themselves; the walk stops at the first repeat. */
  loop: boolean;
}

/**
 * Walks a supersession chain both ways from a part. Safe against loops (a record saying A replaces B and B
 * replaces A) and against forks (the first newer number by id is followed, and the others are still listed as edges).
 */
export function resolveChain(startId: number, edges: SupersessionEdge[]): ChainResult {
  const forward = new Map<number, SupersessionEdge[]>();
  const backward = new Map<number, SupersessionEdge[]>();
  for (const edge of edges) {
    forward.set(
      edge.oldPartId,
      [...(forward.get(edge.oldPartId) ?? []), edge].sort((a, b) => a.newPartId - b.newPartId),
    );
    backward.set(
      edge.newPartId,
      [...(backward.get(edge.newPartId) ?? []), edge].sort((a, b) => a.oldPartId - b.oldPartId),
    );
  }
  const seen = new Set([startId]);
  const walked: SupersessionEdge[] = [];
  let loop = false;

  const after: number[] = [];
  for (let current = startId; ;) {
    const next = forward.get(current)?.[0];
    if (!next) break;
    if (seen.has(next.newPartId)) {
      loop = true;
      break;
    }
    seen.add(next.newPartId);
    walked.push(next);
    after.push(next.newPartId);
    current = next.newPartId;
  }

  const before: number[] = [];
  for (let current = startId; ;) {
    const previous = backward.get(current)?.[0];
    if (!previous) break;
    if (seen.has(previous.oldPartId)) {
      loop = true;
      break;
    }
    seen.add(previous.oldPartId);
    walked.unshift(previous);
    before.unshift(previous.oldPartId);
    current = previous.oldPartId;
  }

  return { before, after, latestId: after.at(-1) ?? startId, edges: walked, loop };
}
