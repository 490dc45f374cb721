import { tradeRound } from "@/lib/standards/units";

/** "25 × 52 × 15 mm", "38.1 × 60.3 × 12.7 mm", "length 1138 mm": a standard part's sizes in one line, to 0.01 mm. */
export function standardSizes(s: {
  innerMm: number | null;
  outerMm: number | null;
  widthMm: number | null;
  lengthMm: number | null;
}): string {
  const parts = [s.innerMm, s.outerMm, s.widthMm]
    .filter((v): v is number => v !== null)
    .map((v) => tradeRound(v, "mm"));
  const text = parts.length > 0 ? `${parts.join(" × ")} mm` : "";
  return s.lengthMm ? `${text}${text ? ", " : ""}length ${tradeRound(s.lengthMm, "mm")} mm` : text;
}
