import { findStandardParts } from "@/lib/catalogue/find-standard";
import { publicJson } from "@/lib/http/cache";
import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { standardPartsQuery } from "@/lib/validation/catalogue";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) => {
  const { q, kind, limit } = parseWith(standardPartsQuery, queryOf(request));
  return publicJson(request, { readsCatalogue: true }, async () => ({
    results: await findStandardParts(q, kind, limit),
  }));
});
