import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { parallelKeyAnswer } from "@/lib/measure/small-parts";
import { parallelKeyQuery } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) =>
  Response.json(parallelKeyAnswer(parseWith(parallelKeyQuery, queryOf(request)))),
);
