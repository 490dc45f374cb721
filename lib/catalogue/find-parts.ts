import Fuse from "fuse.js";
import { QueryTypes } from "sequelize";
import { runPrepared, type PreparedStatement } from "@/db/prepared";
import { sequelize } from "@/db/sequelize";
import type { Fit, PartCategory } from "@/lib/catalogue/kinds";
import { lookAlikeKey, normaliseNumber } from "@/lib/catalogue/normalise";
import { crossLabel, crossRowsFrom, rankCrossRows, rankCrosses, type CrossRow } from "@/lib/catalogue/ranking";
import { latestFrom, latestNumbers, walkFrom } from "@/lib/catalogue/supersessions";

export type MatchedBy = "exact" | "normalised" | "misread" | "prefix" | "similar" | "words";

export interface LookupResult {
  id: number;
  maker: string;
  makerId: number;
  number: string;
  description: string;
  category: PartCategory;
  matchedBy: MatchedBy;
  why: string;
  score: number;
  latestNumber: string;
  /** How many answers the shared ranking has for the part (its own crosses and those of its chain). */
  crossCount: number;
  /** The first answer of the shared ranking: what to ask for at the counter, without opening the part. */
  best: {
    label: string;
    standardPartId: number | null;
    fit: Fit;
    confirmations: number;
    viaNumber: string | null;
  } | null;
  /** The part's documented sizes in millimetres, where the catalogue has them. */
  sizes: { innerMm: number | null; outerMm: number | null; widthMm: number | null; lengthMm: number | null };
}

interface PartRow {
  id: number;
  maker_id: number;
  maker: string;
  number: string;
  number_normalised: string;
  number_key: string;
  description: string;
  category: PartCategory;
  inner_mm: number | null;
  outer_mm: number | null;
  width_mm: number | null;
  length_mm: number | null;
}

const COLUMNS = `p.id, p.maker_id, m.name AS maker, p.number, p.number_normalised, p.number_key, p.description,
  p.category,
  p.inner_mm, p.outer_mm, p.width_mm, p.length_mm`;

let prefixCache: { at: number; prefixes: Array<{ makerId: number; prefix: string }> } | undefined;

export const MAKER_PREFIXES_SQL = "SELECT id, unnest(prefixes) AS prefix FROM makers";

/** The makers' prefixes as typed numbers are compared with them: normalised, the empty ones left out. */
export const prefixesOf = (rows: Array<{ id: number; prefix: string }>) =>
  rows.map((r) => ({ makerId: r.id, prefix: normaliseNumber(r.prefix) })).filter((r) => r.prefix !== "");

/** Every maker's prefixes; makers change rarely, so the list is kept for a minute. */
async function makerPrefixes(): Promise<Array<{ makerId: number; prefix: string }>> {
  if (prefixCache && Date.now() - prefixCache.at < 60_000) return prefixCache.prefixes;
  const rows = await sequelize.query<{ id: number; prefix: string }>(MAKER_PREFIXES_SQL, { type: QueryTypes.SELECT });
  prefixCache = { at: Date.now(), prefixes: prefixesOf(rows) };
  return prefixCache.prefixes;
}

const WHY: Record<MatchedBy, string> = {
  exact: "Exactly as typed",
  normalised: "Same number, written with other spacing, dashes or case",
  misread: "Same number if some look-alike characters were misread (O/0, I/1, S/5, B/8)",
  prefix: "Starts with what you typed",
  similar: "A similar number: one or two characters differ",
  words: "Found by the words of its description, assembly, machine or maker",
};

/**
 * The score bands keep the kinds apart: every exact hit above every prefix hit, above every similar number, above
 * words.
 */
const BAND: Record<MatchedBy, number> = {
  exact: 1,
  normalised: 0.98,
  misread: 0.9,
  prefix: 0.8,
  similar: 0.7,
  words: 0.5,
};

/** Words of three letters or more make a query worth a full-text search (a number like "HM 210 007" has none). */
const WORDY = /[A-Za-z]{3,}/;

/** The query as a PostgreSQL tsquery: every word must be there, the last one may be unfinished (`water pu`). */
function wordsQuery(query: string): string | null {
  const tokens = query.toLowerCase().match(/[\p{L}\p{N}]+/gu) ?? [];
  if (tokens.length === 0) return null;
  return tokens.map((t, i) => (i === tokens.length - 1 && /\p{L}/u.test(t) ? `${t}:*` : t)).join(" & ");
}

/** What was typed, read as a number: its forms, its look-alike keys, and the makers its prefix names. */
export interface Typed {
  query: string;
  stripped: string;
  forms: string[];
  keys: string[];
  key: string;
  namedMakers: Set<number>;
  makerId: number | null;
}

type Found = Map<number, { row: PartRow; matchedBy: MatchedBy; score: number }>;

const FROM = "FROM original_parts p JOIN makers m ON m.id = p.maker_id";
const makerFilter = (typed: Typed) => (typed.makerId ? "AND p.maker_id = :makerId" : "");

/**
 * Finds original parts for what a person typed: a factory number from a worn stamping, part of one, or words.
 *
 * In order: exact, reformatted and look-alike matches; numbers that start with what was typed; similar numbers, which
 * still follow an exact hit because one wrong digit may match another real number; and parts found by words through
 * PostgreSQL full-text search. When the typed number starts with a maker's prefix, that maker's numbers come before
 * others'. `makerId` keeps the results to one maker.
 */
export async function lookUpParts(
  query: string,
  options: { limit: number; makerId?: number | null },
): Promise<LookupResult[]> {
  const typed = await readTyped(query, options.makerId ?? null);
  if (!typed) return [];
  const tsquery = WORDY.test(query) ? wordsQuery(query) : null;
  const [numbers, wordRows] = await Promise.all([
    findByNumber(typed, options.limit),
    tsquery ? findWords(typed, tsquery) : [],
  ]);
  const found: Found = new Map();
  const add = (row: PartRow, matchedBy: MatchedBy, within: number) => {
    if (found.has(row.id)) return;
    // A maker named by the typed prefix goes first within its band.
    const named = typed.namedMakers.size === 0 || typed.namedMakers.has(row.maker_id) ? 0.01 : 0;
    const score = Math.round((BAND[matchedBy] - 0.05 + Math.max(0, Math.min(within, 1)) * 0.04 + named) * 1000) / 1000;
    found.set(row.id, { row, matchedBy, score });
  };
  const asTyped = query.trim().toUpperCase();
  const isSame = (row: PartRow) => typed.forms.includes(row.number_normalised) || typed.keys.includes(row.number_key);
  for (const row of numbers.numberRows.filter(isSame)) {
    const reformatted = typed.forms.includes(row.number_normalised) ? "normalised" : "misread";
    add(row, row.number.toUpperCase() === asTyped ? "exact" : reformatted, 1);
  }
  const hit = found.size > 0;
  for (const row of numbers.numberRows) {
    add(row, "prefix", typed.stripped.length / Math.max(row.number_normalised.length, 1));
  }
  // Similar numbers: those one edit away, after a hit too (one wrong digit may be another real number); with no hit
  // and none one edit away, trigram search casts the wider net.
  for (const row of numbers.oneEdit) add(row, "similar", 1 - row.distance / typed.key.length);
  if (!hit && numbers.oneEdit.length === 0 && found.size < options.limit && typed.key.length >= 3) {
    for (const { row, closeness } of await findSimilar(typed)) add(row, "similar", closeness);
  }
  const topRank = Math.max(...wordRows.map((r) => r.rank), 0) || 1;
  for (const row of wordRows) add(row, "words", row.rank / topRank);
  return toResults(found, options.limit, numbers.answers);
}

async function readTyped(query: string, makerId: number | null): Promise<Typed | null> {
  return typedNumber(query, makerId, await makerPrefixes());
}

/** What was typed, read against the makers' prefixes (normalised); null when nothing in it can be a number. */
export function typedNumber(
  query: string,
  makerId: number | null,
  prefixes: Array<{ makerId: number; prefix: string }>,
): Typed | null {
  const typedNumber = normaliseNumber(query);
  if (typedNumber === "") return null;
  const prefixHit = prefixes
    .filter((p) => typedNumber.startsWith(p.prefix) && /\d/.test(typedNumber.slice(p.prefix.length)))
    .sort((a, b) => b.prefix.length - a.prefix.length);
  const stripped = prefixHit.length > 0 ? typedNumber.slice(prefixHit[0].prefix.length) : typedNumber;
  const namedMakers = new Set(prefixHit.filter((p) => p.prefix === prefixHit[0].prefix).map((p) => p.makerId));
  const forms = [...new Set([typedNumber, stripped])];
  return {
    query,
    stripped,
    forms,
    keys: [...new Set(forms.map(lookAlikeKey))],
    key: lookAlikeKey(stripped),
    namedMakers,
    makerId,
  };
}

/** What the number statement found: its rows, and the latest number and crosses of the likeliest of them. */
interface NumberAnswer {
  numberRows: PartRow[];
  oneEdit: Array<PartRow & { distance: number }>;
  answers: Map<number, { latest: string; crossRows: CrossRow[] }>;
}

/**
 * A maker the typed prefix names (or any, when it names none) first, as the ranking puts it. Similar numbers are
 * read in the ranking's own order (named maker, nearest, number) and no more than the page can show: they come after
 * every number that matched, so a page holds at most that many, and the parts read stay that many however many near
 * numbers a dense catalogue has.
 */
const namedFirst = (makerId: string) => `(cardinality($12::integer[]) = 0 OR ${makerId} = ANY($12::integer[])) DESC`;

/**
 * The look-up's one statement, prepared once per connection: the number itself (exact, reformatted, look-alike) and
 * the numbers that start with it; the numbers one edit away (a character missing, extra or different; for long
 * numbers two, or two swapped), which share one of the typed key's forms (itself, or itself less one character) in
 * the side table of every stored key's forms (migration 0017), found by equality in a handful of index probes and
 * kept by `levenshtein()` on the key the index carries (migration 0019), so only those kept are read; and, for the
 * likeliest of them (same number, then the rest in the order the ranking will most likely give), their latest number
 * and their crosses through the shared walk and ranking rows. The ranking itself stays in `lookUpParts`; a result it
 * puts on show that was not among the likeliest has its answers read afterwards, so the order never depends on this
 * guess.
 */
export const NUMBER_STATEMENT: PreparedStatement = {
  name: "look-up-by-number",
  text: `WITH RECURSIVE
    numbers AS (
      SELECT ${COLUMNS}, 0 AS distance, 0 AS source,
        row_number() OVER (ORDER BY length(p.number_normalised), p.number_normalised) AS place
      ${FROM}
      WHERE (p.number_normalised = ANY($1::text[]) OR p.number_key = ANY($2::text[])
             OR ($3::boolean AND ((p.number_normalised ~>=~ $4::text AND p.number_normalised ~<~ $13::text)
                                  OR (p.number_key ~>=~ $5::text AND p.number_key ~<~ $14::text))))
        AND ($6::integer = 0 OR p.maker_id = $6::integer)
      ORDER BY length(p.number_normalised), p.number_normalised LIMIT 200
    ),
    near AS (
      SELECT DISTINCT v.part_id, levenshtein(v.number_key, $7::text) AS distance
      FROM number_variants v
      WHERE $10::boolean AND v.variant = ANY($8::text[])
        AND levenshtein(v.number_key, $7::text) BETWEEN 1 AND $9::integer
    ),
    edits AS (
      SELECT ${COLUMNS}, n.distance, 1 AS source,
        row_number() OVER (ORDER BY ${namedFirst("p.maker_id")}, n.distance, p.number COLLATE "C") AS place
      FROM near n JOIN original_parts p ON p.id = n.part_id JOIN makers m ON m.id = p.maker_id
      WHERE $6::integer = 0 OR p.maker_id = $6::integer
      ORDER BY ${namedFirst("p.maker_id")}, n.distance, p.number COLLATE "C" LIMIT $11::integer
    ),
    found AS (SELECT * FROM numbers UNION ALL SELECT * FROM edits),
    picked AS (
      SELECT DISTINCT id FROM (
        SELECT id FROM found
        ORDER BY (number_normalised = ANY($1::text[]) OR number_key = ANY($2::text[])) DESC, source,
          ${namedFirst("maker_id")}, length(number_normalised), distance, number COLLATE "C"
        LIMIT $11::integer
      ) likeliest
    ),
    ${walkFrom("newer", "newer", "picked")},
    ${walkFrom("fits", "fits", "picked")},
    latest AS (${latestFrom("newer")}),
    cross_rows AS (${crossRowsFrom("fits")})
    SELECT f.*, l.number AS latest, (SELECT json_agg(x) FROM cross_rows x WHERE x.start_id = f.id) AS cross_rows
    FROM found f LEFT JOIN latest l ON l.start_id = f.id
    ORDER BY f.source, f.place`,
};

/**
 * The first string past every string that starts with `prefix`, in byte order: the prefix with its last character
 * one higher. "Starts with" as a range (`~>=~ prefix AND ~<~ pastPrefix(prefix)`) uses the pattern index with bound
 * parameters, where `LIKE $1` would leave a prepared statement's generic plan to scan the table.
 */
export function pastPrefix(prefix: string): string {
  if (prefix === "") return "";
  const last = prefix.codePointAt(prefix.length - 1)!;
  return prefix.slice(0, -1) + String.fromCodePoint(last + 1);
}

/** The number statement's parameters, in order; a maker id of 0 means every maker. */
export function numberStatementValues(typed: Typed, limit: number): unknown[] {
  const { key } = typed;
  return [
    typed.forms,
    typed.keys,
    typed.stripped.length >= 2,
    typed.stripped,
    typed.key,
    typed.makerId ?? 0,
    key,
    numberForms(key),
    key.length >= 8 ? 2 : 1,
    key.length >= 4,
    limit + 4, // a few past the page, for ties the ranking breaks by number
    [...typed.namedMakers],
    pastPrefix(typed.stripped),
    pastPrefix(typed.key),
  ];
}

async function findByNumber(typed: Typed, limit: number): Promise<NumberAnswer> {
  const rows = await runPrepared<
    PartRow & { distance: number; source: number; latest: string | null; cross_rows: CrossRow[] | null }
  >(NUMBER_STATEMENT, numberStatementValues(typed, limit));
  const answers = new Map<number, { latest: string; crossRows: CrossRow[] }>();
  for (const row of rows) {
    if (row.latest !== null) answers.set(row.id, { latest: row.latest, crossRows: row.cross_rows ?? [] });
  }
  return {
    numberRows: rows.filter((r) => r.source === 0),
    oneEdit: rows.filter((r) => r.source === 1),
    answers,
  };
}

/** Parts found by words, through the full-text index of their descriptions, places, machines and makers. */
function findWords(typed: Typed, tsquery: string): Promise<Array<PartRow & { rank: number }>> {
  return sequelize.query<PartRow & { rank: number }>(
    `SELECT ${COLUMNS}, ts_rank(p.search_document, q) AS rank ${FROM}, to_tsquery('english', :tsquery) q
     WHERE p.search_document @@ q ${makerFilter(typed)} ORDER BY rank DESC, p.number LIMIT 60`,
    { replacements: { tsquery, makerId: typed.makerId }, type: QueryTypes.SELECT },
  );
}

/** A key and each form of it with one character left out: as number_forms() in the database (migration 0017). */
export function numberForms(key: string): string[] {
  const forms = new Set([key]);
  for (let i = 0; i < key.length; i += 1) forms.add(key.slice(0, i) + key.slice(i + 1));
  return [...forms];
}

/** With no hit: trigram candidates from PostgreSQL, ranked by fuse.js. */
async function findSimilar(typed: Typed): Promise<Array<{ row: PartRow; closeness: number }>> {
  // The % operator's threshold (0.3) is set on each pooled connection in db/sequelize.ts.
  const rows = await sequelize.query<PartRow>(
    `SELECT ${COLUMNS} ${FROM} WHERE p.number_key % :key ${makerFilter(typed)}
     ORDER BY similarity(p.number_key, :key) DESC LIMIT 60`,
    { replacements: { key: typed.key, makerId: typed.makerId }, type: QueryTypes.SELECT },
  );
  const fuse = new Fuse(rows, { keys: ["number_key"], includeScore: true, threshold: 0.45, ignoreLocation: true });
  return fuse.search(typed.key).map((hit) => ({ row: hit.item, closeness: 1 - (hit.score ?? 1) }));
}

/** The best first, each with its latest number and the shared ranking's best answer. */
async function toResults(found: Found, limit: number, answers: NumberAnswer["answers"]): Promise<LookupResult[]> {
  const ranked = [...found.values()]
    // Ties by number in code-unit order, as the statement orders them (COLLATE "C").
    .sort((a, b) => b.score - a.score || (a.row.number < b.row.number ? -1 : a.row.number > b.row.number ? 1 : 0))
    .slice(0, limit);
  if (ranked.length === 0) return [];
  // The answers of results the number statement did not read (found by words, by trigram, or past its guess).
  const ids = ranked.map((r) => r.row.id).filter((id) => !answers.has(id));
  const [latest, crosses] =
    ids.length > 0 ? await Promise.all([latestNumbers(ids), rankCrosses(ids)]) : [new Map(), new Map()];
  for (const { row } of ranked) {
    const answer = answers.get(row.id);
    if (!answer) continue;
    latest.set(row.id, answer.latest);
    crosses.set(row.id, rankCrossRows(row.id, answer.crossRows));
  }
  return ranked.map(({ row, matchedBy, score }) => {
    const cross = crosses.get(row.id)?.[0] ?? null;
    return {
      id: row.id,
      maker: row.maker,
      makerId: row.maker_id,
      number: row.number,
      description: row.description,
      category: row.category,
      matchedBy,
      why: WHY[matchedBy],
      score,
      latestNumber: latest.get(row.id) ?? row.number,
      crossCount: crosses.get(row.id)?.length ?? 0,
      best: cross
        ? {
            label: crossLabel(cross),
            standardPartId: cross.standardPartId,
            fit: cross.fit,
            confirmations: cross.confirmations,
            viaNumber: cross.viaNumber,
          }
        : null,
      sizes: { innerMm: row.inner_mm, outerMm: row.outer_mm, widthMm: row.width_mm, lengthMm: row.length_mm },
    };
  });
}
