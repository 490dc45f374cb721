import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/db/sequelize";
import { FITS, type Fit } from "@/lib/catalogue/kinds";
import {
  PROPOSAL_STATUSES,
  type Measurement,
  type NewPartInput,
  type NewStandardInput,
  type ProposalCheck,
  type ProposalStatus,
} from "@/lib/proposals/kinds";

const id = () => ({ type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true });
const json = () => ({ type: DataTypes.JSONB, allowNull: true });

export class Proposal extends Model<InferAttributes<Proposal>, InferCreationAttributes<Proposal>> {
  declare id: CreationOptional<number>;
  declare userId: string;
  declare status: CreationOptional<ProposalStatus>;
  declare version: CreationOptional<number>;
  declare originalPartId: number | null;
  declare newPart: NewPartInput | null;
  declare standardPartId: number | null;
  declare newStandard: NewStandardInput | null;
  declare fit: Fit;
  declare measurements: Measurement[];
  declare notes: string | null;
  declare checks: ProposalCheck[];
  declare moderatorMessage: CreationOptional<string | null>;
  declare decidedBy: CreationOptional<string | null>;
  declare decidedAt: CreationOptional<Date | null>;
  declare crossId: CreationOptional<number | null>;
  declare digestSentAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}
Proposal.init(
  {
    id: id(),
    userId: DataTypes.STRING(40),
    status: { type: DataTypes.ENUM(...PROPOSAL_STATUSES), defaultValue: "pending" },
    version: { type: DataTypes.INTEGER, defaultValue: 1 },
    originalPartId: DataTypes.INTEGER,
    newPart: json(),
    standardPartId: DataTypes.INTEGER,
    newStandard: json(),
    fit: DataTypes.ENUM(...FITS),
    measurements: { type: DataTypes.JSONB, defaultValue: [] },
    notes: DataTypes.TEXT,
    checks: { type: DataTypes.JSONB, defaultValue: [] },
    moderatorMessage: DataTypes.TEXT,
    decidedBy: DataTypes.STRING(40),
    decidedAt: DataTypes.DATE,
    crossId: DataTypes.INTEGER,
    digestSentAt: DataTypes.DATE,
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, modelName: "Proposal", tableName: "proposals" },
);

export class ProposalPhoto extends Model<InferAttributes<ProposalPhoto>, InferCreationAttributes<ProposalPhoto>> {
  declare id: CreationOptional<number>;
  declare userId: string;
  declare proposalId: number | null;
  declare objectKey: string;
  declare contentType: string;
  declare sizeBytes: number;
  declare fileName: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}
ProposalPhoto.init(
  {
    id: id(),
    userId: DataTypes.STRING(40),
    proposalId: DataTypes.INTEGER,
    objectKey: DataTypes.STRING(200),
    contentType: DataTypes.STRING(60),
    sizeBytes: DataTypes.INTEGER,
    fileName: DataTypes.STRING(200),
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, modelName: "ProposalPhoto", tableName: "proposal_photos" },
);

export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<string>;
  declare actorId: string | null;
  declare action: string;
  declare subjectType: string;
  declare subjectId: string;
  declare before: Record<string, unknown> | null;
  declare after: Record<string, unknown> | null;
  declare createdAt: CreationOptional<Date>;
}
AuditEvent.init(
  {
    id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
    actorId: DataTypes.STRING(40),
    action: DataTypes.STRING(60),
    subjectType: DataTypes.STRING(40),
    subjectId: DataTypes.STRING(40),
    before: json(),
    after: json(),
    createdAt: DataTypes.DATE,
  },
  { sequelize, modelName: "AuditEvent", tableName: "audit_events", updatedAt: false },
);
