import { describe, expect, it } from "vitest";
import { matchPlug, readPlugDesignation } from "@/lib/standards/plugs";
import { StandardsInputError } from "@/lib/standards/errors";

const IN = 25.4; // NIST SP 811: 1 in = 25.4 mm exactly

describe("cup and disc plugs", () => {
  it("names the plug by the bore it fits, in the system measured, with the near miss", () => {
    const m = matchPlug({ boreMm: 1.503 * IN, unit: "in", kind: "cup" });
    expect(m.candidates[0]).toMatchObject({ label: "Cup plug 1-1/2 in", system: "inch", deviation: 0.003 });
    expect(m.candidates.some((c) => c.label === "Cup plug 38 mm")).toBe(true);
    // 1-1/2 in is 38.1 mm: 0.1 mm from a 38 mm plug (NIST SP 811 conversion).
    expect(m.nearMiss).toMatchObject({ inchLabel: "1-1/2 in", metricLabel: "38 mm", differenceMm: 0.1 });
  });

  it("puts the metric size first when the bore was measured in millimetres", () => {
    const m = matchPlug({ boreMm: 35.08, unit: "mm", kind: "disc" });
    expect(m.candidates[0]).toMatchObject({ label: "Disc plug 35 mm", system: "metric" });
    expect(m.notes.join(" ")).toMatch(/flat punch/);
  });

  it("offers only sizes sold: sixteenths of an inch, whole millimetres", () => {
    for (const boreMm of [12.9, 22.3, 31.9, 41.35, 50.9, 63.6]) {
      for (const c of matchPlug({ boreMm, unit: "in", kind: "cup" }).candidates) {
        if (c.system === "inch") expect(Number.isInteger(Math.round(c.nominal * 16 * 1e6) / 1e6)).toBe(true);
        else expect(Number.isInteger(c.nominal)).toBe(true);
      }
    }
  });

  it("finds itself first for every sixteenth from 1/2 to 3 in, worn a little large", () => {
    // Property: each inch size, read 0.002 in over (a corroded bore reads large), is named first.
    for (let n = 8; n <= 48; n += 1) {
      const m = matchPlug({ boreMm: (n / 16 + 0.002) * IN, unit: "in", kind: "cup" });
      expect(m.candidates[0].nominal).toBeCloseTo(n / 16, 6);
    }
  });

  it("warns about a bore that reads small or far over", () => {
    expect(matchPlug({ boreMm: 34.8, unit: "mm", kind: "cup" }).warnings.join(" ")).toMatch(/does not wear small/);
    expect(matchPlug({ boreMm: 35.4, unit: "mm", kind: "cup" }).warnings.join(" ")).toMatch(/oversize plug/);
  });

  it("tells how to drive a cup plug: on its inside face, with a driver that clears the lip", () => {
    expect(matchPlug({ boreMm: 40, unit: "mm", kind: "cup" }).notes.join(" ")).toMatch(/inside face.*clears the lip/);
  });

  it("refuses bores outside the sizes sold", () => {
    expect(() => matchPlug({ boreMm: 3, unit: "mm", kind: "cup" })).toThrow(StandardsInputError);
    expect(() => matchPlug({ boreMm: 150, unit: "mm", kind: "cup" })).toThrow(StandardsInputError);
  });

  it("reads a plug designation", () => {
    expect(readPlugDesignation("Cup plug 1-1/2 in")).toEqual({ kind: "cup", boreMm: 38.1, unit: "in" });
    expect(readPlugDesignation("Disc plug 38 mm")).toEqual({ kind: "disc", boreMm: 38, unit: "mm" });
    expect(readPlugDesignation("core plug 1 3/4")).toEqual({ kind: "cup", boreMm: 44.45, unit: "in" });
    expect(readPlugDesignation("Pipe plug 1/4 NPT")).toBeNull();
  });
});
