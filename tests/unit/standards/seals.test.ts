import { describe, expect, it } from "vitest";
import { INCH_PRESS_FIT, IT_GRADES, METRIC_SEALS, OD_ALLOWANCE } from "@/lib/standards/seal-sizes";
import {
  checkPressFit,
  checkShaft,
  GROOVE_REMEDIES,
  matchSeal,
  measureSeal,
  sealOdRange,
  sealOrder,
} from "@/lib/standards/seals";

const IN = 25.4;

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

describe("outside-diameter allowances", () => {
  it("holds the DIN 3760 metal-case and rubber-covered allowances", () => {
    // DIN 3760:1996, table of outside-diameter allowances, as quoted by two openly published seal technical tables:
    // up to 50 mm metal +0.10…+0.20, rubber +0.15…+0.30; over 50 to 80 metal +0.13…+0.23, rubber +0.20…+0.35;
    // over 300 to 500 metal +0.23…+0.35, rubber +0.30…+0.55 mm.
    expect(OD_ALLOWANCE[0]).toEqual({ upToMm: 50, metal: [0.1, 0.2], rubber: [0.15, 0.3] });
    expect(OD_ALLOWANCE[1]).toEqual({ upToMm: 80, metal: [0.13, 0.23], rubber: [0.2, 0.35] });
    expect(OD_ALLOWANCE[5]).toEqual({ upToMm: 500, metal: [0.23, 0.35], rubber: [0.3, 0.55] });
  });

  it("holds the inch press fits: 0.004 ± 0.002 in for a metal case up to 3 in", () => {
    // RMA OS-4 inch press-fit table, as quoted by two openly published seal technical tables: metal case 0.004 in
    // ± 0.002 in up to 3.000 in; rubber-covered 0.007 ± 0.003 in from 1.001 to 2.000 in.
    expect(INCH_PRESS_FIT[2].metal).toEqual({ fit: 0.004, plus: 0.002, minus: 0.002 });
    expect(INCH_PRESS_FIT[1].rubber).toEqual({ fit: 0.007, plus: 0.003, minus: 0.003 });
  });

  it("names the standard and table it took the figures from", () => {
    expect(sealOdRange(47, "metal", "metric").source).toMatch(/^DIN 3760:1996 .*table/);
    expect(sealOdRange(2.374 * IN, "metal", "inch").source).toMatch(/RMA OS-4 .*table/);
    expect(sealOdRange(47, "metal", "metric").source).not.toMatch(/memory/i);
  });
});

describe("press fit of a seal in its housing", () => {
  it("passes a 2.378 in seal in a 2.374 in bore: 0.004 in of press fit", () => {
    // Worked example of common practice in this trade (no published source): a 1940s water-pump fan hub, new seal
    // OD 2.378 in in a 2.374 in bore. RMA OS-4: 0.004 ± 0.002 in for a metal case from 2.001 to 3.000 in.
    const fit = checkPressFit({ boreMm: 2.374 * IN, sealOdMm: 2.378 * IN, outside: "metal", unit: "in" });
    expect(fit).toMatchObject({ interference: 0.004, recommendedMin: 0.002, recommendedMax: 0.006, verdict: "ok" });
    expect(fit.source).toMatch(/RMA OS-4/);
  });

  it("checks a metric seal against DIN 3760 less the housing's H8 tolerance", () => {
    // DIN 3760 up to 50 mm: metal +0.10…+0.20 mm; H8 over 30 to 50 mm is 0…+0.039 mm (ISO 286-1:2010, Table 1):
    // so 0.06 to 0.20 mm of interference for a 47 mm bore.
    const fit = checkPressFit({ boreMm: 47, sealOdMm: 47.12, outside: "metal", unit: "mm" });
    expect(fit).toMatchObject({ interference: 0.12, recommendedMin: 0.06, recommendedMax: 0.2, verdict: "ok" });
    expect(fit.source).toMatch(/DIN 3760.*H8/);
  });

  it("calls a seal the same size as its bore loose, and 0.4 mm over tight", () => {
    expect(checkPressFit({ boreMm: 47, sealOdMm: 47, outside: "metal", unit: "mm" }).verdict).toBe("loose");
    expect(checkPressFit({ boreMm: 47, sealOdMm: 47.4, outside: "metal", unit: "mm" }).verdict).toBe("tight");
  });

  it("allows a rubber-covered OD more squeeze than a metal one", () => {
    // DIN 3760: up to 50 mm, rubber +0.15…+0.30 mm against metal +0.10…+0.20 mm.
    expect(checkPressFit({ boreMm: 47, sealOdMm: 47.25, outside: "rubber", unit: "mm" }).verdict).toBe("ok");
    expect(checkPressFit({ boreMm: 47, sealOdMm: 47.25, outside: "metal", unit: "mm" }).verdict).toBe("tight");
  });
});

describe("the seal to order", () => {
  it("orders 1-1/2 × 2.374 × 1/2 in for the worn fan-hub seal, with the OD that presses in", () => {
    // Worked example of common practice (no published source): 1-1/2 in shaft worn to 1.497 in, 2.374 in bore,
    // 1/2 in wide; a new seal of 2.378 in OD gives the 0.004 in press fit. RMA OS-4: OD = bore + 0.004 ± 0.002 in.
    const order = sealOrder({ shaftMm: 1.497 * IN, boreMm: 2.374 * IN, widthMm: 0.5 * IN, unit: "in" });
    expect(order).toMatchObject({
      system: "inch",
      unit: "in",
      shaft: 1.5,
      bore: 2.374,
      width: 0.5,
      label: "1-1/2 × 2.374 × 1/2 in",
    });
    expect(order.sealOd).toEqual({ min: 2.376, max: 2.38 });
    expect(order.sealOd.min).toBeLessThanOrEqual(2.378);
    expect(order.sealOd.max).toBeGreaterThanOrEqual(2.378);
    expect(order.notes.join(" ")).toMatch(/38 mm .*not interchangeable/);
    expect(order.source).toMatch(/RMA OS-4/);
  });

  it("orders 35 × 52 × 8 mm for a metric seat, the bore a standard ISO 6194-1 one", () => {
    // 35 × 52 × 8 mm is an ISO 6194-1 nominal size (not yet confirmed row by row, docs/standards.md); DIN 3760 over
    // 50 to 80 mm: metal OD +0.13…+0.23 mm, less H8 (46 µm, ISO 286-1:2010 Table 1) at the low end.
    const order = sealOrder({ shaftMm: 34.97, boreMm: 52.03, widthMm: 7.9, unit: "mm" });
    expect(order).toMatchObject({ system: "metric", label: "35 × 52 × 8 mm", bore: 52, width: 8 });
    expect(order.sealOd).toEqual({ min: 52.09, max: 52.23 });
  });

  it("keeps an odd metric bore to the tenth of a millimetre", () => {
    expect(sealOrder({ shaftMm: 40, boreMm: 61.27, unit: "mm" })).toMatchObject({
      bore: 61.3,
      width: null,
      label: "40 × 61.3 mm",
    });
  });

  it("says so when a seal measured in millimetres is an inch one", () => {
    // 38.1 mm = 1-1/2 in exactly (25.4 mm/in); 38 mm would read 0.1 mm large, which a worn shaft cannot.
    const order = sealOrder({ shaftMm: 38.1, boreMm: 60.3, unit: "mm" });
    expect(order.system).toBe("inch");
    expect(order.notes.join(" ")).toMatch(/Measured in millimetres, but the shaft is an inch size/);
  });

  it("answers with an order and nearby sizes where no tabulated size is near", () => {
    const result = measureSeal({
      shaftMm: 1.497 * IN,
      boreMm: 2.374 * IN,
      widthMm: 0.5 * IN,
      toleranceMm: 0.1016,
      unit: "in",
    });
    expect(result.order.label).toBe("1-1/2 × 2.374 × 1/2 in");
    expect(result.candidates.length).toBeGreaterThan(0);
    expect(result.candidates[0].system).toBe("inch");
    expect(result.warnings.join(" ")).not.toMatch(/No standard lip seal/);
    expect(result.shaft.message).toMatch(/within h11 of 1-1\/2 in/);
  });
});

describe("matching a measured seal", () => {
  it("finds 1-1/4 × 2 × 3/8 in for an inch shaft worn a little small", () => {
    // An inch size commonly stocked (common practice, no published source); a worn shaft reads small.
    const { candidates } = matchSeal({
      shaftMm: 1.248 * 25.4,
      boreMm: 2.0 * 25.4,
      widthMm: 0.375 * 25.4,
      toleranceMm: 0.1016,
      unit: "in",
    });
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
    expect(checkShaft({ shaftMm: 39.9, unit: "mm", grooved: false })).toMatchObject({
      verdict: "ok",
      needsSleeve: false,
    });
  });

  it("asks for a sleeve when the shaft is grooved", () => {
    expect(checkShaft({ shaftMm: 40, unit: "mm", grooved: true }).needsSleeve).toBe(true);
  });
});
