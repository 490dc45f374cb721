import { fromMm, inchLabel, MM_PER_INCH, round, TRADE_DECIMALS, type LengthUnit } from "@/lib/standards/units";

/**
 * Which way wear moves a measurement. A worn shaft (an outside surface) measures small; a worn housing bore or the
 * bore of a bearing that has spun on its shaft (inside surfaces) measures large; a used belt has stretched longer
 * and worn narrower. Common practice (no published source).
 */
export type Surface = "shaft" | "housing" | "belt-length" | "belt-width" | "none";

export const SURFACES: Surface[] = ["shaft", "housing", "belt-length", "belt-width", "none"];

/** +1: wear makes the reading larger than nominal; −1: smaller; 0: either way. */
export const wearDirection: Record<Surface, -1 | 0 | 1> = {
  shaft: -1,
  housing: 1,
  "belt-length": 1,
  "belt-width": -1,
  none: 0,
};

export interface NominalCandidate {
  system: "inch" | "metric";
  /** In the system's own unit: inches for inch sizes, millimetres for metric. */
  nominal: number;
  nominalMm: number;
  label: string;
  /** measured − nominal, in the unit the measurement was given in. */
  deviation: number;
  deviationMm: number;
  plausibility: number;
  reason: string;
}

// How far wear and manufacture plausibly move a reading, for a size in millimetres: at least 0.05 mm, or 0.4 %.
// Common practice (no published source): a rule of thumb for caliper readings of worn parts.
const allowanceMm = (mm: number) => Math.max(0.05, mm * 0.004);

/** A designer more often chose 1-1/4 than 1-17/64: coarser fractions are likelier nominal sizes. */
const inchStepPenalty: Record<number, number> = { 1: 0, 2: 0.02, 4: 0.05, 8: 0.1, 16: 0.2, 32: 0.35, 64: 0.5 };

function denominatorOf(sixtyFourths: number): number {
  let d = 64;
  let n = sixtyFourths;
  while (d > 1 && n % 2 === 0) {
    n /= 2;
    d /= 2;
  }
  return d;
}

function plausibility(
  measuredMm: number,
  nominalMm: number,
  surface: Surface,
  stepPenalty: number,
): { score: number; reason: string; fits: boolean } {
  const deviation = measuredMm - nominalMm;
  const allowance = allowanceMm(nominalMm);
  const direction = wearDirection[surface];
  // Wear in its expected direction is cheap; a reading on the wrong side of nominal must be within manufacture.
  const against = direction !== 0 && Math.sign(deviation) === -direction && Math.abs(deviation) > allowance / 4;
  const distance = Math.abs(deviation) / allowance;
  const score = Math.max(0, 1 - 0.35 * distance - stepPenalty - (against ? 0.4 : 0));
  let reason = `${round(Math.abs(deviation), 2)} mm ${deviation >= 0 ? "over" : "under"} nominal`;
  if (against)
    reason +=
      surface === "shaft" ? "; a worn shaft should read small, not large" : "; wear should not make it read this way";
  else if (direction !== 0 && Math.abs(deviation) > allowance / 4) reason += ", as wear would make it";
  return { score: round(score, 3), reason, fits: !against && distance <= 1 };
}

/** Sizes a designer would have chosen: sixteenths of an inch or coarser, whole millimetres (halves below 10 mm). */
function isUsual(c: NominalCandidate): boolean {
  return c.system === "metric"
    ? c.nominal >= 10
      ? Number.isInteger(c.nominal)
      : true
    : denominatorOf(Math.round(c.nominal * 64)) <= 16;
}

/**
 * Snaps a measured size to the likely nominal on the inch fraction grid (1/64 … whole inches, coarser first) and on
 * the metric grid (whole millimetres, half millimetres below 10 mm), most plausible first.
 *
 * The unit a person measured in is evidence: calipers set to inches on an inch machine. When a usual size of that
 * system lies within the wear allowance, it comes first even if a size of the other system happens to lie nearer
 * (1.497 in on a worn shaft is 1-1/2 in, not 38 mm). The near miss between the two is still reported.
 */
export function nominalCandidates(
  measuredMm: number,
  unit: LengthUnit,
  surface: Surface = "none",
  limit = 4,
): NominalCandidate[] {
  const candidates: Array<NominalCandidate & { fits: boolean }> = [];
  const measuredIn = measuredMm / MM_PER_INCH;
  const base = Math.round(measuredIn * 64);
  for (let n = base - 3; n <= base + 3; n += 1) {
    if (n <= 0) continue;
    const nominalIn = n / 64;
    const nominalMm = nominalIn * MM_PER_INCH;
    const { score, reason, fits } = plausibility(measuredMm, nominalMm, surface, inchStepPenalty[denominatorOf(n)]);
    candidates.push({
      ...candidate("inch", nominalIn, nominalMm, inchLabel(nominalIn), measuredMm, unit, score, reason),
      fits,
    });
  }
  const metricStep = measuredMm < 10 ? 0.5 : 1;
  const nearest = Math.round(measuredMm / metricStep) * metricStep;
  for (const nominalMm of [nearest - metricStep, nearest, nearest + metricStep]) {
    if (nominalMm <= 0) continue;
    const half = nominalMm % 1 !== 0 ? 0.15 : 0;
    const { score, reason, fits } = plausibility(measuredMm, nominalMm, surface, half);
    candidates.push({
      ...candidate("metric", nominalMm, nominalMm, `${round(nominalMm, 1)} mm`, measuredMm, unit, score, reason),
      fits,
    });
  }
  const measuredSystem = unit === "in" ? "inch" : "metric";
  const preferred = (c: NominalCandidate & { fits: boolean }) => c.fits && c.system === measuredSystem && isUsual(c);
  for (const c of candidates)
    if (preferred(c))
      c.reason += `; measured in ${unit === "in" ? "inches" : "millimetres"}, so the ${c.system} size comes first`;
  candidates.sort((a, b) => Number(preferred(b)) - Number(preferred(a)) || b.plausibility - a.plausibility);
  const plausible: NominalCandidate[] = candidates
    .filter((c) => c.plausibility >= 0.2)
    .map(({ fits: _fits, ...c }) => c);
  // The other system is always answered too. When no inch reading is plausible, the one worth showing is the nearest
  // size a designer would have chosen (sixteenths or coarser), not an odd 64th that happens to score a little higher.
  for (const system of ["inch", "metric"] as const) {
    if (plausible.some((c) => c.system === system)) continue;
    const usual = candidates
      .filter((c) => c.system === system && (system === "metric" || denominatorOf(Math.round(c.nominal * 64)) <= 16))
      .sort((a, b) => Math.abs(a.deviationMm) - Math.abs(b.deviationMm))[0];
    if (usual) {
      const { fits: _fits, ...rest } = usual;
      plausible.push(rest);
    }
  }
  return plausible.slice(0, limit);
}

function candidate(
  system: "inch" | "metric",
  nominal: number,
  nominalMm: number,
  label: string,
  measuredMm: number,
  unit: LengthUnit,
  plausibilityScore: number,
  reason: string,
): NominalCandidate {
  const deviationMm = measuredMm - nominalMm;
  return {
    system,
    nominal: round(nominal, 6),
    nominalMm: round(nominalMm, 4),
    label,
    deviation: round(fromMm(deviationMm, unit), TRADE_DECIMALS[unit]),
    deviationMm: round(deviationMm, 4),
    plausibility: plausibilityScore,
    reason,
  };
}

export interface NearMiss {
  inchLabel: string;
  metricLabel: string;
  differenceMm: number;
  message: string;
}

/**
 * An inch size and a metric size close enough to be mistaken for each other with calipers, but not interchangeable:
 * 1-1/2 in = 38.1 mm against 38 mm. Flagged when they differ by more than 0.01 mm and less than 0.6 mm or 1.5 %.
 * Common practice (no published source).
 */
export function nearMiss(inchNominalIn: number, metricNominalMm: number): NearMiss | null {
  const inchMm = inchNominalIn * MM_PER_INCH;
  const difference = Math.abs(inchMm - metricNominalMm);
  if (difference <= 0.01 || difference >= Math.max(0.6, metricNominalMm * 0.015) || difference > 1.5) return null;
  const inch = inchLabel(inchNominalIn);
  const metric = `${round(metricNominalMm, 1)} mm`;
  return {
    inchLabel: inch,
    metricLabel: metric,
    differenceMm: round(difference, 3),
    message:
      `${inch} (${round(inchMm, 2)} mm) and ${metric} differ by only ` +
      `${round(difference, 2)} mm: easy to confuse with calipers, but not ` +
      `interchangeable. Check which system the machine was built to.`,
  };
}

/** The near miss between the best inch and the best metric reading of a measurement, if there is one. */
export function nearMissFor(candidates: NominalCandidate[]): NearMiss | null {
  const inch = candidates.find((c) => c.system === "inch");
  const metric = candidates.find((c) => c.system === "metric");
  return inch && metric ? nearMiss(inch.nominal, metric.nominal) : null;
}
