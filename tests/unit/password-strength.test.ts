import { describe, expect, it } from "vitest";
import { passwordWeakness } from "@/lib/auth/password-strength";

describe("how easy a new password is to guess", () => {
  it("refuses repeats, runs of digits, spaces and the address itself, and says why", () => {
    // The zxcvbn estimator (@zxcvbn-ts, common-password lists): each of these scores below 3 of 4.
    for (const weak of ["aaaaaaaaaa", "1234567890", "          ", "password123", "qwertyuiop"]) {
      expect(passwordWeakness(weak), weak).toMatch(/easy to guess/);
    }
    expect(passwordWeakness("smith.fanhub@example.org", ["smith.fanhub@example.org"])).toMatch(/easy to guess/);
  });

  it("takes a long passphrase", () => {
    expect(passwordWeakness("grease gun on the fan hub")).toBeNull();
    expect(passwordWeakness("gearbox-rebuild-1948")).toBeNull();
  });
});
