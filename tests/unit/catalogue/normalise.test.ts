import { describe, expect, it } from "vitest";
import { lookAlikeKey, normaliseNumber, searchForms, stripPrefix } from "@/lib/catalogue/normalise";

describe("normalising a typed factory number", () => {
  it("ignores case, spaces, dashes, dots and slashes", () => {
    expect(normaliseNumber(" cv-1207.44/b ")).toBe("CV120744B");
    expect(normaliseNumber("CV 1207 44 B")).toBe("CV120744B");
  });

  it("strips a maker prefix only when digits remain", () => {
    expect(stripPrefix("CV120744B", ["CV-", "CVT"])).toBe("120744B");
    expect(stripPrefix("CVTA", ["CV"])).toBe("CVTA");
  });

  it("prefers the longest prefix", () => {
    expect(stripPrefix("HMD4410", ["HM", "HMD"])).toBe("4410");
  });

  it("folds look-alike stamped characters together: O/0, I/1, S/5, B/8", () => {
    // common practice (no published source): the usual misreadings of worn stampings.
    expect(lookAlikeKey("8O5I2S")).toBe(lookAlikeKey("805125"));
    expect(lookAlikeKey("B")).toBe("8");
  });

  it("gives one search form for every way of writing the same stamped number", () => {
    const forms = ["CV-12O7-44B", "cv 1207 448", "1207.44.B"].map((typed) => searchForms(typed, ["CV"]).key);
    expect(new Set(forms).size).toBe(1);
  });
});
