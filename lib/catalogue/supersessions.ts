import { QueryTypes } from "sequelize";
import { sequelize } from "@/db/sequelize";
import { resolveChain, type ChainResult, type SupersessionEdge } from "@/lib/catalogue/chain";
import type { SupersessionKind } from "@/lib/catalogue/kinds";

/**
 * For many parts in one round trip: the latest number each has been superseded by. The recursive walk keeps the
 * path it has taken and will not revisit a part, so a loop in the records ends it.
 */
export async function latestNumbers(ids: number[]): Promise<Map<number, string>> {
  if (ids.length === 0) return new Map();
  const rows = await sequelize.query<{ start_id: number; number: string }>(
    `WITH RECURSIVE walk(start_id, part_id, depth, path) AS (
       SELECT id, id, 0, ARRAY[id] FROM original_parts WHERE id IN (:ids)
       UNION ALL
       SELECT w.start_id, s.new_part_id, w.depth + 1, w.path || s.new_part_id
       FROM walk w JOIN supersessions s ON s.old_part_id = w.part_id
       WHERE NOT s.new_part_id = ANY(w.path) AND w.depth < 25
     ),
     latest AS (
       SELECT DISTINCT ON (w.start_id) w.start_id, p.number
       FROM walk w JOIN original_parts p ON p.id = w.part_id
       ORDER BY w.start_id, w.depth DESC, w.part_id
     )
     SELECT l.start_id, l.number FROM latest l`,
    { replacements: { ids }, type: QueryTypes.SELECT },
  );
  return new Map(rows.map((r) => [r.start_id, r.number]));
}

/** Every supersession record connected to a part, either way, as far as the chain goes (loop-safe). */
export async function loadChain(partId: number): Promise<ChainResult> {
  const rows = await sequelize.query<{ old_part_id: number; new_part_id: number; kind: SupersessionKind; note: string | null }>(
    `WITH RECURSIVE linked(part_id, depth, path) AS (
       SELECT CAST(:partId AS integer), 0, ARRAY[CAST(:partId AS integer)]
       UNION ALL
       SELECT CASE WHEN s.old_part_id = l.part_id THEN s.new_part_id ELSE s.old_part_id END, l.depth + 1,
              l.path || CASE WHEN s.old_part_id = l.part_id THEN s.new_part_id ELSE s.old_part_id END
       FROM linked l JOIN supersessions s ON s.old_part_id = l.part_id OR s.new_part_id = l.part_id
       WHERE NOT (CASE WHEN s.old_part_id = l.part_id THEN s.new_part_id ELSE s.old_part_id END) = ANY(l.path) AND l.depth < 25
     )
     SELECT DISTINCT s.old_part_id, s.new_part_id, s.kind, s.note
     FROM supersessions s WHERE s.old_part_id IN (SELECT part_id FROM linked) OR s.new_part_id IN (SELECT part_id FROM linked)`,
    { replacements: { partId }, type: QueryTypes.SELECT },
  );
  const edges: SupersessionEdge[] = rows.map((r) => ({ oldPartId: r.old_part_id, newPartId: r.new_part_id, kind: r.kind, note: r.note }));
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
    `WITH RECURSIVE walk(start_id, part_id, depth, path) AS (
       SELECT id, id, 0, ARRAY[id] FROM original_parts WHERE id IN (:ids)
       UNION ALL
       SELECT w.start_id, s.old_part_id, w.depth + 1, w.path || s.old_part_id
       FROM walk w JOIN supersessions s ON s.new_part_id = w.part_id
       WHERE NOT s.old_part_id = ANY(w.path) AND w.depth < 25
     )
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
    `WITH RECURSIVE linked(start_id, part_id, path) AS (
       SELECT id, id, ARRAY[id] FROM original_parts WHERE id IN (:ids)
       UNION ALL
       SELECT l.start_id, CASE WHEN s.old_part_id = l.part_id THEN s.new_part_id ELSE s.old_part_id END,
              l.path || CASE WHEN s.old_part_id = l.part_id THEN s.new_part_id ELSE s.old_part_id END
       FROM linked l JOIN supersessions s ON s.old_part_id = l.part_id OR s.new_part_id = l.part_id
       WHERE NOT (CASE WHEN s.old_part_id = l.part_id THEN s.new_part_id ELSE s.old_part_id END) = ANY(l.path) AND cardinality(l.path) < 25
     )
     SELECT DISTINCT start_id, part_id FROM linked WHERE part_id <> start_id`,
    { replacements: { ids }, type: QueryTypes.SELECT },
  );
  for (const r of rows) members.get(r.start_id)?.push(r.part_id);
  return members;
}
