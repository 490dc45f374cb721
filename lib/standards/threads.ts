import { StandardsInputError } from "@/lib/standards/errors";
import { byScore, scoreDimensions, type Deviation } from "@/lib/standards/match";
import { MM_PER_INCH, round, type LengthUnit } from "@/lib/standards/units";

/**
 * Screw threads identified from a measured major diameter and a thread-gauge reading (threads per inch or pitch):
 * Unified, ISO metric, British Whitworth and Fine, pipe threads (NPT, BSP) and spark plug threads.
 */

export type ThreadSeries = "UNC" | "UNF" | "M" | "MF" | "BSW" | "BSF" | "NPT" | "BSP" | "SPARK";

export const SERIES: Record<ThreadSeries, { name: string; angle: 55 | 60; source: string; taper?: string }> = {
  UNC: { name: "Unified coarse", angle: 60, source: "ASME B1.1, Unified inch screw threads, UNC series" },
  UNF: { name: "Unified fine", angle: 60, source: "ASME B1.1, Unified inch screw threads, UNF series" },
  M: { name: "ISO metric coarse", angle: 60, source: "ISO 261, ISO general purpose metric threads, coarse pitch" },
  MF: { name: "ISO metric fine", angle: 60, source: "ISO 261, ISO general purpose metric threads, fine pitches" },
  BSW: { name: "British Standard Whitworth", angle: 55, source: "BS 84, Whitworth form threads, BSW series" },
  BSF: { name: "British Standard Fine", angle: 55, source: "BS 84, Whitworth form threads, BSF series" },
  NPT: {
    name: "American pipe thread, taper",
    angle: 60,
    source: "ASME B1.20.1, NPT: pipe outside diameter and threads per inch",
    taper: "1 in 16 on the diameter",
  },
  BSP: {
    name: "British pipe thread",
    angle: 55,
    source: "ISO 228-1 (G, parallel) and ISO 7-1 (R, taper): major diameter and threads per inch",
  },
  SPARK: {
    name: "Spark plug thread",
    angle: 60,
    source: "ISO 28741 (metric) and SAE J548 (7/8-18), spark plug threads",
  },
};

export interface ThreadSpec {
  designation: string;
  series: ThreadSeries;
  majorMm: number;
  pitchMm: number;
  /** Threads per inch for inch threads; null for metric ones. */
  tpi: number | null;
}

const IN = MM_PER_INCH;
const num = (n: number) => 0.06 + 0.013 * n; // ASME B1.1: a numbered size's major diameter, 0.060 + 0.013 × N in

/** Unified sizes: [size label, major diameter in inches, UNC tpi, UNF tpi]. ASME B1.1. */
export const UNIFIED: Array<[string, number, number | null, number | null]> = [
  ["#0", num(0), null, 80], ["#1", num(1), 64, 72], ["#2", num(2), 56, 64], ["#3", num(3), 48, 56],
  ["#4", num(4), 40, 48], ["#5", num(5), 40, 44], ["#6", num(6), 32, 40], ["#8", num(8), 32, 36],
  ["#10", num(10), 24, 32], ["#12", num(12), 24, 28], ["1/4", 0.25, 20, 28], ["5/16", 0.3125, 18, 24],
  ["3/8", 0.375, 16, 24], ["7/16", 0.4375, 14, 20], ["1/2", 0.5, 13, 20], ["9/16", 0.5625, 12, 18],
  ["5/8", 0.625, 11, 18], ["3/4", 0.75, 10, 16], ["7/8", 0.875, 9, 14], ["1", 1, 8, 12], ["1-1/8", 1.125, 7, 12],
  ["1-1/4", 1.25, 7, 12], ["1-3/8", 1.375, 6, 12], ["1-1/2", 1.5, 6, 12], ["1-3/4", 1.75, 5, null],
  ["2", 2, 4.5, null],
]; // prettier-ignore

/** ISO metric sizes: [major diameter, coarse pitch, fine pitches]. ISO 261 (the first-choice fine pitches). */
export const METRIC: Array<[number, number, number[]]> = [
  [2, 0.4, [0.25]], [2.5, 0.45, [0.35]], [3, 0.5, [0.35]], [4, 0.7, [0.5]], [5, 0.8, [0.5]], [6, 1, [0.75]],
  [8, 1.25, [1, 0.75]], [10, 1.5, [1.25, 1, 0.75]], [12, 1.75, [1.5, 1.25, 1]], [14, 2, [1.5, 1.25, 1]],
  [16, 2, [1.5, 1]], [18, 2.5, [2, 1.5, 1]], [20, 2.5, [2, 1.5, 1]], [22, 2.5, [2, 1.5, 1]], [24, 3, [2, 1.5, 1]],
  [27, 3, [2, 1.5, 1]], [30, 3.5, [3, 2, 1.5]], [33, 3.5, [3, 2, 1.5]], [36, 4, [3, 2, 1.5]], [39, 4, [3, 2, 1.5]],
  [42, 4.5, [4, 3, 2]], [45, 4.5, [4, 3, 2]], [48, 5, [4, 3, 2]], [52, 5, [4, 3, 2]], [56, 5.5, [4, 3, 2]],
  [60, 5.5, [4, 3, 2]], [64, 6, [4, 3, 2]],
]; // prettier-ignore

/** Whitworth form sizes: [size, BSW tpi, BSF tpi]. BS 84. */
export const WHITWORTH: Array<[string, number | null, number | null]> = [
  ["1/8", 40, null], ["3/16", 24, 32], ["7/32", null, 28], ["1/4", 20, 26], ["9/32", null, 26], ["5/16", 18, 22],
  ["3/8", 16, 20], ["7/16", 14, 18], ["1/2", 12, 16], ["9/16", 12, 16], ["5/8", 11, 14], ["11/16", null, 14],
  ["3/4", 10, 12], ["7/8", 9, 11], ["1", 8, 10], ["1-1/8", 7, 9], ["1-1/4", 7, 9], ["1-1/2", 6, 8], ["1-3/4", 5, 7],
  ["2", 4.5, 7],
]; // prettier-ignore

/** NPT: [pipe size, outside diameter of the pipe in inches, tpi]. ASME B1.20.1. */
export const NPT: Array<[string, number, number]> = [
  ["1/16", 0.3125, 27], ["1/8", 0.405, 27], ["1/4", 0.54, 18], ["3/8", 0.675, 18], ["1/2", 0.84, 14],
  ["3/4", 1.05, 14], ["1", 1.315, 11.5], ["1-1/4", 1.66, 11.5], ["1-1/2", 1.9, 11.5], ["2", 2.375, 11.5],
]; // prettier-ignore

/** BSP: [pipe size, major diameter in millimetres, tpi]. ISO 228-1 / ISO 7-1. */
export const BSP: Array<[string, number, number]> = [
  ["1/16", 7.723, 28], ["1/8", 9.728, 28], ["1/4", 13.157, 19], ["3/8", 16.662, 19], ["1/2", 20.955, 14],
  ["5/8", 22.911, 14], ["3/4", 26.441, 14], ["7/8", 30.201, 14], ["1", 33.249, 11], ["1-1/4", 41.91, 11],
  ["1-1/2", 47.803, 11], ["2", 59.614, 11],
]; // prettier-ignore

/** Spark plug threads: M10 × 1, M12 × 1.25, M14 × 1.25, M18 × 1.5 (ISO 28741) and 7/8-18 (SAE J548). */
export const SPARK: ThreadSpec[] = [
  { designation: "M10 × 1 spark plug", series: "SPARK", majorMm: 10, pitchMm: 1, tpi: null },
  { designation: "M12 × 1.25 spark plug", series: "SPARK", majorMm: 12, pitchMm: 1.25, tpi: null },
  { designation: "M14 × 1.25 spark plug", series: "SPARK", majorMm: 14, pitchMm: 1.25, tpi: null },
  { designation: "M18 × 1.5 spark plug", series: "SPARK", majorMm: 18, pitchMm: 1.5, tpi: null },
  { designation: "7/8-18 spark plug", series: "SPARK", majorMm: 0.875 * IN, pitchMm: IN / 18, tpi: 18 },
];

const inchSpec = (designation: string, series: ThreadSeries, majorIn: number, tpi: number): ThreadSpec => ({
  designation,
  series,
  majorMm: round(majorIn * IN, 4),
  pitchMm: round(IN / tpi, 4),
  tpi,
});
const metricSpec = (d: number, p: number, series: "M" | "MF"): ThreadSpec => ({
  designation: `M${d} × ${p}`,
  series,
  majorMm: d,
  pitchMm: p,
  tpi: null,
});
const fraction = (size: string) =>
  size.split("-").reduce((sum, part) => {
    const [a, b] = part.split("/").map(Number);
    return sum + (b ? a / b : a);
  }, 0);

/** Every thread the identifier knows. */
export const ALL_THREADS: ThreadSpec[] = [
  ...UNIFIED.flatMap(([size, d, unc, unf]) => [
    ...(unc ? [inchSpec(`${size}-${unc} UNC`, "UNC", d, unc)] : []),
    ...(unf ? [inchSpec(`${size}-${unf} UNF`, "UNF", d, unf)] : []),
  ]),
  ...METRIC.flatMap(([d, coarse, fine]) => [metricSpec(d, coarse, "M"), ...fine.map((p) => metricSpec(d, p, "MF"))]),
  ...WHITWORTH.flatMap(([size, bsw, bsf]) => [
    ...(bsw ? [inchSpec(`${size} BSW (${bsw} tpi)`, "BSW", fraction(size), bsw)] : []),
    ...(bsf ? [inchSpec(`${size} BSF (${bsf} tpi)`, "BSF", fraction(size), bsf)] : []),
  ]),
  ...NPT.map(([size, od, tpi]) => inchSpec(`${size}-${tpi} NPT`, "NPT", od, tpi)),
  ...BSP.map(([size, major, tpi]) => ({
    designation: `${size} BSP (G or R, ${tpi} tpi)`,
    series: "BSP" as const,
    majorMm: major,
    pitchMm: round(IN / tpi, 4),
    tpi,
  })),
  ...SPARK,
];

/**
 * Threads that are easy to mistake for each other with a rule and a gauge, and how to tell them apart. Each pair is
 * named by designations in ALL_THREADS. Common practice (no published source).
 */
export const LOOK_ALIKES: Array<{ pair: [string, string]; message: string }> = [
  {
    pair: ["1/4-28 UNF", "M6 × 1"],
    message:
      "1/4-28 UNF (6.35 mm, 0.907 mm pitch) and M6 × 1 look alike: a nut of one starts on the other and strips. " +
      "Check the pitch with a gauge over ten threads.",
  },
  {
    pair: ["1/2 BSW (12 tpi)", "1/2-13 UNC"],
    message:
      "1/2 BSW has 12 threads per inch, 1/2 UNC 13, and the Whitworth thread is 55° and rounded: count over a full " +
      "inch, one thread in twelve is easy to miss.",
  },
  {
    pair: ["1/4 BSW (20 tpi)", "1/4-20 UNC"],
    message:
      "1/4 BSW and 1/4-20 UNC have the same 20 threads per inch but a 55° rounded form against a 60° flat one: a " +
      "nut of one runs on the other loosely and will strip under load. Look at the crests with a glass.",
  },
  {
    pair: ["5/16-18 UNC", "M8 × 1.25"],
    message: "5/16-18 UNC (7.94 mm, 1.41 mm pitch) and M8 × 1.25 are close: check the pitch with a gauge.",
  },
  {
    pair: ["1/2-14 NPT", "1/2 BSP (G or R, 14 tpi)"],
    message:
      "1/2 NPT and 1/2 BSP both have 14 threads per inch but different forms (60° and 55°): they seal badly on each " +
      "other. NPT is always tapered; BSP is parallel (G) or tapered (R).",
  },
  {
    pair: ["1/8-27 NPT", "1/8 BSP (G or R, 28 tpi)"],
    message: "1/8 NPT has 27 threads per inch, 1/8 BSP 28: they start on each other and then bind. Count carefully.",
  },
  {
    pair: ["3/8-24 UNF", "M10 × 1"],
    message: "3/8-24 UNF (9.53 mm, 1.06 mm pitch) and M10 × 1 are close: measure the diameter with a micrometer.",
  },
  {
    pair: ["#10-24 UNC", "3/16 BSW (24 tpi)"],
    message:
      "#10-24 UNC (0.190 in) and 3/16 BSW (0.1875 in) share 24 threads per inch and differ by less than calipers " +
      "read on a worn thread: the Whitworth thread is 55° and rounded. Try a known nut.",
  },
  {
    pair: ["#10-32 UNF", "3/16 BSF (32 tpi)"],
    message:
      "#10-32 UNF (0.190 in) and 3/16 BSF (0.1875 in) share 32 threads per inch: only the thread form tells them " +
      "apart. Try a known nut.",
  },
  {
    pair: ["#12-28 UNF", "7/32 BSF (28 tpi)"],
    message: "#12-28 UNF (0.216 in) and 7/32 BSF (0.219 in) share 28 threads per inch: try a known nut.",
  },
  {
    pair: ["M14 × 1.25", "M14 × 1.25 spark plug"],
    message: "A 14 mm spark plug thread is M14 × 1.25: the same as the fine metric bolt thread.",
  },
];

/** The threads grease fittings are made in, and the forms they come in. SAE J534 and DIN 71412. */
export const GREASE_FITTINGS = {
  threads: [
    { thread: "1/4-28 taper (SAE-LT)", matches: "1/4-28 UNF", note: "the usual inch fitting: a tapered 1/4-28 thread" },
    { thread: "1/8-27 NPT", matches: "1/8-27 NPT", note: "larger inch fitting, pipe thread" },
    { thread: "M6 × 1", matches: "M6 × 1", note: "metric fitting, DIN 71412" },
    { thread: "M8 × 1", matches: "M8 × 1", note: "metric fitting, DIN 71412" },
    { thread: "M10 × 1", matches: "M10 × 1", note: "metric fitting, DIN 71412" },
  ],
  angles: ["straight (DIN 71412 form A)", "45° (form B)", "90° (form C)"],
  source: "SAE J534, lubrication fittings; DIN 71412, hydraulic-type grease nipples",
  notes: [
    "Clean the old fitting's hole before fitting a new one, and check the grease reaches the bearing.",
    "Fit the same angle as the old one where a gun must reach it past a guard or a belt.",
  ],
};

export interface ThreadCandidate {
  designation: string;
  series: ThreadSeries;
  seriesName: string;
  angle: 55 | 60;
  taper: string | null;
  majorDiameter: number;
  pitch: number;
  tpi: number | null;
  score: number;
  deviations: Deviation[];
  warnings: string[];
  greaseFitting: string | null;
  source: string;
}

/**
 * Threads that fit a measured major diameter and pitch, best first. A bolt's crest reads a little under its nominal
 * and wears smaller; a pipe thread is measured somewhere on its taper. A thread gauge reads the pitch closely, so a
 * pitch more than a little off is not offered. Common practice (no published source) for the tolerances.
 */
export function identifyThread(input: { diameterMm: number; pitchMm: number; unit: LengthUnit }): ThreadCandidate[] {
  const { diameterMm, pitchMm, unit } = input;
  if (diameterMm < 1.2 || diameterMm > 80)
    throw new StandardsInputError("Threads are identified from 1.2 mm (#0) to 80 mm (3 in) across.");
  if (pitchMm <= 0.1 || pitchMm > 7) throw new StandardsInputError("A pitch is between 0.1 and 7 mm (4 to 250 tpi).");
  const found = ALL_THREADS.flatMap((t) => {
    const pipe = t.series === "NPT" || t.series === "BSP";
    const measured = [
      {
        name: "diameter",
        label: "diameter",
        measuredMm: diameterMm,
        toleranceMm: Math.max(0.12, t.majorMm * (pipe ? 0.02 : 0.01)),
        surface: "shaft" as const,
      },
      { name: "pitch", label: "pitch", measuredMm: pitchMm, toleranceMm: t.pitchMm * 0.008 },
    ];
    const scored = scoreDimensions(measured, { diameter: t.majorMm, pitch: t.pitchMm }, unit);
    if (!scored) return [];
    const series = SERIES[t.series];
    const system = t.tpi === null ? "mm" : "in";
    return [
      {
        designation: t.designation,
        series: t.series,
        seriesName: series.name,
        angle: series.angle,
        taper: series.taper ?? (t.series === "BSP" ? "R is tapered 1 in 16; G is parallel" : null),
        majorDiameter: round(unit === "in" ? t.majorMm / IN : t.majorMm, unit === "in" ? 4 : 3),
        pitch: round(t.pitchMm, 4),
        tpi: t.tpi,
        score: round(scored.score * (system === unit ? 1 : 0.97), 3),
        deviations: scored.deviations,
        warnings: [] as string[],
        greaseFitting: GREASE_FITTINGS.threads.find((g) => g.matches === t.designation)?.thread ?? null,
        source: series.source,
      },
    ];
  }).sort(byScore);
  const top = found.slice(0, 6);
  for (const c of top)
    for (const { pair, message } of LOOK_ALIKES)
      if (pair.includes(c.designation) && !c.warnings.includes(message)) c.warnings.push(message);
  return top;
}

/** Threads per inch as a pitch in millimetres, or a pitch as it was given. */
export function pitchFrom(input: { tpi?: number; pitchMm?: number }): number {
  if (input.tpi !== undefined) {
    if (!(input.tpi >= 4 && input.tpi <= 120)) throw new StandardsInputError("Threads per inch run from 4 to 120.");
    return IN / input.tpi;
  }
  if (input.pitchMm === undefined) throw new StandardsInputError("Give the threads per inch or the pitch.");
  return input.pitchMm;
}

/** A thread's designation read back to its sizes: any designation in ALL_THREADS, as written or loosely. */
export function readThreadDesignation(text: string): ThreadSpec | null {
  const squash = (s: string) => s.toLowerCase().replace(/\s+|×|x/g, "");
  const t = squash(text.replace(/\(.*?\)/g, ""));
  return (
    ALL_THREADS.find((x) => squash(x.designation) === squash(text)) ??
    ALL_THREADS.find((x) => squash(x.designation.replace(/\(.*?\)/g, "")) === t) ??
    null
  );
}
