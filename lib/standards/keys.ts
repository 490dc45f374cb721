import { StandardsInputError } from "@/lib/standards/errors";
import { byScore, scoreDimensions, type Deviation } from "@/lib/standards/match";
import { inchLabel, MM_PER_INCH, round, type LengthUnit } from "@/lib/standards/units";

/**
 * Keys: Woodruff keys by their ASME B17.2 number or their DIN 6888 size, and the parallel key for a shaft by ASME
 * B17.1 and DIN 6885-1.
 */

export const WOODRUFF_INCH_SOURCE = "ASME B17.2, Woodruff keys: key numbers and key heights";
export const WOODRUFF_METRIC_SOURCE = "DIN 6888, Woodruff keys: width × height and seat diameter";
export const PARALLEL_INCH_SOURCE = "ASME B17.1, keys and keyseats: key size for the shaft diameter";
export const PARALLEL_METRIC_SOURCE = "DIN 6885-1, parallel keys: key size for the shaft diameter";

/**
 * The height of an inch Woodruff key by its nominal diameter in eighths of an inch: a key of one diameter has one
 * height whatever its width. ASME B17.2 (maximum key height).
 */
export const WOODRUFF_HEIGHTS: Record<number, number> = {
  2: 0.109,
  2.5: 0.14,
  3: 0.172,
  4: 0.203,
  5: 0.25,
  6: 0.313,
  7: 0.375,
  8: 0.438,
  9: 0.484,
  10: 0.547,
  11: 0.594,
  12: 0.641,
};

/** The inch key numbers made: ASME B17.2. */
export const WOODRUFF_NUMBERS = [
  "202", "202.5", "302.5", "203", "303", "403", "204", "304", "404", "305", "405", "505", "605", "406", "506", "606",
  "806", "507", "607", "707", "807", "608", "708", "808", "1008", "1208", "609", "709", "809", "1009", "610", "710",
  "810", "1010", "1210", "811", "1011", "1211", "812", "1012", "1212",
]; // prettier-ignore

/** DIN 6888 Woodruff keys: width b × height h, and the seat (key) diameter d2, in millimetres. */
export const WOODRUFF_METRIC: Array<[number, number, number]> = [
  [1, 1.4, 4], [1.5, 2.6, 7], [2, 2.6, 7], [2, 3.7, 10], [2.5, 3.7, 10], [3, 3.7, 10], [3, 5, 13], [3, 6.5, 16],
  [4, 5, 13], [4, 6.5, 16], [4, 7.5, 19], [5, 6.5, 16], [5, 7.5, 19], [5, 9, 22], [6, 7.5, 19], [6, 9, 22],
  [6, 10, 25], [6, 11, 28], [8, 11, 28], [8, 13, 32], [10, 13, 32], [10, 16, 45],
]; // prettier-ignore

export interface WoodruffKey {
  /** `606`, or `6 × 9` for DIN 6888. */
  number: string;
  system: "inch" | "metric";
  width: number;
  diameter: number;
  height: number;
  unit: LengthUnit;
  /** `No. 606 (3/16 × 3/4 in)`, `DIN 6888 6 × 9`: what to ask for, and the standard part's designation. */
  label: string;
  source: string;
}

function inchKey(number: string): WoodruffKey {
  const [digits] = number.split(".");
  const half = number.endsWith(".5");
  const widthCode = Number(digits.slice(0, -2));
  const diameterCode = Number(digits.slice(-2)) + (half ? 0.5 : 0);
  const height = WOODRUFF_HEIGHTS[diameterCode];
  if (!widthCode || height === undefined)
    throw new StandardsInputError(`No. ${number} is not an ASME B17.2 Woodruff key number.`);
  const width = widthCode / 32;
  const diameter = diameterCode / 8;
  return {
    number,
    system: "inch",
    width,
    diameter,
    height,
    unit: "in",
    label: `Woodruff key No. ${number} (${inchLabel(width).replace(/ in$/, "")} × ${inchLabel(diameter)})`,
    source: WOODRUFF_INCH_SOURCE,
  };
}

function metricKey([b, h, d]: [number, number, number]): WoodruffKey {
  return {
    number: `${b} × ${h}`,
    system: "metric",
    width: b,
    diameter: d,
    height: h,
    unit: "mm",
    label: `Woodruff key DIN 6888 ${b} × ${h}`,
    source: WOODRUFF_METRIC_SOURCE,
  };
}

/**
 * A Woodruff key from its number: `606`, `No. 1212`, `#404`, `302.5` (ASME B17.2: the last two digits are the
 * diameter in eighths of an inch, the digits before them the width in thirty-seconds), or `6 x 9` / `DIN 6888 6×9`.
 */
export function decodeWoodruff(text: string): WoodruffKey {
  const cleaned = text.trim().replace(/^(woodruff\s+key\s*)?/i, "");
  const metric = /^(?:DIN\s*6888\s*)?(\d+(?:[.,]\d+)?)\s*[x×*]\s*(\d+(?:[.,]\d+)?)(?:\s*mm)?$/i.exec(cleaned);
  if (metric) {
    const [b, h] = [Number(metric[1].replace(",", ".")), Number(metric[2].replace(",", "."))];
    const row = WOODRUFF_METRIC.find(([x, y]) => x === b && y === h);
    if (!row) throw new StandardsInputError(`${b} × ${h} is not a DIN 6888 Woodruff key size.`);
    return metricKey(row);
  }
  const inch = /^(?:no\.?\s*|#\s*)?(\d{3,4}(?:\.5)?)$/i.exec(cleaned);
  if (!inch)
    throw new StandardsInputError(
      `"${text.trim()}" is not a Woodruff key number. Write it like 606, No. 1212 or, for DIN 6888, 6 × 9.`,
    );
  if (!WOODRUFF_NUMBERS.includes(inch[1])) {
    const decoded = inchKey(inch[1]);
    throw new StandardsInputError(
      `No. ${inch[1]} would be ${decoded.label.replace(/^Woodruff key No\. \S+ /, "")}, but ASME B17.2 lists no such key.`,
    );
  }
  return inchKey(inch[1]);
}

/** Every Woodruff key of both standards. */
export const ALL_WOODRUFF: WoodruffKey[] = [...WOODRUFF_NUMBERS.map(inchKey), ...WOODRUFF_METRIC.map(metricKey)];

export interface WoodruffCandidate extends WoodruffKey {
  score: number;
  deviations: Deviation[];
  warnings: string[];
}

/**
 * Woodruff keys near a measured one, best first. A worn key reads a little narrow and low; the diameter of the round
 * side is hard to read, so it counts for less. Common practice (no published source) for the tolerances.
 */
export function matchWoodruff(input: {
  widthMm: number;
  diameterMm: number;
  heightMm?: number;
  unit: LengthUnit;
}): WoodruffCandidate[] {
  const measured = [
    { name: "width", label: "width", measuredMm: input.widthMm, toleranceMm: 0.08, surface: "shaft" as const },
    { name: "diameter", label: "diameter", measuredMm: input.diameterMm, toleranceMm: 0.8 },
    ...(input.heightMm !== undefined
      ? [{ name: "height", label: "height", measuredMm: input.heightMm, toleranceMm: 0.25, surface: "shaft" as const }]
      : []),
  ];
  const mm = (k: WoodruffKey, v: number) => (k.unit === "in" ? v * MM_PER_INCH : v);
  return ALL_WOODRUFF.flatMap((k) => {
    const scored = scoreDimensions(
      measured,
      { width: mm(k, k.width), diameter: mm(k, k.diameter), height: mm(k, k.height) },
      input.unit,
    );
    if (!scored) return [];
    const system = input.unit === "in" ? "inch" : "metric";
    const score = round(scored.score * (k.system === system ? 1 : 0.95), 3);
    return [{ ...k, score, deviations: scored.deviations, warnings: [] }];
  })
    .sort(byScore)
    .slice(0, 6);
}

/** ASME B17.1: the key width for shaft diameters over `over` up to and including `upTo`, all in inches. */
export const PARALLEL_INCH: Array<{ over: number; upTo: number; width: number; rectangularHeight: number }> = [
  { over: 5 / 16, upTo: 7 / 16, width: 3 / 32, rectangularHeight: 3 / 32 },
  { over: 7 / 16, upTo: 9 / 16, width: 1 / 8, rectangularHeight: 3 / 32 },
  { over: 9 / 16, upTo: 7 / 8, width: 3 / 16, rectangularHeight: 1 / 8 },
  { over: 7 / 8, upTo: 1.25, width: 1 / 4, rectangularHeight: 3 / 16 },
  { over: 1.25, upTo: 1.375, width: 5 / 16, rectangularHeight: 1 / 4 },
  { over: 1.375, upTo: 1.75, width: 3 / 8, rectangularHeight: 1 / 4 },
  { over: 1.75, upTo: 2.25, width: 1 / 2, rectangularHeight: 3 / 8 },
  { over: 2.25, upTo: 2.75, width: 5 / 8, rectangularHeight: 7 / 16 },
  { over: 2.75, upTo: 3.25, width: 3 / 4, rectangularHeight: 1 / 2 },
  { over: 3.25, upTo: 3.75, width: 7 / 8, rectangularHeight: 5 / 8 },
  { over: 3.75, upTo: 4.5, width: 1, rectangularHeight: 3 / 4 },
  { over: 4.5, upTo: 5.5, width: 1.25, rectangularHeight: 7 / 8 },
  { over: 5.5, upTo: 6.5, width: 1.5, rectangularHeight: 1 },
];

/** DIN 6885-1: key width b × height h for shaft diameters over `over` up to and including `upTo`, in millimetres. */
export const PARALLEL_METRIC: Array<{ over: number; upTo: number; b: number; h: number }> = [
  { over: 6, upTo: 8, b: 2, h: 2 },
  { over: 8, upTo: 10, b: 3, h: 3 },
  { over: 10, upTo: 12, b: 4, h: 4 },
  { over: 12, upTo: 17, b: 5, h: 5 },
  { over: 17, upTo: 22, b: 6, h: 6 },
  { over: 22, upTo: 30, b: 8, h: 7 },
  { over: 30, upTo: 38, b: 10, h: 8 },
  { over: 38, upTo: 44, b: 12, h: 8 },
  { over: 44, upTo: 50, b: 14, h: 9 },
  { over: 50, upTo: 58, b: 16, h: 10 },
  { over: 58, upTo: 65, b: 18, h: 11 },
  { over: 65, upTo: 75, b: 20, h: 12 },
  { over: 75, upTo: 85, b: 22, h: 14 },
  { over: 85, upTo: 95, b: 25, h: 14 },
  { over: 95, upTo: 110, b: 28, h: 16 },
];

export interface ParallelKeys {
  unit: LengthUnit;
  inch: { label: string; width: number; height: number; rectangular: string; source: string } | null;
  metric: { label: string; width: number; height: number; source: string } | null;
  notes: string[];
}

/**
 * The parallel key for a shaft in both systems; the key of the system measured in is the one to ask for. A worn
 * keyway is measured for width before a key is bought: a key a size up, or a stepped key, is the usual repair.
 */
export function parallelKeys(shaftMm: number, unit: LengthUnit): ParallelKeys {
  const inches = shaftMm / MM_PER_INCH;
  const i = PARALLEL_INCH.find((r) => inches > r.over - 0.002 && inches <= r.upTo + 0.002);
  const m = PARALLEL_METRIC.find((r) => shaftMm > r.over - 0.05 && shaftMm <= r.upTo + 0.05);
  if (!i && !m)
    throw new StandardsInputError("Parallel keys are tabulated for shafts from 6 mm (5/16 in) to 110 mm (6-1/2 in).");
  const w = i ? inchLabel(i.width).replace(/ in$/, "") : "";
  return {
    unit,
    inch: i
      ? {
          label: `Square key ${w} × ${w} in`,
          width: i.width,
          height: i.width,
          rectangular: `Rectangular key ${w} × ${inchLabel(i.rectangularHeight)}`,
          source: PARALLEL_INCH_SOURCE,
        }
      : null,
    metric: m
      ? { label: `Parallel key DIN 6885 A ${m.b} × ${m.h}`, width: m.b, height: m.h, source: PARALLEL_METRIC_SOURCE }
      : null,
    notes: [
      "Measure the keyway's width, not only the shaft: a keyway hammered wide wants a stepped key or a key a size up.",
      "Cut the key to the hub's length, less a little; dress its ends round if the keyway's ends are round.",
    ],
  };
}

/** A key's standard designation read back: a Woodruff number or DIN 6888 size, or a parallel key `b × h`. */
export function readKeyDesignation(
  text: string,
): { widthMm: number; heightMm: number; diameterMm: number | null } | null {
  const woodruff = /woodruff|^(no\.?\s*|#)?\d{3,4}(\.5)?\b/i.test(text);
  if (woodruff) {
    const number = /(?:no\.?\s*|#\s*)?(\d{3,4}(?:\.5)?)\b/i.exec(text);
    const metric = /(\d+(?:[.,]\d+)?)\s*[x×]\s*(\d+(?:[.,]\d+)?)/.exec(text);
    try {
      const key =
        /DIN\s*6888/i.test(text) && metric
          ? decodeWoodruff(`${metric[1]} x ${metric[2]}`)
          : decodeWoodruff(number?.[1] ?? "");
      const mm = (v: number) => round(key.unit === "in" ? v * MM_PER_INCH : v, 4);
      return { widthMm: mm(key.width), heightMm: mm(key.height), diameterMm: mm(key.diameter) };
    } catch {
      return null;
    }
  }
  const parallel = /(\d+(?:[./]\d+)?)\s*[x×]\s*(\d+(?:[./]\d+)?)(?:\s*[x×]\s*\d+(?:[.]\d+)?)?\s*(mm|in)?/i.exec(text);
  if (!parallel) return null;
  const inch = parallel[3]?.toLowerCase() === "in" || parallel[1].includes("/");
  const value = (v: string) => (v.includes("/") ? Number(v.split("/")[0]) / Number(v.split("/")[1]) : Number(v));
  const scale = inch ? MM_PER_INCH : 1;
  return {
    widthMm: round(value(parallel[1]) * scale, 4),
    heightMm: round(value(parallel[2]) * scale, 4),
    diameterMm: null,
  };
}
