import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { taperPinMatchAnswer } from "@/lib/measure/small-parts";
import { taperPinMatchQuery } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) =>
  Response.json(taperPinMatchAnswer(parseWith(taperPinMatchQuery, queryOf(request)))),
);
