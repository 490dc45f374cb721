import { describe, expect, it } from "vitest";
import { ALL_BEARINGS, boreFromCode, decodeBearing, DesignationError, matchBearing } from "@/lib/standards/bearings";
import { DEEP_GROOVE } from "@/lib/standards/bearing-tables";

const dims = (designation: string) => {
  const b = ALL_BEARINGS.find((x) => x.designation === designation);
  return b && [b.boreMm, b.outsideDiameterMm, b.widthMm];
};

describe("deep groove ball bearing boundary dimensions", () => {
  // DIN 625-1 (= ISO 15:2017 boundary dimensions), as tabulated in the BOLTS open parts library, data/bearings.blt.
  const din625: Array<[string, number, number, number]> = [
    ["608", 8, 22, 7],
    ["609", 9, 24, 7],
    ["625", 5, 16, 5],
    ["626", 6, 19, 6],
    ["627", 7, 22, 7],
    ["629", 9, 26, 8],
    ["6000", 10, 26, 8],
    ["6200", 10, 30, 9],
    ["6300", 10, 35, 11],
    ["6001", 12, 28, 8],
    ["6201", 12, 32, 10],
    ["6301", 12, 37, 12],
    ["16002", 15, 32, 8],
    ["6002", 15, 32, 9],
    ["6202", 15, 35, 11],
    ["6302", 15, 42, 13],
    ["16003", 17, 35, 8],
    ["6003", 17, 35, 10],
    ["6203", 17, 40, 12],
    ["6303", 17, 47, 14],
    ["16004", 20, 42, 8],
    ["6004", 20, 42, 12],
    ["6204", 20, 47, 14],
    ["6304", 20, 52, 15],
    ["16005", 25, 47, 8],
    ["6005", 25, 47, 12],
    ["6205", 25, 52, 15],
    ["6305", 25, 62, 17],
    ["16006", 30, 55, 9],
    ["6006", 30, 55, 13],
    ["6206", 30, 62, 16],
    ["16007", 35, 62, 9],
    ["6007", 35, 62, 14],
  ];
  for (const [designation, d, D, B] of din625) {
    it(`gives ${designation} as ${d} × ${D} × ${B} mm`, () => expect(dims(designation)).toEqual([d, D, B]));
  }

  it("gives the larger sizes as remembered from ISO 15 tables", () => {
    // from memory (ISO 15:2017, diameter series 2, 3, 4, 8, 9): not checked against a copy of the standard here.
    expect(dims("6210")).toEqual([50, 90, 20]);
    expect(dims("6220")).toEqual([100, 180, 34]);
    expect(dims("6310")).toEqual([50, 110, 27]);
    expect(dims("6408")).toEqual([40, 110, 27]);
    expect(dims("61805")).toEqual([25, 37, 7]);
    expect(dims("61905")).toEqual([25, 42, 9]);
    expect(dims("6020")).toEqual([100, 150, 24]);
  });

  it("covers every bore code from 00 to 20 (10 to 100 mm) in series 618, 619, 60, 62 and 63", () => {
    for (const series of ["618", "619", "60", "62", "63"] as const) {
      const codes = DEEP_GROOVE[series].map(([code]) => code).filter((c) => /^\d\d$/.test(c));
      expect(codes).toEqual(Array.from({ length: 21 }, (_, i) => String(i).padStart(2, "0")));
    }
  });

  it("follows the bore-code rule in every row of every series", () => {
    // ISO 15:2017 bore codes: 00 = 10, 01 = 12, 02 = 15, 03 = 17 mm, then code × 5 mm.
    for (const rows of Object.values(DEEP_GROOVE)) for (const [code, d] of rows) expect(boreFromCode(code)).toBe(d);
    expect(boreFromCode("04")).toBe(20);
    expect(boreFromCode("/22")).toBe(22);
    expect(boreFromCode("96")).toBe(480);
  });

  it("gives bearings of one diameter series the same outside diameter for the same bore", () => {
    // ISO 15 dimension plan: D depends on d and the diameter series only; 160 and 60 are both diameter series 0.
    for (const [code, d, D] of DEEP_GROOVE["160"]) {
      const sixty = DEEP_GROOVE["60"].find(([c]) => c === code);
      expect(sixty?.[1]).toBe(d);
      expect(sixty?.[2]).toBe(D);
    }
  });

  it("gives the R-series inch bearings a bore of their number in sixteenths of an inch", () => {
    // ABMA inch radial ball bearing numbering: R8 has a 8/16 = 1/2 in bore. R8 is 1/2 × 1-1/8 × 1/4 in open (BOSL2
    // open parts library, ball_bearings.scad, R-series rows).
    expect(dims("R8")).toEqual([12.7, 28.575, 6.35]);
    for (const b of ALL_BEARINGS.filter((x) => x.series === "R"))
      expect(b.boreMm).toBeCloseTo((Number(b.boreCode) / 16) * 25.4, 6);
  });

  it("agrees with the BOSL2 table on every open R-series size", () => {
    // BOSL2 ball_bearings.scad, inch rows R2 … R24 (d × D × B in inches).
    const bosl2: Array<[string, number, number, number]> = [
      ["R2", 1 / 8, 3 / 8, 5 / 32],
      ["R3", 3 / 16, 1 / 2, 5 / 32],
      ["R4", 1 / 4, 5 / 8, 0.196],
      ["R6", 3 / 8, 7 / 8, 7 / 32],
      ["R8", 1 / 2, 9 / 8, 1 / 4],
      ["R10", 5 / 8, 11 / 8, 9 / 32],
      ["R12", 3 / 4, 13 / 8, 5 / 16],
      ["R14", 7 / 8, 15 / 8, 3 / 8],
      ["R16", 1, 2, 3 / 8],
      ["R18", 9 / 8, 17 / 8, 3 / 8],
      ["R20", 10 / 8, 18 / 8, 3 / 8],
      ["R22", 11 / 8, 20 / 8, 7 / 16],
      ["R24", 12 / 8, 21 / 8, 7 / 16],
    ];
    for (const [designation, d, D, B] of bosl2) {
      const [bore, od, width] = dims(designation) ?? [];
      expect(bore).toBeCloseTo(d * 25.4, 3);
      expect(od).toBeCloseTo(D * 25.4, 3);
      expect(width).toBeCloseTo(B * 25.4, 3);
    }
  });

  it("decodes R8-2RS and R8ZZ with the closed width, R8 with the open one", () => {
    // from memory (ABMA inch series tables; BOSL2 gives its ZZ rows the open width, so this is not confirmed):
    // R8 open 1/4 in, R8-2RS and R8-ZZ 5/16 in wide.
    expect(decodeBearing("R8").widthMm).toBeCloseTo(6.35, 4);
    expect(decodeBearing("R8-2RS").widthMm).toBeCloseTo(7.9375, 4);
    expect(decodeBearing("R8ZZ").widthMm).toBeCloseTo(7.9375, 4);
    expect(decodeBearing("R4-2RS").widthMm).toBeCloseTo(0.196 * 25.4, 4);
  });

  it("finds R8-2RS for a measured 1/2 × 1-1/8 × 5/16 in bearing", () => {
    // from memory (ABMA inch series): the sealed R8 is 5/16 in wide.
    const { candidates } = matchBearing({
      boreMm: 12.7,
      outsideDiameterMm: 28.575,
      widthMm: 7.94,
      toleranceMm: 0.1016,
      unit: "in",
    });
    expect(candidates[0].designation).toBe("R8-2RS");
  });
});

describe("decoding a designation", () => {
  // Suffix letters as commonly used in the trade (common practice, no single published source); clearance groups per
  // ISO 5753-1.
  it("reads 6205-2RS as a 25 mm light-series bearing sealed both sides", () => {
    const b = decodeBearing("6205-2RS");
    expect(b).toMatchObject({ series: "62", boreCode: "05", boreMm: 25, outsideDiameterMm: 52, widthMm: 15 });
    expect(b.closures).toMatchObject({ kind: "contact seal", sides: 2 });
    expect(b.clearance.group).toBe("CN");
  });

  it("reads the usual ways of writing the same bearing alike", () => {
    expect(decodeBearing("6205 2RS C3")).toMatchObject({ designation: "6205-2RS C3", clearance: { group: "C3" } });
    expect(decodeBearing("6205ZZ").closures).toMatchObject({ kind: "shield", sides: 2 });
    expect(decodeBearing("6205-2Z").designation).toBe(decodeBearing("6205zz").designation);
    expect(decodeBearing("6205-Z").closures).toMatchObject({ kind: "shield", sides: 1 });
    expect(decodeBearing("6205N").snapRing).toMatchObject({ groove: true, ring: false });
    expect(decodeBearing("6205 NR").snapRing).toMatchObject({ groove: true, ring: true });
  });

  it("reads three-digit older numbers as the 62 and 63 series, and says it is common practice", () => {
    expect(decodeBearing("206")).toMatchObject({ series: "62", boreMm: 30 });
    const old = decodeBearing("307");
    expect(old).toMatchObject({ series: "63", boreMm: 35, outsideDiameterMm: 80, widthMm: 21 });
    expect(old.notes.join(" ")).toMatch(/common practice/);
  });

  it("keeps a miniature 608 as the 8 mm bearing it is", () => {
    expect(decodeBearing("608-2RS")).toMatchObject({ series: "60", boreMm: 8, outsideDiameterMm: 22 });
  });

  it("keeps and reports suffixes it cannot read", () => {
    const b = decodeBearing("6305-2RS TN9 X9");
    expect(b.unknownSuffixes).toEqual(["TN9", "X9"]);
    expect(b.notes.join(" ")).toContain("TN9");
  });

  it("says that roller and angular-contact bearings share the 62 series' size", () => {
    expect(decodeBearing("6207").notes.join(" ")).toMatch(/cylindrical roller/);
  });

  for (const bad of ["", "hello", "6299", "62-", "9205"]) {
    it(`refuses ${JSON.stringify(bad)} with a reason`, () =>
      expect(() => decodeBearing(bad)).toThrow(DesignationError));
  }
});

describe("matching a measured bearing", () => {
  it("finds 6205 first for 25.02 × 51.98 × 15.0 mm", () => {
    // 6205 is 25 × 52 × 15 mm: DIN 625-1 as tabulated in BOLTS data/bearings.blt.
    const { candidates, warnings } = matchBearing({
      boreMm: 25.02,
      outsideDiameterMm: 51.98,
      widthMm: 15,
      toleranceMm: 0.1,
      unit: "mm",
    });
    expect(candidates[0].designation).toBe("6205");
    expect(candidates[0].deviations.map((d) => d.name)).toEqual(["bore", "od", "width"]);
    expect(warnings).toEqual([]);
  });

  it("finds the inch R16 for 1 × 2 × 3/8 in, and answers in inches", () => {
    // R16: 1 × 2 × 3/8 in (ABMA inch series, from memory; the 16/16 in bore follows the numbering rule).
    const { candidates } = matchBearing({
      boreMm: 25.4,
      outsideDiameterMm: 50.8,
      widthMm: 9.525,
      toleranceMm: 0.1,
      unit: "in",
    });
    expect(candidates[0]).toMatchObject({ designation: "R16", system: "inch" });
    expect(candidates[0].deviations[0].nominal).toBeCloseTo(1, 4);
  });

  it("warns when no standard bearing fits the three sizes", () => {
    const { warnings } = matchBearing({
      boreMm: 26.5,
      outsideDiameterMm: 55.5,
      widthMm: 14.2,
      toleranceMm: 0.1,
      unit: "mm",
    });
    expect(warnings.join(" ")).toMatch(/special|misread|worn/);
  });

  it("tells apart 6206 (30 mm) from an inch bearing near it, and says same size is not the same part", () => {
    // 6206 is 30 × 62 × 16 mm (DIN 625-1, BOLTS); NU 206 shares dimension series 02 (ISO 15 dimension plan).
    const { candidates } = matchBearing({
      boreMm: 30,
      outsideDiameterMm: 62,
      widthMm: 16,
      toleranceMm: 0.1,
      unit: "mm",
    });
    expect(candidates[0].designation).toBe("6206");
    expect(candidates[0].warnings.join(" ")).toMatch(/Same size is not the same part/);
  });
});
