import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type NonAttribute } from "sequelize";
import type { User } from "@/db/models/user";
import { sequelize } from "@/db/sequelize";

export class Session extends Model<InferAttributes<Session>, InferCreationAttributes<Session>> {
  declare id: string;
  declare userId: string;
  declare expiresAt: Date;
  declare user?: NonAttribute<User>;
}

Session.init(
  {
    id: { type: DataTypes.STRING(64), primaryKey: true },
    userId: { type: DataTypes.STRING(40), allowNull: false },
    expiresAt: { type: DataTypes.DATE, allowNull: false },
  },
  { sequelize, modelName: "Session", tableName: "sessions", timestamps: false },
);
