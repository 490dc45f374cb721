import { QueryTypes } from "sequelize";
import { sequelize } from "@/db/sequelize";
import type { StandardKind } from "@/lib/catalogue/kinds";

export interface StandardPartHit {
  id: number;
  kind: StandardKind;
  designation: string;
  innerMm: number | null;
  outerMm: number | null;
  widthMm: number | null;
  lengthMm: number | null;
}

/** Standard parts whose designation contains what was typed (spaces and dashes ignored), shortest first. */
export async function findStandardParts(
  q: string,
  kind: StandardKind | undefined,
  limit: number,
): Promise<StandardPartHit[]> {
  const compact = q.toUpperCase().replace(/[\s\-×x*]+/g, "");
  const rows = await sequelize.query<{
    id: number;
    kind: StandardKind;
    designation: string;
    inner_mm: number | null;
    outer_mm: number | null;
    width_mm: number | null;
    length_mm: number | null;
  }>(
    `SELECT id, kind, designation, inner_mm, outer_mm, width_mm, length_mm FROM standard_parts
     WHERE regexp_replace(upper(designation), '[\\s\\-×X*]+', '', 'g') LIKE :pattern ${kind ? "AND kind = :kind" : ""}
     ORDER BY length(designation), designation LIMIT :limit`,
    {
      replacements: { pattern: `%${compact.replace(/[%_\\]/g, "")}%`, kind: kind ?? null, limit },
      type: QueryTypes.SELECT,
    },
  );
  return rows.map((r) => ({
    id: r.id,
    kind: r.kind,
    designation: r.designation,
    innerMm: r.inner_mm,
    outerMm: r.outer_mm,
    widthMm: r.width_mm,
    lengthMm: r.length_mm,
  }));
}
