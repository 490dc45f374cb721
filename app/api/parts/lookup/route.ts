import { findPartsByNumber } from "@/lib/catalogue/find-parts";
import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { lookupQuery } from "@/lib/validation/catalogue";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) => {
  const { q, limit } = parseWith(lookupQuery, queryOf(request));
  return Response.json({ results: await findPartsByNumber(q, limit) });
});
