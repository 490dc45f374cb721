import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { chainIdentifyAnswer } from "@/lib/measure/small-parts";
import { chainIdentifyQuery } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) =>
  Response.json(chainIdentifyAnswer(parseWith(chainIdentifyQuery, queryOf(request)))),
);
