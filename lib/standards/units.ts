import { StandardsInputError } from "@/lib/standards/errors";

/** Inch and millimetre values as people type them, and the exact conversion between them. */

export type LengthUnit = "mm" | "in";

/** 1 in = 25.4 mm exactly, by the international yard and pound agreement of 1959. */
export const MM_PER_INCH = 25.4;

export const toMm = (value: number, unit: LengthUnit): number => (unit === "mm" ? value : value * MM_PER_INCH);
export const fromMm = (mm: number, unit: LengthUnit): number => (unit === "mm" ? mm : mm / MM_PER_INCH);

export interface ParsedLength {
  value: number;
  unit: LengthUnit;
  mm: number;
}

export class UnitParseError extends StandardsInputError {}

const UNIT_WORDS: Record<string, LengthUnit> = {
  '"': "in",
  "''": "in",
  in: "in",
  "in.": "in",
  inch: "in",
  inches: "in",
  mm: "mm",
  millimetre: "mm",
  millimetres: "mm",
  millimeter: "mm",
  millimeters: "mm",
};

const MAX_MM = 20_000;

/**
 * Reads `1.5`, `1-1/2`, `1 1/2"`, `1.500 in`, `38.1 mm`, `2 3/8`, `52mm`, `3/4`, `,75`.
 * A value without a unit takes `defaultUnit`; anything else is refused with the reason.
 */
export function parseLength(input: string, defaultUnit: LengthUnit): ParsedLength {
  const text = input.trim().toLowerCase().replace(/,/g, ".").replace(/\s+/g, " ");
  if (text === "") throw new UnitParseError("Enter a size, like 1-1/2 in or 38.1 mm.");
  const match = /^(.*?)(?:\s*("|''|in\.?|inch(?:es)?|mm|millimet(?:re|er)s?))?$/.exec(text);
  const numberPart = (match?.[1] ?? "").trim();
  const unit = match?.[2] ? UNIT_WORDS[match[2]] : defaultUnit;
  const value = parseNumber(numberPart);
  if (value === null) {
    throw new UnitParseError(`"${input.trim()}" is not a size. Write it like 1.5, 1-1/2, 1 1/2", 38.1 mm or 52mm.`);
  }
  if (value <= 0) throw new UnitParseError("A size must be more than zero.");
  const mm = toMm(value, unit);
  if (mm > MAX_MM) throw new UnitParseError(`${input.trim()} is larger than any part Understudy deals with.`);
  return { value, unit, mm };
}

function parseNumber(text: string): number | null {
  let m = /^(\d+(?:\.\d*)?|\.\d+)$/.exec(text);
  if (m) return Number(m[1]);
  m = /^(\d+)\/(\d+)$/.exec(text);
  if (m) return fraction(0, m[1], m[2]);
  m = /^(\d+)(?:-| |- | -)(\d+)\/(\d+)$/.exec(text);
  if (m) return fraction(Number(m[1]), m[2], m[3]);
  return null;
}

function fraction(whole: number, numerator: string, denominator: string): number | null {
  const d = Number(denominator);
  if (d === 0) return null;
  return whole + Number(numerator) / d;
}

/**
 * Rounds for display without binary noise: 38.1 stays 38.1, 1.49999999 becomes 1.5. Halves round away from zero, so a
 * deviation of −0.0015 in reads −0.002 in, as +0.0015 in reads +0.002 in.
 */
export function round(value: number, decimals: number): number {
  const f = 10 ** decimals;
  const scaled = Math.abs(value) * f;
  // 1.0049999999 × 100 must round as the 1.005 it stands for.
  const rounded = Math.round(scaled + scaled * Number.EPSILON * 4);
  return (Math.sign(value) * rounded) / f || 0;
}

/**
 * The trade's precision for a length: inches to the thousandth, millimetres to the hundredth. A deviation or a
 * measured value is never shown finer than a person can read it off a micrometer.
 */
export const TRADE_DECIMALS: Record<LengthUnit, number> = { in: 3, mm: 2 };

export function tradeRound(value: number, unit: LengthUnit): number {
  return round(value, TRADE_DECIMALS[unit]);
}

/** `2.380 in`, `61.3 mm`: a measured or computed length at the trade's precision (inches always in thousandths). */
export function showLength(value: number, unit: LengthUnit): string {
  return unit === "in" ? `${tradeRound(value, unit).toFixed(3)} in` : `${tradeRound(value, unit)} mm`;
}

/** A signed deviation at the trade's precision: `+0.004 in`, `−0.05 mm`, `±0 in`. */
export function showDeviation(value: number, unit: LengthUnit): string {
  const rounded = tradeRound(value, unit);
  if (rounded === 0) return `±0 ${unit}`;
  return `${rounded > 0 ? "+" : "−"}${Math.abs(rounded)} ${unit}`;
}

/** `1-1/4 in`, `3/4 in`, `2 in` for a value on the 1/64 grid; decimals otherwise. */
export function inchLabel(inches: number): string {
  const sixtyFourths = Math.round(inches * 64);
  if (Math.abs(sixtyFourths / 64 - inches) > 1e-9) return `${round(inches, 3)} in`;
  const whole = Math.floor(sixtyFourths / 64);
  let numerator = sixtyFourths % 64;
  let denominator = 64;
  while (numerator > 0 && numerator % 2 === 0) {
    numerator /= 2;
    denominator /= 2;
  }
  if (numerator === 0) return `${whole} in`;
  return whole > 0 ? `${whole}-${numerator}/${denominator} in` : `${numerator}/${denominator} in`;
}

export function mmLabel(mm: number): string {
  return `${round(mm, 2)} mm`;
}

export function lengthLabel(value: number, unit: LengthUnit): string {
  return unit === "in" ? inchLabel(value) : mmLabel(value);
}

/**
 * What a person typed, said again in the other unit: `24.98` mm becomes `0.983` in, `1-1/2` in becomes `38.1` mm, at
 * the trade's precision. Text that is not a size (empty, half-typed) is left as it is, for the field to report.
 */
export function convertTyped(text: string, from: LengthUnit, to: LengthUnit): string {
  if (from === to || text.trim() === "") return text;
  try {
    const parsed = parseLength(text, from);
    return String(tradeRound(fromMm(parsed.mm, to), to));
  } catch {
    return text;
  }
}

/** The typed sizes of a form, each converted with convertTyped. */
export function convertTypedSizes<T extends Record<string, string>>(
  sizes: T,
  names: Array<keyof T>,
  from: LengthUnit,
  to: LengthUnit,
): T {
  const next = { ...sizes };
  for (const name of names) next[name] = convertTyped(sizes[name], from, to) as T[keyof T];
  return next;
}

/** Typed sizes as measured values (value in the unit it was typed in), leaving out what is empty or unreadable. */
export function measuredValues<D extends string>(
  typed: Array<[D, string]>,
  defaultUnit: LengthUnit,
): Array<{ dimension: D; value: number; unit: LengthUnit }> {
  return typed.flatMap(([dimension, text]) => {
    try {
      const parsed = parseLength(text, defaultUnit);
      return [{ dimension, value: parsed.value, unit: parsed.unit }];
    } catch {
      return [];
    }
  });
}
