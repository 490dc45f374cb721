import { sequelize } from "@/db/sequelize";
import { AccountToken } from "@/db/models/account-token";
import { Session } from "@/db/models/session";
import { SignInFailure } from "@/db/models/sign-in-failure";
import { User } from "@/db/models/user";

// Associations live here only, once, after every model is defined. Aliases are spelled out (and every model
// names itself in init) because the production build minifies class names, which Sequelize would otherwise use.
User.hasMany(Session, { foreignKey: "userId", as: "sessions", onDelete: "CASCADE" });
Session.belongsTo(User, { foreignKey: "userId", as: "user" });
User.hasMany(AccountToken, { foreignKey: "userId", as: "accountTokens", onDelete: "CASCADE" });
AccountToken.belongsTo(User, { foreignKey: "userId", as: "user" });

export { sequelize, AccountToken, Session, SignInFailure, User };
