import { publicJson } from "@/lib/http/cache";
import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { bearingAnswer } from "@/lib/measure/answers";
import { bearingMatchQuery } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) =>
  publicJson(request, { readsCatalogue: true }, () => bearingAnswer(parseWith(bearingMatchQuery, queryOf(request)))),
);
