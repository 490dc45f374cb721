import { describe, expect, it } from "vitest";
import {
  checkAgainstPart,
  checkStandard,
  measurementDeviations,
  PART_SIZES_FIELD,
  readSealSize,
} from "@/lib/proposals/checks";
import { readProposalPrefill } from "@/lib/proposals/prefill";
import { proposalHref } from "@/lib/proposals/prefill-link";
import { toStandardItem } from "@/lib/lists/standard-item";

describe("checking a proposed standard part with the standards engine", () => {
  it("reads a bearing designation and takes its sizes from the tables", () => {
    // DIN 625-1 (= ISO 15:2017 boundary dimensions), as tabulated in the BOLTS open parts library: 6205 is 25 × 52 × 15
    // mm.
    const checked = checkStandard({ kind: "bearing", designation: "6205 2rs" });
    expect(checked).toMatchObject({ designation: "6205-2RS", innerMm: 25, outerMm: 52, widthMm: 15 });
    expect(checked.checks).toEqual([expect.objectContaining({ level: "ok" })]);
  });

  it("flags each entered size that contradicts the designation, and only those", () => {
    // DIN 625-1 via BOLTS: 6305 is 25 × 62 × 17 mm. 47 mm is the outside diameter of 6005, a common mix-up.
    const checked = checkStandard({ kind: "bearing", designation: "6305", innerMm: 25, outerMm: 47, widthMm: 17 });
    const warnings = checked.checks.filter((c) => c.level === "warning");
    expect(warnings.map((w) => w.field)).toEqual(["standard.outerMm"]);
    expect(warnings[0].message).toContain("62 mm");
    expect(checked.outerMm).toBe(62);
  });

  it("keeps the sizes given when the designation cannot be read, and says so", () => {
    const checked = checkStandard({ kind: "bearing", designation: "XJ-99", innerMm: 20, outerMm: 47, widthMm: 14 });
    expect(checked).toMatchObject({ designation: "XJ-99", innerMm: 20, outerMm: 47, widthMm: 14 });
    expect(checked.checks[0].level).toBe("warning");
  });

  it("reads a classical V-belt and accepts its inside, pitch or outside length", () => {
    // RMA/MPTA IP-20 numbering: B43 is 43 in inside; pitch = inside + 1.8 in (from memory) = 44.8 in = 1137.9 mm.
    const checked = checkStandard({ kind: "v_belt", designation: "B-43", lengthMm: 1092 });
    expect(checked).toMatchObject({ designation: "B43", lengthMm: 1137.9 });
    expect(checked.checks.some((c) => c.level === "warning")).toBe(false);
    const wrong = checkStandard({ kind: "v_belt", designation: "B43", lengthMm: 1300 });
    expect(wrong.checks.filter((c) => c.level === "warning").map((c) => c.field)).toEqual(["standard.lengthMm"]);
  });

  it("reads shaft × bore × width from a lip seal's designation and knows a listed size", () => {
    // ISO 6194-1 nominal sizes include 35 × 52 × 8 mm (from memory).
    const listed = checkStandard({ kind: "lip_seal", designation: "35 x 52 x 8" });
    expect(listed).toMatchObject({ innerMm: 35, outerMm: 52, widthMm: 8 });
    expect(listed.checks[0].level).toBe("ok");
    const contradicts = checkStandard({ kind: "lip_seal", designation: "35×52×8", outerMm: 55 });
    expect(contradicts.checks.map((c) => c.field)).toContain("standard.outerMm");
  });

  it("asks for the three sizes of a seal given neither in the designation nor the fields", () => {
    expect(checkStandard({ kind: "lip_seal", designation: "rear crank seal" }).checks[0]).toMatchObject({
      level: "warning",
    });
  });
});

describe("measured sizes beside the standard part's", () => {
  it("converts inches and gives measured minus nominal in millimetres", () => {
    // 1 in = 25.4 mm exactly (international yard and pound agreement, 1959): 2.047 in = 51.9938 mm.
    const deviations = measurementDeviations(
      [
        { dimension: "outer", value: 2.047, unit: "in" },
        { dimension: "inner", value: 24.98, unit: "mm" },
        { dimension: "other", value: 3, unit: "mm", label: "lip height" },
      ],
      { innerMm: 25, outerMm: 52, widthMm: 15, lengthMm: null },
    );
    expect(deviations).toEqual([
      { dimension: "outer", label: "outer", measuredMm: 51.994, nominalMm: 52, deviationMm: -0.006 },
      { dimension: "inner", label: "inner", measuredMm: 24.98, nominalMm: 25, deviationMm: -0.02 },
    ]);
  });
});

describe("a proposal against the worn part's own sizes", () => {
  const part = { number: "XX-1", innerMm: 15, outerMm: 35, widthMm: 11, lengthMm: null };

  it("flags a 20 × 47 × 14 bearing for a part documented as 15 × 35 × 11", () => {
    // DIN 625-1 via BOLTS: 6204 is 20 × 47 × 14 mm and 6202 is 15 × 35 × 11 mm.
    const check = checkAgainstPart(part, {
      kind: "bearing",
      designation: "6204",
      innerMm: 20,
      outerMm: 47,
      widthMm: 14,
      lengthMm: null,
    });
    expect(check).toMatchObject({ level: "warning", field: PART_SIZES_FIELD });
    expect(check?.message).toMatch(/15 × 35 × 11 mm.*6204 is 20 × 47 × 14 mm.*bore or shaft 5 mm larger/);
  });

  it("passes the same size, and a part that has no documented sizes", () => {
    expect(
      checkAgainstPart(part, {
        kind: "bearing",
        designation: "6202-2RS",
        innerMm: 15,
        outerMm: 35,
        widthMm: 11,
        lengthMm: null,
      }),
    ).toBeNull();
    expect(
      checkAgainstPart(
        { number: "XX-2", innerMm: null, outerMm: null, widthMm: null, lengthMm: null },
        { kind: "bearing", designation: "6204", innerMm: 20, outerMm: 47, widthMm: 14, lengthMm: null },
      ),
    ).toBeNull();
  });

  it("leaves an inch/metric near miss to its own warning", () => {
    // 1-1/2 in = 38.1 mm against a 38 mm seal: 0.1 mm, flagged elsewhere as a near miss, not as another size.
    expect(
      checkAgainstPart(
        { number: "XX-3", innerMm: 38.1, outerMm: 55, widthMm: 8, lengthMm: null },
        { kind: "lip_seal", designation: "38 × 55 × 8", innerMm: 38, outerMm: 55, widthMm: 8, lengthMm: null },
      ),
    ).toBeNull();
  });
});

describe("reading a seal's designation", () => {
  it("reads fractions and thousandths of an inch", () => {
    // 1 in = 25.4 mm exactly.
    const size = readSealSize("1-1/2 × 2.374 × 1/2 in");
    expect(size?.inch).toBe(true);
    expect(size?.innerMm).toBeCloseTo(38.1, 6);
    expect(size?.outerMm).toBeCloseTo(60.2996, 6);
    expect(size?.widthMm).toBeCloseTo(12.7, 6);
  });

  it("reads millimetres with or without the unit, and refuses what is not three sizes", () => {
    expect(readSealSize("35x52x7 mm")).toMatchObject({ innerMm: 35, outerMm: 52, widthMm: 7, inch: false });
    expect(readSealSize("35 × 52 × 7")).toMatchObject({ inch: false });
    expect(readSealSize("35 × 52")).toBeNull();
    expect(readSealSize("a × b × c")).toBeNull();
  });

  it("does not call an inch seal ordered by its sizes unbuyable", () => {
    const checked = checkStandard({ kind: "lip_seal", designation: "1-1/2 × 2.374 × 1/2 in" });
    expect(checked.checks.every((c) => c.level === "ok")).toBe(true);
  });
});

describe("from a calculator to the proposal form", () => {
  it("carries the standard part and the measurements through the link", () => {
    const href = proposalHref({
      kind: "lip_seal",
      designation: "1-1/2 × 2.374 × 1/2 in",
      measurements: [{ dimension: "inner", value: 1.497, unit: "in" }],
    });
    const params = Object.fromEntries(new URL(href, "http://x").searchParams);
    const prefill = readProposalPrefill(params);
    expect(prefill?.standard).toMatchObject({
      mode: "new",
      kind: "lip_seal",
      designation: "1-1/2 × 2.374 × 1/2 in",
      innerMm: 38.1,
      outerMm: 60.3,
      widthMm: 12.7,
    });
    expect(prefill?.measurements).toEqual([{ dimension: "inner", value: 1.497, unit: "in" }]);
  });

  it("ignores what it cannot read instead of failing", () => {
    expect(readProposalPrefill({ kind: "rocket", designation: "6205" })).toBeNull();
    expect(
      readProposalPrefill({ kind: "bearing", designation: "6205", m: "inner:abc:in,outer:52:mm" })?.measurements,
    ).toEqual([{ dimension: "outer", value: 52, unit: "mm" }]);
  });
});

describe("a measured standard part on a job list", () => {
  it("takes its sizes from the engine's reading of the designation", () => {
    // DIN 625-1 via BOLTS: 6205 is 25 × 52 × 15 mm.
    expect(toStandardItem({ kind: "bearing", designation: "6205 2rs" })).toMatchObject({
      designation: "6205-2RS",
      innerMm: 25,
      outerMm: 52,
      widthMm: 15,
    });
  });
});

describe("standard parts cut or driven in the workshop", () => {
  it("reads a felt ring's inside × outside × thickness from its designation", () => {
    const felt = checkStandard({ kind: "felt", designation: "Felt ring 1-1/4 × 1-3/4 × 1/4 in" });
    // NIST SP 811: 1 in = 25.4 mm exactly.
    expect(felt).toMatchObject({ innerMm: 31.75, outerMm: 44.45, widthMm: 6.35 });
    expect(felt.checks[0].level).toBe("ok");
    expect(checkStandard({ kind: "felt", designation: "felt strip" }).checks[0].level).toBe("warning");
  });

  it("reads gland packing's section and a plug's bore", () => {
    expect(checkStandard({ kind: "packing", designation: "Gland packing 1/4 in square" }).widthMm).toBe(6.35);
    expect(checkStandard({ kind: "plug", designation: "Cup plug 1-1/2 in" })).toMatchObject({
      outerMm: 38.1,
      attributes: { plug: "cup" },
    });
    expect(checkStandard({ kind: "plug", designation: "Pipe plug 1/4 NPT" }).checks).toEqual([]);
  });

  it("keeps a gasket as its template, from the designer's link or its query", () => {
    const link = "https://example.test/measure/gasket?unit=mm&outline=circle&od=120&holes=4&pcd=100&hole=10";
    const gasket = checkStandard({ kind: "gasket", designation: "", template: link });
    expect(gasket).toMatchObject({ designation: "Gasket Ø120 mm, 4 holes Ø10 on Ø100, 0.8 mm fibre", outerMm: 120 });
    expect(gasket.attributes.template).toBe("unit=mm&outline=circle&od=120&holes=4&pcd=100&hole=10&use=water");
    const broken = checkStandard({
      kind: "gasket",
      designation: "pump gasket",
      template: "outline=circle&od=50&holes=4&pcd=60&hole=5",
    });
    expect(broken.checks[0]).toMatchObject({ level: "warning", field: "standard.template" });
    expect(checkStandard({ kind: "gasket", designation: "pump gasket" }).checks[0].level).toBe("warning");
  });
});
