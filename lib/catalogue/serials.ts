import { AppError } from "@/lib/errors";

/**
 * Machine serials as stamped on the plate ("22-4100"): a machine's prefix and a running number. Ranges compare the
 * running number; the prefix is shown back so that the person reads what is on their plate.
 */
export function parseSerial(input: string, prefix: string | null, field = "machineSerial"): number {
  const typed = input.trim().toUpperCase();
  const compact = (text: string) => text.replace(/[\s\-/.]+/g, "");
  const own = compact(prefix ?? "").toUpperCase();
  // "K402650" on a machine whose serials start K40-: a prefix with a letter in it cannot be mistaken for digits.
  if (/[A-Z]/.test(own) && compact(typed).startsWith(own) && /^\d{1,7}$/.test(compact(typed).slice(own.length)))
    return Number(compact(typed).slice(own.length));
  const match = /^(.*?)[\s\-/.]*(\d{1,7})$/.exec(typed);
  if (!match)
    throw new AppError(
      "validation_failed",
      `Type the serial from the machine's plate${prefix ? `, for example ${prefix}4100` : ""}.`,
      { field },
    );
  if (match[1] && compact(match[1]) !== own)
    throw new AppError(
      "validation_failed",
      `Serials of this machine start ${prefix ?? "with a number"}; ${input.trim()} belongs to another model.`,
      { field },
    );
  return Number(match[2]);
}

export const showSerial = (serial: number, prefix: string | null) => `${prefix ?? ""}${serial}`;

export function coversSerial(range: { serialFrom: number | null; serialTo: number | null }, serial: number): boolean {
  return (
    (range.serialFrom === null || serial >= range.serialFrom) && (range.serialTo === null || serial <= range.serialTo)
  );
}

/**
 * A usage's serials in words: "all serials", "to serial 22-1340", "from serial 22-1341", "serials 22-1341 to 22-2000".
 */
export function serialRangeText(
  range: { serialFrom: number | null; serialTo: number | null },
  prefix: string | null,
): string | null {
  const { serialFrom: from, serialTo: to } = range;
  if (from === null && to === null) return null;
  if (from === null) return `to serial ${showSerial(to!, prefix)}`;
  if (to === null) return `from serial ${showSerial(from, prefix)}`;
  return `serials ${showSerial(from, prefix)} to ${showSerial(to, prefix)}`;
}
