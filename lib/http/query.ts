/** A request's query string as a plain object, for parsing with a zod schema. */
export function queryOf(request: Request): Record<string, string> {
  return Object.fromEntries(new URL(request.url).searchParams);
}
