import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { woodruffMatchAnswer } from "@/lib/measure/small-parts";
import { woodruffMatchQuery } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) =>
  Response.json(woodruffMatchAnswer(parseWith(woodruffMatchQuery, queryOf(request)))),
);
