import type { z } from "zod";
import { AppError } from "@/lib/errors";

/** Field-name → first message, for forms and for 400 bodies. */
export function fieldErrors(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const name = issue.path.length > 0 ? issue.path.join(".") : "body";
    fields[name] ??= issue.message;
  }
  return fields;
}

export function parseWith<S extends z.ZodType>(schema: S, input: unknown): z.infer<S> {
  const result = schema.safeParse(input);
  if (result.success) return result.data;
  const fields = fieldErrors(result.error);
  const [field, message] = Object.entries(fields)[0] ?? ["body", "The request is not valid."];
  throw new AppError("validation_failed", message, { field, fields });
}
