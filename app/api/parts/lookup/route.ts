import { findPartsByNumber } from "@/lib/catalogue/find-parts";
import { handle } from "@/lib/http/handle";
import { lookupQuery } from "@/lib/validation/catalogue";
import { parseWith } from "@/lib/validation/parse";
import { queryOf } from "@/lib/validation/standards";

export const runtime = "nodejs";

export const GET = handle(async (request) => {
  const { q, limit } = parseWith(lookupQuery, queryOf(request));
  return Response.json({ results: await findPartsByNumber(q, limit) });
});
