import { describe, expect, it } from "vitest";
import { FELT_THICKNESSES, sizeFelt } from "@/lib/standards/felts";
import { PACKING_SECTIONS, readPackingSection, sizePacking, staggerAngle } from "@/lib/standards/packing";
import { StandardsInputError } from "@/lib/standards/errors";

const IN = 25.4; // NIST SP 811: 1 in = 25.4 mm exactly

describe("felt rings and strips", () => {
  it("cuts the ring to the nominal shaft and the groove, and the strip to the mean circumference", () => {
    // A 1-1/4 in shaft worn to 1.247 in, a groove 1.750 in across and 1/4 in wide.
    const felt = sizeFelt({ shaftMm: 1.247 * IN, boreMm: 1.75 * IN, widthMm: 0.25 * IN, unit: "in" });
    expect(felt.ring).toEqual({ inside: 1.25, outside: 1.75, thickness: 0.25 });
    // Geometry: the circumference of a circle is π × its diameter; the strip lies at the groove's mean diameter,
    // (1.247 + 1.750) / 2 = 1.4985 in, so π × 1.4985 = 4.7077 in.
    expect(felt.strip.cutLength).toBe(4.708);
    // The strip fills the groove: as wide as the groove, as thick as it is deep ((1.750 − 1.247) / 2 = 0.2515 in),
    // taken up to the next felt sold (1/4 in would be under by 0.0015 in; within 0.05 mm it is the same felt).
    expect(felt.strip).toMatchObject({ width: 0.25, thickness: 0.25 });
    expect(felt.label).toBe("Felt ring 1-1/4 × 1-3/4 × 1/4 in");
  });

  it("answers in millimetres when measured in millimetres", () => {
    const felt = sizeFelt({ shaftMm: 31.9, boreMm: 44.1, widthMm: 5.6, unit: "mm" });
    expect(felt.ring).toEqual({ inside: 32, outside: 44, thickness: 6 });
    expect(felt.label).toBe("Felt ring 32 × 44 × 6 mm");
    // Geometry: π × (31.9 + 44.1) / 2 = π × 38 = 119.38 mm.
    expect(felt.strip.cutLength).toBe(119.38);
  });

  it("takes the next felt thickness up, never down: felt compresses into its seat", () => {
    // common practice (no published source)
    expect(sizeFelt({ shaftMm: 30, boreMm: 40, widthMm: 4.4, unit: "mm" }).ring.thickness).toBe(5);
    for (const unit of ["in", "mm"] as const) {
      const sizes = FELT_THICKNESSES[unit];
      expect([...sizes].sort((a, b) => a - b)).toEqual(sizes);
    }
  });

  it("says why a groove cannot take a felt", () => {
    expect(() => sizeFelt({ shaftMm: 30, boreMm: 29, widthMm: 5, unit: "mm" })).toThrow(StandardsInputError);
    const shallow = sizeFelt({ shaftMm: 30, boreMm: 32, widthMm: 5, unit: "mm" });
    expect(shallow.warnings.join(" ")).toMatch(/less than 2 mm deep/);
  });

  it("tells how to fit it: square ends butted, soaked in oil", () => {
    const notes = sizeFelt({ shaftMm: 30, boreMm: 40, widthMm: 5, unit: "mm" }).notes.join(" ");
    expect(notes).toMatch(/square/);
    expect(notes).toMatch(/butt/);
    expect(notes).toMatch(/[Ss]oak .* oil/);
  });
});

describe("gland packing", () => {
  it("snaps (bore − shaft) / 2 to a section sold, and cuts each ring to π × (shaft + section)", () => {
    // A 5/8 in pump shaft worn to 0.623 in in a 1-1/8 in box, 1 in deep.
    const p = sizePacking({ shaftMm: 0.623 * IN, boreMm: 1.125 * IN, depthMm: 1 * IN, unit: "in" });
    // Geometry: (1.125 − 0.623) / 2 = 0.251 in a side.
    expect(p.measuredSection).toBe(0.251);
    expect(p.section).toBe(0.25);
    expect(p.sectionLabel).toBe("1/4 in square");
    // common practice (no published source): each ring is cut to the circumference at shaft diameter plus one
    // section, π × (0.623 + 0.25) = 2.7426 in.
    expect(p.cutLength).toBe(2.743);
    // 1 in of box holds four rings of 1/4 in.
    expect(p.rings).toBe(4);
    expect(p.label).toBe("Gland packing 1/4 in square");
    expect(p.otherSystem).toMatchObject({ section: 6, sectionLabel: "6 mm square", unit: "mm" });
  });

  it("works in millimetres", () => {
    const p = sizePacking({ shaftMm: 20, boreMm: 36, depthMm: 33, unit: "mm" });
    expect(p).toMatchObject({ section: 8, sectionLabel: "8 mm square", rings: 4 });
    // π × (20 + 8) = 87.96 mm
    expect(p.cutLength).toBe(87.96);
  });

  it("warns when the box leaves a section well away from any sold, and why", () => {
    const worn = sizePacking({ shaftMm: 15.2, boreMm: 30, unit: "mm" });
    expect(worn.section).toBe(7);
    expect(worn.warnings).toEqual([]);
    // A box leaving 1.3 in a side, past the largest section sold (1 in): a worn box or a sleeve missing.
    const odd = sizePacking({ shaftMm: 0.5 * IN, boreMm: 3.1 * IN, unit: "in" });
    expect(odd.warnings.join(" ")).toMatch(/more than the nearest section sold/);
  });

  it("staggers the joints evenly: 90° for four or more rings, 120° for three", () => {
    // common practice (no published source)
    expect([staggerAngle(2), staggerAngle(3), staggerAngle(4), staggerAngle(6), staggerAngle(null)]).toEqual([
      180, 120, 90, 90, 90,
    ]);
    const notes = sizePacking({ shaftMm: 20, boreMm: 32, depthMm: 18, unit: "mm" }).notes.join(" ");
    expect(notes).toMatch(/120°/);
    expect(notes).toMatch(/weep/);
  });

  it("refuses a box that cannot hold packing", () => {
    expect(() => sizePacking({ shaftMm: 20, boreMm: 20, unit: "mm" })).toThrow(StandardsInputError);
    expect(() => sizePacking({ shaftMm: 20, boreMm: 32, depthMm: 2, unit: "mm" })).toThrow(/shallower/);
  });

  it("reads a section back from a designation", () => {
    expect(readPackingSection("Gland packing 1/4 in square")).toEqual({ sectionMm: 6.35, unit: "in" });
    expect(readPackingSection("Gland packing 6 mm square")).toEqual({ sectionMm: 6, unit: "mm" });
    expect(readPackingSection('packing 5/16" sq')).toEqual({ sectionMm: 7.9375, unit: "in" });
    expect(readPackingSection("graphite yarn")).toBeNull();
  });

  it("sells sections in ascending order in both systems", () => {
    for (const unit of ["in", "mm"] as const)
      expect([...PACKING_SECTIONS[unit]].sort((a, b) => a - b)).toEqual(PACKING_SECTIONS[unit]);
  });
});
