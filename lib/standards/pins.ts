import { StandardsInputError } from "@/lib/standards/errors";
import { inchLabel, MM_PER_INCH, round, type LengthUnit } from "@/lib/standards/units";

/**
 * Taper pins: inch pins by their number (ANSI/ASME B18.8.2, large-end diameter, taper 1/4 in per foot on the
 * diameter) and metric pins by their small-end diameter (ISO 2339, taper 1:50).
 */

export const TAPER_INCH_SOURCE = "ASME B18.8.2, taper pins: pin numbers and large-end diameters, taper 1/4 in per foot";
export const TAPER_METRIC_SOURCE = "ISO 2339, taper pins: nominal (small-end) diameter, taper 1:50";

/** Taper 1/4 in per foot on the diameter: the diameter changes by 1/48 of the length. */
export const INCH_TAPER = 1 / 48;
/** ISO 2339: 1:50. */
export const METRIC_TAPER = 1 / 50;

/** ASME B18.8.2 pin numbers and large-end diameters in inches. */
export const TAPER_PINS_INCH: Array<[string, number]> = [
  ["7/0", 0.0625], ["6/0", 0.078], ["5/0", 0.094], ["4/0", 0.109], ["3/0", 0.125], ["2/0", 0.141], ["0", 0.156],
  ["1", 0.172], ["2", 0.193], ["3", 0.219], ["4", 0.25], ["5", 0.289], ["6", 0.341], ["7", 0.409], ["8", 0.492],
  ["9", 0.591], ["10", 0.706],
]; // prettier-ignore

/** ISO 2339 nominal diameters (the small end), in millimetres. */
export const TAPER_PINS_METRIC = [0.6, 0.8, 1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6, 8, 10, 12, 16, 20, 25, 30, 40, 50];

export interface TaperPin {
  /** `No. 4`, `ISO 2339 8` */
  number: string;
  system: "inch" | "metric";
  unit: LengthUnit;
  /** Inch pins: the large end, their nominal; metric pins: the small end, theirs. */
  nominal: number;
  largeEnd: number | null;
  smallEnd: number | null;
  length: number | null;
  taper: string;
  label: string;
  source: string;
}

function inchPin([number, large]: [string, number], length?: number): TaperPin {
  return {
    number: `No. ${number}`,
    system: "inch",
    unit: "in",
    nominal: large,
    largeEnd: large,
    smallEnd: length === undefined ? null : round(large - length * INCH_TAPER, 4),
    length: length ?? null,
    taper: "1/4 in per foot on the diameter",
    label: `Taper pin No. ${number}${length ? ` × ${inchLabel(length)}` : ""}`,
    source: TAPER_INCH_SOURCE,
  };
}

function metricPin(d: number, length?: number): TaperPin {
  return {
    number: `ISO 2339 ${d}`,
    system: "metric",
    unit: "mm",
    nominal: d,
    largeEnd: length === undefined ? null : round(d + length * METRIC_TAPER, 3),
    smallEnd: d,
    length: length ?? null,
    taper: "1:50",
    label: `Taper pin ISO 2339 ${d}${length ? ` × ${length}` : ""}`,
    source: TAPER_METRIC_SOURCE,
  };
}

/**
 * A taper pin from its number: `No. 4`, `#4`, `4/0`, `7/0` (inch), or `ISO 2339 8`, `8 x 40`, `8mm` (metric). A length
 * in millimetres, however it was measured, gives the other end's diameter in the pin's own unit.
 */
export function decodeTaperPin(text: string, lengthMm?: number): TaperPin {
  const t = text.trim().replace(/^taper\s+pin\s*/i, "");
  const metric = /^(?:ISO\s*2339\s*(?:[AB]\s*)?)?(\d+(?:[.,]\d+)?)\s*(?:mm)?(?:\s*[x×]\s*(\d+(?:[.,]\d+)?))?$/i.exec(t);
  const inch = /^(?:no\.?\s*|#\s*)?(\d{1,2}(?:\/0)?)$/i.exec(t);
  if (inch && !/ISO|mm|x|×/i.test(t)) {
    const row = TAPER_PINS_INCH.find(([n]) => n === inch[1]);
    if (!row) throw new StandardsInputError(`No. ${inch[1]} is not an ASME B18.8.2 taper pin: they run 7/0 to 10.`);
    return inchPin(row, lengthMm === undefined ? undefined : round(lengthMm / MM_PER_INCH, 4));
  }
  if (metric && /ISO|mm|x|×|[.,]/i.test(t)) {
    const d = Number(metric[1].replace(",", "."));
    if (!TAPER_PINS_METRIC.includes(d)) throw new StandardsInputError(`${d} mm is not an ISO 2339 taper pin diameter.`);
    const len = metric[2] ? Number(metric[2].replace(",", ".")) : lengthMm;
    return metricPin(d, len);
  }
  throw new StandardsInputError(`"${text.trim()}" is not a taper pin. Write it like No. 4, 4/0 or ISO 2339 8 × 40.`);
}

export interface TaperPinCandidate extends TaperPin {
  /** measured − nominal, in the unit measured in */
  deviation: number;
  reason: string;
}

/**
 * Taper pins for a measured large end. Inch pins are named by it; a metric pin is named by its small end, which is the
 * large end less length/50, so a metric answer needs the length (or the small end measured). A pin that has been
 * driven and drawn reads a little small. Best first.
 */
export function matchTaperPin(input: { largeEndMm: number; lengthMm?: number; unit: LengthUnit }): TaperPinCandidate[] {
  const { largeEndMm, lengthMm, unit } = input;
  const toUnit = (mm: number) => round(unit === "in" ? mm / MM_PER_INCH : mm, unit === "in" ? 3 : 2);
  const inch = TAPER_PINS_INCH.map(([number, large]) => {
    const devMm = largeEndMm - large * MM_PER_INCH;
    const pin = inchPin([number, large], lengthMm === undefined ? undefined : round(lengthMm / MM_PER_INCH, 4));
    return { ...pin, deviation: toUnit(devMm), devMm, reason: "large end against the pin number's diameter" };
  });
  const metric =
    lengthMm === undefined
      ? []
      : TAPER_PINS_METRIC.map((d) => {
          const pin = metricPin(d, round(lengthMm, 2));
          const devMm = largeEndMm - (pin.largeEnd ?? d);
          return {
            ...pin,
            deviation: toUnit(devMm),
            devMm,
            reason: `large end of a ${d} mm pin ${round(lengthMm, 1)} mm long`,
          };
        });
  const preferred = unit === "in" ? "inch" : "metric";
  return [...inch, ...metric]
    .filter((c) => Math.abs(c.devMm) <= Math.max(0.3, c.nominal * 0.04 * (c.unit === "in" ? MM_PER_INCH : 1)))
    .sort(
      (a, b) =>
        Math.abs(a.devMm) -
        Math.abs(b.devMm) +
        (a.system === preferred ? -0.05 : 0) -
        (b.system === preferred ? -0.05 : 0),
    )
    .slice(0, 5)
    .map(({ devMm: _devMm, ...c }) => c);
}

export const PIN_NOTES = [
  "Drive a taper pin out from its small end with a pin punch a little smaller than that end; support the hub so the " +
    "shaft does not bend.",
  "Ream the hole with a taper-pin reamer of the same number before fitting a new pin, so it bears along its length.",
];
