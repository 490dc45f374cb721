import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { taperPinAnswer } from "@/lib/measure/small-parts";
import { taperPinQuery } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) => Response.json(taperPinAnswer(parseWith(taperPinQuery, queryOf(request)))));
