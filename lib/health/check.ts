import { sequelize } from "@/db/sequelize";
import { checkMail } from "@/lib/mail/send";
import { checkStorage } from "@/lib/storage/s3";

export type ServiceState = { ok: true; ms: number } | { ok: false; ms: number; problem: string };

export interface HealthReport {
  ok: boolean;
  database: ServiceState;
  storage: ServiceState;
  mail: ServiceState;
}

async function probe(check: () => Promise<unknown>, timeoutMs = 3_000): Promise<ServiceState> {
  const started = Date.now();
  try {
    await Promise.race([
      check(),
      new Promise((_, reject) => setTimeout(() => reject(new Error(`no answer within ${timeoutMs} ms`)), timeoutMs)),
    ]);
    return { ok: true, ms: Date.now() - started };
  } catch (error) {
    // The public answer says only that a service is not answering; the driver's message, which can name addresses and
    // accounts, goes to the server's log.
    console.error("[understudy] health probe failed", error instanceof Error ? error.message : error);
    const timedOut = error instanceof Error && error.message.startsWith("no answer within");
    return { ok: false, ms: Date.now() - started, problem: timedOut ? "not answering in time" : "not answering" };
  }
}

/** Each service's probe; a test may stand another in for one of them. */
export async function checkHealth(
  probes: Partial<Record<"database" | "storage" | "mail", () => Promise<unknown>>> = {},
): Promise<HealthReport> {
  const [database, storage, mail] = await Promise.all([
    probe(probes.database ?? (() => sequelize.query("SELECT 1"))),
    probe(probes.storage ?? checkStorage),
    probe(probes.mail ?? checkMail),
  ]);
  return { ok: database.ok && storage.ok && mail.ok, database, storage, mail };
}
