import { QueryTypes } from "sequelize";
import { sequelize } from "@/db/sequelize";
import {
  CATEGORY_NAMES,
  CAUTION_FOR_CATEGORY,
  type CautionKind,
  type PartCategory,
  type SupersessionKind,
} from "@/lib/catalogue/kinds";
import { bestCrosses, crossLabel, rankCrosses, type RankedCross } from "@/lib/catalogue/ranking";
import { serialRangeText } from "@/lib/catalogue/serials";
import { loadChain } from "@/lib/catalogue/supersessions";
import { AppError } from "@/lib/errors";

export interface ChainLink {
  id: number;
  number: string;
  kind: SupersessionKind | null;
  note: string | null;
}

/** A cross as the part page shows it: the shared ranking's entry (its own or a chain number's, `viaNumber`). */
export type CrossView = RankedCross;

export interface PartDetail {
  id: number;
  maker: { id: number; name: string };
  number: string;
  description: string;
  category: PartCategory;
  categoryName: string;
  dimensions: {
    innerMm: number | null;
    outerMm: number | null;
    widthMm: number | null;
    lengthMm: number | null;
    note: string | null;
  };
  chain: { before: ChainLink[]; after: ChainLink[]; latest: ChainLink; loop: boolean };
  crosses: CrossView[];
  whereUsed: Array<{
    machineId: number;
    maker: string;
    model: string;
    years: string;
    assembly: string;
    position: string;
    quantity: number;
    serials: string | null;
    serialNote: string | null;
  }>;
  sameAssembly: Array<{
    id: number;
    number: string;
    description: string;
    category: PartCategory;
    assembly: string;
    model: string;
    serials: string | null;
    standard: string | null;
  }>;
  cautions: CautionKind[];
}

interface PartRow {
  id: number;
  maker_id: number;
  maker: string;
  number: string;
  description: string;
  category: PartCategory;
  inner_mm: number | null;
  outer_mm: number | null;
  width_mm: number | null;
  length_mm: number | null;
  dimensions_note: string | null;
}

/** Everything the part page shows, as plain objects; only approved crosses are included. */
export async function getPart(id: number): Promise<PartDetail> {
  const [part] = await sequelize.query<PartRow>(
    `SELECT p.id, p.maker_id, m.name AS maker, p.number, p.description, p.category, p.inner_mm, p.outer_mm, p.width_mm,
            p.length_mm, p.dimensions_note
     FROM original_parts p JOIN makers m ON m.id = p.maker_id WHERE p.id = :id`,
    { replacements: { id }, type: QueryTypes.SELECT },
  );
  if (!part) throw new AppError("not_found", "No part with that id.");
  const [chain, ranked, used, sameAssembly] = await Promise.all([
    chainOf(part),
    rankCrosses([id], { photos: true }),
    whereUsed(part),
    restOfAssembly(id),
  ]);
  const cautions = new Set<CautionKind>();
  const byCategory = CAUTION_FOR_CATEGORY[part.category];
  if (byCategory) cautions.add(byCategory);
  for (const u of used) if (u.caution) cautions.add(u.caution);
  return {
    id: part.id,
    maker: { id: part.maker_id, name: part.maker },
    number: part.number,
    description: part.description,
    category: part.category,
    categoryName: CATEGORY_NAMES[part.category],
    dimensions: {
      innerMm: part.inner_mm,
      outerMm: part.outer_mm,
      widthMm: part.width_mm,
      lengthMm: part.length_mm,
      note: part.dimensions_note,
    },
    chain,
    crosses: ranked.get(id) ?? [],
    whereUsed: used.map(({ caution: _caution, ...u }) => u),
    sameAssembly,
    cautions: [...cautions],
  };
}

/** The supersession chain around the part, each link with its number and how it supersedes the one before. */
async function chainOf(part: PartRow): Promise<PartDetail["chain"]> {
  const chain = await loadChain(part.id);
  const chainIds = [...chain.before, ...chain.after];
  const numbers = new Map<number, string>([[part.id, part.number]]);
  if (chainIds.length > 0) {
    const rows = await sequelize.query<{ id: number; number: string }>(
      "SELECT id, number FROM original_parts WHERE id IN (:ids)",
      { replacements: { ids: chainIds }, type: QueryTypes.SELECT },
    );
    for (const r of rows) numbers.set(r.id, r.number);
  }
  const edgeInto = (partId: number) => chain.edges.find((e) => e.newPartId === partId);
  const link = (partId: number): ChainLink => ({
    id: partId,
    number: numbers.get(partId) ?? "?",
    kind: edgeInto(partId)?.kind ?? null,
    note: edgeInto(partId)?.note ?? null,
  });
  return {
    before: chain.before.map(link),
    after: chain.after.map(link),
    latest: link(chain.latestId),
    loop: chain.loop,
  };
}

/** Every machine, place and serial range the part is fitted to, with the caution of each place. */
async function whereUsed(part: PartRow) {
  const rows = await sequelize.query<{
    machine_id: number;
    maker: string;
    model: string;
    year_from: number | null;
    year_to: number | null;
    assembly: string;
    position: string;
    quantity: number;
    serial_from: number | null;
    serial_to: number | null;
    serial_prefix: string | null;
    serial_note: string | null;
    caution: CautionKind | null;
  }>(
    `SELECT u.machine_id, mk.name AS maker, ma.model, ma.year_from, ma.year_to, a.name AS assembly,
            coalesce(u.position, :description) AS position, u.quantity,
            u.serial_from, u.serial_to, ma.serial_prefix, u.serial_note, a.caution
     FROM part_usages u JOIN machines ma ON ma.id = u.machine_id JOIN makers mk ON mk.id = ma.maker_id
       JOIN assemblies a ON a.id = u.assembly_id
     WHERE u.part_id = :id ORDER BY mk.name, ma.model, a.name, u.serial_from NULLS FIRST`,
    { replacements: { id: part.id, description: part.description }, type: QueryTypes.SELECT },
  );
  return rows.map((u) => ({
    machineId: u.machine_id,
    maker: u.maker,
    model: u.model,
    years: u.year_from ? `${u.year_from}–${u.year_to ?? ""}` : "",
    assembly: u.assembly,
    position: u.position,
    quantity: u.quantity,
    serials: serialRangeText({ serialFrom: u.serial_from, serialTo: u.serial_to }, u.serial_prefix),
    serialNote: u.serial_note,
    caution: u.caution,
  }));
}

/** The other positions of the same assemblies, on the serials this part was fitted to, each with its best answer. */
async function restOfAssembly(id: number): Promise<PartDetail["sameAssembly"]> {
  const rows = await sequelize.query<{
    id: number;
    number: string;
    description: string;
    category: PartCategory;
    assembly: string;
    model: string;
    serial_from: number | null;
    serial_to: number | null;
    serial_prefix: string | null;
  }>(
    `SELECT DISTINCT ON (p.id) p.id, p.number, p.description, p.category, a.name AS assembly, ma.model,
            u.serial_from, u.serial_to, ma.serial_prefix
     FROM part_usages mine
     JOIN part_usages u ON u.machine_id = mine.machine_id AND u.assembly_id = mine.assembly_id
      AND u.part_id <> mine.part_id
      AND coalesce(u.position, '') <> coalesce(mine.position, '-')
      AND (u.serial_to IS NULL OR mine.serial_from IS NULL OR u.serial_to >= mine.serial_from)
      AND (u.serial_from IS NULL OR mine.serial_to IS NULL OR u.serial_from <= mine.serial_to)
      AND u.serial_note IS NULL
     JOIN original_parts p ON p.id = u.part_id JOIN assemblies a ON a.id = u.assembly_id
     JOIN machines ma ON ma.id = u.machine_id
     WHERE mine.part_id = :id
     ORDER BY p.id LIMIT 40`,
    { replacements: { id }, type: QueryTypes.SELECT },
  );
  const best = await bestCrosses(rows.map((r) => r.id));
  return rows
    .map((r) => {
      const cross = best.get(r.id);
      return {
        id: r.id,
        number: r.number,
        description: r.description,
        category: r.category,
        assembly: r.assembly,
        model: r.model,
        serials: serialRangeText({ serialFrom: r.serial_from, serialTo: r.serial_to }, r.serial_prefix),
        standard: cross ? crossLabel(cross) : null,
      };
    })
    .sort((a, b) => a.assembly.localeCompare(b.assembly) || a.number.localeCompare(b.number));
}
