import { z } from "zod";
import { IMPORT_TARGETS } from "@/lib/imports/kinds";
import { idFromText } from "@/lib/validation/ids";

export const importUploadFields = z.object({
  target: z.enum(IMPORT_TARGETS, { error: "target is catalogue or review_queue." }).optional(),
  mappingId: idFromText("saved mapping").optional(),
});

export const mappingBody = z.object({
  mapping: z.record(z.string(), z.string().max(200).nullable(), {
    error: "mapping is an object of field → column title.",
  }),
});

export const savedMappingBody = mappingBody.extend({
  name: z
    .string({ error: "Give the mapping a name." })
    .trim()
    .min(2, "Give the mapping a name.")
    .max(80, "A name is at most 80 characters."),
});
