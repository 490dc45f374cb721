import { publicJson } from "@/lib/http/cache";
import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { sealAnswer } from "@/lib/measure/answers";
import { sealMatchQuery } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) =>
  publicJson(request, { readsCatalogue: true }, () => sealAnswer(parseWith(sealMatchQuery, queryOf(request)))),
);
