import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { driveAnswer } from "@/lib/measure/answers";
import { driveQuery } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) => Response.json(await driveAnswer(parseWith(driveQuery, queryOf(request)))));
