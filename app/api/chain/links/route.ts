import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { chainLinksAnswer } from "@/lib/measure/small-parts";
import { chainLinksQuery } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) =>
  Response.json(chainLinksAnswer(parseWith(chainLinksQuery, queryOf(request)))),
);
