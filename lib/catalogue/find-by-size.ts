import { QueryTypes } from "sequelize";
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
 * Original parts whose documented inner and outer sizes lie within the window of a measurement, so a part with no
 * legible number can still be named. The window is three tolerances each way, as in the standard-size matching.
 */
export async function findPartsBySize(input: {
  category: PartCategory;
  /** Null for a part known by its outside alone (a plug). */
  innerMm: number | null;
  outerMm: number;
  toleranceMm: number;
  limit?: number;
}): Promise<SizedPart[]> {
  const w = input.toleranceMm * 3;
  const inner = input.innerMm ?? 0;
  const limit = input.limit ?? 12;
  const rows = await sequelize.query<{
    id: number;
    maker: string;
    number: string;
    description: string;
    inner_mm: number | null;
    outer_mm: number;
    width_mm: number | null;
  }>(
    // The nearest sizes first, straight from the GiST index (migration 0015): the box is the tolerance window, the
    // order the distance from what was measured; the expressions are the index's own. A second sort key would make
    // PostgreSQL read and sort the whole window, so parts of the same size are put in number order here, from
    // twice as many rows as are shown.
    `SELECT p.id, m.name AS maker, p.number, p.description, p.inner_mm, p.outer_mm, p.width_mm
     FROM original_parts p JOIN makers m ON m.id = p.maker_id
     WHERE p.outer_mm IS NOT NULL AND p.category = :category
       AND point(coalesce(p.inner_mm, 0)::float8, p.outer_mm::float8)
         <@ box(point(:innerLo, :outerLo), point(:innerHi, :outerHi))
     ORDER BY point(coalesce(p.inner_mm, 0)::float8, p.outer_mm::float8) <-> point(:inner, :outer)
     LIMIT :read`,
    {
      replacements: {
        category: input.category,
        inner,
        outer: input.outerMm,
        innerLo: inner - (input.innerMm === null ? 0 : w),
        innerHi: inner + (input.innerMm === null ? 0 : w),
        outerLo: input.outerMm - w,
        outerHi: input.outerMm + w,
        read: limit * 2,
      },
      type: QueryTypes.SELECT,
    },
  );
  const distance = (r: { inner_mm: number | null; outer_mm: number }) =>
    Math.hypot((r.inner_mm ?? 0) - inner, r.outer_mm - input.outerMm);
  return rows
    .map((r) => ({ r, d: distance(r) }))
    .sort((a, b) => a.d - b.d || (a.r.number < b.r.number ? -1 : a.r.number > b.r.number ? 1 : 0))
    .slice(0, limit)
    .map(({ r }) => ({
      id: r.id,
      maker: r.maker,
      number: r.number,
      description: r.description,
      innerMm: r.inner_mm,
      outerMm: r.outer_mm,
      widthMm: r.width_mm,
    }));
}
