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
    const problem = error instanceof Error ? error.message || error.name : "unreachable";
    return { ok: false, ms: Date.now() - started, problem };
  }
}

export async function checkHealth(): Promise<HealthReport> {
  const [database, storage, mail] = await Promise.all([
    probe(() => sequelize.query("SELECT 1")),
    probe(checkStorage),
    probe(checkMail),
  ]);
  return { ok: database.ok && storage.ok && mail.ok, database, storage, mail };
}
