import { Lucia, TimeSpan } from "lucia";
import { sequelizeAdapter } from "@/lib/auth/adapter";
import { SESSION_COOKIE, SESSION_COOKIE_ATTRIBUTES, SESSION_DAYS } from "@/lib/auth/cookie";
import type { Role } from "@/lib/auth/roles";

export const lucia = new Lucia(sequelizeAdapter, {
  sessionExpiresIn: new TimeSpan(SESSION_DAYS, "d"),
  sessionCookie: {
    name: SESSION_COOKIE,
    expires: true,
    attributes: { secure: SESSION_COOKIE_ATTRIBUTES.secure, sameSite: SESSION_COOKIE_ATTRIBUTES.sameSite },
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
