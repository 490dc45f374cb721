import Fuse from "fuse.js";
import { QueryTypes } from "sequelize";
import { sequelize } from "@/db/sequelize";
import type { PartCategory } from "@/lib/catalogue/kinds";
import { lookAlikeKey, normaliseNumber, stripPrefix } from "@/lib/catalogue/normalise";
import { latestNumbersAndCrossCounts } from "@/lib/catalogue/supersessions";

export type MatchedBy = "exact" | "normalised" | "misread" | "similar";

export interface LookupResult {
  id: number;
  maker: string;
  number: string;
  description: string;
  category: PartCategory;
  matchedBy: MatchedBy;
  why: string;
  score: number;
  latestNumber: string;
  crossCount: number;
  /** The part's documented sizes in millimetres, where the catalogue has them. */
  sizes: { innerMm: number | null; outerMm: number | null; widthMm: number | null; lengthMm: number | null };
}

interface PartRow {
  id: number;
  maker: string;
  number: string;
  number_normalized: string;
  number_key: string;
  description: string;
  category: PartCategory;
  inner_mm: number | null;
  outer_mm: number | null;
  width_mm: number | null;
  length_mm: number | null;
}

const COLUMNS = `p.id, m.name AS maker, p.number, p.number_normalized, p.number_key, p.description, p.category,
  p.inner_mm, p.outer_mm, p.width_mm, p.length_mm`;

let prefixCache: { at: number; prefixes: string[] } | undefined;

/** Every maker's prefixes; makers change rarely, so the list is kept for a minute. */
async function makerPrefixes(): Promise<string[]> {
  if (prefixCache && Date.now() - prefixCache.at < 60_000) return prefixCache.prefixes;
  const rows = await sequelize.query<{ prefix: string }>("SELECT DISTINCT unnest(prefixes) AS prefix FROM makers", { type: QueryTypes.SELECT });
  prefixCache = { at: Date.now(), prefixes: rows.map((r) => r.prefix) };
  return prefixCache.prefixes;
}

const WHY: Record<MatchedBy, string> = {
  exact: "Exactly as typed",
  normalised: "Same number, written with other spacing, dashes or case",
  misread: "Same number if some look-alike characters were misread (O/0, I/1, S/5, B/8)",
  similar: "A similar number: one or two characters differ",
};

/**
 * Finds original parts by factory number as typed from a worn stamping: exact and normalised matches first, then
 * look-alike misreadings, then similar numbers (trigram candidates from PostgreSQL, ranked by fuse.js).
 */
export async function findPartsByNumber(query: string, limit: number): Promise<LookupResult[]> {
  const typed = normaliseNumber(query);
  if (typed === "") return [];
  const prefixes = await makerPrefixes();
  const stripped = stripPrefix(typed, prefixes);
  const forms = [...new Set([typed, stripped])];
  const keys = [...new Set(forms.map(lookAlikeKey))];

  const found = new Map<number, { row: PartRow; matchedBy: MatchedBy; score: number }>();
  const exactRows = await sequelize.query<PartRow>(
    `SELECT ${COLUMNS} FROM original_parts p JOIN makers m ON m.id = p.maker_id
     WHERE p.number_normalized IN (:forms) OR p.number_key IN (:keys) LIMIT 200`,
    { replacements: { forms, keys }, type: QueryTypes.SELECT },
  );
  const asTyped = query.trim().toUpperCase();
  for (const row of exactRows) {
    const matchedBy: MatchedBy = row.number.toUpperCase() === asTyped ? "exact" : forms.includes(row.number_normalized) ? "normalised" : "misread";
    found.set(row.id, { row, matchedBy, score: matchedBy === "exact" ? 1 : matchedBy === "normalised" ? 0.98 : 0.9 });
  }

  // Similar numbers only when nothing matched outright: a restorer with an exact hit has found the part.
  if (found.size === 0 && keys[keys.length - 1].length >= 3) {
    const key = keys[keys.length - 1];
    // The % operator's threshold (0.3) is set on each pooled connection in db/sequelize.ts.
    const nearest = await sequelize.query<PartRow>(
      `SELECT ${COLUMNS} FROM original_parts p JOIN makers m ON m.id = p.maker_id
       WHERE p.number_key % :key ORDER BY similarity(p.number_key, :key) DESC LIMIT 60`,
      { replacements: { key }, type: QueryTypes.SELECT },
    );
    const fuse = new Fuse(nearest, { keys: ["number_key"], includeScore: true, threshold: 0.45, ignoreLocation: true });
    for (const hit of fuse.search(key)) {
      found.set(hit.item.id, { row: hit.item, matchedBy: "similar", score: Math.round((1 - (hit.score ?? 1)) * 0.85 * 1000) / 1000 });
    }
  }

  const ranked = [...found.values()].sort((a, b) => b.score - a.score || a.row.number.localeCompare(b.row.number)).slice(0, limit);
  if (ranked.length === 0) return [];
  const ids = ranked.map((r) => r.row.id);
  const { latest, counts } = await latestNumbersAndCrossCounts(ids);
  return ranked.map(({ row, matchedBy, score }) => ({
    id: row.id,
    maker: row.maker,
    number: row.number,
    description: row.description,
    category: row.category,
    matchedBy,
    why: WHY[matchedBy],
    score,
    latestNumber: latest.get(row.id) ?? row.number,
    crossCount: counts.get(row.id) ?? 0,
    sizes: { innerMm: row.inner_mm, outerMm: row.outer_mm, widthMm: row.width_mm, lengthMm: row.length_mm },
  }));
}

