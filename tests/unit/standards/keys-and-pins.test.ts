import { describe, expect, it } from "vitest";
import {
  ALL_WOODRUFF,
  decodeWoodruff,
  matchWoodruff,
  PARALLEL_INCH,
  PARALLEL_METRIC,
  parallelKeys,
  readKeyDesignation,
  WOODRUFF_HEIGHTS,
  WOODRUFF_NUMBERS,
} from "@/lib/standards/keys";
import { decodeTaperPin, matchTaperPin, TAPER_PINS_INCH, TAPER_PINS_METRIC } from "@/lib/standards/pins";
import { StandardsInputError } from "@/lib/standards/errors";

const IN = 25.4; // NIST SP 811: 1 in = 25.4 mm exactly

describe("Woodruff keys", () => {
  it("decodes every ASME B17.2 number by its rule: width in 32nds, diameter in 8ths (exhaustive)", () => {
    // ASME B17.2: the last two digits give the nominal diameter in eighths of an inch, the digits before them the
    // width in thirty-seconds.
    for (const number of WOODRUFF_NUMBERS) {
      const key = decodeWoodruff(number);
      const [whole] = number.split(".");
      expect(key.width).toBeCloseTo(Number(whole.slice(0, -2)) / 32, 9);
      expect(key.diameter).toBeCloseTo((Number(whole.slice(-2)) + (number.endsWith(".5") ? 0.5 : 0)) / 8, 9);
    }
    expect(decodeWoodruff("No. 606")).toMatchObject({ width: 0.1875, diameter: 0.75, height: 0.313 });
    expect(decodeWoodruff("#1212").label).toBe("Woodruff key No. 1212 (3/8 × 1-1/2 in)");
  });

  it("agrees row by row with an open table of key heights", () => {
    // vu-arma-dev/Design_Calculations_Library, Keys/Woodruff_key_recommendation_inch.m (after ANSI B17.2, via
    // Collins, Busby & Staab, Mechanical Design of Machine Elements, 2nd ed.): number, width, height in inches.
    const open: Array<[string, number, number]> = [
      ["305", 3 / 32, 0.25],
      ["405", 1 / 8, 0.25],
      ["506", 5 / 32, 0.312],
      ["608", 3 / 16, 0.437],
      ["809", 1 / 4, 0.484],
      ["1212", 3 / 8, 0.641],
    ];
    for (const [number, width, height] of open) {
      const key = decodeWoodruff(number);
      expect(key.width, number).toBeCloseTo(width, 6);
      // The open table gives heights to 0.001 in, truncated (0.312 for 0.3125); ours are rounded.
      expect(Math.abs(key.height - height), number).toBeLessThan(0.0015);
    }
    // The same height for a diameter whatever the width: every number has one.
    for (const number of WOODRUFF_NUMBERS) expect(decodeWoodruff(number).height).toBeGreaterThan(0);
    expect(Object.keys(WOODRUFF_HEIGHTS)).toHaveLength(12);
  });

  it("decodes DIN 6888 sizes and refuses what neither standard lists", () => {
    // DIN 6888 (from memory): 6 × 9 has a 22 mm seat diameter.
    expect(decodeWoodruff("DIN 6888 6 x 9")).toMatchObject({ system: "metric", width: 6, height: 9, diameter: 22 });
    expect(() => decodeWoodruff("7 x 9")).toThrow(StandardsInputError);
    expect(() => decodeWoodruff("No. 999")).toThrow(/no such key|not an ASME/);
    expect(() => decodeWoodruff("key")).toThrow(StandardsInputError);
  });

  it("finds every key first from its own sizes, worn a little (property)", () => {
    for (const key of ALL_WOODRUFF) {
      const mm = (v: number) => (key.unit === "in" ? v * IN : v);
      const [best] = matchWoodruff({
        widthMm: mm(key.width) - 0.02,
        diameterMm: mm(key.diameter) - 0.2,
        heightMm: mm(key.height) - 0.05,
        unit: key.unit,
      });
      expect(best?.number, key.number).toBe(key.number);
    }
  });
});

describe("parallel keys", () => {
  it("gives the ASME B17.1 key width for a shaft, row by row against an open table", () => {
    // vu-arma-dev/Design_Calculations_Library, Keys/Square_key_recommendation_inch.m (ANSI B17.1, via Collins et
    // al., Table 8.1): shaft range and square key width in inches.
    const open: Array<[number, number, number]> = [
      [5 / 16, 7 / 16, 3 / 32], [1 / 2, 9 / 16, 1 / 8], [5 / 8, 7 / 8, 3 / 16], [15 / 16, 1.25, 1 / 4],
      [1 + 5 / 16, 1.375, 5 / 16], [1 + 7 / 16, 1.75, 3 / 8], [1 + 13 / 16, 2.25, 1 / 2], [2 + 5 / 16, 2.75, 5 / 8],
      [2 + 13 / 16, 3.25, 3 / 4], [3 + 5 / 16, 3.75, 7 / 8], [3 + 13 / 16, 4.5, 1], [4 + 9 / 16, 5.5, 1.25],
      [5 + 9 / 16, 6.5, 1.5],
    ]; // prettier-ignore
    expect(PARALLEL_INCH).toHaveLength(open.length);
    for (const [from, to, width] of open) {
      expect(parallelKeys(from * IN, "in").inch?.width, `${from}`).toBe(width);
      expect(parallelKeys(to * IN, "in").inch?.width, `${to}`).toBe(width);
    }
    expect(parallelKeys(1.5 * IN, "in").inch?.label).toBe("Square key 3/8 × 3/8 in");
  });

  it("gives the DIN 6885-1 key for a metric shaft, against a JIS B 1301 table (the same sizes)", () => {
    // JIS B 1301 keyway table in an open Python package found by code search (rows for 6–75 mm shafts; the
    // repository was not named by the search): b × h by shaft range.
    const open: Array<[number, number, number, number]> = [
      [6, 8, 2, 2], [8, 10, 3, 3], [10, 12, 4, 4], [12, 17, 5, 5], [17, 22, 6, 6], [22, 30, 8, 7], [30, 38, 10, 8],
      [38, 44, 12, 8], [44, 50, 14, 9], [50, 58, 16, 10], [58, 65, 18, 11], [65, 75, 20, 12],
    ]; // prettier-ignore
    for (const [over, upTo, b, h] of open) {
      const row = PARALLEL_METRIC.find((r) => r.over === over && r.upTo === upTo);
      expect(row, `${over}-${upTo}`).toMatchObject({ b, h });
    }
    expect(parallelKeys(25, "mm").metric?.label).toBe("Parallel key DIN 6885 A 8 × 7");
    expect(() => parallelKeys(3, "mm")).toThrow(StandardsInputError);
  });

  it("reads a key back from its designation", () => {
    expect(readKeyDesignation("Woodruff key No. 606 (3/16 × 3/4 in), ASME B17.2")).toEqual({
      widthMm: 4.7625,
      heightMm: 7.9502,
      diameterMm: 19.05,
    });
    expect(readKeyDesignation("Parallel key 6 × 6 × 25 mm, DIN 6885 A")).toMatchObject({ widthMm: 6, heightMm: 6 });
    expect(readKeyDesignation("Square key 3/8 × 3/8 in")).toMatchObject({ widthMm: 9.525, heightMm: 9.525 });
  });
});

describe("taper pins", () => {
  it("decodes every ASME B18.8.2 number, and computes the small end at 1/4 in per foot", () => {
    // ASME B18.8.2 (from memory; no open table found): No. 4 has a 0.250 in large end.
    expect(decodeTaperPin("No. 4")).toMatchObject({ largeEnd: 0.25, system: "inch" });
    // Taper 1/4 in per foot on the diameter: over 2 in the diameter falls by 2/48 in, 0.25 − 0.0417 = 0.2083.
    expect(decodeTaperPin("#4", 2 * IN).smallEnd).toBeCloseTo(0.2083, 4);
    for (const [n, large] of TAPER_PINS_INCH) expect(decodeTaperPin(n).largeEnd).toBe(large);
    // Each number is larger than the last (the numbering is monotone).
    const larges = TAPER_PINS_INCH.map(([, l]) => l);
    expect([...larges].sort((a, b) => a - b)).toEqual(larges);
  });

  it("decodes ISO 2339 pins by the small end, the large end at 1:50", () => {
    // ISO 2339: taper 1:50; an 8 mm pin 40 mm long has a large end of 8 + 40/50 = 8.8 mm (geometry).
    expect(decodeTaperPin("ISO 2339 8 x 40")).toMatchObject({ smallEnd: 8, largeEnd: 8.8, system: "metric" });
    expect(() => decodeTaperPin("ISO 2339 7")).toThrow(StandardsInputError);
    expect(() => decodeTaperPin("No. 11")).toThrow(StandardsInputError);
  });

  it("matches a measured large end, each inch number finding itself first (property)", () => {
    for (const [n, large] of TAPER_PINS_INCH) {
      const [best] = matchTaperPin({ largeEndMm: large * IN - 0.02, unit: "in" });
      expect(best?.number, n).toBe(`No. ${n}`);
    }
    // Each ISO 2339 pin, 40 mm long, read at its large end a little small (d + 40/50 − 0.02), finds itself first.
    for (const d of TAPER_PINS_METRIC.filter((x) => x >= 2)) {
      const [best] = matchTaperPin({ largeEndMm: d + 0.8 - 0.02, lengthMm: 40, unit: "mm" });
      expect(best?.number, `${d}`).toBe(`ISO 2339 ${d}`);
    }
  });
});
