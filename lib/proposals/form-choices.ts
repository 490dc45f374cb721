import { Assembly, Machine, Maker } from "@/db";
import type { FormChoices } from "@/components/proposals/proposal-form";

/** Makers, their machines and the places on a machine, for the proposal form's lists. */
export async function loadFormChoices(): Promise<FormChoices> {
  const [makers, machines, assemblies] = await Promise.all([
    Maker.findAll({ attributes: ["id", "name"], order: [["name", "ASC"]] }),
    Machine.findAll({ attributes: ["id", "makerId", "model"], order: [["model", "ASC"]] }),
    Assembly.findAll({ attributes: ["id", "name"], order: [["name", "ASC"]] }),
  ]);
  return {
    makers: makers.map((m) => ({ id: m.id, name: m.name })),
    machines: machines.map((m) => ({ id: m.id, makerId: m.makerId, model: m.model })),
    assemblies: assemblies.map((a) => ({ id: a.id, name: a.name })),
  };
}
