/** "25 × 52 × 15 mm", "length 1138 mm": a standard part's sizes in one line. */
export function standardSizes(s: { innerMm: number | null; outerMm: number | null; widthMm: number | null; lengthMm: number | null }): string {
  const parts = [s.innerMm, s.outerMm, s.widthMm].filter((v) => v !== null);
  const text = parts.length > 0 ? `${parts.join(" × ")} mm` : "";
  return s.lengthMm ? `${text}${text ? ", " : ""}length ${s.lengthMm} mm` : text;
}
