import { sequelize } from "@/db/sequelize";
import { AccountToken } from "@/db/models/account-token";
import { Session } from "@/db/models/session";
import { SignInFailure } from "@/db/models/sign-in-failure";
import { User } from "@/db/models/user";
import { AuditEvent, Proposal, ProposalPhoto } from "@/db/models/proposals";
import { Import, ImportMapping } from "@/db/models/imports";
import { JobList, JobListLine } from "@/db/models/lists";
import {
  Assembly,
  Confirmation,
  Cross,
  Machine,
  Maker,
  OriginalPart,
  PartUsage,
  StandardPart,
  Supersession,
} from "@/db/models/catalogue";

// Associations live here only, once, after every model is defined. Aliases are spelled out (and every model
// names itself in init) because the production build minifies class names, which Sequelize would otherwise use.
User.hasMany(Session, { foreignKey: "userId", as: "sessions", onDelete: "CASCADE" });
Session.belongsTo(User, { foreignKey: "userId", as: "user" });
User.hasMany(AccountToken, { foreignKey: "userId", as: "accountTokens", onDelete: "CASCADE" });
AccountToken.belongsTo(User, { foreignKey: "userId", as: "user" });

Maker.hasMany(Machine, { foreignKey: "makerId", as: "machines" });
Machine.belongsTo(Maker, { foreignKey: "makerId", as: "maker" });
Maker.hasMany(OriginalPart, { foreignKey: "makerId", as: "parts" });
OriginalPart.belongsTo(Maker, { foreignKey: "makerId", as: "maker" });
OriginalPart.hasMany(PartUsage, { foreignKey: "partId", as: "usages" });
PartUsage.belongsTo(OriginalPart, { foreignKey: "partId", as: "part" });
PartUsage.belongsTo(Machine, { foreignKey: "machineId", as: "machine" });
PartUsage.belongsTo(Assembly, { foreignKey: "assemblyId", as: "assembly" });
OriginalPart.hasMany(Cross, { foreignKey: "originalPartId", as: "crosses" });
Cross.belongsTo(OriginalPart, { foreignKey: "originalPartId", as: "originalPart" });
Cross.belongsTo(StandardPart, { foreignKey: "standardPartId", as: "standardPart" });
Cross.hasMany(Confirmation, { foreignKey: "crossId", as: "confirmations" });
Confirmation.belongsTo(Cross, { foreignKey: "crossId", as: "cross" });

User.hasMany(Proposal, { foreignKey: "userId", as: "proposals" });
Proposal.belongsTo(User, { foreignKey: "userId", as: "user" });
Proposal.belongsTo(OriginalPart, { foreignKey: "originalPartId", as: "originalPart" });
Proposal.belongsTo(StandardPart, { foreignKey: "standardPartId", as: "standardPart" });
Proposal.hasMany(ProposalPhoto, { foreignKey: "proposalId", as: "photos" });
ProposalPhoto.belongsTo(Proposal, { foreignKey: "proposalId", as: "proposal" });
Proposal.hasMany(Confirmation, { foreignKey: "proposalId", as: "confirmations" });

JobList.hasMany(JobListLine, { foreignKey: "listId", as: "lines" });
JobListLine.belongsTo(JobList, { foreignKey: "listId", as: "list" });

export { sequelize, AccountToken, Session, SignInFailure, User };
export { AuditEvent, Proposal, ProposalPhoto };
export { Import, ImportMapping, JobList, JobListLine };
export { Assembly, Confirmation, Cross, Machine, Maker, OriginalPart, PartUsage, StandardPart, Supersession };
