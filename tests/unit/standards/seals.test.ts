import { describe, expect, it } from "vitest";
import { IT_GRADES, METRIC_SEALS } from "@/lib/standards/seal-sizes";
import { checkPressFit, checkShaft, GROOVE_REMEDIES, matchSeal } from "@/lib/standards/seals";

describe("standard lip seal sizes", () => {
  it("lists the common metric sizes", () => {
    // from memory (ISO 6194-1 nominal sizes, the DIN 3760 list): spot checks, not a copy of the standard.
    const has = (d: number, D: number, b: number) => METRIC_SEALS.some(([x, y, z]) => x === d && y === D && z === b);
    expect(has(25, 40, 7)).toBe(true);
    expect(has(35, 52, 8)).toBe(true);
    expect(has(50, 72, 8)).toBe(true);
    expect(has(80, 100, 10)).toBe(true);
  });

  it("uses the IT8 and IT11 grades of ISO 286-1", () => {
    // ISO 286-1:2010, Table 1: over 30 up to 50 mm, IT8 = 39 µm and IT11 = 160 µm; over 50 up to 80, IT8 = 46 µm.
    expect(IT_GRADES.find((g) => g.overMm === 30)).toMatchObject({ it8: 39, it11: 160 });
    expect(IT_GRADES.find((g) => g.overMm === 50)?.it8).toBe(46);
  });
});

describe("press fit of a seal in its housing", () => {
  it("passes 1.754 in in a 1.750 in bore (0.004 in) for a metal-cased seal", () => {
    // Worked from ISO 6194-1 metal OD allowance +0.08…+0.20 mm up to 50 mm (from memory) and H8 = 0…+39 µm
    // (ISO 286-1:2010): 0.0016 in to 0.0079 in of interference.
    const fit = checkPressFit({ boreMm: 1.75 * 25.4, sealOdMm: 1.754 * 25.4, outside: "metal", unit: "in" });
    expect(fit.interference).toBeCloseTo(0.004, 5);
    expect(fit.recommendedMin).toBeCloseTo((0.08 - 0.039) / 25.4, 5);
    expect(fit.recommendedMax).toBeCloseTo(0.2 / 25.4, 5);
    expect(fit.verdict).toBe("ok");
    expect(fit.source).toMatch(/ISO 6194-1/);
  });

  it("calls a seal the same size as its bore loose, and 0.4 mm over tight", () => {
    expect(checkPressFit({ boreMm: 47, sealOdMm: 47, outside: "metal", unit: "mm" }).verdict).toBe("loose");
    expect(checkPressFit({ boreMm: 47, sealOdMm: 47.4, outside: "metal", unit: "mm" }).verdict).toBe("tight");
  });

  it("allows a rubber-covered OD more squeeze than a metal one", () => {
    // from memory (ISO 6194-1): rubber OD allowance up to 50 mm is +0.15…+0.30 mm.
    expect(checkPressFit({ boreMm: 47, sealOdMm: 47.25, outside: "rubber", unit: "mm" }).verdict).toBe("ok");
    expect(checkPressFit({ boreMm: 47, sealOdMm: 47.25, outside: "metal", unit: "mm" }).verdict).toBe("tight");
  });
});

describe("matching a measured seal", () => {
  it("finds 1-1/4 × 2 × 3/8 in for an inch shaft worn a little small", () => {
    // An inch size commonly stocked (common practice, no published source); a worn shaft reads small.
    const { candidates } = matchSeal({ shaftMm: 1.248 * 25.4, boreMm: 2.0 * 25.4, widthMm: 0.375 * 25.4, toleranceMm: 0.1016, unit: "in" });
    expect(candidates[0]).toMatchObject({ system: "inch", size: "1-1/4 × 2 × 3/8 in" });
  });

  it("finds 35 × 52 × 8 mm for a metric housing", () => {
    // 35 × 52 × 8 mm: an ISO 6194-1 nominal size (from memory of the standard's table).
    const { candidates } = matchSeal({ shaftMm: 34.97, boreMm: 52.02, widthMm: 8, toleranceMm: 0.1, unit: "mm" });
    expect(candidates[0].size).toBe("35 × 52 × 8 mm");
  });

  it("warns that a grooved shaft will leak and offers the remedies", () => {
    const result = matchSeal({ shaftMm: 35, boreMm: 52, toleranceMm: 0.1, unit: "mm", grooved: true });
    expect(result.warnings.join(" ")).toMatch(/will leak/);
    expect(result.remedies).toEqual(GROOVE_REMEDIES);
    expect(result.remedies.join(" ")).toMatch(/sleeve/);
  });

  it("warns of an inch and a metric seal of nearly the same shaft size", () => {
    // 1-1/2 in = 38.1 mm against a 38 mm shaft seal.
    const { candidates } = matchSeal({ shaftMm: 38.05, boreMm: 55.6, toleranceMm: 0.3, unit: "mm" });
    expect(candidates.some((c) => c.warnings.some((w) => /not interchangeable/.test(w)))).toBe(true);
  });
});

describe("the shaft under a seal", () => {
  it("accepts a 40 mm shaft at 39.9 mm, within h11", () => {
    // ISO 286-1:2010: h11 for 30–50 mm is 0 / −0.160 mm.
    expect(checkShaft({ shaftMm: 39.9, unit: "mm", grooved: false })).toMatchObject({ verdict: "ok", needsSleeve: false });
  });

  it("asks for a sleeve when the shaft is grooved", () => {
    expect(checkShaft({ shaftMm: 40, unit: "mm", grooved: true }).needsSleeve).toBe(true);
  });
});
