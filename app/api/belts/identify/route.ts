import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { beltSectionAnswer } from "@/lib/measure/answers";
import { beltIdentifyQuery } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) =>
  Response.json(await beltSectionAnswer(parseWith(beltIdentifyQuery, queryOf(request)))),
);
