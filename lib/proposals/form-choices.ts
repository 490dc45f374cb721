import { Assembly, Machine, Maker, OriginalPart } from "@/db";
import type { FormChoices } from "@/components/proposals/proposal-form";
import type { PickedPart } from "@/components/proposals/pickers";
import { idFromText } from "@/lib/validation/ids";

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

/** The part a proposal starts from when the form is opened from a part page (`?part=`); null for none or a bad id. */
export async function pickedPartFor(partParam: string | undefined): Promise<PickedPart | null> {
  const id = idFromText("part").safeParse(partParam);
  if (!id.success) return null;
  const part = await OriginalPart.findByPk(id.data);
  const maker = part ? await Maker.findByPk(part.makerId) : null;
  if (!part || !maker) return null;
  const dims = { innerMm: part.innerMm, outerMm: part.outerMm, widthMm: part.widthMm, lengthMm: part.lengthMm };
  return { id: part.id, number: part.number, maker: maker.name, description: part.description, dims };
}
