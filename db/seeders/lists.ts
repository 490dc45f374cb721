import { QueryTypes } from "sequelize";
import { JobList, sequelize, User } from "@/db";
import { addLine, addRestOfAssembly, createList } from "@/lib/lists/lists";

/**
 * One job list for the demo member, so a shop sees what a list looks like before making its own: a water pump
 * rebuild on a crawler, its pump bearing added and then the rest of the pump in one step, as a person would.
 */
export async function seedDemoLists(log: (message: string) => void = () => {}): Promise<void> {
  const member = await User.findOne({ where: { email: "member@understudy.test" } });
  if (!member || (await JobList.count({ where: { userId: member.id } })) > 0) return;
  const [pump] = await sequelize.query<{ machine_id: number; model: string; part_id: number }>(
    `SELECT m.id AS machine_id, m.model, u.part_id FROM part_usages u
       JOIN machines m ON m.id = u.machine_id JOIN assemblies a ON a.id = u.assembly_id JOIN original_parts p ON p.id = u.part_id
      WHERE a.name = 'Water pump' AND m.kind = 'crawler' AND p.category = 'bearing' AND u.serial_note IS NULL
      ORDER BY m.year_from, p.id LIMIT 1`,
    { type: QueryTypes.SELECT },
  );
  if (!pump) return;
  const list = await createList(member.id, {
    machineId: pump.machine_id,
    title: `Water pump rebuild, customer's ${pump.model}`,
    notes: "Pump leaks at the weep hole and the shaft has end play. Customer wants it back for spring ploughing.",
  });
  const first = await addLine(member.id, list.id, { partId: pump.part_id, quantity: 1, notes: "Old one runs rough. Check the shaft where the seal runs before ordering." });
  await addRestOfAssembly(member.id, list.id, first.lineId);
  log(`demo job list for ${member.email}: ${list.title}`);
}
