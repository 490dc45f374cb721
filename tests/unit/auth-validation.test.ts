import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/errors";
import { signInBody, signUpBody } from "@/lib/validation/auth";
import { parseWith } from "@/lib/validation/parse";

function fieldsOf(run: () => unknown): Record<string, string> {
  try {
    run();
  } catch (error) {
    if (error instanceof AppError) return error.options.fields ?? {};
  }
  throw new Error("expected a validation error");
}

describe("sign-up and sign-in bodies", () => {
  it("accepts a valid sign-up and lower-cases the address", () => {
    expect(parseWith(signUpBody, { email: " Restorer@Example.ORG ", password: "a long password" })).toEqual({
      email: "restorer@example.org",
      password: "a long password",
    });
  });

  it("names each missing field", () => {
    expect(Object.keys(fieldsOf(() => parseWith(signUpBody, {})))).toEqual(["email", "password"]);
  });

  it("refuses a short password and a malformed address with the reason", () => {
    const fields = fieldsOf(() => parseWith(signUpBody, { email: "not-an-address", password: "short" }));
    expect(fields.email).toMatch(/valid e-mail/);
    expect(fields.password).toMatch(/at least 10/);
  });

  it("refuses an absurdly long password instead of hashing it", () => {
    const fields = fieldsOf(() => parseWith(signInBody, { email: "a@example.org", password: "x".repeat(10_000) }));
    expect(fields.password).toMatch(/at most 200/);
  });

  it("reports a body that is not an object as a body error", () => {
    expect(fieldsOf(() => parseWith(signInBody, "just a string"))).toHaveProperty("body");
  });
});
