import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { findSection, standardLengthsForPitch } from "@/lib/standards/belts";
import { adjustablePulleyRange, atTradePrecision, solveDrive } from "@/lib/standards/drive";
import { fromMm, toMm, tradeRound } from "@/lib/standards/units";
import { driveQuery, forField, readOptionalSize, readSize } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

// Geometry runs in the unit asked for; sizes typed with their own unit ("250 mm" on an inch form) are converted first.
export const GET = handle(async (request) => {
  const q = parseWith(driveQuery, queryOf(request));
  const inUnit = (mm: number | undefined) => (mm === undefined ? undefined : fromMm(mm, q.unit));
  const large = inUnit(readSize("large", q.large, q.unit)) as number;
  const small = inUnit(readSize("small", q.small, q.unit)) as number;
  const center = inUnit(readOptionalSize("center", q.center, q.unit));
  const length = inUnit(readOptionalSize("length", q.length, q.unit));
  const field = center !== undefined ? "center" : "length";
  const drive = forField(field, () => solveDrive({ large, small, center, length }));
  const body: Record<string, unknown> = { unit: q.unit, ...atTradePrecision(drive, q.unit) };
  const smallMax = inUnit(readOptionalSize("smallMax", q.smallMax, q.unit));
  if (smallMax !== undefined) {
    const range = forField("smallMax", () =>
      adjustablePulleyRange({ fixed: large, adjustableMin: small, adjustableMax: smallMax, center: drive.center }),
    );
    body.adjustableRange = { shortest: tradeRound(range.shortest, q.unit), longest: tradeRound(range.longest, q.unit) };
  }
  if (q.section) {
    const section = forField("section", () => findSection(q.section as string));
    body.standardLengths = standardLengthsForPitch(section, toMm(drive.pitchLength, q.unit));
  }
  return Response.json(body);
});
