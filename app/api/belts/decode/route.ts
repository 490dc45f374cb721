import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { decodeBelt } from "@/lib/standards/belts";
import { beltDecodeQuery, forField } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) => {
  const { designation } = parseWith(beltDecodeQuery, queryOf(request));
  return Response.json(forField("designation", () => decodeBelt(designation)));
});
