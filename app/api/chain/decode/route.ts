import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { chainDecodeAnswer } from "@/lib/measure/small-parts";
import { chainDecodeQuery } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) =>
  Response.json(chainDecodeAnswer(parseWith(chainDecodeQuery, queryOf(request)))),
);
