import { publicJson } from "@/lib/http/cache";
import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { workOut } from "@/lib/measure/calculators";

/**
 * The GET handler of a calculator the engine answers alone: the same function the browser runs offline, with an
 * answer anyone may keep (it changes only with the build).
 */
export const calculatorRoute = (path: string) =>
  handle(async (request) => publicJson(request, { readsCatalogue: false }, () => workOut(path, queryOf(request))));
