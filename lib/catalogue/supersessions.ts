import { QueryTypes } from "sequelize";
import { sequelize } from "@/db/sequelize";
import { resolveChain, type ChainResult, type SupersessionEdge } from "@/lib/catalogue/chain";
import type { SupersessionKind } from "@/lib/catalogue/kinds";

const EITHER_WAY = "CASE WHEN s.old_part_id = w.part_id THEN s.new_part_id ELSE s.old_part_id END";

/**
 * A recursive walk of the supersession records from each of `:ids`: towards newer numbers, towards older ones, both
 * ways, or the way a replacement fits (`fits`: to newer numbers across interchangeable and one-way links, to older
 * ones across interchangeable links only). It keeps the path it has taken and will not revisit a part, so a loop in
 * the records ends it; 25 links at most. Gives `walk(start_id, part_id, depth, path)`.
 */
export function walk(direction: "newer" | "older" | "both" | "fits"): string {
  return `WITH RECURSIVE ${walkFrom("walk", direction, "original_parts WHERE id IN (:ids)")}`;
}

/**
 * The same walk as one named entry of a `WITH RECURSIVE` list, starting from the `id`s of `starts` (a table, or a
 * table with its WHERE), so one statement can walk from the parts it has just found.
 */
export function walkFrom(name: string, direction: "newer" | "older" | "both" | "fits", starts: string): string {
  const next = { newer: "s.new_part_id", older: "s.old_part_id", both: EITHER_WAY, fits: EITHER_WAY }[direction];
  const join = {
    newer: "s.old_part_id = w.part_id",
    older: "s.new_part_id = w.part_id",
    both: "s.old_part_id = w.part_id OR s.new_part_id = w.part_id",
    fits:
      "(s.old_part_id = w.part_id AND s.kind IN ('interchangeable', " +
      "'one_way')) OR (s.new_part_id = w.part_id AND s.kind = " +
      "'interchangeable')",
  }[direction];
  return `${name}(start_id, part_id, depth, path) AS (
       SELECT id, id, 0, ARRAY[id] FROM ${starts}
       UNION ALL
       SELECT w.start_id, ${next}, w.depth + 1, w.path || ${next}
       FROM ${name} w JOIN supersessions s ON ${join}
       WHERE NOT ${next} = ANY(w.path) AND w.depth < 25
     )`;
}

/** From a walk towards newer numbers: each start's latest number, as `(start_id, number)`. */
export const latestFrom = (walkName: string) =>
  `SELECT DISTINCT ON (w.start_id) w.start_id, p.number
   FROM ${walkName} w JOIN original_parts p ON p.id = w.part_id
   ORDER BY w.start_id, w.depth DESC, w.part_id`;

/** For many parts in one round trip: the latest number each has been superseded by. */
export async function latestNumbers(ids: number[]): Promise<Map<number, string>> {
  if (ids.length === 0) return new Map();
  const rows = await sequelize.query<{ start_id: number; number: string }>(`${walk("newer")} ${latestFrom("walk")}`, {
    replacements: { ids },
    type: QueryTypes.SELECT,
  });
  return new Map(rows.map((r) => [r.start_id, r.number]));
}

/** Every supersession record connected to a part, either way, as far as the chain goes (loop-safe). */
export async function loadChain(partId: number): Promise<ChainResult> {
  const rows = await sequelize.query<{
    old_part_id: number;
    new_part_id: number;
    kind: SupersessionKind;
    note: string | null;
  }>(
    `${walk("both")}
     SELECT DISTINCT s.old_part_id, s.new_part_id, s.kind, s.note
     FROM supersessions s WHERE s.old_part_id IN (SELECT part_id FROM walk) OR s.new_part_id IN (SELECT part_id FROM
       walk)`,
    { replacements: { ids: [partId] }, type: QueryTypes.SELECT },
  );
  const edges: SupersessionEdge[] = rows.map((r) => ({
    oldPartId: r.old_part_id,
    newPartId: r.new_part_id,
    kind: r.kind,
    note: r.note,
  }));
  return resolveChain(partId, edges);
}

/**
 * For many parts in one round trip: the older numbers each replaces, along its chain, oldest first. A job list and
 * its print sheet show these beside the number to order, so a counter can match an old box or parts book.
 */
export async function earlierNumbers(ids: number[]): Promise<Map<number, string[]>> {
  const earlier = new Map<number, string[]>(ids.map((id) => [id, []]));
  if (ids.length === 0) return earlier;
  const rows = await sequelize.query<{ start_id: number; number: string; depth: number }>(
    `${walk("older")}
     SELECT w.start_id, p.number, max(w.depth) AS depth FROM walk w JOIN original_parts p ON p.id = w.part_id
     WHERE w.depth > 0 GROUP BY w.start_id, p.number ORDER BY w.start_id, max(w.depth) DESC, p.number`,
    { replacements: { ids }, type: QueryTypes.SELECT },
  );
  for (const r of rows) earlier.get(r.start_id)?.push(r.number);
  return earlier;
}

/** Every part connected to each given part by supersession records, either way and of any kind, itself included. */
export async function chainMembers(ids: number[]): Promise<Map<number, number[]>> {
  const members = new Map<number, number[]>(ids.map((id) => [id, [id]]));
  if (ids.length === 0) return members;
  const rows = await sequelize.query<{ start_id: number; part_id: number }>(
    `${walk("both")}
     SELECT DISTINCT start_id, part_id FROM walk WHERE part_id <> start_id`,
    { replacements: { ids }, type: QueryTypes.SELECT },
  );
  for (const r of rows) members.get(r.start_id)?.push(r.part_id);
  return members;
}
