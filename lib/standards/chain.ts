import { StandardsInputError } from "@/lib/standards/errors";
import { byScore, scoreDimensions, type Deviation } from "@/lib/standards/match";
import { inchLabel, MM_PER_INCH, round, type LengthUnit } from "@/lib/standards/units";

/** Roller chain: ANSI numbers (ASME B29.1) and the ISO 606 B series (British standard), decoded and identified. */

export const ANSI_SOURCE =
  "ASME B29.1, precision power transmission roller chains: pitch, roller diameter, inner width";
export const ISO_B_SOURCE = "ISO 606, short-pitch roller chains, B series: pitch, roller diameter, inner width";

/** ANSI chain: [number, pitch, roller diameter, width between inner plates], inches. ASME B29.1. */
export const ANSI_CHAIN: Array<[string, number, number, number]> = [
  ["25", 0.25, 0.13, 0.125], ["35", 0.375, 0.2, 0.188], ["40", 0.5, 0.312, 0.312], ["41", 0.5, 0.306, 0.25],
  ["50", 0.625, 0.4, 0.375], ["60", 0.75, 0.469, 0.5], ["80", 1, 0.625, 0.625], ["100", 1.25, 0.75, 0.75],
  ["120", 1.5, 0.875, 1], ["140", 1.75, 1, 1], ["160", 2, 1.125, 1.25],
]; // prettier-ignore

/** ISO 606 B series: [number, pitch, roller diameter, width between inner plates], millimetres. */
export const ISO_B_CHAIN: Array<[string, number, number, number]> = [
  ["05B", 8, 5, 3], ["06B", 9.525, 6.35, 5.72], ["08B", 12.7, 8.51, 7.75], ["10B", 15.875, 10.16, 9.65],
  ["12B", 19.05, 12.07, 11.68], ["16B", 25.4, 15.88, 17.02], ["20B", 31.75, 19.05, 19.56], ["24B", 38.1, 25.4, 25.4],
]; // prettier-ignore

export interface Chain {
  number: string;
  system: "ansi" | "iso";
  strands: number;
  pitch: number;
  rollerDiameter: number;
  innerWidth: number;
  unit: LengthUnit;
  /** `Roller chain ANSI 40-1 (1/2 in pitch)`: what to ask for, and the standard part's designation. */
  label: string;
  /** Rollerless (25, 35) or lightweight (41): said, so the next chain bought is the same kind. */
  notes: string[];
  source: string;
}

function ansi([n, p, r, w]: [string, number, number, number], strands: number): Chain {
  const notes: string[] = [];
  if (n.endsWith("5")) notes.push("A rollerless chain: the 'roller' measured is its bush.");
  if (n === "41") notes.push("The lightweight chain of 1/2 in pitch: narrower, with smaller rollers, than No. 40.");
  return {
    number: `${n}-${strands}`,
    system: "ansi",
    strands,
    pitch: p,
    rollerDiameter: r,
    innerWidth: w,
    unit: "in",
    label: `Roller chain ANSI ${n}-${strands} (${inchLabel(p)} pitch)`,
    notes,
    source: ANSI_SOURCE,
  };
}

function isoB([n, p, r, w]: [string, number, number, number], strands: number): Chain {
  return {
    number: `${n}-${strands}`,
    system: "iso",
    strands,
    pitch: p,
    rollerDiameter: r,
    innerWidth: w,
    unit: "mm",
    label: `Roller chain ISO ${n}-${strands} (${p} mm pitch)`,
    notes: [],
    source: ISO_B_SOURCE,
  };
}

/**
 * A chain from its number: `40`, `#40-1`, `ANSI 60-2`, `41` (ASME B29.1: the digits before the last give the pitch in
 * eighths of an inch; a last digit 0 is the standard chain, 1 the lightweight, 5 the rollerless), or `08B`, `08B-2`
 * (ISO 606 B: the digits give the pitch in sixteenths of an inch).
 */
export function decodeChain(text: string): Chain {
  const t = text.trim().replace(/^(roller\s+chain\s*)?(ansi|iso)?\s*#?\s*/i, "");
  const m = /^(\d{2,3}|\d{2}B)(?:-(\d))?(?:\s*\(.*\))?$/i.exec(t);
  if (!m) throw new StandardsInputError(`"${text.trim()}" is not a chain number. Write it like 40, 60-2 or 08B-1.`);
  const strands = Number(m[2] ?? 1);
  if (strands < 1 || strands > 4) throw new StandardsInputError("A chain has from 1 to 4 strands.");
  const number = m[1].toUpperCase();
  const a = ANSI_CHAIN.find(([n]) => n === number);
  if (a) return ansi(a, strands);
  const b = ISO_B_CHAIN.find(([n]) => n === number);
  if (b) return isoB(b, strands);
  if (/B$/.test(number)) throw new StandardsInputError(`${number} is not an ISO 606 B chain: they run 05B to 24B.`);
  const eighths = Number(number.slice(0, -1));
  throw new StandardsInputError(
    `${number} would be ${inchLabel(eighths / 8)} pitch, but ASME B29.1 has no chain ${number}: ` +
      "the standard numbers are 25, 35, 40, 41, 50, 60, 80, 100, 120, 140 and 160.",
  );
}

export const ALL_CHAINS: Chain[] = [...ANSI_CHAIN.map((r) => ansi(r, 1)), ...ISO_B_CHAIN.map((r) => isoB(r, 1))];

export interface ChainCandidate extends Chain {
  score: number;
  deviations: Deviation[];
  warnings: string[];
}

/**
 * Chains that fit a measured pitch (centre to centre of neighbouring pins; over ten pitches is better) and roller
 * diameter, best first. A worn chain's pitch reads long. Common practice (no published source) for the tolerances.
 */
export function identifyChain(input: {
  pitchMm: number;
  rollerMm: number;
  innerWidthMm?: number;
  unit: LengthUnit;
}): ChainCandidate[] {
  const measured = [
    { name: "pitch", label: "pitch", measuredMm: input.pitchMm, toleranceMm: 0.12, surface: "belt-length" as const },
    { name: "roller", label: "roller", measuredMm: input.rollerMm, toleranceMm: 0.12, surface: "shaft" as const },
    ...(input.innerWidthMm !== undefined
      ? [{ name: "width", label: "inner width", measuredMm: input.innerWidthMm, toleranceMm: 0.3 }]
      : []),
  ];
  const mm = (c: Chain, v: number) => (c.unit === "in" ? v * MM_PER_INCH : v);
  return ALL_CHAINS.flatMap((c) => {
    const scored = scoreDimensions(
      measured,
      { pitch: mm(c, c.pitch), roller: mm(c, c.rollerDiameter), width: mm(c, c.innerWidth) },
      input.unit,
    );
    if (!scored) return [];
    const warnings =
      c.number === "40-1" || c.number === "08B-1"
        ? [
            "ANSI 40 and ISO 08B share the 1/2 in pitch but not the roller or the width: they do not run together, " +
              "and each wants its own sprockets. Measure the roller and the width between the inner plates.",
          ]
        : [];
    return [{ ...c, score: scored.score, deviations: scored.deviations, warnings }];
  })
    .sort(byScore)
    .slice(0, 5);
}

export interface ChainLinks {
  unit: LengthUnit;
  /** The exact number of pitches for the centre distance, before rounding. */
  exact: number;
  /** Links to order: the exact number rounded up to an even number, so no offset link is needed. */
  links: number;
  /** The centre distance those links give, with the chain just tight. */
  center: number;
  notes: string[];
}

/**
 * Links for two sprockets and a centre distance, by the handbook formula
 * L = 2C/p + (N1 + N2)/2 + (N2 − N1)² p / (4π² C), and the centre distance the chosen even number of links gives,
 * solved from the same formula.
 */
export function chainLinks(input: {
  pitch: number;
  teeth1: number;
  teeth2: number;
  center: number;
  unit: LengthUnit;
}): ChainLinks {
  const { pitch: p, teeth1, teeth2, center: c, unit } = input;
  if (
    !Number.isInteger(teeth1) ||
    !Number.isInteger(teeth2) ||
    teeth1 < 6 ||
    teeth2 < 6 ||
    teeth1 > 200 ||
    teeth2 > 200
  )
    throw new StandardsInputError("Sprockets have a whole number of teeth, from 6 to 200.");
  const [n1, n2] = [Math.min(teeth1, teeth2), Math.max(teeth1, teeth2)];
  const largeRadius = p / (2 * Math.sin(Math.PI / n2));
  const smallRadius = p / (2 * Math.sin(Math.PI / n1));
  if (c <= largeRadius + smallRadius)
    throw new StandardsInputError("The sprockets would touch at that centre distance: it must be larger.");
  const exact = (2 * c) / p + (n1 + n2) / 2 + ((n2 - n1) ** 2 * p) / (4 * Math.PI ** 2 * c);
  const links = 2 * Math.ceil(exact / 2 - 1e-9);
  // Solve L = 2C/p + S + D²p/(4π²C) for C: a quadratic in C.
  const s = (n1 + n2) / 2;
  const k = ((n2 - n1) ** 2 * p) / (4 * Math.PI ** 2);
  const a = 2 / p;
  const b = s - links;
  const center = (-b + Math.sqrt(b * b - 4 * a * k)) / (2 * a);
  return {
    unit,
    exact: round(exact, 2),
    links,
    center: round(center, unit === "in" ? 3 : 1),
    notes: [
      "Order an even number of links, joined with a connecting link; an odd number needs an offset link, the weak " +
        "point of a chain.",
      "Set the slack to about 2 % of the centre distance on the slack side, then turn the sprockets by hand to check " +
        "for a tight spot.",
    ],
  };
}

/** A chain designation read back: `Roller chain ANSI 40-1`, `08B-1`, `#60`. */
export function readChainDesignation(text: string): Chain | null {
  try {
    return decodeChain(text.replace(/^roller\s+chain\s*/i, "").replace(/\s*\(.*\)\s*$/, ""));
  } catch (error) {
    if (error instanceof StandardsInputError) return null;
    throw error;
  }
}
