import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { checkPressFit } from "@/lib/standards/seals";
import { pressFitQuery, readSize } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) => {
  const q = parseWith(pressFitQuery, queryOf(request));
  const fit = checkPressFit({
    boreMm: readSize("bore", q.bore, q.unit),
    sealOdMm: readSize("sealOd", q.sealOd, q.unit),
    outside: q.outside,
    unit: q.unit,
  });
  return Response.json(fit);
});
