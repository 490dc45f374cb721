import { wearDirection, type Surface } from "@/lib/standards/nominal";
import { fromMm, inchLabel, mmLabel, round, TRADE_DECIMALS, type LengthUnit } from "@/lib/standards/units";

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
  /** The nominal as the trade writes it: `5/32 in`, `2.374 in`, `47 mm`. */
  nominalLabel: string;
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
export function scoreDimensions(
  measured: MeasuredDimension[],
  nominalMm: Record<string, number>,
  unit: LengthUnit,
): Scored | null {
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
    deviations.push(deviationOf(dim, nominal, unit, tolerances <= (towardWear ? 2 : 1)));
  }
  if (deviations.length === 0) return null;
  const score = Math.max(0, 1 - total / (deviations.length * CUTOFF));
  return { score: round(score, 3), deviations, withinTolerance: deviations.every((d) => d.withinTolerance) };
}

/**
 * One measured dimension against one nominal size, in the unit asked for. Nominal sizes keep their exact decimal
 * (5/32 in is 0.15625 in); readings and deviations are at the trade's precision.
 */
export function deviationOf(
  dim: MeasuredDimension,
  nominalMm: number,
  unit: LengthUnit,
  withinTolerance: boolean,
): Deviation {
  return {
    name: dim.name,
    label: dim.label,
    nominal: round(fromMm(nominalMm, unit), unit === "in" ? 5 : 2),
    nominalLabel: unit === "in" ? inchLabel(fromMm(nominalMm, unit)) : mmLabel(nominalMm),
    measured: round(fromMm(dim.measuredMm, unit), TRADE_DECIMALS[unit]),
    deviation: round(fromMm(dim.measuredMm - nominalMm, unit), TRADE_DECIMALS[unit]),
    withinTolerance,
  };
}

/** "bore 0.02 mm over, OD exact, width 0.1 mm under": the deviations in words. */
export function describeDeviations(deviations: Deviation[], unit: LengthUnit): string {
  return deviations
    .map((d) => {
      const size = Math.abs(d.deviation);
      if (size === 0) return `${d.label} exact`;
      return `${d.label} ${size} ${unit} ${d.deviation > 0 ? "over" : "under"}`;
    })
    .join(", ");
}

export function byScore<T extends { score: number }>(a: T, b: T): number {
  return b.score - a.score;
}
