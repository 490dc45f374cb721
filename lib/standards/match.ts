import { wearDirection, type Surface } from "@/lib/standards/nominal";
import { fromMm, round, type LengthUnit } from "@/lib/standards/units";

/** One measured dimension: what the calipers read, how far off is still acceptable, and which way wear moves it. */
export interface MeasuredDimension {
  name: string;
  label: string;
  measuredMm: number;
  toleranceMm: number;
  surface?: Surface;
}

export interface Deviation {
  name: string;
  label: string;
  nominal: number;
  measured: number;
  /** measured − nominal, in the unit asked for */
  deviation: number;
  withinTolerance: boolean;
}

export interface Scored {
  score: number;
  deviations: Deviation[];
  withinTolerance: boolean;
}

/** Beyond this many tolerances on any dimension a part is not offered at all. */
const CUTOFF = 3;

/**
 * The one scoring rule for bearings, seals and belts. Each dimension's deviation is measured in tolerances; a deviation
 * in the direction wear would move it counts half. Score 1 is exact; a candidate more than three tolerances off on
 * any dimension is dropped (null).
 */
export function scoreDimensions(measured: MeasuredDimension[], nominalMm: Record<string, number>, unit: LengthUnit): Scored | null {
  let total = 0;
  const deviations: Deviation[] = [];
  for (const dim of measured) {
    const nominal = nominalMm[dim.name];
    if (nominal === undefined) continue;
    const deviationMm = dim.measuredMm - nominal;
    const towardWear = dim.surface ? Math.sign(deviationMm) === wearDirection[dim.surface] : false;
    const tolerances = Math.abs(deviationMm) / dim.toleranceMm;
    if (tolerances > CUTOFF * (towardWear ? 2 : 1)) return null;
    total += towardWear ? tolerances / 2 : tolerances;
    const digits = unit === "in" ? 4 : 2;
    deviations.push({
      name: dim.name,
      label: dim.label,
      nominal: round(fromMm(nominal, unit), digits),
      measured: round(fromMm(dim.measuredMm, unit), digits),
      deviation: round(fromMm(deviationMm, unit), digits + 1),
      withinTolerance: tolerances <= (towardWear ? 2 : 1),
    });
  }
  if (deviations.length === 0) return null;
  const score = Math.max(0, 1 - total / (deviations.length * CUTOFF));
  return { score: round(score, 3), deviations, withinTolerance: deviations.every((d) => d.withinTolerance) };
}

/** "bore 0.02 mm over, OD exact, width 0.1 mm under": the deviations in words. */
export function describeDeviations(deviations: Deviation[], unit: LengthUnit): string {
  return deviations
    .map((d) => {
      const size = Math.abs(d.deviation);
      if (size < (unit === "in" ? 0.00005 : 0.005)) return `${d.label} exact`;
      return `${d.label} ${round(size, unit === "in" ? 4 : 2)} ${unit} ${d.deviation > 0 ? "over" : "under"}`;
    })
    .join(", ");
}

export function byScore<T extends { score: number }>(a: T, b: T): number {
  return b.score - a.score;
}
