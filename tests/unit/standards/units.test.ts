import fc from "fast-check";
// @ts-expect-error convert-units 2 ships no types; it is used here only as an independent reference.
import convert from "convert-units";
import { describe, expect, it } from "vitest";
import {
  convertTyped,
  convertTypedSizes,
  fromMm,
  inchLabel,
  measuredValues,
  parseLength,
  round,
  showDeviation,
  showLength,
  toMm,
  UnitParseError,
} from "@/lib/standards/units";

describe("inch and millimetre", () => {
  it("converts exactly at 25.4 mm to the inch", () => {
    // International yard and pound agreement (1959); NIST SP 811, appendix B: 1 in = 2.54 cm exactly.
    expect(toMm(1, "in")).toBe(25.4);
    expect(toMm(1.5, "in")).toBeCloseTo(38.1, 12);
  });

  it("agrees with an independent unit library across the range of machine parts", () => {
    // convert-units 2.3.4 (npm), an independent general-purpose conversion library. It converts through feet with a
    // rounded factor (1 in → 25.3999992 mm), so agreement is checked to one part in ten million.
    for (const inches of [0.125, 0.625, 1, 1.5, 2.375, 10, 62.5]) {
      const reference = convert(inches).from("in").to("mm") as number;
      expect(Math.abs(toMm(inches, "in") - reference) / reference).toBeLessThan(1e-7);
    }
  });

  it("returns to the same inch value after a trip through millimetres", () => {
    // Property: fromMm(toMm(x)) = x for every size a part can have.
    fc.assert(
      fc.property(
        fc.double({ min: 0.001, max: 1000, noNaN: true }),
        (inches) => Math.abs(fromMm(toMm(inches, "in"), "in") - inches) <= 1e-9 * inches,
      ),
    );
  });
});

describe("reading what people type", () => {
  const cases: Array<[string, number, "in" | "mm"]> = [
    ["1.5", 1.5, "in"],
    ["1-1/2", 1.5, "in"],
    ['1 1/2"', 1.5, "in"],
    ["1.500 in", 1.5, "in"],
    ["38.1 mm", 38.1, "mm"],
    ["2 3/8", 2.375, "in"],
    ["52mm", 52, "mm"],
    ["3/4", 0.75, "in"],
    ["0,75 in", 0.75, "in"],
    [".625", 0.625, "in"],
  ];
  for (const [text, value, unit] of cases) {
    it(`reads ${JSON.stringify(text)} as ${value} ${unit}`, () => {
      const parsed = parseLength(text, "in");
      expect(parsed.value).toBeCloseTo(value, 12);
      expect(parsed.unit).toBe(unit);
    });
  }

  it("uses the chosen unit when none is typed", () => {
    expect(parseLength("52", "mm")).toMatchObject({ value: 52, unit: "mm", mm: 52 });
  });

  for (const nonsense of ["", "abc", "1/0", "-5", "0", "1..5", "5 ft", "1-1/2-3", "99999 in"]) {
    it(`refuses ${JSON.stringify(nonsense)} with a reason`, () => {
      expect(() => parseLength(nonsense, "in")).toThrow(UnitParseError);
    });
  }
});

describe("inch labels", () => {
  it("writes sizes the way they are spoken in the shop", () => {
    expect(inchLabel(1.25)).toBe("1-1/4 in");
    expect(inchLabel(0.75)).toBe("3/4 in");
    expect(inchLabel(2)).toBe("2 in");
    expect(inchLabel(1 + 17 / 64)).toBe("1-17/64 in");
    // Off the 1/64 grid an inch size is written in thousandths, the trade's precision.
    expect(inchLabel(1.2485)).toBe("1.249 in");
  });
});

describe("numbers at the trade's precision", () => {
  it("shows inches in thousandths and millimetres in hundredths", () => {
    // common practice (no published source): a micrometer reads 0.001 in or 0.01 mm.
    expect(showLength(2.38, "in")).toBe("2.380 in");
    expect(showLength(61.2996, "mm")).toBe("61.3 mm");
    expect(showDeviation(0.03125, "in")).toBe("+0.031 in");
    expect(showDeviation(-0.0015, "in")).toBe("−0.002 in");
    expect(showDeviation(0.00001, "mm")).toBe("±0 mm");
  });

  it("rounds halves away from zero, the same either side of nominal", () => {
    // common practice (no published source): a reading 0.0015 in under nominal is shown as far from it as one over.
    expect(round(-1.5, 0)).toBe(-2);
    expect(round(1.5, 0)).toBe(2);
    expect(round(1.005, 2)).toBe(1.01);
  });
});

describe("switching units converts what was typed", () => {
  it("says 24.98 mm again as 0.983 in, and 1-1/2 in as 38.1 mm", () => {
    // 1 in = 25.4 mm exactly (1959 agreement): 24.98 / 25.4 = 0.98346…; 1.5 × 25.4 = 38.1.
    expect(convertTyped("24.98", "mm", "in")).toBe("0.983");
    expect(convertTyped("1-1/2", "in", "mm")).toBe("38.1");
    expect(convertTyped('2 3/8"', "mm", "mm")).toBe('2 3/8"');
  });

  it("leaves text that is not a size as it was, for the field to report", () => {
    expect(convertTyped("about an inch", "in", "mm")).toBe("about an inch");
    expect(convertTyped("", "in", "mm")).toBe("");
  });

  it("converts the named fields of a form and no others", () => {
    expect(convertTypedSizes({ shaft: "1.5", bore: "2.374", note: "1" }, ["shaft", "bore"], "in", "mm")).toEqual({
      shaft: "38.1",
      bore: "60.3",
      note: "1",
    });
  });

  it("reads typed sizes as measured values in the unit each was typed in", () => {
    expect(
      measuredValues(
        [
          ["inner", "1.497"],
          ["outer", "60.3 mm"],
          ["width", ""],
        ],
        "in",
      ),
    ).toEqual([
      { dimension: "inner", value: 1.497, unit: "in" },
      { dimension: "outer", value: 60.3, unit: "mm" },
    ]);
  });
});
