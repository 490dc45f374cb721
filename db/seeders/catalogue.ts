import { Op } from "sequelize";
import { Assembly, Confirmation, Cross, Machine, Maker, OriginalPart, PartUsage, sequelize, StandardPart, Supersession, User } from "@/db";
import { buildDemoCatalogue } from "@/fixtures/catalogue/build";
import { searchForms } from "@/lib/catalogue/normalise";

/** Loads the invented demo catalogue in one transaction: all of it lands, or none. */
export async function seedDemoCatalogue(log: (message: string) => void = () => {}): Promise<void> {
  const demo = buildDemoCatalogue();
  const confirmers = await User.findAll({ where: { email: { [Op.like]: "club.member%@understudy.test" } }, order: [["email", "ASC"]] });
  await sequelize.transaction(async (transaction) => {
    const t = { transaction };
    const makers = new Map<string, Maker>();
    for (const m of demo.makers) makers.set(m.key, await Maker.create({ name: m.name, prefixes: m.prefixes, country: m.country, note: m.note }, t));
    const machines = new Map<string, number>();
    for (const m of demo.machines) {
      const row = await Machine.create({ makerId: makers.get(m.makerKey)!.id, model: m.model, kind: m.kind, yearFrom: m.yearFrom, yearTo: m.yearTo, serialNote: m.serialNote }, t);
      machines.set(m.key, row.id);
    }
    const assemblies = new Map<string, number>();
    for (const a of demo.assemblies) assemblies.set(a.name, (await Assembly.create({ name: a.name, caution: a.caution }, t)).id);

    const standardRows = await StandardPart.bulkCreate(demo.standardParts.map(({ key: _key, ...s }) => s), { ...t, returning: true });
    const standard = new Map(demo.standardParts.map((s, i) => [s.key, standardRows[i].id]));

    const partRows = await OriginalPart.bulkCreate(
      demo.parts.map(({ key: _key, makerKey, ...p }) => {
        const maker = makers.get(makerKey)!;
        const forms = searchForms(p.number, maker.prefixes);
        return { ...p, makerId: maker.id, numberNormalized: forms.normalised, numberKey: forms.key };
      }),
      { ...t, returning: true },
    );
    const partIds = new Map(demo.parts.map((p, i) => [p.key, partRows[i].id]));

    await PartUsage.bulkCreate(
      demo.usages.map((u) => ({ partId: partIds.get(u.partKey)!, machineId: machines.get(u.machineKey)!, assemblyId: assemblies.get(u.assembly)!, quantity: u.quantity, serialNote: u.serialNote })),
      t,
    );
    await Supersession.bulkCreate(demo.supersessions.map((s) => ({ oldPartId: partIds.get(s.oldKey)!, newPartId: partIds.get(s.newKey)!, kind: s.kind, note: s.note })), t);
    const crossRows = await Cross.bulkCreate(
      demo.crosses.map((c) => ({
        originalPartId: partIds.get(c.partKey)!,
        standardPartId: c.standardKey ? standard.get(c.standardKey)! : null,
        repairMethod: c.repairMethod,
        fit: c.fit,
        notes: c.notes,
        status: c.status,
        origin: c.origin,
        createdBy: null,
      })),
      { ...t, returning: true },
    );
    await Confirmation.bulkCreate(
      demo.crosses.flatMap((c, i) => confirmers.slice(0, c.confirmations).map((user) => ({ crossId: crossRows[i].id, userId: user.id, note: null }))),
      t,
    );
  });
  log(`demo catalogue: ${demo.makers.length} makers, ${demo.machines.length} machines, ${demo.parts.length} parts, ${demo.crosses.length} crosses`);
}

export async function isCatalogueEmpty(): Promise<boolean> {
  return (await OriginalPart.count()) === 0;
}
