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
  // The customer's machine is serial 2650 of its model: the pump parts are the ones fitted to that serial.
  const serial = 2650;
  const [pump] = await sequelize.query<{
    machine_id: number;
    model: string;
    part_id: number;
    serial_prefix: string | null;
  }>(
    `SELECT m.id AS machine_id, m.model, u.part_id, m.serial_prefix FROM part_usages u
       JOIN machines m ON m.id = u.machine_id JOIN assemblies a ON a.id = u.assembly_id JOIN original_parts p ON p.id =
         u.part_id
      WHERE a.name = 'Water pump' AND m.kind = 'crawler' AND p.category = 'bearing' AND u.serial_note IS NULL
        AND (u.serial_from IS NULL OR u.serial_from <= :serial) AND (u.serial_to IS NULL OR u.serial_to >= :serial)
      ORDER BY m.year_from, p.id LIMIT 1`,
    { replacements: { serial }, type: QueryTypes.SELECT },
  );
  if (!pump) return;
  const list = await createList(member.id, {
    machineId: pump.machine_id,
    machineSerial: `${pump.serial_prefix ?? ""}${serial}`,
    title: `Water pump rebuild, customer's ${pump.model}`,
    notes: "Pump leaks at the weep hole and the shaft has end play. Customer wants it back for spring ploughing.",
  });
  const first = await addLine(member.id, list.id, {
    partId: pump.part_id,
    quantity: 1,
    notes: "Old one runs rough. Check the shaft where the seal runs before ordering.",
  });
  await addRestOfAssembly(member.id, list.id, first.lineId);
  log(`demo job list for ${member.email}: ${list.title}`);
}
