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

/** Rounds for display without binary noise: 38.1 stays 38.1, 1.49999999 becomes 1.5. */
export function round(value: number, decimals: number): number {
  const f = 10 ** decimals;
  return Math.round(value * f) / f;
}

/** `1-1/4 in`, `3/4 in`, `2 in` for a value on the 1/64 grid; decimals otherwise. */
export function inchLabel(inches: number): string {
  const sixtyFourths = Math.round(inches * 64);
  if (Math.abs(sixtyFourths / 64 - inches) > 1e-9) return `${round(inches, 4)} in`;
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
