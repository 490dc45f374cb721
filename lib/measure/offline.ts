import { ApiError } from "@/lib/hooks/use-api";
import { AppError, errorBody } from "@/lib/errors";
import { workOut } from "@/lib/measure/calculators";

/**
 * A calculator's answer worked out in the browser, for when there is no connection: the API's own function on the
 * address's query, with a bad size refused in the API's own words.
 */
export function workOutHere(url: string): unknown {
  const address = new URL(url, "http://understudy.invalid");
  try {
    const answer = workOut(address.pathname, Object.fromEntries(address.searchParams));
    return { ...(answer as object), offline: true };
  } catch (error) {
    if (error instanceof AppError) throw new ApiError(errorBody(error), error.status);
    throw new ApiError({ error: "internal", message: "That could not be worked out on this device." }, 500);
  }
}
