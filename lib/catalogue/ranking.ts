import { QueryTypes } from "sequelize";
import { sequelize } from "@/db/sequelize";
import { FITS, type Fit, type StandardKind } from "@/lib/catalogue/kinds";
import { walk } from "@/lib/catalogue/supersessions";

/**
 * The one place that decides which standard parts take a factory part's place, and in what order. The part page,
 * look-up, the machine table, job lists, the print sheet and the CSV all read their crosses from here, so one part
 * has one best answer wherever it is looked at.
 *
 * A part's crosses are its own approved crosses and those of the numbers it is interchangeable with, along the whole
 * chain either way; across a one-way link only the newer number's crosses count for the older one (the newer part fits
 * where the older did, not the other way round). A link that needs companion parts passes nothing on.
 */
export interface RankedCross {
  /** The cross's own id (what a confirmation is recorded against). */
  id: number;
  /** The factory part the cross was recorded on. */
  partId: number;
  /** The number the cross came from when it is another number of the chain; null for the part's own. */
  viaNumber: string | null;
  fit: Fit;
  standardPartId: number | null;
  standard: {
    kind: StandardKind;
    designation: string;
    innerMm: number | null;
    outerMm: number | null;
    widthMm: number | null;
    lengthMm: number | null;
    attributes: Record<string, unknown>;
  } | null;
  repairMethod: string | null;
  notes: string | null;
  origin: string;
  /** Members' confirmations of this standard part on this part, counted over every number of the chain it came from. */
  confirmations: number;
  /** Photos from the proposals that put it in the catalogue (only when asked for). */
  photos: number[];
}

export interface CrossRow {
  start_id: number;
  id: number;
  part_id: number;
  number: string;
  fit: Fit;
  standard_part_id: number | null;
  repair_method: string | null;
  notes: string | null;
  origin: string;
  confirmations: string | number;
  photos?: number[] | null;
  kind: StandardKind | null;
  designation: string | null;
  inner_mm: number | null;
  outer_mm: number | null;
  width_mm: number | null;
  length_mm: number | null;
  attributes: Record<string, unknown> | null;
}

const fitRank = (fit: Fit) => FITS.indexOf(fit);
const sameThing = (row: CrossRow) =>
  row.standard_part_id !== null ? `s${row.standard_part_id}` : `r${(row.repair_method ?? "").trim().toLowerCase()}`;

/**
 * Orders one part's crosses: best fit first; of one fit, a standard part one can order before a repair method; then
 * the most confirmations; then the part's own before a chain number's; then by name, so the order never wobbles.
 * The same standard part reached through several numbers shows once (the part's own record where it has one), with
 * the confirmations of all of them.
 */
export function rankCrossRows(startId: number, rows: CrossRow[]): RankedCross[] {
  const groups = new Map<string, CrossRow[]>();
  for (const row of rows) groups.set(sameThing(row), [...(groups.get(sameThing(row)) ?? []), row]);
  const merged: RankedCross[] = [];
  for (const group of groups.values()) {
    const pick = [...group].sort(
      (a, b) =>
        Number(b.part_id === startId) - Number(a.part_id === startId) ||
        fitRank(a.fit) - fitRank(b.fit) ||
        Number(b.confirmations) - Number(a.confirmations) ||
        a.id - b.id,
    )[0];
    merged.push({
      id: pick.id,
      partId: pick.part_id,
      viaNumber: pick.part_id === startId ? null : pick.number,
      fit: pick.fit,
      standardPartId: pick.standard_part_id,
      standard:
        pick.kind && pick.designation
          ? {
              kind: pick.kind,
              designation: pick.designation,
              innerMm: pick.inner_mm,
              outerMm: pick.outer_mm,
              widthMm: pick.width_mm,
              lengthMm: pick.length_mm,
              attributes: pick.attributes ?? {},
            }
          : null,
      repairMethod: pick.repair_method,
      notes: pick.notes,
      origin: pick.origin,
      confirmations: group.reduce((sum, r) => sum + Number(r.confirmations), 0),
      photos: [...new Set(group.flatMap((r) => r.photos ?? []))].sort((a, b) => a - b),
    });
  }
  const label = (c: RankedCross) => c.standard?.designation ?? c.repairMethod ?? "";
  return merged.sort(
    (a, b) =>
      fitRank(a.fit) - fitRank(b.fit) ||
      Number(b.standard !== null) - Number(a.standard !== null) ||
      b.confirmations - a.confirmations ||
      Number(a.viaNumber !== null) - Number(b.viaNumber !== null) ||
      label(a).localeCompare(label(b)) ||
      a.id - b.id,
  );
}

/**
 * From a walk the way a replacement fits: the approved crosses each start can take, as `CrossRow`s, the photos of
 * their proposals when asked for.
 */
export function crossRowsFrom(walkName: string, options: { photos?: boolean } = {}): string {
  const photos = options.photos
    ? `, (SELECT coalesce(array_agg(ph.id ORDER BY ph.id), '{}') FROM proposals sub
         JOIN proposal_photos ph ON ph.proposal_id = sub.id
         WHERE sub.cross_id = c.id AND sub.status = 'approved') AS photos`
    : "";
  return `SELECT src.start_id, c.id, c.original_part_id AS part_id, p.number, c.fit, c.standard_part_id,
       c.repair_method, c.notes, c.origin,
       (SELECT count(*) FROM confirmations f WHERE f.cross_id = c.id) AS confirmations${photos},
       s.kind, s.designation, s.inner_mm, s.outer_mm, s.width_mm, s.length_mm, s.attributes
     FROM (SELECT DISTINCT start_id, part_id FROM ${walkName}) src
     JOIN crosses c ON c.original_part_id = src.part_id AND c.status = 'approved'
     JOIN original_parts p ON p.id = c.original_part_id
     LEFT JOIN standard_parts s ON s.id = c.standard_part_id`;
}

/** Every part's ranked crosses, for many parts in one query. Parts with none get an empty list. */
export async function rankCrosses(
  partIds: readonly number[],
  options: { photos?: boolean } = {},
): Promise<Map<number, RankedCross[]>> {
  const ids = [...new Set(partIds)];
  const ranked = new Map<number, RankedCross[]>(ids.map((id) => [id, []]));
  if (ids.length === 0) return ranked;
  const rows = await sequelize.query<CrossRow>(`${walk("fits")} ${crossRowsFrom("walk", options)}`, {
    replacements: { ids },
    type: QueryTypes.SELECT,
  });
  const byStart = new Map<number, CrossRow[]>();
  for (const row of rows) byStart.set(row.start_id, [...(byStart.get(row.start_id) ?? []), row]);
  for (const [startId, list] of byStart) ranked.set(startId, rankCrossRows(startId, list));
  return ranked;
}

/** The best answer for each part: the first of its ranking, or null when the catalogue has no approved cross. */
export async function bestCrosses(partIds: readonly number[]): Promise<Map<number, RankedCross | null>> {
  const ranked = await rankCrosses(partIds);
  return new Map([...ranked].map(([id, list]) => [id, list[0] ?? null]));
}

/**
 * What to ask for at the counter: the standard designation, or the repair method where the answer is work, not a part.
 */
export const crossLabel = (cross: Pick<RankedCross, "standard" | "repairMethod">): string =>
  cross.standard?.designation ?? cross.repairMethod ?? "";
