import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { decodeBearing } from "@/lib/standards/bearings";
import { bearingDecodeQuery, forField } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) => {
  const { designation } = parseWith(bearingDecodeQuery, queryOf(request));
  const decoded = forField("designation", () => decodeBearing(designation));
  return Response.json(decoded);
});
