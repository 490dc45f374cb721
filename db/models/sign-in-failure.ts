import { DataTypes, Model, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/db/sequelize";

/** Failed sign-ins counted per key (`account:<email>` or `address:<ip>`) within a sliding window. */
export class SignInFailure extends Model<InferAttributes<SignInFailure>, InferCreationAttributes<SignInFailure>> {
  declare key: string;
  declare failures: number;
  declare windowStartedAt: Date;
}

SignInFailure.init(
  {
    key: { type: DataTypes.STRING(300), primaryKey: true },
    failures: { type: DataTypes.INTEGER, allowNull: false },
    windowStartedAt: { type: DataTypes.DATE, allowNull: false },
  },
  { sequelize, modelName: "SignInFailure", tableName: "sign_in_failures", timestamps: false },
);
