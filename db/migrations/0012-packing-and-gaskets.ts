import type { QueryInterface } from "sequelize";
import { addEnumValues, removeEnumValues } from "@/db/migrations/enum-values";

/**
 * Gland packing becomes a part category and a kind of standard part, and a gasket cut to a template a kind of standard
 * part beside gasket sheet. PostgreSQL adds an enum value in place; taking one away means rebuilding the type, which
 * down does only when no row uses the value.
 */
const ADDED = [
  { type: "enum_original_parts_category", table: "original_parts", column: "category", values: ["packing"] },
  { type: "enum_standard_parts_kind", table: "standard_parts", column: "kind", values: ["packing", "gasket"] },
];

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await addEnumValues(qi, ADDED);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await removeEnumValues(qi, ADDED);
}
