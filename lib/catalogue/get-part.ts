import { QueryTypes } from "sequelize";
import { sequelize } from "@/db/sequelize";
import { CATEGORY_NAMES, type CautionKind, type Fit, type PartCategory, type StandardKind, type SupersessionKind } from "@/lib/catalogue/kinds";
import { loadChain } from "@/lib/catalogue/supersessions";
import { AppError } from "@/lib/errors";

export interface ChainLink {
  id: number;
  number: string;
  kind: SupersessionKind | null;
  note: string | null;
}

export interface CrossView {
  id: number;
  fit: Fit;
  standard: { kind: StandardKind; designation: string; innerMm: number | null; outerMm: number | null; widthMm: number | null; lengthMm: number | null; attributes: Record<string, unknown> } | null;
  repairMethod: string | null;
  notes: string | null;
  origin: string;
  confirmations: number;
  /** Photos from the member's proposal that put this cross in the catalogue. */
  photos: number[];
}

export interface PartDetail {
  id: number;
  maker: { id: number; name: string };
  number: string;
  description: string;
  category: PartCategory;
  categoryName: string;
  dimensions: { innerMm: number | null; outerMm: number | null; widthMm: number | null; lengthMm: number | null; note: string | null };
  chain: { before: ChainLink[]; after: ChainLink[]; latest: ChainLink; loop: boolean };
  crosses: CrossView[];
  whereUsed: Array<{ machineId: number; maker: string; model: string; years: string; assembly: string; quantity: number; serialNote: string | null }>;
  sameAssembly: Array<{ id: number; number: string; description: string; category: PartCategory; assembly: string; model: string; standard: string | null }>;
  cautions: CautionKind[];
}

const CATEGORY_CAUTIONS: Partial<Record<PartCategory, CautionKind>> = { bearing: "bearings", v_belt: "belts", lip_seal: "seals", felt_seal: "seals", gasket: "seals" };

/** Everything the part page shows, as plain objects; only approved crosses are included. */
export async function getPart(id: number): Promise<PartDetail> {
  const [part] = await sequelize.query<{
    id: number; maker_id: number; maker: string; number: string; description: string; category: PartCategory;
    inner_mm: number | null; outer_mm: number | null; width_mm: number | null; length_mm: number | null; dimensions_note: string | null;
  }>(
    `SELECT p.id, p.maker_id, m.name AS maker, p.number, p.description, p.category, p.inner_mm, p.outer_mm, p.width_mm, p.length_mm, p.dimensions_note
     FROM original_parts p JOIN makers m ON m.id = p.maker_id WHERE p.id = :id`,
    { replacements: { id }, type: QueryTypes.SELECT },
  );
  if (!part) throw new AppError("not_found", "No part with that id.");

  const chain = await loadChain(id);
  const chainIds = [...chain.before, ...chain.after];
  const numbers = new Map<number, string>([[id, part.number]]);
  if (chainIds.length > 0) {
    const rows = await sequelize.query<{ id: number; number: string }>("SELECT id, number FROM original_parts WHERE id IN (:ids)", { replacements: { ids: chainIds }, type: QueryTypes.SELECT });
    for (const r of rows) numbers.set(r.id, r.number);
  }
  const edgeInto = (partId: number) => chain.edges.find((e) => e.newPartId === partId);
  const link = (partId: number): ChainLink => ({ id: partId, number: numbers.get(partId) ?? "?", kind: edgeInto(partId)?.kind ?? null, note: edgeInto(partId)?.note ?? null });

  const [crosses, whereUsed, sameAssembly] = await Promise.all([
    sequelize.query<{
      id: number; fit: Fit; repair_method: string | null; notes: string | null; origin: string; confirmations: string; photos: number[];
      kind: StandardKind | null; designation: string | null; inner_mm: number | null; outer_mm: number | null; width_mm: number | null; length_mm: number | null; attributes: Record<string, unknown> | null;
    }>(
      `SELECT c.id, c.fit, c.repair_method, c.notes, c.origin, count(f.id) AS confirmations,
              (SELECT coalesce(array_agg(ph.id ORDER BY ph.id), '{}') FROM submissions sub JOIN submission_photos ph ON ph.submission_id = sub.id
               WHERE sub.cross_id = c.id AND sub.status = 'approved') AS photos,
              s.kind, s.designation, s.inner_mm, s.outer_mm, s.width_mm, s.length_mm, s.attributes
       FROM crosses c LEFT JOIN standard_parts s ON s.id = c.standard_part_id LEFT JOIN confirmations f ON f.cross_id = c.id
       WHERE c.original_part_id = :id AND c.status = 'approved'
       GROUP BY c.id, s.id
       ORDER BY c.fit, count(f.id) DESC, c.id`,
      { replacements: { id }, type: QueryTypes.SELECT },
    ),
    sequelize.query<{ machine_id: number; maker: string; model: string; year_from: number | null; year_to: number | null; assembly: string; quantity: number; serial_note: string | null; caution: CautionKind | null }>(
      `SELECT u.machine_id, mk.name AS maker, ma.model, ma.year_from, ma.year_to, a.name AS assembly, u.quantity, u.serial_note, a.caution
       FROM part_usages u JOIN machines ma ON ma.id = u.machine_id JOIN makers mk ON mk.id = ma.maker_id JOIN assemblies a ON a.id = u.assembly_id
       WHERE u.part_id = :id ORDER BY mk.name, ma.model, a.name`,
      { replacements: { id }, type: QueryTypes.SELECT },
    ),
    sequelize.query<{ id: number; number: string; description: string; category: PartCategory; assembly: string; model: string; standard: string | null }>(
      `SELECT DISTINCT ON (p.id) p.id, p.number, p.description, p.category, a.name AS assembly, ma.model,
              (SELECT s.designation FROM crosses c JOIN standard_parts s ON s.id = c.standard_part_id
               WHERE c.original_part_id = p.id AND c.status = 'approved' ORDER BY c.fit, c.id LIMIT 1) AS standard
       FROM part_usages mine
       JOIN part_usages u ON u.machine_id = mine.machine_id AND u.assembly_id = mine.assembly_id AND u.part_id <> mine.part_id AND u.serial_note IS NULL
       JOIN original_parts p ON p.id = u.part_id JOIN assemblies a ON a.id = u.assembly_id JOIN machines ma ON ma.id = u.machine_id
       WHERE mine.part_id = :id
       ORDER BY p.id LIMIT 40`,
      { replacements: { id }, type: QueryTypes.SELECT },
    ),
  ]);

  const cautions = new Set<CautionKind>();
  const byCategory = CATEGORY_CAUTIONS[part.category];
  if (byCategory) cautions.add(byCategory);
  for (const u of whereUsed) if (u.caution) cautions.add(u.caution);

  return {
    id: part.id,
    maker: { id: part.maker_id, name: part.maker },
    number: part.number,
    description: part.description,
    category: part.category,
    categoryName: CATEGORY_NAMES[part.category],
    dimensions: { innerMm: part.inner_mm, outerMm: part.outer_mm, widthMm: part.width_mm, lengthMm: part.length_mm, note: part.dimensions_note },
    chain: { before: chain.before.map(link), after: chain.after.map(link), latest: link(chain.latestId), loop: chain.loop },
    crosses: crosses.map((c) => ({
      id: c.id,
      fit: c.fit,
      standard: c.kind && c.designation ? { kind: c.kind, designation: c.designation, innerMm: c.inner_mm, outerMm: c.outer_mm, widthMm: c.width_mm, lengthMm: c.length_mm, attributes: c.attributes ?? {} } : null,
      repairMethod: c.repair_method,
      notes: c.notes,
      origin: c.origin,
      confirmations: Number(c.confirmations),
      photos: c.photos,
    })),
    whereUsed: whereUsed.map((u) => ({
      machineId: u.machine_id,
      maker: u.maker,
      model: u.model,
      years: u.year_from ? `${u.year_from}–${u.year_to ?? ""}` : "",
      assembly: u.assembly,
      quantity: u.quantity,
      serialNote: u.serial_note,
    })),
    sameAssembly: sameAssembly.sort((a, b) => a.assembly.localeCompare(b.assembly) || a.number.localeCompare(b.number)),
    cautions: [...cautions],
  };
}
