import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { threadAnswer } from "@/lib/measure/small-parts";
import { threadQuery } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) => Response.json(threadAnswer(parseWith(threadQuery, queryOf(request)))));
