import type { QueryInterface } from "sequelize";
import { addEnumValues, removeEnumValues } from "@/db/migrations/enum-values";

/** Pins, bolts and studs, grease fittings and roller chain become part categories and kinds of standard part. */
const ADDED = [
  {
    type: "enum_original_parts_category",
    table: "original_parts",
    column: "category",
    values: ["pin", "fastener", "grease_fitting", "chain"],
  },
  {
    type: "enum_standard_parts_kind",
    table: "standard_parts",
    column: "kind",
    values: ["pin", "thread", "grease_fitting", "chain"],
  },
];

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await addEnumValues(qi, ADDED);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await removeEnumValues(qi, ADDED);
}
