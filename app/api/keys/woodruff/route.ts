import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { woodruffAnswer } from "@/lib/measure/small-parts";
import { woodruffQuery } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) => Response.json(woodruffAnswer(parseWith(woodruffQuery, queryOf(request)))));
