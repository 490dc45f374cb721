import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/db/sequelize";

export const ACCOUNT_TOKEN_PURPOSES = ["verify_email", "reset_password"] as const;
export type AccountTokenPurpose = (typeof ACCOUNT_TOKEN_PURPOSES)[number];

/** A one-time link sent by e-mail. Only the SHA-256 of the secret is stored, so a database leak opens no accounts. */
export class AccountToken extends Model<InferAttributes<AccountToken>, InferCreationAttributes<AccountToken>> {
  declare tokenHash: string;
  declare userId: string;
  declare purpose: AccountTokenPurpose;
  declare expiresAt: Date;
  declare createdAt: CreationOptional<Date>;
}

AccountToken.init(
  {
    tokenHash: { type: DataTypes.STRING(64), primaryKey: true },
    userId: { type: DataTypes.STRING(40), allowNull: false },
    purpose: { type: DataTypes.ENUM(...ACCOUNT_TOKEN_PURPOSES), allowNull: false },
    expiresAt: { type: DataTypes.DATE, allowNull: false },
    createdAt: DataTypes.DATE,
  },
  { sequelize, modelName: "AccountToken", tableName: "account_tokens", updatedAt: false },
);
