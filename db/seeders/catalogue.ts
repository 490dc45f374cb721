import { Op } from "sequelize";
import {
  Assembly,
  Confirmation,
  Cross,
  Machine,
  Maker,
  OriginalPart,
  PartUsage,
  sequelize,
  StandardPart,
  Proposal,
  Supersession,
  User,
} from "@/db";
import type { Measurement } from "@/lib/proposals/kinds";
import type { DemoStandardPart } from "@/fixtures/catalogue/build";
import { buildDemoCatalogue } from "@/fixtures/catalogue/build";
import { searchForms } from "@/lib/catalogue/normalise";

/** Loads the invented demo catalogue in one transaction: all of it lands, or none. */
export async function seedDemoCatalogue(log: (message: string) => void = () => {}): Promise<void> {
  const demo = buildDemoCatalogue();
  const confirmers = await User.findAll({
    where: { email: { [Op.like]: "club.member%@understudy.test" } },
    order: [["email", "ASC"]],
  });
  await sequelize.transaction(async (transaction) => {
    const t = { transaction };
    const makers = new Map<string, Maker>();
    for (const m of demo.makers)
      makers.set(
        m.key,
        await Maker.create({ name: m.name, prefixes: m.prefixes, country: m.country, note: m.note }, t),
      );
    const machines = new Map<string, number>();
    for (const m of demo.machines) {
      const row = await Machine.create(
        {
          makerId: makers.get(m.makerKey)!.id,
          model: m.model,
          kind: m.kind,
          yearFrom: m.yearFrom,
          yearTo: m.yearTo,
          serialNote: m.serialNote,
          serialPrefix: m.serialPrefix,
        },
        t,
      );
      machines.set(m.key, row.id);
    }
    const assemblies = new Map<string, number>();
    for (const a of demo.assemblies)
      assemblies.set(a.name, (await Assembly.create({ name: a.name, caution: a.caution }, t)).id);

    const standardRows = await StandardPart.bulkCreate(
      demo.standardParts.map(({ key: _key, ...s }) => s),
      { ...t, returning: true },
    );
    const standard = new Map(demo.standardParts.map((s, i) => [s.key, standardRows[i].id]));

    const partRows = await OriginalPart.bulkCreate(
      demo.parts.map(({ key: _key, makerKey, ...p }) => {
        const maker = makers.get(makerKey)!;
        const forms = searchForms(p.number, maker.prefixes);
        return { ...p, makerId: maker.id, numberNormalised: forms.normalised, numberKey: forms.key };
      }),
      { ...t, returning: true },
    );
    const partIds = new Map(demo.parts.map((p, i) => [p.key, partRows[i].id]));

    await PartUsage.bulkCreate(
      demo.usages.map((u) => ({
        partId: partIds.get(u.partKey)!,
        machineId: machines.get(u.machineKey)!,
        assemblyId: assemblies.get(u.assembly)!,
        quantity: u.quantity,
        serialNote: u.serialNote,
        serialFrom: u.serialFrom,
        serialTo: u.serialTo,
        position: u.position,
      })),
      t,
    );
    await Supersession.bulkCreate(
      demo.supersessions.map((s) => ({
        oldPartId: partIds.get(s.oldKey)!,
        newPartId: partIds.get(s.newKey)!,
        kind: s.kind,
        note: s.note,
      })),
      t,
    );
    // Pending crosses with a standard part are members' proposals waiting in the review queue: they are loaded as
    // proposals by the club members, sent over the last few weeks, so the queue has work in it from the start.
    const proposals = demo.crosses.filter((c) => c.status === "pending" && c.standardKey && confirmers.length > 0);
    const crosses = demo.crosses.filter((c) => !proposals.includes(c));
    const standardByKey = new Map(demo.standardParts.map((sp) => [sp.key, sp]));
    const now = Date.now();
    await Proposal.bulkCreate(
      proposals.map((c, i) => {
        const sent = new Date(now - (proposals.length - i) * 4 * 3600_000 - 24 * 3600_000);
        return {
          userId: confirmers[i % confirmers.length].id,
          status: "pending" as const,
          originalPartId: partIds.get(c.partKey)!,
          newPart: null,
          standardPartId: standard.get(c.standardKey!)!,
          newStandard: null,
          fit: c.fit,
          measurements: demoMeasurements(standardByKey.get(c.standardKey!)!, i),
          notes: c.notes ?? "Fitted on our club's machine; running well since.",
          checks: [],
          digestSentAt: sent,
          createdAt: sent,
          updatedAt: sent,
        };
      }),
      t,
    );
    const crossRows = await Cross.bulkCreate(
      crosses.map((c) => ({
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
      crosses.flatMap((c, i) =>
        confirmers.slice(0, c.confirmations).map((user) => ({ crossId: crossRows[i].id, userId: user.id, note: null })),
      ),
      t,
    );
  });
  const proposals = demo.crosses.filter((c) => c.status === "pending" && c.standardKey).length;
  log(
    `demo catalogue: ${demo.makers.length} makers, ${demo.machines.length} ` +
      `machines, ${demo.parts.length} parts, ` +
      `${demo.crosses.length - proposals} crosses, ${proposals} proposals to ` +
      `review`,
  );
}

/** What a member would have measured on the worn part: near the standard sizes, a little off as worn parts are. */
function demoMeasurements(sp: DemoStandardPart, i: number): Measurement[] {
  const wear = [0.02, -0.03, 0.05, 0.01][i % 4];
  const out: Measurement[] = [];
  if (sp.innerMm)
    out.push({ dimension: "inner", value: Math.round((sp.innerMm - Math.abs(wear)) * 100) / 100, unit: "mm" });
  if (sp.outerMm) out.push({ dimension: "outer", value: Math.round((sp.outerMm + wear) * 100) / 100, unit: "mm" });
  if (sp.widthMm && sp.kind !== "v_belt")
    out.push({ dimension: "width", value: Math.round((sp.widthMm - Math.abs(wear)) * 100) / 100, unit: "mm" });
  if (sp.lengthMm)
    out.push({
      dimension: "length",
      value: Math.round(sp.lengthMm + 4),
      unit: "mm",
      label: "outside length, measured with a tape",
    });
  return out;
}

export async function isCatalogueEmpty(): Promise<boolean> {
  return (await OriginalPart.count()) === 0;
}
