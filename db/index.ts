import { sequelize } from "@/db/sequelize";
import { AccountToken } from "@/db/models/account-token";
import { Session } from "@/db/models/session";
import { SignInFailure } from "@/db/models/sign-in-failure";
import { User } from "@/db/models/user";

// Associations live here only, once, after every model is defined.
User.hasMany(Session, { foreignKey: "userId", onDelete: "CASCADE" });
Session.belongsTo(User, { foreignKey: "userId" });
User.hasMany(AccountToken, { foreignKey: "userId", onDelete: "CASCADE" });
AccountToken.belongsTo(User, { foreignKey: "userId" });

export { sequelize, AccountToken, Session, SignInFailure, User };
