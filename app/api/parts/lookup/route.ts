import { lookUpParts } from "@/lib/catalogue/find-parts";
import { publicJson } from "@/lib/http/cache";
import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { lookupQuery } from "@/lib/validation/catalogue";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

/** `?q=` a factory number, part of one, or words; `&maker=` an id keeps the results to one maker; `&limit=`. */
export const GET = handle(async (request) => {
  const { q, limit, maker } = parseWith(lookupQuery, queryOf(request));
  return publicJson(request, { readsCatalogue: true }, async () => ({
    results: await lookUpParts(q, { limit, makerId: maker ?? null }),
  }));
});
