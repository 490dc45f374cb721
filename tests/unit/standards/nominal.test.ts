import { describe, expect, it } from "vitest";
import { nearMiss, nearMissFor, nominalCandidates } from "@/lib/standards/nominal";

describe("nominal size from a measured one", () => {
  it("reads a shaft of 1.2485 in as 1-1/4 in worn a little small", () => {
    // common practice (no published source): a worn shaft measures under its nominal size.
    const [best] = nominalCandidates(1.2485 * 25.4, "in", "shaft");
    expect(best).toMatchObject({ system: "inch", label: "1-1/4 in", nominal: 1.25 });
    expect(best.deviation).toBeCloseTo(-0.0015, 5);
  });

  it("reads 31.98 mm on a shaft as 32 mm, ahead of 1-1/4 in", () => {
    // 1-1/4 in = 31.75 mm exactly (25.4 mm/in); 31.98 mm is over it, which a worn shaft cannot be.
    const candidates = nominalCandidates(31.98, "mm", "shaft");
    expect(candidates[0].label).toBe("32 mm");
    expect(candidates.find((c) => c.system === "inch")?.label).toBe("1-1/4 in");
  });

  it("leans the other way for a worn housing bore, which reads large", () => {
    // common practice (no published source): a worn bore measures over its nominal size.
    const [best] = nominalCandidates(52.04, "mm", "housing");
    expect(best.label).toBe("52 mm");
  });

  it("always offers the best inch and the best metric reading", () => {
    const systems = new Set(nominalCandidates(40.0, "mm").map((c) => c.system));
    expect(systems).toEqual(new Set(["inch", "metric"]));
  });
});

describe("inch/metric near misses", () => {
  it("flags 1-1/2 in against 38 mm", () => {
    // 1.5 in = 38.1 mm exactly; 0.1 mm apart is within caliper error but not a fit.
    const miss = nearMiss(1.5, 38);
    expect(miss?.differenceMm).toBeCloseTo(0.1, 6);
    expect(miss?.message).toContain("not interchangeable");
  });

  it("flags 1 in against 25 mm and 2 in against 51 mm", () => {
    expect(nearMiss(1, 25)?.differenceMm).toBeCloseTo(0.4, 6);
    expect(nearMiss(2, 51)?.differenceMm).toBeCloseTo(0.2, 6);
  });

  it("does not flag sizes that are plainly different, or the same", () => {
    expect(nearMiss(1.25, 30)).toBeNull(); // 31.75 against 30 mm: 1.75 mm apart
    expect(nearMiss(1, 25.4)).toBeNull(); // identical
  });

  it("finds the near miss in a measurement between 1-1/2 in and 38 mm", () => {
    expect(nearMissFor(nominalCandidates(38.05, "mm"))?.inchLabel).toBe("1-1/2 in");
  });
});
