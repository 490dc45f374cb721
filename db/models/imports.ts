import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/db/sequelize";
import {
  IMPORT_STATUSES,
  IMPORT_TARGETS,
  type ImportCounts,
  type ImportMappingValue,
  type ImportProgress,
  type ImportStatus,
  type ImportTarget,
} from "@/lib/imports/kinds";

const id = () => ({ type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true });
const json = () => ({ type: DataTypes.JSONB, allowNull: true });

export class Import extends Model<InferAttributes<Import>, InferCreationAttributes<Import>> {
  declare id: CreationOptional<number>;
  declare userId: string | null;
  declare target: ImportTarget;
  declare status: CreationOptional<ImportStatus>;
  declare objectKey: string;
  declare fileName: string;
  declare sizeBytes: number;
  declare sha256: string;
  declare encoding: string | null;
  declare delimiter: string | null;
  declare headers: string[];
  declare mapping: ImportMappingValue;
  declare counts: CreationOptional<ImportCounts | null>;
  declare committedCounts: CreationOptional<ImportCounts | null>;
  declare progress: CreationOptional<ImportProgress | null>;
  declare errorMessage: CreationOptional<string | null>;
  declare committedAt: CreationOptional<Date | null>;
  declare rolledBackAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}
Import.init(
  {
    id: id(),
    userId: DataTypes.STRING(40),
    target: DataTypes.ENUM(...IMPORT_TARGETS),
    status: { type: DataTypes.ENUM(...IMPORT_STATUSES), defaultValue: "uploaded" },
    objectKey: DataTypes.STRING(200),
    fileName: DataTypes.STRING(200),
    sizeBytes: {
      type: DataTypes.BIGINT,
      get() {
        return Number(this.getDataValue("sizeBytes"));
      },
    },
    sha256: DataTypes.STRING(64),
    encoding: DataTypes.STRING(20),
    delimiter: DataTypes.STRING(2),
    headers: { type: DataTypes.JSONB, defaultValue: [] },
    mapping: { type: DataTypes.JSONB, defaultValue: {} },
    counts: json(),
    committedCounts: json(),
    progress: json(),
    errorMessage: DataTypes.TEXT,
    committedAt: DataTypes.DATE,
    rolledBackAt: DataTypes.DATE,
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, modelName: "Import", tableName: "imports" },
);

export class ImportMapping extends Model<InferAttributes<ImportMapping>, InferCreationAttributes<ImportMapping>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare mapping: ImportMappingValue;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}
ImportMapping.init(
  {
    id: id(),
    name: DataTypes.STRING(80),
    mapping: DataTypes.JSONB,
    createdBy: DataTypes.STRING(40),
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, modelName: "ImportMapping", tableName: "import_mappings" },
);
