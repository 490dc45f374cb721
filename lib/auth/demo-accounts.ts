/**
 * The demo seed's accounts all live under this domain (a `.test` name, reserved by RFC 2606, so no mail for it is
 * ever delivered). Their password is published in the README, so in production they must never open a session,
 * even on a database that was once seeded for a demo.
 */
export const DEMO_DOMAIN = "understudy.test";

export function isDemoAccount(email: string): boolean {
  return email.toLowerCase().endsWith(`@${DEMO_DOMAIN}`);
}

/** Whether an account may sign in, or keep a session, where the app runs in `appEnv`. */
export function accountUsable(email: string, appEnv: string): boolean {
  return appEnv !== "production" || !isDemoAccount(email);
}
