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
  const rows = await sequelize.query<{
    id: number;
    maker: string;
    number: string;
    description: string;
    inner_mm: number;
    outer_mm: number;
    width_mm: number | null;
  }>(
    `SELECT p.id, m.name AS maker, p.number, p.description, p.inner_mm, p.outer_mm, p.width_mm
     FROM original_parts p JOIN makers m ON m.id = p.maker_id
     WHERE p.category = :category AND p.outer_mm BETWEEN :outerLo AND :outerHi AND
       (CAST(:inner AS numeric) IS NULL OR p.inner_mm BETWEEN :innerLo AND :innerHi)
     ORDER BY abs(coalesce(p.inner_mm - :inner, 0)) + abs(p.outer_mm - :outer), p.number
     LIMIT :limit`,
    {
      replacements: {
        category: input.category,
        inner: input.innerMm,
        outer: input.outerMm,
        innerLo: input.innerMm === null ? null : input.innerMm - w,
        innerHi: input.innerMm === null ? null : input.innerMm + w,
        outerLo: input.outerMm - w,
        outerHi: input.outerMm + w,
        limit: input.limit ?? 12,
      },
      type: QueryTypes.SELECT,
    },
  );
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
