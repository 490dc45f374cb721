import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { workOut } from "@/lib/measure/calculators";

/** The GET handler of a calculator the engine answers alone: the same function the browser runs offline. */
export const calculatorRoute = (path: string) =>
  handle(async (request) => Response.json(workOut(path, queryOf(request))));
