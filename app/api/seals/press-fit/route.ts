import { handle } from "@/lib/http/handle";
import { checkPressFit } from "@/lib/standards/seals";
import { pressFitQuery, queryOf, readSize } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) => {
  const q = parseWith(pressFitQuery, queryOf(request));
  const fit = checkPressFit({ boreMm: readSize("bore", q.bore, q.unit), sealOdMm: readSize("sealOd", q.sealOd, q.unit), outside: q.outside, unit: q.unit });
  return Response.json(fit);
});
