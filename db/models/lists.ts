import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/db/sequelize";
import type { StandardItem } from "@/lib/lists/standard-item";

const id = () => ({ type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true });

export class JobList extends Model<InferAttributes<JobList>, InferCreationAttributes<JobList>> {
  declare id: CreationOptional<number>;
  declare userId: string;
  declare title: string;
  declare machineId: number | null;
  declare notes: string | null;
  declare shareToken: CreationOptional<string | null>;
  /** The serial of the list's machine (the running number), when known: assembly adds then pick that serial's parts. */
  declare machineSerial: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}
JobList.init(
  {
    id: id(),
    userId: DataTypes.STRING(40),
    title: DataTypes.STRING(120),
    machineId: DataTypes.INTEGER,
    notes: DataTypes.TEXT,
    shareToken: DataTypes.STRING(64),
    machineSerial: DataTypes.INTEGER,
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, modelName: "JobList", tableName: "job_lists" },
);

export class JobListLine extends Model<InferAttributes<JobListLine>, InferCreationAttributes<JobListLine>> {
  declare id: CreationOptional<number>;
  declare listId: number;
  declare partId: number | null;
  declare requestedNumber: string | null;
  /** A standard part worked out from measurements, when the line has no factory part (partId null). */
  declare standardItem: StandardItem | null;
  declare standardPartId: number | null;
  declare quantity: number;
  declare notes: string | null;
  declare supplier: CreationOptional<string | null>;
  declare supplierNumber: CreationOptional<string | null>;
  /** Decimal as text, as PostgreSQL's numeric comes back. */
  declare unitPrice: CreationOptional<string | null>;
  declare ordered: CreationOptional<boolean>;
  /** Set when the line is removed; it can be put back for a short while. */
  declare removedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}
JobListLine.init(
  {
    id: id(),
    listId: DataTypes.INTEGER,
    partId: DataTypes.INTEGER,
    requestedNumber: DataTypes.STRING(60),
    standardItem: DataTypes.JSONB,
    standardPartId: DataTypes.INTEGER,
    quantity: DataTypes.INTEGER,
    notes: DataTypes.TEXT,
    supplier: DataTypes.STRING(120),
    supplierNumber: DataTypes.STRING(60),
    unitPrice: DataTypes.DECIMAL(10, 2),
    ordered: { type: DataTypes.BOOLEAN, defaultValue: false },
    removedAt: DataTypes.DATE,
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, modelName: "JobListLine", tableName: "job_list_lines" },
);
