import { publicJson } from "@/lib/http/cache";
import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { feltAnswer } from "@/lib/measure/answers";
import { feltQuery } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) =>
  publicJson(request, { readsCatalogue: true }, () => feltAnswer(parseWith(feltQuery, queryOf(request)))),
);
