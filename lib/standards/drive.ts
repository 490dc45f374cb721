import { StandardsInputError } from "@/lib/standards/errors";
import { round, tradeRound, type LengthUnit } from "@/lib/standards/units";

/**
 * Open-belt drive geometry on pitch diameters. The exact relations of two circles and their outer tangents:
 *   L = 2·√(C² − ((D − d)/2)²) + π(D + d)/2 + (D − d)·asin((D − d)/2C)
 * Any consistent unit. The handbook approximation L ≈ 2C + 1.57(D + d) + (D − d)²/4C agrees closely for usual drives.
 */
export class DriveError extends StandardsInputError {}

function check(large: number, small: number): void {
  if (!(large > 0 && small > 0)) throw new DriveError("Both pulley diameters must be more than zero.");
  if (small > large) throw new DriveError("The small pulley is larger than the large one: swap them.");
}

export function beltPitchLength(large: number, small: number, centre: number): number {
  check(large, small);
  const half = (large - small) / 2;
  if (centre <= half)
    throw new DriveError(
      "The centre distance is too short for these pulleys: the small one would sit inside the large one.",
    );
  return (
    2 * Math.sqrt(centre ** 2 - half ** 2) +
    (Math.PI * (large + small)) / 2 +
    (large - small) * Math.asin(half / centre)
  );
}

/**
 * The centre distance at which a belt of this pitch length fits; L grows steadily with C, so bisection is exact enough.
 */
export function centreDistance(large: number, small: number, length: number): number {
  check(large, small);
  const minimum = (large - small) / 2;
  let lo = minimum * (1 + 1e-12) + 1e-12;
  if (length <= beltPitchLength(large, small, lo)) {
    throw new DriveError(`A belt of pitch length ${round(length, 2)} is too short to go round these pulleys at all.`);
  }
  let hi = length / 2;
  for (let i = 0; i < 200 && hi - lo > 1e-12 * hi; i += 1) {
    const mid = (lo + hi) / 2;
    if (beltPitchLength(large, small, mid) < length) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

/** The free length of belt between the pulleys: one tangent. */
export function spanLength(large: number, small: number, centre: number): number {
  return Math.sqrt(centre ** 2 - ((large - small) / 2) ** 2);
}

/** Arc of contact on the small pulley, in degrees. */
export function wrapAngleSmallDeg(large: number, small: number, centre: number): number {
  return 180 - (2 * Math.asin((large - small) / (2 * centre)) * 180) / Math.PI;
}

/**
 * Tensioning target: 1/64 in of deflection per inch of span (in any unit, span/64). Common practice (no published
 * source).
 */
export function deflectionTarget(span: number): number {
  return span / 64;
}

export interface DriveResult {
  pitchLength: number;
  center: number;
  span: number;
  deflection: number;
  wrapAngleSmallDeg: number;
  ratio: number;
  warnings: string[];
}

export function solveDrive(input: { large: number; small: number; center?: number; length?: number }): DriveResult {
  const center = input.center ?? centreDistance(input.large, input.small, input.length ?? Number.NaN);
  const pitchLength =
    input.center !== undefined ? beltPitchLength(input.large, input.small, center) : (input.length as number);
  const span = spanLength(input.large, input.small, center);
  const wrap = wrapAngleSmallDeg(input.large, input.small, center);
  const warnings: string[] = [];
  if (center < (input.large + input.small) / 2) warnings.push("The pulleys would overlap at this centre distance.");
  if (wrap < 120)
    warnings.push(`Only ${round(wrap, 0)}° of wrap on the small pulley: a V-belt is likely to slip below about 120°.`);
  return {
    pitchLength: round(pitchLength, 3),
    center: round(center, 3),
    span: round(span, 3),
    deflection: round(deflectionTarget(span), 3),
    wrapAngleSmallDeg: round(wrap, 2),
    ratio: round(input.large / input.small, 3),
    warnings,
  };
}

/**
 * An adjustable (split-flange) pulley changes its pitch diameter as its halves are screwed apart: the belt lengths the
 * drive can take run from the length at its smallest diameter to the length at its largest.
 */
export function adjustablePulleyRange(input: {
  fixed: number;
  adjustableMin: number;
  adjustableMax: number;
  center: number;
}) {
  if (!(input.adjustableMin > 0 && input.adjustableMax >= input.adjustableMin)) {
    throw new DriveError(
      "The adjustable pulley's smallest pitch diameter must be above zero and not above its largest.",
    );
  }
  const lengthAt = (d: number) => beltPitchLength(Math.max(input.fixed, d), Math.min(input.fixed, d), input.center);
  return { shortest: round(lengthAt(input.adjustableMin), 3), longest: round(lengthAt(input.adjustableMax), 3) };
}

/**
 * A drive's answer at the trade's precision for the unit it was worked in: lengths to 0.001 in or 0.01 mm, angles
 * whole.
 */
export function atTradePrecision(drive: DriveResult, unit: LengthUnit): DriveResult {
  return {
    ...drive,
    pitchLength: tradeRound(drive.pitchLength, unit),
    center: tradeRound(drive.center, unit),
    span: tradeRound(drive.span, unit),
    deflection: tradeRound(drive.deflection, unit),
    wrapAngleSmallDeg: round(drive.wrapAngleSmallDeg, 0),
    ratio: round(drive.ratio, 2),
  };
}
