import * as accounts from "@/db/migrations/0001-accounts";

// Listed by hand, in order, so that the same list runs under tsx, vitest and the Next bundle alike.
export const migrations = [{ name: "0001-accounts", ...accounts }];
