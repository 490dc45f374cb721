import { Lucia, TimeSpan } from "lucia";
import { sequelizeAdapter } from "@/lib/auth/adapter";
import { SESSION_COOKIE } from "@/lib/auth/cookie";
import type { Role } from "@/lib/auth/roles";
import { isProduction } from "@/lib/env";

export const lucia = new Lucia(sequelizeAdapter, {
  sessionExpiresIn: new TimeSpan(30, "d"),
  sessionCookie: {
    name: SESSION_COOKIE,
    expires: true,
    attributes: { secure: isProduction, sameSite: "lax" },
  },
  getUserAttributes: (attributes) => ({
    email: attributes.email,
    role: attributes.role,
    emailVerified: attributes.emailVerified,
  }),
});

declare module "lucia" {
  interface Register {
    Lucia: typeof lucia;
    DatabaseUserAttributes: { email: string; role: Role; emailVerified: boolean };
    UserId: string;
  }
}
