import type { ErrorBody } from "@/lib/errors";

/** The message for one field from an API error, and whatever the fields on screen cannot show. */
export function errorFor(error: ErrorBody | null, field: string): string | undefined {
  return error?.field === field ? error.message : undefined;
}

export function unplacedError(error: ErrorBody | null, shownFields: string[]): string | null {
  if (!error) return null;
  return error.field && shownFields.includes(error.field) ? null : error.message;
}
