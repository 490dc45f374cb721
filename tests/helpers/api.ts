import { randomBytes, randomUUID } from "node:crypto";
import request from "supertest";

/** The server `npm test` started; never BASE_URL, which vitest sets to "/". */
export const APP_URL = process.env.APP_URL ?? "http://127.0.0.1:3100";

export const DEMO_PASSWORD = "understudy-demo";

export function uniqueEmail(label: string): string {
  return `${label}-${randomUUID().slice(0, 8)}@example.org`;
}

/**
 * A made-up client address per call, so the per-address sign-in limit reached in one test never reaches another,
 * in this file or the next. Drawn at random from 198.18.0.0/15, the range RFC 2544 sets aside for testing.
 */
export function uniqueAddress(): string {
  const [a, b, c] = randomBytes(3);
  return `198.${18 + (a & 1)}.${b}.${c}`;
}

interface Options {
  cookie?: string;
  address?: string;
  origin?: string | null;
}

/** A same-site JSON request, as the app's own pages send it (with an Origin header). */
export function send(method: "post" | "patch" | "get" | "delete", path: string, body?: unknown, options: Options = {}) {
  let req = request(APP_URL)[method](path);
  if (options.origin !== null && method !== "get") req = req.set("Origin", options.origin ?? APP_URL);
  if (options.cookie) req = req.set("Cookie", options.cookie);
  if (options.address) req = req.set("X-Forwarded-For", options.address);
  return body === undefined ? req : req.set("Content-Type", "application/json").send(body as object);
}

export function sessionCookie(response: { headers: Record<string, unknown> }): string {
  const cookies = ([] as string[]).concat((response.headers["set-cookie"] as string[] | string | undefined) ?? []);
  const session = cookies.find((c) => c.startsWith("understudy_session="));
  if (!session) throw new Error("No session cookie was set");
  return session.split(";")[0];
}

export async function signIn(email: string, password = DEMO_PASSWORD, address = uniqueAddress()): Promise<string> {
  const response = await send("post", "/api/auth/sign-in", { email, password }, { address });
  if (response.status !== 200)
    throw new Error(`Sign-in of ${email} failed: ${response.status} ${JSON.stringify(response.body)}`);
  return sessionCookie(response);
}
