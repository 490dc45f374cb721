import { AppError } from "@/lib/errors";
import { textFault } from "@/lib/http/handle";

/** A request's query string as a plain object, for parsing with a zod schema; a parameter that is not text is a 400. */
export function queryOf(request: Request): Record<string, string> {
  const query = Object.fromEntries(new URL(request.url).searchParams);
  for (const [name, value] of Object.entries(query)) {
    const fault = textFault(value) ?? textFault(name);
    if (fault)
      throw new AppError("validation_failed", `This text ${fault}.`, {
        field: name,
        fields: { [name]: `This text ${fault}.` },
      });
  }
  return query;
}
