import { QueryTypes, type Transaction } from "sequelize";
import { sequelize } from "@/db/sequelize";
import type { PartCategory } from "@/lib/catalogue/kinds";

export interface SizedPart {
  id: number;
  maker: string;
  number: string;
  description: string;
  innerMm: number | null;
  outerMm: number;
  widthMm: number | null;
}

/**
 * The nearest distinct sizes first, from the GiST index on `part_sizes` (migration 0018), inside the tolerance
 * window's box; then, for each, its parts in number order through the btree on size and number. No size can
 * give more than `limit` of the answer, so each is read only that far: the rows read are bounded by the limit,
 * however many parts the catalogue holds of one size.
 */
export const NEAREST_SIZES_SQL = `
  SELECT p.id, m.name AS maker, p.number, p.description, p.inner_mm, p.outer_mm, p.width_mm
  FROM (
    SELECT inner_mm, outer_mm, point(inner_mm, outer_mm) <-> point(:inner, :outer) AS distance
    FROM part_sizes
    WHERE category = :category
      AND point(inner_mm, outer_mm) <@ box(point(:innerLo, :outerLo), point(:innerHi, :outerHi))
    ORDER BY point(inner_mm, outer_mm) <-> point(:inner, :outer)
    LIMIT :limit
  ) s
  CROSS JOIN LATERAL (
    SELECT * FROM original_parts p
    WHERE p.outer_mm IS NOT NULL AND p.category = :category
      AND coalesce(p.inner_mm, 0)::float8 = s.inner_mm AND p.outer_mm::float8 = s.outer_mm
    ORDER BY p.number COLLATE "C"
    LIMIT :limit
  ) p
  JOIN makers m ON m.id = p.maker_id
  ORDER BY s.distance, p.number COLLATE "C"
  LIMIT :limit`;

interface SizeQuery {
  category: PartCategory;
  /** Null for a part known by its outside alone (a plug). */
  innerMm: number | null;
  outerMm: number;
  toleranceMm: number;
  limit?: number;
}

/** The nearest-size statement's named parameters for a measurement. */
export function nearestSizesValues(input: SizeQuery) {
  const w = input.toleranceMm * 3;
  const inner = input.innerMm ?? 0;
  return {
    category: input.category,
    inner,
    outer: input.outerMm,
    innerLo: inner - (input.innerMm === null ? 0 : w),
    innerHi: inner + (input.innerMm === null ? 0 : w),
    outerLo: input.outerMm - w,
    outerHi: input.outerMm + w,
    limit: input.limit ?? 12,
  };
}

/**
 * Original parts whose documented inner and outer sizes lie within the window of a measurement, so a part with no
 * legible number can still be named. The window is three tolerances each way, as in the standard-size matching.
 */
export async function findPartsBySize(input: SizeQuery & { transaction?: Transaction }): Promise<SizedPart[]> {
  const rows = await sequelize.query<{
    id: number;
    maker: string;
    number: string;
    description: string;
    inner_mm: number | null;
    outer_mm: number;
    width_mm: number | null;
  }>(NEAREST_SIZES_SQL, {
    replacements: nearestSizesValues(input),
    type: QueryTypes.SELECT,
    transaction: input.transaction,
  });
  return rows.map((r) => ({
    id: r.id,
    maker: r.maker,
    number: r.number,
    description: r.description,
    innerMm: r.inner_mm,
    outerMm: r.outer_mm,
    widthMm: r.width_mm,
  }));
}
