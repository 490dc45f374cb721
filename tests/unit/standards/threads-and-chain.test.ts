import { describe, expect, it } from "vitest";
import {
  ALL_THREADS,
  BSP,
  identifyThread,
  METRIC,
  NPT,
  pitchFrom,
  readThreadDesignation,
  UNIFIED,
  WHITWORTH,
} from "@/lib/standards/threads";
import {
  ALL_CHAINS,
  ANSI_CHAIN,
  chainLinks,
  decodeChain,
  identifyChain,
  readChainDesignation,
} from "@/lib/standards/chain";
import { StandardsInputError } from "@/lib/standards/errors";

const IN = 25.4; // NIST SP 811: 1 in = 25.4 mm exactly

describe("thread tables, row by row against open tables", () => {
  it("Unified: every size's UNC and UNF threads per inch", () => {
    // BelfrySCAD/BOSL2, screws.scad, UTS_thread table (coarse, fine): the same tpi for every size we list.
    const bosl2: Record<string, [number | null, number | null]> = {
      "#0": [null, 80], "#1": [64, 72], "#2": [56, 64], "#3": [48, 56], "#4": [40, 48], "#5": [40, 44],
      "#6": [32, 40], "#8": [32, 36], "#10": [24, 32], "#12": [24, 28], "1/4": [20, 28], "5/16": [18, 24],
      "3/8": [16, 24], "7/16": [14, 20], "1/2": [13, 20], "9/16": [12, 18], "5/8": [11, 18], "3/4": [10, 16],
      "7/8": [9, 14], "1": [8, 12], "1-1/8": [7, 12], "1-1/4": [7, 12], "1-3/8": [6, 12], "1-1/2": [6, 12],
      "1-3/4": [5, null], "2": [4.5, null],
    }; // prettier-ignore
    expect(UNIFIED).toHaveLength(Object.keys(bosl2).length);
    for (const [size, , unc, unf] of UNIFIED) expect([unc, unf], size).toEqual(bosl2[size]);
    // ASME B1.1: a numbered size is 0.060 + 0.013 × N in: #10 is 0.190 in.
    expect(UNIFIED.find(([s]) => s === "#10")?.[1]).toBeCloseTo(0.19, 9);
  });

  it("ISO metric: coarse and fine pitches of every size", () => {
    // BelfrySCAD/BOSL2, screws.scad, ISO_thread table: coarse pitch and the fine pitches (columns fine, extra fine,
    // super fine) that we list for each size.
    const bosl2: Record<number, number[]> = {
      2: [0.4, 0.25], 2.5: [0.45, 0.35], 3: [0.5, 0.35], 4: [0.7, 0.5], 5: [0.8, 0.5], 6: [1, 0.75],
      8: [1.25, 1, 0.75], 10: [1.5, 1.25, 1, 0.75], 12: [1.75, 1.5, 1.25, 1], 14: [2, 1.5, 1.25, 1], 16: [2, 1.5, 1],
      18: [2.5, 2, 1.5, 1], 20: [2.5, 2, 1.5, 1], 22: [2.5, 2, 1.5, 1], 24: [3, 2, 1.5, 1], 27: [3, 2, 1.5, 1],
      30: [3.5, 3, 2, 1.5], 33: [3.5, 3, 2, 1.5], 36: [4, 3, 2, 1.5], 39: [4, 3, 2, 1.5], 42: [4.5, 4, 3, 2],
      45: [4.5, 4, 3, 2], 48: [5, 4, 3, 2], 52: [5, 4, 3, 2], 56: [5.5, 4, 3, 2], 60: [5.5, 4, 3, 2],
      64: [6, 4, 3, 2],
    }; // prettier-ignore
    expect(METRIC).toHaveLength(Object.keys(bosl2).length);
    for (const [d, coarse, fine] of METRIC) expect([coarse, ...fine], `M${d}`).toEqual(bosl2[d]);
  });

  it("Whitworth: BSW and BSF threads per inch", () => {
    // Two open thread tables found by code search (a C# add-in and a Swift app; the search does not name their
    // repositories): BSW 1/8-40 … 1-8, BSF 3/16-32 … 5/8-14, as pitches in millimetres.
    const bsw: Record<string, number> = {
      "1/8": 40, "3/16": 24, "1/4": 20, "5/16": 18, "3/8": 16, "7/16": 14, "1/2": 12, "5/8": 11, "3/4": 10, "1": 8,
    }; // prettier-ignore
    const bsf: Record<string, number> = {
      "3/16": 32,
      "1/4": 26,
      "5/16": 22,
      "3/8": 20,
      "7/16": 18,
      "1/2": 16,
      "5/8": 14,
    };
    for (const [size, tpi] of Object.entries(bsw))
      expect(WHITWORTH.find(([s]) => s === size)?.[1], `${size} BSW`).toBe(tpi);
    for (const [size, tpi] of Object.entries(bsf))
      expect(WHITWORTH.find(([s]) => s === size)?.[2], `${size} BSF`).toBe(tpi);
  });

  it("pipe threads: NPT outside diameters and BSP major diameters with their threads per inch", () => {
    // BelfrySCAD/BOSL2, threading.scad: npt_threaded_rod info_table (OD to 0.004 in of the pipe's, TPI) and
    // bspp_dimensions (TPI, OD in inches).
    const nptOpen: Record<string, [number, number]> = {
      "1/16": [0.308, 27], "1/8": [0.401, 27], "1/4": [0.533, 18], "3/8": [0.668, 18], "1/2": [0.832, 14],
      "3/4": [1.043, 14], "1": [1.305, 11.5], "1-1/4": [1.649, 11.5], "1-1/2": [1.888, 11.5], "2": [2.362, 11.5],
    }; // prettier-ignore
    for (const [size, od, tpi] of NPT) {
      const [openOd, openTpi] = nptOpen[size];
      expect(tpi, size).toBe(openTpi);
      // BOSL2 gives the thread's diameter at the gauge plane, a little under the pipe's outside diameter.
      expect(od - openOd, size).toBeGreaterThanOrEqual(0);
      expect(od - openOd, size).toBeLessThan(0.015);
    }
    const bspOpen: Record<string, [number, number]> = {
      "1/16": [28, 0.3041], "1/8": [28, 0.383], "1/4": [19, 0.518], "3/8": [19, 0.656], "1/2": [14, 0.825],
      "5/8": [14, 0.902], "3/4": [14, 1.041], "7/8": [14, 1.189], "1": [11, 1.309], "1-1/4": [11, 1.65],
      "1-1/2": [11, 1.882], "2": [11, 2.347],
    }; // prettier-ignore
    for (const [size, major, tpi] of BSP) {
      expect(tpi, size).toBe(bspOpen[size][0]);
      expect(major / IN, size).toBeCloseTo(bspOpen[size][1], 2);
    }
  });
});

describe("identifying a thread", () => {
  it("finds every thread first from its own diameter, worn a little, and its gauge reading (property)", () => {
    for (const t of ALL_THREADS) {
      const found = identifyThread({ diameterMm: t.majorMm - 0.06, pitchMm: t.pitchMm, unit: t.tpi ? "in" : "mm" });
      // A 14 mm spark plug thread is the M14 × 1.25 fine thread: either name is the right answer.
      const same = ALL_THREADS.filter((o) => o.majorMm === t.majorMm && o.pitchMm === t.pitchMm).map(
        (o) => o.designation,
      );
      if (same.includes(found[0]?.designation)) continue;
      // Three pairs cannot be told apart by rule and gauge (#10-24 UNC and 3/16 BSW, #10-32 UNF and 3/16 BSF,
      // #12-28 UNF and 7/32 BSF): the thread is then second, and the first names it in a warning.
      expect(found[1]?.designation, t.designation).toBe(t.designation);
      expect(found[0].warnings.join(" "), t.designation).toContain(t.designation.split(" ")[0].split("-")[0]);
    }
  });

  it("tells 1/4-28 UNF from M6 × 1, and warns about the pair", () => {
    const unf = identifyThread({ diameterMm: 0.247 * IN, pitchMm: pitchFrom({ tpi: 28 }), unit: "in" });
    expect(unf[0].designation).toBe("1/4-28 UNF");
    expect(unf[0].warnings.join(" ")).toMatch(/M6 × 1/);
    expect(unf[0].greaseFitting).toBe("1/4-28 taper (SAE-LT)");
    const m6 = identifyThread({ diameterMm: 5.95, pitchMm: 1, unit: "mm" });
    expect(m6[0].designation).toBe("M6 × 1");
  });

  it("separates 1/2 BSW from 1/2 UNC by the count, and names the 55° form", () => {
    const bsw = identifyThread({ diameterMm: 12.6, pitchMm: pitchFrom({ tpi: 12 }), unit: "in" });
    expect(bsw[0]).toMatchObject({ designation: "1/2 BSW (12 tpi)", angle: 55 });
    expect(bsw[0].warnings.join(" ")).toMatch(/12 threads per inch, 1\/2 UNC 13/);
    const unc = identifyThread({ diameterMm: 12.6, pitchMm: pitchFrom({ tpi: 13 }), unit: "in" });
    expect(unc[0].designation).toBe("1/2-13 UNC");
  });

  it("names pipe threads by the pipe size, with the NPT and BSP look-alike", () => {
    // ASME B1.20.1: 1/2 NPT is on 0.840 in pipe with 14 tpi.
    const npt = identifyThread({ diameterMm: 0.835 * IN, pitchMm: pitchFrom({ tpi: 14 }), unit: "in" });
    expect(npt.map((c) => c.designation)).toContain("1/2-14 NPT");
    expect(npt.find((c) => c.designation === "1/2-14 NPT")?.warnings.join(" ")).toMatch(/BSP/);
  });

  it("identifies a 14 mm spark plug thread", () => {
    const plug = identifyThread({ diameterMm: 13.9, pitchMm: 1.25, unit: "mm" });
    expect(plug.map((c) => c.designation)).toEqual(expect.arrayContaining(["M14 × 1.25", "M14 × 1.25 spark plug"]));
  });

  it("refuses readings no thread has, and reads designations back", () => {
    expect(() => identifyThread({ diameterMm: 0.5, pitchMm: 0.2, unit: "mm" })).toThrow(StandardsInputError);
    expect(() => pitchFrom({ tpi: 2 })).toThrow(StandardsInputError);
    expect(readThreadDesignation("1/4-20 UNC")).toMatchObject({ series: "UNC", tpi: 20 });
    expect(readThreadDesignation("m8 x 1.25")).toMatchObject({ series: "M", majorMm: 8 });
    expect(readThreadDesignation("1/2 BSW")).toMatchObject({ series: "BSW", tpi: 12 });
    expect(readThreadDesignation("lefty")).toBeNull();
  });
});

describe("roller chain", () => {
  it("decodes every ANSI number by its rule: pitch in eighths from the leading digits (exhaustive)", () => {
    // ASME B29.1: the digits before the last give the pitch in eighths of an inch.
    for (const [n, pitch] of ANSI_CHAIN) expect(pitch, n).toBe(Number(n.slice(0, -1)) / 8);
    // ISO 606 B: the two digits give the pitch in sixteenths of an inch; 05B, an 8 mm chain, is the one exception.
    for (const c of ALL_CHAINS.filter((x) => x.system === "iso" && x.number !== "05B-1"))
      expect(c.pitch, c.number).toBeCloseTo((Number(c.number.slice(0, 2)) / 16) * IN, 2);
    expect(decodeChain("#40")).toMatchObject({ number: "40-1", pitch: 0.5, rollerDiameter: 0.312, unit: "in" });
    expect(decodeChain("ANSI 60-2")).toMatchObject({ strands: 2, pitch: 0.75 });
    expect(decodeChain("08B-1")).toMatchObject({ pitch: 12.7, rollerDiameter: 8.51, unit: "mm" });
    expect(() => decodeChain("45")).toThrow(/no chain 45/);
    expect(() => decodeChain("07B")).toThrow(StandardsInputError);
  });

  it("agrees with an open ANSI chain table row by row", () => {
    // Chain_ANSI.scad (Edward B. Horch, 2025, GPL-3.0), ANSI_SIZES: pitch, roller width, roller OD in inches; found
    // by code search, which does not name its repository.
    const open: Record<string, [number, number, number]> = {
      "25": [0.25, 0.125, 0.13], "35": [0.375, 0.188, 0.2], "40": [0.5, 0.312, 0.312], "41": [0.5, 0.25, 0.306],
      "50": [0.625, 0.375, 0.4], "60": [0.75, 0.5, 0.469], "80": [1, 0.625, 0.625], "100": [1.25, 0.75, 0.75],
      "120": [1.5, 1, 0.875], "140": [1.75, 1, 1], "160": [2, 1.25, 1.125],
    }; // prettier-ignore
    for (const [n, pitch, roller, width] of ANSI_CHAIN) expect([pitch, width, roller], n).toEqual(open[n]);
  });

  it("identifies every chain first from its own pitch and roller, a little worn (property)", () => {
    for (const c of ALL_CHAINS) {
      const mm = (v: number) => (c.unit === "in" ? v * IN : v);
      const [best] = identifyChain({
        pitchMm: mm(c.pitch) + 0.05,
        rollerMm: mm(c.rollerDiameter) - 0.03,
        innerWidthMm: mm(c.innerWidth),
        unit: c.unit,
      });
      expect(best?.number, c.number).toBe(c.number);
    }
  });

  it("counts links for two sprockets and a centre distance, and the centre distance they give", () => {
    // Machinery's Handbook, roller chain length in pitches L = 2C + (N + n)/2 + (N − n)²/(4π²C), C in pitches (from
    // memory): No. 40 chain, 15 and 30 teeth, 20 in centres: C = 40 pitches, L = 80 + 22.5 + 225/(4π² × 40) = 102.64.
    const r = chainLinks({ pitch: 0.5, teeth1: 15, teeth2: 30, center: 20, unit: "in" });
    expect(r.exact).toBeCloseTo(102.64, 2);
    expect(r.links).toBe(104);
    // Solving the same formula for 104 links gives the centre distance they make, a little over 20 in.
    expect(r.center).toBeGreaterThan(20);
    const again = chainLinks({ pitch: 0.5, teeth1: 15, teeth2: 30, center: r.center, unit: "in" });
    expect(again.exact).toBeCloseTo(104, 2);
    expect(() => chainLinks({ pitch: 0.5, teeth1: 15, teeth2: 30, center: 1, unit: "in" })).toThrow(
      StandardsInputError,
    );
    expect(readChainDesignation("Roller chain ANSI 40-1 (1/2 in pitch)")?.number).toBe("40-1");
  });
});
