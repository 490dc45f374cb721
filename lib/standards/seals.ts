import {
  byScore,
  describeDeviations,
  deviationOf,
  scoreDimensions,
  type Deviation,
  type MeasuredDimension,
} from "@/lib/standards/match";
import { nearMiss, nearMissFor, nominalCandidates } from "@/lib/standards/nominal";
import {
  INCH_PRESS_FIT,
  INCH_PRESS_FIT_SOURCE,
  INCH_SEALS,
  IT_GRADES,
  METRIC_SEALS,
  OD_ALLOWANCE,
  OD_ALLOWANCE_SOURCE,
} from "@/lib/standards/seal-sizes";
import {
  fromMm,
  inchLabel,
  MM_PER_INCH,
  round,
  showDeviation,
  showLength,
  tradeRound,
  type LengthUnit,
} from "@/lib/standards/units";

export interface StandardSeal {
  system: "metric" | "inch";
  shaftMm: number;
  boreMm: number;
  widthMm: number;
  size: string;
}

const inchSize = (d: number, D: number, b: number) =>
  `${inchLabel(d).replace(" in", "")} × ${inchLabel(D).replace(" in", "")} × ${inchLabel(b)}`;

export const ALL_SEALS: StandardSeal[] = [
  ...METRIC_SEALS.map(([d, D, b]) => ({
    system: "metric" as const,
    shaftMm: d,
    boreMm: D,
    widthMm: b,
    size: `${d} × ${D} × ${b} mm`,
  })),
  ...INCH_SEALS.map(([d, D, b]) => ({
    system: "inch" as const,
    shaftMm: round(d * MM_PER_INCH, 4),
    boreMm: round(D * MM_PER_INCH, 4),
    widthMm: round(b * MM_PER_INCH, 4),
    size: inchSize(d, D, b),
  })),
];

/** What decides whether one lip seal can take another's place, besides its size. */
export interface SealAttributes {
  lips?: "single" | "double";
  spring?: boolean;
  dustLip?: boolean;
  outside?: "metal" | "rubber";
}

export function describeAttributes(a: SealAttributes): string {
  const parts = [
    a.spring === false ? "plain lip (no spring)" : "spring-loaded lip",
    a.lips === "double" || a.dustLip ? "with a dust lip" : null,
    a.outside === "metal" ? "metal-cased OD" : a.outside === "rubber" ? "rubber-covered OD" : null,
  ];
  return parts.filter(Boolean).join(", ");
}

export interface SealCandidate extends StandardSeal {
  score: number;
  deviations: Deviation[];
  explanation: string;
  orderAs: string;
  warnings: string[];
}

export interface SealMatchInput {
  shaftMm: number;
  boreMm: number;
  widthMm?: number;
  toleranceMm: number;
  unit: LengthUnit;
  grooved?: boolean;
  attributes?: SealAttributes;
}

export const GROOVE_REMEDIES = [
  "Fit a thin-wall shaft repair sleeve over the worn band: it restores a " +
    "fresh running surface and keeps the same seal size.",
  "Or set the new seal a few millimetres deeper or shallower in its bore " +
    "(a spacer or shim behind it, or pressed short of the shoulder) so the " +
    "lip runs on unworn shaft.",
  "Or have the shaft metal-sprayed or sleeved and ground back to size by a machine shop.",
];

/** Ranks standard lip seals by shaft, housing bore and width; a worn shaft reads small, which is forgiven. */
export function matchSeal(input: SealMatchInput): {
  candidates: SealCandidate[];
  warnings: string[];
  remedies: string[];
} {
  const measured = [
    {
      name: "shaft",
      label: "shaft",
      measuredMm: input.shaftMm,
      toleranceMm: input.toleranceMm,
      surface: "shaft" as const,
    },
    {
      name: "bore",
      label: "bore",
      measuredMm: input.boreMm,
      toleranceMm: input.toleranceMm,
      surface: "housing" as const,
    },
    // Width matters least: a slightly narrower seal usually fits its seat; a wider one may not.
    ...(input.widthMm
      ? [
          {
            name: "width",
            label: "width",
            measuredMm: input.widthMm,
            toleranceMm: Math.max(input.toleranceMm * 4, 0.5),
          },
        ]
      : []),
  ];
  const orderAs = describeAttributes(input.attributes ?? {});
  const candidates: SealCandidate[] = [];
  for (const seal of ALL_SEALS) {
    const scored = scoreDimensions(
      measured,
      { shaft: seal.shaftMm, bore: seal.boreMm, width: seal.widthMm },
      input.unit,
    );
    if (!scored) continue;
    const warnings: string[] = [];
    if (input.widthMm && seal.widthMm > input.widthMm + 0.3)
      warnings.push("Wider than the old seal: check the seat is deep enough.");
    candidates.push({
      ...seal,
      score: scored.score,
      deviations: scored.deviations,
      explanation: describeDeviations(scored.deviations, input.unit),
      orderAs,
      warnings,
    });
  }
  candidates.sort(byScore);
  if (candidates.length === 0)
    candidates.push(
      ...nearestSeals(measured, input.unit, orderAs, nominalCandidates(input.shaftMm, input.unit, "shaft")[0].system),
    );
  for (const inch of candidates.filter((c) => c.system === "inch")) {
    for (const metric of candidates.filter((c) => c.system === "metric")) {
      const miss = nearMiss(inch.shaftMm / MM_PER_INCH, metric.shaftMm);
      if (miss) {
        inch.warnings.push(`Shaft: ${miss.message}`);
        metric.warnings.push(`Shaft: ${miss.message}`);
      }
    }
  }

  const warnings: string[] = [];
  const remedies = input.grooved ? GROOVE_REMEDIES : [];
  if (input.grooved)
    warnings.push("The old lip has worn a groove in the shaft. A new seal running on the same line will leak.");
  return { candidates: candidates.slice(0, 8), warnings, remedies };
}

/**
 * The tabulated sizes nearest a measurement that none of them matches: shown as "sizes nearby", never as a match, so a
 * person sees what the tables hold while ordering by the worked-out size.
 */
function nearestSeals(
  measured: MeasuredDimension[],
  unit: LengthUnit,
  orderAs: string,
  system: "inch" | "metric",
): SealCandidate[] {
  const nominalOf = (seal: StandardSeal): Record<string, number> => ({
    shaft: seal.shaftMm,
    bore: seal.boreMm,
    width: seal.widthMm,
  });
  // Width counts a quarter: a seat takes a seal a little narrower, and width is the size least often known.
  const distance = (seal: StandardSeal) =>
    measured.reduce(
      (sum, dim) => sum + Math.abs(nominalOf(seal)[dim.name] - dim.measuredMm) * (dim.name === "width" ? 0.25 : 1),
      0,
    );
  return [...ALL_SEALS]
    .sort((a, b) => Number(b.system === system) - Number(a.system === system) || distance(a) - distance(b))
    .slice(0, 3)
    .map((seal) => {
      const deviations = measured.map((dim) => deviationOf(dim, nominalOf(seal)[dim.name], unit, false));
      return {
        ...seal,
        score: 0,
        deviations,
        explanation: describeDeviations(deviations, unit),
        orderAs,
        warnings: [
          "Not this size: the nearest in the table, shown for comparison. Order by the sizes worked out above.",
        ],
      };
    });
}

function gradeFor(mm: number) {
  return IT_GRADES.find((g) => mm > g.overMm && mm <= g.upToMm) ?? IT_GRADES[IT_GRADES.length - 1];
}

export interface PressFit {
  interference: number;
  recommendedMin: number;
  recommendedMax: number;
  verdict: "ok" | "loose" | "tight";
  unit: LengthUnit;
  outside: "metal" | "rubber";
  message: string;
  source: string;
}

/**
 * The outside diameter a new seal should have for its press fit in a housing bore, in millimetres. Inch bores take the
 * inch press-fit table; metric ones the DIN 3760 allowances, less the housing's H8 tolerance at the low end (a bore at
 * the top of H8 with a seal at the bottom of its allowance still holds).
 */
export function sealOdRange(
  boreMm: number,
  outside: "metal" | "rubber",
  system: "inch" | "metric",
): { minMm: number; maxMm: number; source: string } {
  if (system === "inch") {
    const boreIn = boreMm / MM_PER_INCH;
    const row = INCH_PRESS_FIT.find((r) => boreIn <= r.upToIn) ?? INCH_PRESS_FIT[INCH_PRESS_FIT.length - 1];
    const { fit, plus, minus } = row[outside];
    return {
      minMm: boreMm + (fit - minus) * MM_PER_INCH,
      maxMm: boreMm + (fit + plus) * MM_PER_INCH,
      source: INCH_PRESS_FIT_SOURCE,
    };
  }
  const row = OD_ALLOWANCE.find((r) => boreMm <= r.upToMm) ?? OD_ALLOWANCE[OD_ALLOWANCE.length - 1];
  const [low, high] = row[outside];
  return {
    minMm: boreMm + low - gradeFor(boreMm).it8 / 1000,
    maxMm: boreMm + high,
    source: `${OD_ALLOWANCE_SOURCE}, against a housing bore in H8 (ISO 286-1:2010, Table 1)`,
  };
}

/** The press fit of a seal in its housing: interference = seal OD − bore, against the range for that bore. */
export function checkPressFit(input: {
  boreMm: number;
  sealOdMm: number;
  outside: "metal" | "rubber";
  unit: LengthUnit;
}): PressFit {
  const range = sealOdRange(input.boreMm, input.outside, input.unit === "in" ? "inch" : "metric");
  const minMm = range.minMm - input.boreMm;
  const maxMm = range.maxMm - input.boreMm;
  const interferenceMm = input.sealOdMm - input.boreMm;
  // Compared at the trade's precision, so a seal made to the table's own figure is never a thousandth "loose".
  const interference = tradeRound(fromMm(interferenceMm, input.unit), input.unit);
  const recommendedMin = tradeRound(fromMm(minMm, input.unit), input.unit);
  const recommendedMax = tradeRound(fromMm(maxMm, input.unit), input.unit);
  const verdict = interference < recommendedMin ? "loose" : interference > recommendedMax ? "tight" : "ok";
  const show = (value: number) => `${value} ${input.unit}`;
  const message = {
    ok:
      `Interference ${show(interference)} is within the recommended ` +
      `${show(recommendedMin)} to ${show(recommendedMax)}: the seal should ` +
      `stay put without distorting.`,
    loose:
      `Interference ${show(interference)} is below the recommended ${show(recommendedMin)}: ` +
      `the seal may turn or weep round its OD. ${
        input.outside === "metal"
          ? "A worn or oversize bore can take a seal with a rubber-covered OD, " +
            "or a thin coat of sealant on the metal OD."
          : "Check the bore for wear; an oversize bore may need sleeving, or a seal with a larger OD."
      }`,
    tight:
      `Interference ${show(interference)} is above the recommended ` +
      `${show(recommendedMax)}: the case may buckle or the lip be squeezed ` +
      `onto the shaft. Check both measurements.`,
  }[verdict];
  return {
    interference,
    recommendedMin,
    recommendedMax,
    verdict,
    unit: input.unit,
    outside: input.outside,
    message,
    source: range.source,
  };
}

export interface ShaftCheck {
  nominalLabel: string;
  lowestInTolerance: number;
  verdict: "ok" | "undersize" | "oversize";
  needsSleeve: boolean;
  message: string;
}

/**
 * A lip seal's shaft should be within h11 of its nominal size (ISO 6194-1 asks for h11; ISO 286-1 gives the grade).
 * A groove worn by the old lip needs a sleeve or a new line, however the diameter reads.
 */
export function checkShaft(input: { shaftMm: number; unit: LengthUnit; grooved: boolean }): ShaftCheck {
  const nominal = nominalCandidates(input.shaftMm, input.unit, "shaft")[0];
  const it11 = gradeFor(nominal.nominalMm).it11 / 1000;
  const lowest = nominal.nominalMm - it11;
  const verdict = input.shaftMm < lowest ? "undersize" : input.shaftMm > nominal.nominalMm + 0.01 ? "oversize" : "ok";
  const needsSleeve = input.grooved || verdict === "undersize";
  const show = (mm: number) => showLength(fromMm(mm, input.unit), input.unit);
  const parts = [
    verdict === "ok"
      ? `The shaft is within h11 of ${nominal.label} (down to ${show(lowest)}).`
      : verdict === "undersize"
        ? `The shaft is below h11 for ${nominal.label} (lowest ${show(lowest)}): the lip may not grip enough.`
        : `The shaft reads above ${nominal.label}: re-measure, or check whether it is a different nominal size.`,
  ];
  if (needsSleeve) parts.push("A repair sleeve of the same seal size is the usual remedy.");
  return {
    nominalLabel: nominal.label,
    lowestInTolerance: tradeRound(fromMm(lowest, input.unit), input.unit),
    verdict,
    needsSleeve,
    message: parts.join(" "),
  };
}

export interface SealOrder {
  system: "inch" | "metric";
  /** The unit every figure of the order is in: inches for an inch seal, millimetres for a metric one. */
  unit: LengthUnit;
  /** Nominal shaft size: a worn shaft reads small, so this is the size the shaft was made to. */
  shaft: number;
  shaftLabel: string;
  /** The housing bore at the trade's precision: thousandths of an inch; 0.1 mm, or whole mm for a standard bore. */
  bore: number;
  /** Nearest common fraction of an inch, or whole millimetre; null when the width was not measured. */
  width: number | null;
  /** How a person asks for it at a parts counter, shaft first: `1-1/2 × 2.374 × 1/2 in`. */
  label: string;
  /** The outside diameter a new seal should have for its press fit in this bore. */
  sealOd: { min: number; max: number };
  askFor: string;
  notes: string[];
  source: string;
}

const metricBores = new Set(METRIC_SEALS.map(([, D]) => D));
const inchBores = [...new Set(INCH_SEALS.map(([, D]) => D))];

/** The bore as a seal is asked for: a worn housing reads large, so a standard bore just below the reading is taken. */
function orderBore(boreMm: number, system: "inch" | "metric"): number {
  if (system === "inch") {
    const boreIn = boreMm / MM_PER_INCH;
    const known = inchBores.find((D) => boreIn - D >= -0.0005 && boreIn - D <= 0.002);
    return known ?? round(boreIn, 3);
  }
  const whole = Math.round(boreMm);
  // Within the wear allowance of a whole-millimetre bore that the ISO 6194-1 sizes use: ask for that bore.
  if (metricBores.has(whole) && boreMm - whole >= -0.05 && boreMm - whole <= Math.max(0.1, whole * 0.004)) return whole;
  return round(boreMm, 1);
}

/** Width to the nearest 1/16 in or whole millimetre: seal widths are made in those steps. */
function orderWidth(widthMm: number, system: "inch" | "metric"): number {
  if (system === "inch") return Math.max(1, Math.round((widthMm / MM_PER_INCH) * 16)) / 16;
  return Math.max(1, Math.round(widthMm));
}

/**
 * The lip seal to order for a measured shaft, housing bore and (optionally) width, whatever the tables hold: inch seals
 * are made for far more bores than any list. The system is the shaft's: the unit measured in leads where both fit.
 */
export function sealOrder(input: {
  shaftMm: number;
  boreMm: number;
  widthMm?: number;
  unit: LengthUnit;
  grooved?: boolean;
  attributes?: SealAttributes;
}): SealOrder {
  const shaftCandidates = nominalCandidates(input.shaftMm, input.unit, "shaft");
  const shaftNominal = shaftCandidates[0];
  const system = shaftNominal.system;
  const unit: LengthUnit = system === "inch" ? "in" : "mm";
  const shaft = shaftNominal.nominal;
  const bore = orderBore(input.boreMm, system);
  const boreMm = system === "inch" ? bore * MM_PER_INCH : bore;
  const width = input.widthMm === undefined ? null : orderWidth(input.widthMm, system);
  const outside = input.attributes?.outside ?? "metal";
  const range = sealOdRange(boreMm, outside, system);
  // The range is rounded inward, so that any seal read off it at the trade's precision is inside the fit.
  const step = system === "inch" ? 0.001 : 0.01;
  const sealOd = {
    min: round(Math.ceil(round(fromMm(range.minMm, unit) / step, 6)) * step, system === "inch" ? 3 : 2),
    max: round(Math.floor(round(fromMm(range.maxMm, unit) / step, 6)) * step, system === "inch" ? 3 : 2),
  };
  const shaftText = system === "inch" ? inchLabel(shaft).replace(" in", "") : `${round(shaft, 1)}`;
  const widthText = width === null ? null : system === "inch" ? inchLabel(width).replace(" in", "") : `${width}`;
  const boreText = system === "inch" ? bore.toFixed(3) : `${bore}`;
  const label = [shaftText, boreText, widthText].filter(Boolean).join(" × ") + ` ${unit}`;
  const askFor = describeAttributes(input.attributes ?? {});

  const notes = orderNotes(input, { system, unit, shaftNominal, bore, boreMm, width, sealOd, outside });
  const miss = nearMissFor(shaftCandidates);
  if (miss) notes.push(miss.message);
  return {
    system,
    unit,
    shaft,
    shaftLabel: shaftNominal.label,
    bore,
    width,
    label,
    sealOd,
    askFor,
    notes,
    source: range.source,
  };
}

/** What the order means for the person at the bench: wear, the bore, the new seal's OD to check, width, system. */
function orderNotes(
  input: { shaftMm: number; widthMm?: number; unit: LengthUnit; grooved?: boolean },
  order: {
    system: "inch" | "metric";
    unit: LengthUnit;
    shaftNominal: { nominalMm: number; label: string };
    bore: number;
    boreMm: number;
    width: number | null;
    sealOd: { min: number; max: number };
    outside: string;
  },
): string[] {
  const { system, unit, shaftNominal, bore, boreMm, width, sealOd, outside } = order;
  const shaftReading = showLength(fromMm(input.shaftMm, unit), unit);
  const shaftWear = fromMm(input.shaftMm - shaftNominal.nominalMm, unit);
  const notes = [
    tradeRound(shaftWear, unit) === 0
      ? `Shaft ${shaftReading}: ${shaftNominal.label} exactly.`
      : `Shaft ${shaftReading}: ${shaftNominal.label}, ` +
        `${showDeviation(shaftWear, unit)} from ` +
        `nominal${shaftWear < 0 ? ", as a worn shaft reads" : ""}.`,
    system === "inch"
      ? `Housing bore ${bore.toFixed(3)} in: inch seals are made for bores in ` +
        `thousandths, so ask for exactly this bore.`
      : `Housing bore ${bore} mm${
          Number.isInteger(bore) && metricBores.has(bore)
            ? ", a standard ISO 6194-1 bore"
            : ": not a standard bore, so ask for a seal made for it or measure again"
        }.`,
    `A new seal's outside diameter should be ` +
      `${showLength(sealOd.min, unit)} to ${showLength(sealOd.max, unit)} for ` +
      `its press fit in this bore ` +
      `(${outside === "metal" ? "metal case" : "rubber-covered"}): check it ` +
      `with calipers before fitting.`,
  ];
  if (width === null)
    notes.push("Width not measured: give the depth of the seal's seat when you ask, or take the old seal along.");
  else if (Math.abs(fromMm(input.widthMm ?? 0, unit) - width) > (system === "inch" ? 0.01 : 0.2)) {
    notes.push(
      `Width measured ${showLength(fromMm(input.widthMm ?? 0, unit), unit)}; ` +
        `seals come in ${system === "inch" ? "1/16 in" : "whole-millimetre"} ` +
        `steps. A slightly narrower seal fits a plain seat; a wider one needs ` +
        `the depth.`,
    );
  }
  if (input.unit !== unit) {
    notes.push(
      `Measured in ${input.unit === "in" ? "inches" : "millimetres"}, but the ` +
        `shaft is ${system === "inch" ? "an inch" : "a metric"} size: order ` +
        `${system === "inch" ? "an inch" : "a metric"} seal. In ${input.unit}: ` +
        `shaft ` +
        `${showLength(fromMm(shaftNominal.nominalMm, input.unit), input.unit)}, ` +
        `bore ${showLength(fromMm(boreMm, input.unit), input.unit)}.`,
    );
  }
  if (input.grooved)
    notes.push(
      "The old lip has worn a groove: fit a repair sleeve of the same seal size, or set the new lip on unworn shaft.",
    );
  return notes;
}

/** Everything the seal calculator answers for one measurement: the seal to order first, then the sizes nearby. */
export function measureSeal(input: SealMatchInput) {
  return {
    order: sealOrder(input),
    ...matchSeal(input),
    shaft: checkShaft({ shaftMm: input.shaftMm, unit: input.unit, grooved: input.grooved ?? false }),
  };
}
