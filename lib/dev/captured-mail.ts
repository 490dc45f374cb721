import { env, isProduction } from "@/lib/env";
import { AppError } from "@/lib/errors";

/** A message as the local mail fake keeps it and serves it back. */
export interface CapturedMailSummary {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
}

export interface CapturedMail extends CapturedMailSummary {
  html: string | null;
}

/** Reads what the local mail fake captured. Never available in production, where mail is really delivered. */
async function fromMailFake<T>(path: string): Promise<T | null> {
  if (isProduction) throw new AppError("not_found", "Captured mail exists only outside production.");
  let response: Response;
  try {
    response = await fetch(`${env.MAIL_FAKE_API_URL}${path}`, { cache: "no-store" });
  } catch {
    throw new AppError(
      "unavailable",
      `The mail fake does not answer at ${env.MAIL_FAKE_API_URL}. Start the app with npm start or npm run dev.`,
    );
  }
  if (response.status === 404) return null;
  if (!response.ok) throw new AppError("unavailable", `The mail fake answered ${response.status}.`);
  return (await response.json()) as T;
}

export async function listCapturedMail(): Promise<CapturedMailSummary[]> {
  return (await fromMailFake<{ messages: CapturedMailSummary[] }>("/messages"))?.messages ?? [];
}

export async function getCapturedMail(id: string): Promise<CapturedMail | null> {
  if (!/^[\w-]+$/.test(id)) return null;
  return fromMailFake<CapturedMail>(`/messages/${id}`);
}
