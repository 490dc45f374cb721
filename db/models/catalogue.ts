import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/db/sequelize";
import {
  CROSS_ORIGINS,
  CROSS_STATUSES,
  FITS,
  MACHINE_KINDS,
  PART_CATEGORIES,
  STANDARD_KINDS,
  SUPERSESSION_KINDS,
  type CrossOrigin,
  type CrossStatus,
  type Fit,
  type MachineKind,
  type PartCategory,
  type StandardKind,
  type SupersessionKind,
} from "@/lib/catalogue/kinds";

// The catalogue's models. They sit in one file because they are only ever used together; each names itself
// (modelName), since the production build minifies class names.
const id = () => ({ type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true });
// A fresh object for each attribute: Sequelize writes the column name into the definition it is given.
const mm = () => ({ type: DataTypes.DOUBLE, allowNull: true });
const stamps = { createdAt: DataTypes.DATE, updatedAt: DataTypes.DATE };

export class Maker extends Model<InferAttributes<Maker>, InferCreationAttributes<Maker>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare prefixes: string[];
  declare country: string | null;
  declare note: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}
Maker.init(
  {
    id: id(),
    name: DataTypes.STRING(120),
    prefixes: DataTypes.ARRAY(DataTypes.STRING(12)),
    country: DataTypes.STRING(60),
    note: DataTypes.TEXT,
    ...stamps,
  },
  { sequelize, modelName: "Maker", tableName: "makers" },
);

export class Machine extends Model<InferAttributes<Machine>, InferCreationAttributes<Machine>> {
  declare id: CreationOptional<number>;
  declare makerId: number;
  declare model: string;
  declare kind: MachineKind;
  declare yearFrom: number | null;
  declare yearTo: number | null;
  declare serialNote: string | null;
  /** What the machine's serials start with ("22-" for 22-4100); the running number after it is what ranges compare. */
  declare serialPrefix: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}
Machine.init(
  {
    id: id(),
    makerId: DataTypes.INTEGER,
    model: DataTypes.STRING(120),
    kind: DataTypes.ENUM(...MACHINE_KINDS),
    yearFrom: DataTypes.INTEGER,
    yearTo: DataTypes.INTEGER,
    serialNote: DataTypes.TEXT,
    serialPrefix: DataTypes.STRING(12),
    ...stamps,
  },
  { sequelize, modelName: "Machine", tableName: "machines" },
);

export class Assembly extends Model<InferAttributes<Assembly>, InferCreationAttributes<Assembly>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare caution: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}
Assembly.init(
  { id: id(), name: DataTypes.STRING(80), caution: DataTypes.STRING(20), ...stamps },
  { sequelize, modelName: "Assembly", tableName: "assemblies" },
);

export class OriginalPart extends Model<InferAttributes<OriginalPart>, InferCreationAttributes<OriginalPart>> {
  declare id: CreationOptional<number>;
  declare makerId: number;
  declare number: string;
  declare numberNormalised: string;
  declare numberKey: string;
  declare description: string;
  declare category: PartCategory;
  declare innerMm: number | null;
  declare outerMm: number | null;
  declare widthMm: number | null;
  declare lengthMm: number | null;
  declare dimensionsNote: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}
OriginalPart.init(
  {
    id: id(),
    makerId: DataTypes.INTEGER,
    number: DataTypes.STRING(60),
    numberNormalised: DataTypes.STRING(60),
    numberKey: DataTypes.STRING(60),
    description: DataTypes.STRING(200),
    category: DataTypes.ENUM(...PART_CATEGORIES),
    innerMm: mm(),
    outerMm: mm(),
    widthMm: mm(),
    lengthMm: mm(),
    dimensionsNote: DataTypes.STRING(200),
    ...stamps,
  },
  { sequelize, modelName: "OriginalPart", tableName: "original_parts" },
);

export class PartUsage extends Model<InferAttributes<PartUsage>, InferCreationAttributes<PartUsage>> {
  declare id: CreationOptional<number>;
  declare partId: number;
  declare machineId: number;
  declare assemblyId: number;
  declare quantity: number;
  declare serialNote: string | null;
  /** Machine serials (running numbers, inclusive) the part was fitted from and to; null is open-ended. */
  declare serialFrom: CreationOptional<number | null>;
  declare serialTo: CreationOptional<number | null>;
  /** The place in the assembly the part fills; parts of one machine in the same position replace each other. */
  declare position: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}
PartUsage.init(
  {
    id: id(),
    partId: DataTypes.INTEGER,
    machineId: DataTypes.INTEGER,
    assemblyId: DataTypes.INTEGER,
    quantity: DataTypes.INTEGER,
    serialNote: DataTypes.STRING(200),
    serialFrom: DataTypes.INTEGER,
    serialTo: DataTypes.INTEGER,
    position: DataTypes.STRING(200),
    ...stamps,
  },
  { sequelize, modelName: "PartUsage", tableName: "part_usages" },
);

export class Supersession extends Model<InferAttributes<Supersession>, InferCreationAttributes<Supersession>> {
  declare id: CreationOptional<number>;
  declare oldPartId: number;
  declare newPartId: number;
  declare kind: SupersessionKind;
  declare note: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}
Supersession.init(
  {
    id: id(),
    oldPartId: DataTypes.INTEGER,
    newPartId: DataTypes.INTEGER,
    kind: DataTypes.ENUM(...SUPERSESSION_KINDS),
    note: DataTypes.TEXT,
    ...stamps,
  },
  { sequelize, modelName: "Supersession", tableName: "supersessions" },
);

export class StandardPart extends Model<InferAttributes<StandardPart>, InferCreationAttributes<StandardPart>> {
  declare id: CreationOptional<number>;
  declare kind: StandardKind;
  declare designation: string;
  declare innerMm: number | null;
  declare outerMm: number | null;
  declare widthMm: number | null;
  declare lengthMm: number | null;
  declare attributes: Record<string, unknown>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}
StandardPart.init(
  {
    id: id(),
    kind: DataTypes.ENUM(...STANDARD_KINDS),
    designation: DataTypes.STRING(80),
    innerMm: mm(),
    outerMm: mm(),
    widthMm: mm(),
    lengthMm: mm(),
    attributes: DataTypes.JSONB,
    ...stamps,
  },
  { sequelize, modelName: "StandardPart", tableName: "standard_parts" },
);

export class Cross extends Model<InferAttributes<Cross>, InferCreationAttributes<Cross>> {
  declare id: CreationOptional<number>;
  declare originalPartId: number;
  declare standardPartId: number | null;
  declare repairMethod: string | null;
  declare fit: Fit;
  declare notes: string | null;
  declare status: CrossStatus;
  declare origin: CrossOrigin;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}
Cross.init(
  {
    id: id(),
    originalPartId: DataTypes.INTEGER,
    standardPartId: DataTypes.INTEGER,
    repairMethod: DataTypes.TEXT,
    fit: DataTypes.ENUM(...FITS),
    notes: DataTypes.TEXT,
    status: DataTypes.ENUM(...CROSS_STATUSES),
    origin: DataTypes.ENUM(...CROSS_ORIGINS),
    createdBy: DataTypes.STRING(40),
    ...stamps,
  },
  { sequelize, modelName: "Cross", tableName: "crosses" },
);

export class Confirmation extends Model<InferAttributes<Confirmation>, InferCreationAttributes<Confirmation>> {
  declare id: CreationOptional<number>;
  declare crossId: number | null;
  declare proposalId: number | null;
  declare userId: string;
  declare note: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}
Confirmation.init(
  {
    id: id(),
    crossId: DataTypes.INTEGER,
    proposalId: DataTypes.INTEGER,
    userId: DataTypes.STRING(40),
    note: DataTypes.TEXT,
    ...stamps,
  },
  { sequelize, modelName: "Confirmation", tableName: "confirmations" },
);
