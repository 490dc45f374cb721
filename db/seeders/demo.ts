import { readFile } from "node:fs/promises";
import path from "node:path";
import { generateIdFromEntropySize } from "lucia";
import { z } from "zod";
import { sequelize, User } from "@/db";
import { hashPassword } from "@/lib/auth/password";
import { ROLES } from "@/lib/auth/roles";
import { isProduction } from "@/lib/env";

const demoAccounts = z.object({
  password: z.string().min(10),
  accounts: z.array(z.object({ email: z.email(), role: z.enum(ROLES) })),
});

const fixtures = (name: string) => path.join(process.cwd(), "fixtures", name);

/** True when nothing has been loaded yet; the demo is loaded into an empty database only. */
export async function isDatabaseEmpty(): Promise<boolean> {
  return (await User.count()) === 0;
}

export async function seedDemo(log: (message: string) => void = () => {}): Promise<void> {
  if (isProduction) throw new Error("The demo seed never runs in production (APP_ENV=production).");
  const data = demoAccounts.parse(JSON.parse(await readFile(fixtures("demo-accounts.json"), "utf8")));
  const passwordHash = await hashPassword(data.password);
  await sequelize.transaction(async (transaction) => {
    for (const account of data.accounts) {
      const [, created] = await User.findOrCreate({
        where: { email: account.email },
        defaults: {
          id: generateIdFromEntropySize(10),
          email: account.email,
          passwordHash,
          role: account.role,
          emailVerifiedAt: new Date(),
        },
        transaction,
      });
      if (created) log(`demo account ${account.email} (${account.role})`);
    }
  });
}
