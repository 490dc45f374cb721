import { describe, expect, it } from "vitest";
import { safeReturnPath } from "@/lib/auth/return-path";

const APP = "http://127.0.0.1:3100";

describe("where signing in leads", () => {
  it("follows a path on this site, with its query and fragment", () => {
    expect(safeReturnPath("/lists?from=sign-in#new", APP)).toBe("/lists?from=sign-in#new");
    expect(safeReturnPath("/propose?kind=lip_seal&designation=1-1%2F2", APP)).toBe(
      "/propose?kind=lip_seal&designation=1-1%2F2",
    );
  });

  it("never leads to another site, however the address is disguised", () => {
    // WHATWG URL parsing, as browsers do it: a backslash is a slash and tabs are dropped in http(s) URLs.
    for (const next of [
      "/\\evil.example/",
      "/\t/evil.example/",
      "//evil.example/",
      "https://evil.example/",
      "/\\/evil.example",
      " /x",
      "javascript:alert(1)",
    ]) {
      expect(safeReturnPath(next, APP)).toBe("/");
    }
    expect(safeReturnPath(undefined, APP)).toBe("/");
  });
});
