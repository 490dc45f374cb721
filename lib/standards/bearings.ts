import { StandardsInputError } from "@/lib/standards/errors";
import {
  DEEP_GROOVE,
  R_SERIES,
  SAME_ENVELOPE,
  SERIES_INFO,
  type DeepGrooveSeries,
} from "@/lib/standards/bearing-tables";
import { byScore, describeDeviations, scoreDimensions, type Deviation } from "@/lib/standards/match";
import { nearMiss } from "@/lib/standards/nominal";
import { MM_PER_INCH, round, type LengthUnit } from "@/lib/standards/units";

export interface StandardBearing {
  designation: string;
  series: string;
  boreCode: string;
  boreMm: number;
  outsideDiameterMm: number;
  widthMm: number;
  system: "metric" | "inch";
  /** Width of the shielded or sealed form, where it differs from the open one (R series). */
  closedWidthMm?: number;
}

/** Every bearing the engine knows, built once from the tables. */
export const ALL_BEARINGS: StandardBearing[] = [
  ...(Object.entries(DEEP_GROOVE) as Array<[DeepGrooveSeries, Array<[string, number, number, number]>]>).flatMap(
    ([series, rows]) =>
      rows.map(([boreCode, d, D, B]) => ({
        designation: `${series}${boreCode}`,
        series,
        boreCode,
        boreMm: d,
        outsideDiameterMm: D,
        widthMm: B,
        system: "metric" as const,
      })),
  ),
  ...R_SERIES.map(([designation, d, D, B, closed]) => ({
    designation,
    series: "R",
    boreCode: designation.slice(1),
    boreMm: round(d * MM_PER_INCH, 4),
    outsideDiameterMm: round(D * MM_PER_INCH, 4),
    widthMm: round(B * MM_PER_INCH, 4),
    system: "inch" as const,
    ...(closed !== B ? { closedWidthMm: round(closed * MM_PER_INCH, 4) } : {}),
  })),
];

/** What the matcher compares a measurement with: each size once, and the wider closed form as a size of its own. */
const MATCHABLE: StandardBearing[] = ALL_BEARINGS.flatMap((b) =>
  b.closedWidthMm === undefined
    ? [b]
    : [b, { ...b, designation: `${b.designation}-2RS`, widthMm: b.closedWidthMm, closedWidthMm: undefined }],
);

const byDesignation = new Map(ALL_BEARINGS.map((b) => [b.designation, b]));

/** The bore-code rule of ISO 15: 00 = 10, 01 = 12, 02 = 15, 03 = 17 mm, then code × 5; "/22" is 22 mm. */
export function boreFromCode(code: string): number | null {
  if (/^\/\d+(\.\d+)?$/.test(code)) return Number(code.slice(1));
  if (/^\d$/.test(code)) return Number(code);
  const fixed: Record<string, number> = { "00": 10, "01": 12, "02": 15, "03": 17 };
  if (code in fixed) return fixed[code];
  if (/^\d\d$/.test(code) && Number(code) >= 4 && Number(code) <= 96) return Number(code) * 5;
  return null;
}

export type Closure = "open" | "shield" | "contact seal";

export interface Closures {
  kind: Closure;
  sides: 0 | 1 | 2;
  text: string;
}

export interface DecodedBearing {
  designation: string;
  input: string;
  series: string;
  seriesName: string;
  boreCode: string;
  boreMm: number;
  outsideDiameterMm: number;
  widthMm: number;
  closures: Closures;
  clearance: { group: string; text: string };
  snapRing: { groove: boolean; ring: boolean; text: string };
  unknownSuffixes: string[];
  notes: string[];
}

export class DesignationError extends StandardsInputError {}

// Longest first, so that 2RS is read before RS and NR before N.
const SUFFIXES: Array<{ token: string; apply: (d: SuffixState) => void }> = [
  { token: "2RS", apply: (s) => (s.closure = { kind: "contact seal", sides: 2 }) },
  { token: "ZZ", apply: (s) => (s.closure = { kind: "shield", sides: 2 }) },
  { token: "2Z", apply: (s) => (s.closure = { kind: "shield", sides: 2 }) },
  { token: "RS", apply: (s) => (s.closure = { kind: "contact seal", sides: 1 }) },
  { token: "Z", apply: (s) => (s.closure = { kind: "shield", sides: 1 }) },
  { token: "NR", apply: (s) => (s.snap = { groove: true, ring: true }) },
  { token: "N", apply: (s) => (s.snap = { groove: true, ring: false }) },
  { token: "C2", apply: (s) => (s.clearance = "C2") },
  { token: "C3", apply: (s) => (s.clearance = "C3") },
  { token: "C4", apply: (s) => (s.clearance = "C4") },
  { token: "C5", apply: (s) => (s.clearance = "C5") },
  { token: "CN", apply: (s) => (s.clearance = "CN") },
];

interface SuffixState {
  closure: { kind: Closure; sides: 0 | 1 | 2 };
  snap: { groove: boolean; ring: boolean };
  clearance: string;
  unknown: string[];
}

// Internal radial clearance groups of ISO 5753-1: Group 2 tighter than normal, N normal, 3–5 progressively looser.
const CLEARANCE_TEXT: Record<string, string> = {
  CN: "normal internal clearance (ISO 5753-1 group N)",
  C2: "less than normal internal clearance (ISO 5753-1 group 2)",
  C3: "greater than normal internal clearance (ISO 5753-1 group 3), usual for hot-running or tight-fitted bearings",
  C4: "greater than group 3 (ISO 5753-1 group 4)",
  C5: "greater than group 4 (ISO 5753-1 group 5)",
};

function readSuffixes(text: string): SuffixState {
  const state: SuffixState = {
    closure: { kind: "open", sides: 0 },
    snap: { groove: false, ring: false },
    clearance: "CN",
    unknown: [],
  };
  for (const chunk of text.split(/[\s\-./]+/).filter(Boolean)) {
    let rest = chunk;
    while (rest.length > 0) {
      const hit = SUFFIXES.find((s) => rest.startsWith(s.token));
      if (!hit) {
        state.unknown.push(rest);
        break;
      }
      hit.apply(state);
      rest = rest.slice(hit.token.length);
    }
  }
  return state;
}

/** The designation in one consistent trade form: 6205-2RS N C3. */
function writeDesignation(base: string, s: SuffixState): string {
  const closure = { shield: ["", "-Z", "-2Z"], "contact seal": ["", "-RS", "-2RS"], open: ["", "", ""] }[
    s.closure.kind
  ][s.closure.sides];
  const snap = s.snap.ring ? " NR" : s.snap.groove ? " N" : "";
  const clearance = s.clearance === "CN" ? "" : ` ${s.clearance}`;
  return `${base}${closure}${snap}${clearance}`;
}

function closureText(c: { kind: Closure; sides: 0 | 1 | 2 }): string {
  if (c.sides === 0) return "open (no shields or seals)";
  const what = c.kind === "shield" ? "metal shield" : "rubbing rubber seal";
  return c.sides === 2 ? `${what}s on both sides` : `${what} on one side`;
}

/**
 * Decodes what is stamped or written: `6205-2RS`, `6205 2RS C3`, `6205ZZ`, `6205-2Z`, `6205N`, `6205 NR`, `62/22`,
 * `R8-2Z`, and the older numbering without the leading type digit (`206` for 6206, `307` for 6307) as common practice.
 * Unknown suffixes are kept and reported, never dropped.
 */
export function decodeBearing(input: string): DecodedBearing {
  const text = input.trim().toUpperCase();
  if (text === "") throw new DesignationError("Enter a bearing designation, like 6205-2RS.");
  if (text.length > 40) throw new DesignationError("A bearing designation is at most 40 characters.");
  const { base, rest, notes } = findBase(text, input);
  const suffixes = readSuffixes(rest);
  notes.push(...suffixNotes(suffixes));
  const envelope = SAME_ENVELOPE[base.series as DeepGrooveSeries];
  if (envelope) notes.push(`Same boundary dimensions, different bearings: ${envelope.join("; ")}.`);
  return {
    designation: writeDesignation(base.designation, suffixes),
    input: input.trim(),
    series: base.series,
    seriesName:
      base.series === "R" ? "inch radial ball bearing, R series" : SERIES_INFO[base.series as DeepGrooveSeries].name,
    boreCode: base.boreCode,
    boreMm: base.boreMm,
    outsideDiameterMm: base.outsideDiameterMm,
    // Shields and seals widen some inch bearings: R8 is 1/4 in wide open, 5/16 in as R8-2RS or R8-ZZ.
    widthMm: suffixes.closure.kind !== "open" && base.closedWidthMm !== undefined ? base.closedWidthMm : base.widthMm,
    closures: { ...suffixes.closure, text: closureText(suffixes.closure) },
    clearance: { group: suffixes.clearance, text: CLEARANCE_TEXT[suffixes.clearance] },
    snapRing: {
      ...suffixes.snap,
      text: suffixes.snap.ring
        ? "snap-ring groove with the snap ring fitted"
        : suffixes.snap.groove
          ? "snap-ring groove, no ring"
          : "no snap-ring groove",
    },
    unknownSuffixes: suffixes.unknown,
    notes,
  };
}

/** The bearing the designation's series and bore code name (inch R, metric, or the older numbering), and the rest. */
function findBase(text: string, input: string): { base: StandardBearing; rest: string; notes: string[] } {
  const inch = /^(R\d{1,2})(.*)$/.exec(text);
  const metric = /^(618|619|160|60|62|63|64)(\/\d+|\d{2}|\d)(?!\d)(.*)$/.exec(text.replace(/\s+(?=\/)/, ""));
  const old = /^([234])(\d{2})(?!\d)(.*)$/.exec(text);
  if (inch && byDesignation.has(inch[1])) return { base: byDesignation.get(inch[1])!, rest: inch[2], notes: [] };
  if (metric) {
    const base = byDesignation.get(`${metric[1]}${metric[2]}`);
    if (base) return { base, rest: metric[3], notes: [] };
    const bore = boreFromCode(metric[2]);
    throw new DesignationError(
      bore === null
        ? `"${metric[2]}" is not a bore code. Codes are 00, 01, 02, 03, then 04 and up (× 5 mm).`
        : `Series ${metric[1]} has no ${bore} mm bore in the tables (bore code ` +
            `${metric[2]}). Check the number, or measure the bearing.`,
    );
  }
  const base = old ? byDesignation.get(`6${old[1]}${old[2]}`) : undefined;
  if (old && base) {
    const note =
      `"${old[1]}${old[2]}" is read as ${base.designation}: older numbering ` +
      `often left out the leading 6 of deep groove ball bearings. This is ` +
      `common practice, not a standard; check the size.`;
    return { base, rest: old[3], notes: [note] };
  }
  throw new DesignationError(
    `"${input.trim()}" is not a deep groove ball bearing designation we can ` +
      `read. Try a form like 6205-2RS, 62/22 or R8.`,
  );
}

/** What the suffixes mean for a restorer: letters not decoded, shields against seals, a snap-ring groove. */
function suffixNotes(suffixes: ReturnType<typeof readSuffixes>): string[] {
  const notes: string[] = [];
  if (suffixes.unknown.length > 0) {
    notes.push(
      `Not decoded: ${suffixes.unknown.join(", ")}. Makers add their own ` +
        `suffix letters (cage, grease, noise grade); keep them when ordering ` +
        `and ask what they mean.`,
    );
  }
  if (suffixes.closure.kind === "shield")
    notes.push(
      "Shields do not touch the inner ring: low drag, but they keep out only " +
        "coarse dirt. For wet or muddy places a sealed bearing is usual.",
    );
  if (suffixes.closure.kind === "contact seal")
    notes.push(
      "Rubbing seals keep out water and grit better than shields, at the cost " +
        "of a little drag and a lower speed limit.",
    );
  if (suffixes.snap.groove && !suffixes.snap.ring)
    notes.push(
      "N: a snap-ring groove in the outer ring; the ring itself is ordered separately or comes with the NR form.",
    );
  return notes;
}

export interface BearingCandidate {
  designation: string;
  series: string;
  system: "metric" | "inch";
  boreMm: number;
  outsideDiameterMm: number;
  widthMm: number;
  score: number;
  deviations: Deviation[];
  explanation: string;
  warnings: string[];
}

export interface BearingMatchInput {
  boreMm: number;
  outsideDiameterMm: number;
  widthMm?: number;
  toleranceMm: number;
  unit: LengthUnit;
}

/**
 * Ranks standard bearings against a measured bore, OD and (optionally) width. The bore of a bearing that spun on its
 * shaft reads large and the OD of one that spun in its housing reads small, so wear in those directions is forgiven.
 */
export function matchBearing(input: BearingMatchInput): { candidates: BearingCandidate[]; warnings: string[] } {
  const measured = [
    {
      name: "bore",
      label: "bore",
      measuredMm: input.boreMm,
      toleranceMm: input.toleranceMm,
      surface: "housing" as const,
    },
    {
      name: "od",
      label: "OD",
      measuredMm: input.outsideDiameterMm,
      toleranceMm: input.toleranceMm,
      surface: "shaft" as const,
    },
    ...(input.widthMm
      ? [{ name: "width", label: "width", measuredMm: input.widthMm, toleranceMm: input.toleranceMm }]
      : []),
  ];
  const candidates: BearingCandidate[] = [];
  for (const bearing of MATCHABLE) {
    const scored = scoreDimensions(
      measured,
      { bore: bearing.boreMm, od: bearing.outsideDiameterMm, width: bearing.widthMm },
      input.unit,
    );
    if (!scored) continue;
    const warnings: string[] = [];
    if (!scored.withinTolerance)
      warnings.push("Outside the tolerance you gave on at least one dimension: a possible match only.");
    const envelope = SAME_ENVELOPE[bearing.series as DeepGrooveSeries];
    if (envelope)
      warnings.push(
        `Same size is not the same part: ${envelope[0]} share these dimensions. Check the rolling elements.`,
      );
    if (bearing.closedWidthMm !== undefined) {
      warnings.push(
        `The open ${bearing.designation} is narrower than its shielded or ` +
          `sealed form (${round(bearing.closedWidthMm / MM_PER_INCH, 3)} in wide ` +
          `as ${bearing.designation}-2RS or -ZZ).`,
      );
    } else if (bearing.series === "R" && bearing.designation.endsWith("-2RS")) {
      warnings.push("This width is the shielded or sealed form's: ask for -2RS (rubber seals) or -ZZ (metal shields).");
    }
    candidates.push({
      designation: bearing.designation,
      series: bearing.series,
      system: bearing.system,
      boreMm: bearing.boreMm,
      outsideDiameterMm: bearing.outsideDiameterMm,
      widthMm: bearing.widthMm,
      score: scored.score,
      deviations: scored.deviations,
      explanation: describeDeviations(scored.deviations, input.unit),
      warnings,
    });
  }
  candidates.sort(byScore);
  addCrossSystemWarnings(candidates);

  const warnings: string[] = [];
  if (!candidates.some((c) => c.deviations.every((d) => d.withinTolerance))) {
    warnings.push(
      "No standard deep groove ball bearing fits these three sizes within " +
        "your tolerance. Re-measure; the part may be worn, misread (inch " +
        "against metric), or a special made for the machine.",
    );
  }
  return { candidates: candidates.slice(0, 10), warnings };
}

/** An inch bearing and a metric one in the same list with near-identical sizes: say they are not interchangeable. */
function addCrossSystemWarnings(candidates: BearingCandidate[]): void {
  const inch = candidates.filter((c) => c.system === "inch");
  const metric = candidates.filter((c) => c.system === "metric");
  for (const i of inch) {
    for (const m of metric) {
      const miss =
        nearMiss(i.boreMm / MM_PER_INCH, m.boreMm) ?? nearMiss(i.outsideDiameterMm / MM_PER_INCH, m.outsideDiameterMm);
      if (!miss) continue;
      const text =
        `${i.designation} (inch) and ${m.designation} (metric) are close in ` +
        `size but not interchangeable: ${miss.message}`;
      i.warnings.push(text);
      m.warnings.push(text);
    }
  }
}
