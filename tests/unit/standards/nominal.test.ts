import { describe, expect, it } from "vitest";
import { nearMiss, nearMissFor, nominalCandidates } from "@/lib/standards/nominal";

describe("nominal size from a measured one", () => {
  it("reads a shaft of 1.2485 in as 1-1/4 in worn a little small", () => {
    // common practice (no published source): a worn shaft measures under its nominal size.
    const [best] = nominalCandidates(1.2485 * 25.4, "in", "shaft");
    expect(best).toMatchObject({ system: "inch", label: "1-1/4 in", nominal: 1.25 });
    // Readings are given at the trade's precision, the thousandth of an inch; the exact figure stays in millimetres.
    expect(best.deviation).toBe(-0.002);
    expect(best.deviationMm).toBeCloseTo(-0.0015 * 25.4, 4);
  });

  it("takes 1.497 in on a worn shaft as 1-1/2 in, not 38 mm, because it was measured in inches", () => {
    // The worked example of issue 10 (common practice, no published source): a 1940s fan-hub shaft of 1-1/2 in,
    // worn 0.003 in. 1.497 in = 38.024 mm lies nearer 38 mm, but both fit within the wear allowance.
    const candidates = nominalCandidates(1.497 * 25.4, "in", "shaft");
    expect(candidates[0]).toMatchObject({ system: "inch", label: "1-1/2 in" });
    expect(candidates.some((c) => c.label === "38 mm")).toBe(true);
    expect(nearMissFor(candidates)?.message).toMatch(/not interchangeable/);
  });

  it("takes 38.02 mm on a shaft as 38 mm when it was measured in millimetres", () => {
    // The same reading typed in millimetres: the metric size leads; 1-1/2 in = 38.1 mm exactly (25.4 mm/in).
    expect(nominalCandidates(38.02, "mm", "shaft")[0].label).toBe("38 mm");
  });

  it("does not let the unit pull a reading to an odd sixty-fourth", () => {
    // 0.984 in = 24.99 mm: a 25 mm shaft measured in inches. 63/64 in is not a size a designer chose.
    expect(nominalCandidates(0.984 * 25.4, "in", "shaft")[0].label).toBe("25 mm");
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
