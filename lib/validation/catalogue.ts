import { z } from "zod";
import { STANDARD_KINDS } from "@/lib/catalogue/kinds";
import { idFromText } from "@/lib/validation/ids";

export const lookupQuery = z.object({
  q: z
    .string({ error: "Type a factory number or some words." })
    .trim()
    .min(1, "Type a factory number or some words.")
    .max(120, "A search is at most 120 characters."),
  maker: idFromText("maker").optional(),
  limit: z.coerce
    .number({ error: "limit must be a number." })
    .int("limit must be a whole number.")
    .min(1, "limit is at least 1.")
    .max(50, "limit is at most 50.")
    .default(10),
});

export const standardPartsQuery = z.object({
  q: z
    .string({ error: "Type a designation." })
    .trim()
    .min(1, "Type a designation.")
    .max(80, "A designation is at most 80 characters."),
  kind: z.enum(STANDARD_KINDS, { error: "kind is one of the standard part kinds." }).optional(),
  limit: z.coerce
    .number({ error: "limit must be a number." })
    .int()
    .min(1, "limit is at least 1.")
    .max(50, "limit is at most 50.")
    .default(10),
});
