import { QueryTypes } from "sequelize";
import { sequelize } from "@/db/sequelize";
import type { Fit, MachineKind, PartCategory } from "@/lib/catalogue/kinds";
import { bestCrosses, crossLabel } from "@/lib/catalogue/ranking";
import { serialRangeText } from "@/lib/catalogue/serials";
import { AppError } from "@/lib/errors";

export interface MakerWithMachines {
  id: number;
  name: string;
  country: string | null;
  note: string | null;
  machines: Array<{ id: number; model: string; kind: MachineKind; years: string; partCount: number }>;
}

export async function makersWithMachines(): Promise<MakerWithMachines[]> {
  const rows = await sequelize.query<{
    maker_id: number;
    maker: string;
    country: string | null;
    note: string | null;
    id: number;
    model: string;
    kind: MachineKind;
    year_from: number | null;
    year_to: number | null;
    parts: string;
  }>(
    `SELECT mk.id AS maker_id, mk.name AS maker, mk.country, mk.note, ma.id, ma.model, ma.kind, ma.year_from,
      ma.year_to,
            (SELECT count(DISTINCT u.part_id) FROM part_usages u WHERE u.machine_id = ma.id) AS parts
     FROM makers mk JOIN machines ma ON ma.maker_id = mk.id ORDER BY mk.name, ma.year_from, ma.model`,
    { type: QueryTypes.SELECT },
  );
  const makers = new Map<number, MakerWithMachines>();
  for (const r of rows) {
    if (!makers.has(r.maker_id))
      makers.set(r.maker_id, { id: r.maker_id, name: r.maker, country: r.country, note: r.note, machines: [] });
    makers.get(r.maker_id)!.machines.push({
      id: r.id,
      model: r.model,
      kind: r.kind,
      years: years(r.year_from, r.year_to),
      partCount: Number(r.parts),
    });
  }
  return [...makers.values()];
}

const years = (from: number | null, to: number | null) => (from ? `${from}–${to ?? ""}` : "");

export interface MachinePartRow {
  partId: number;
  number: string;
  description: string;
  category: PartCategory;
  assembly: string;
  quantity: number;
  /** The serials this part was fitted to ("to serial 22-1340"), null for all. */
  serials: string | null;
  serialNote: string | null;
  standard: string | null;
  fit: Fit | null;
  /** The chain number the best answer was recorded on, when not this one. */
  viaNumber: string | null;
}

export interface MachineDetail {
  id: number;
  maker: string;
  model: string;
  kind: MachineKind;
  years: string;
  serialNote: string | null;
  serialPrefix: string | null;
  assemblies: Array<{ name: string; count: number }>;
  parts: MachinePartRow[];
}

/** A machine and its parts by assembly, each with its best approved standard equivalent. */
export async function getMachine(id: number): Promise<MachineDetail> {
  const [machine] = await sequelize.query<{
    id: number;
    maker: string;
    model: string;
    kind: MachineKind;
    year_from: number | null;
    year_to: number | null;
    serial_note: string | null;
    serial_prefix: string | null;
  }>(
    "SELECT ma.id, mk.name AS maker, ma.model, ma.kind, ma.year_from, " +
      "ma.year_to, ma.serial_note, ma.serial_prefix FROM machines ma JOIN " +
      "makers mk ON mk.id = ma.maker_id WHERE ma.id = :id",
    { replacements: { id }, type: QueryTypes.SELECT },
  );
  if (!machine) throw new AppError("not_found", "No machine with that id.");
  const parts = await sequelize.query<{
    part_id: number;
    number: string;
    description: string;
    category: PartCategory;
    assembly: string;
    quantity: number;
    serial_from: number | null;
    serial_to: number | null;
    serial_note: string | null;
  }>(
    `SELECT p.id AS part_id, p.number, p.description, p.category, a.name AS assembly, u.quantity, u.serial_from,
      u.serial_to, u.serial_note
     FROM part_usages u JOIN original_parts p ON p.id = u.part_id JOIN assemblies a ON a.id = u.assembly_id
     WHERE u.machine_id = :id ORDER BY a.name, coalesce(u.position, p.description), u.serial_from NULLS FIRST,
       p.number`,
    { replacements: { id }, type: QueryTypes.SELECT },
  );
  const best = await bestCrosses(parts.map((p) => p.part_id));
  const counts = new Map<string, number>();
  for (const p of parts) counts.set(p.assembly, (counts.get(p.assembly) ?? 0) + 1);
  return {
    id: machine.id,
    maker: machine.maker,
    model: machine.model,
    kind: machine.kind,
    years: years(machine.year_from, machine.year_to),
    serialNote: machine.serial_note,
    serialPrefix: machine.serial_prefix,
    assemblies: [...counts].map(([name, count]) => ({ name, count })),
    parts: parts.map((p) => {
      const cross = best.get(p.part_id) ?? null;
      return {
        partId: p.part_id,
        number: p.number,
        description: p.description,
        category: p.category,
        assembly: p.assembly,
        quantity: p.quantity,
        serials: serialRangeText({ serialFrom: p.serial_from, serialTo: p.serial_to }, machine.serial_prefix),
        serialNote: p.serial_note,
        standard: cross ? crossLabel(cross) : null,
        fit: cross?.fit ?? null,
        viaNumber: cross?.viaNumber ?? null,
      };
    }),
  };
}

/** Every maker by name, for a filter. */
export async function makerChoices(): Promise<Array<{ id: number; name: string }>> {
  return sequelize.query<{ id: number; name: string }>("SELECT id, name FROM makers ORDER BY name", {
    type: QueryTypes.SELECT,
  });
}

/** Every machine as one line ("Corvane Tractor Works Model 30 (1946–1952)"), for choosing one in a form. */
export async function machineChoices(): Promise<Array<{ id: number; label: string }>> {
  return (await makersWithMachines()).flatMap((m) =>
    m.machines.map((ma) => ({ id: ma.id, label: `${m.name} ${ma.model}${ma.years ? ` (${ma.years})` : ""}` })),
  );
}
