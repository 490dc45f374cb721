import { describe, expect, it } from "vitest";
import { checkStandard, measurementDeviations } from "@/lib/community/checks";

describe("checking a proposed standard part with the standards engine", () => {
  it("reads a bearing designation and takes its sizes from the tables", () => {
    // DIN 625-1 (= ISO 15:2017 boundary dimensions), as tabulated in the BOLTS open parts library: 6205 is 25 × 52 × 15 mm.
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
    expect(checkStandard({ kind: "lip_seal", designation: "rear crank seal" }).checks[0]).toMatchObject({ level: "warning" });
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
