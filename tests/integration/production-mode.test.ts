import { afterAll, describe, expect, it } from "vitest";

// This file runs the account code as a production server would: the environment is read when lib/env is first
// imported, and each test file has modules of its own.
process.env.APP_ENV = "production";
const { signIn } = await import("@/lib/auth/accounts");
const { sequelize } = await import("@/db");
const { isDemoAccount } = await import("@/lib/auth/demo-accounts");

afterAll(() => sequelize.close());

describe("production mode on a database once seeded for a demo", () => {
  it("refuses the demo accounts, with the published password, as if they did not exist", async () => {
    for (const email of ["member@understudy.test", "admin@understudy.test"]) {
      await expect(signIn({ email, password: "understudy-demo", address: "198.18.0.1" })).rejects.toMatchObject({
        code: "unauthenticated",
      });
    }
  });

  it("knows the demo accounts by their reserved domain only", () => {
    expect(isDemoAccount("Admin@Understudy.test")).toBe(true);
    expect(isDemoAccount("restorer@example.org")).toBe(false);
    expect(isDemoAccount("someone@understudy.test.example.org")).toBe(false);
  });
});
