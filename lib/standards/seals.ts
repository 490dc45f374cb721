import { byScore, describeDeviations, scoreDimensions, type Deviation } from "@/lib/standards/match";
import { nearMiss, nominalCandidates } from "@/lib/standards/nominal";
import { IT_GRADES, INCH_SEALS, METRIC_SEALS, OD_ALLOWANCE } from "@/lib/standards/seal-sizes";
import { fromMm, inchLabel, MM_PER_INCH, round, type LengthUnit } from "@/lib/standards/units";

export interface StandardSeal {
  system: "metric" | "inch";
  shaftMm: number;
  boreMm: number;
  widthMm: number;
  size: string;
}

const inchSize = (d: number, D: number, b: number) => `${inchLabel(d).replace(" in", "")} × ${inchLabel(D).replace(" in", "")} × ${inchLabel(b)}`;

export const ALL_SEALS: StandardSeal[] = [
  ...METRIC_SEALS.map(([d, D, b]) => ({ system: "metric" as const, shaftMm: d, boreMm: D, widthMm: b, size: `${d} × ${D} × ${b} mm` })),
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
  "Fit a thin-wall shaft repair sleeve over the worn band: it restores a fresh running surface and keeps the same seal size.",
  "Or set the new seal a few millimetres deeper or shallower in its bore (a spacer or shim behind it, or pressed short of the shoulder) so the lip runs on unworn shaft.",
  "Or have the shaft metal-sprayed or sleeved and ground back to size by a machine shop.",
];

/** Ranks standard lip seals by shaft, housing bore and width; a worn shaft reads small, which is forgiven. */
export function matchSeal(input: SealMatchInput): { candidates: SealCandidate[]; warnings: string[]; remedies: string[] } {
  const measured = [
    { name: "shaft", label: "shaft", measuredMm: input.shaftMm, toleranceMm: input.toleranceMm, surface: "shaft" as const },
    { name: "bore", label: "bore", measuredMm: input.boreMm, toleranceMm: input.toleranceMm, surface: "housing" as const },
    // Width matters least: a slightly narrower seal usually fits its seat; a wider one may not.
    ...(input.widthMm ? [{ name: "width", label: "width", measuredMm: input.widthMm, toleranceMm: Math.max(input.toleranceMm * 4, 0.5) }] : []),
  ];
  const orderAs = describeAttributes(input.attributes ?? {});
  const candidates: SealCandidate[] = [];
  for (const seal of ALL_SEALS) {
    const scored = scoreDimensions(measured, { shaft: seal.shaftMm, bore: seal.boreMm, width: seal.widthMm }, input.unit);
    if (!scored) continue;
    const warnings: string[] = [];
    if (input.widthMm && seal.widthMm > input.widthMm + 0.3) warnings.push("Wider than the old seal: check the seat is deep enough.");
    candidates.push({ ...seal, score: scored.score, deviations: scored.deviations, explanation: describeDeviations(scored.deviations, input.unit), orderAs, warnings });
  }
  candidates.sort(byScore);
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
  if (candidates.length === 0) warnings.push("No standard lip seal is near these sizes. Re-measure the shaft and the housing bore (not the old seal's lip, which is smaller than the shaft).");
  const remedies = input.grooved ? GROOVE_REMEDIES : [];
  if (input.grooved) warnings.push("The old lip has worn a groove in the shaft. A new seal running on the same line will leak.");
  return { candidates: candidates.slice(0, 8), warnings, remedies };
}

function gradeFor(mm: number) {
  return IT_GRADES.find((g) => mm > g.overMm && mm <= g.upToMm) ?? IT_GRADES[IT_GRADES.length - 1];
}

export const PRESS_FIT_SOURCE =
  "ISO 6194-1 seal outside-diameter allowances (from memory of the standard) against a housing bore in tolerance H8, ISO 286-1:2010 Table 1";

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
 * The press fit of a seal in its housing: interference = seal OD − bore. The recommended range is the seal's OD
 * allowance over nominal, less the housing's H8 tolerance at the low end (a bore at the top of H8 with a seal at the
 * bottom of its allowance still holds).
 */
export function checkPressFit(input: { boreMm: number; sealOdMm: number; outside: "metal" | "rubber"; unit: LengthUnit }): PressFit {
  const row = OD_ALLOWANCE.find((r) => input.boreMm <= r.upToMm) ?? OD_ALLOWANCE[OD_ALLOWANCE.length - 1];
  const [low, high] = row[input.outside];
  const it8 = gradeFor(input.boreMm).it8 / 1000;
  const minMm = low - it8;
  const maxMm = high;
  const interferenceMm = input.sealOdMm - input.boreMm;
  const verdict = interferenceMm < minMm ? "loose" : interferenceMm > maxMm ? "tight" : "ok";
  const digits = input.unit === "in" ? 4 : 3;
  const show = (mm: number) => `${round(fromMm(mm, input.unit), digits)} ${input.unit}`;
  const message = {
    ok: `Interference ${show(interferenceMm)} is within the recommended ${show(minMm)} to ${show(maxMm)}: the seal should stay put without distorting.`,
    loose: `Interference ${show(interferenceMm)} is below the recommended ${show(minMm)}: the seal may turn or weep round its OD. ${
      input.outside === "metal"
        ? "A worn or oversize bore can take a seal with a rubber-covered OD, or a thin coat of sealant on the metal OD."
        : "Check the bore for wear; an oversize bore may need sleeving, or a seal with a larger OD."
    }`,
    tight: `Interference ${show(interferenceMm)} is above the recommended ${show(maxMm)}: the case may buckle or the lip be squeezed onto the shaft. Check both measurements.`,
  }[verdict];
  return {
    interference: round(fromMm(interferenceMm, input.unit), digits + 1),
    recommendedMin: round(fromMm(minMm, input.unit), digits + 1),
    recommendedMax: round(fromMm(maxMm, input.unit), digits + 1),
    verdict,
    unit: input.unit,
    outside: input.outside,
    message,
    source: PRESS_FIT_SOURCE,
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
  const show = (mm: number) => `${round(fromMm(mm, input.unit), input.unit === "in" ? 4 : 3)} ${input.unit}`;
  const parts = [
    verdict === "ok"
      ? `The shaft is within h11 of ${nominal.label} (down to ${show(lowest)}).`
      : verdict === "undersize"
        ? `The shaft is below h11 for ${nominal.label} (lowest ${show(lowest)}): the lip may not grip enough.`
        : `The shaft reads above ${nominal.label}: re-measure, or check whether it is a different nominal size.`,
  ];
  if (needsSleeve) parts.push("A repair sleeve of the same seal size is the usual remedy.");
  return { nominalLabel: nominal.label, lowestInTolerance: round(fromMm(lowest, input.unit), 5), verdict, needsSleeve, message: parts.join(" ") };
}
