import { z } from "zod";
import { positiveId } from "@/lib/validation/ids";

const quantity = z.number({ error: "The quantity is a whole number." }).int("The quantity is a whole number.").min(1, "The quantity is at least 1.").max(9999, "The quantity is at most 9999.");

export const listInput = z.object({
  title: z.string({ error: "Give the list a title." }).trim().min(2, "Give the list a title, e.g. water pump rebuild.").max(120, "A title is at most 120 characters."),
  machineId: positiveId("the machine").nullable().optional(),
  notes: z.string().trim().max(2000, "Notes are at most 2000 characters.").optional(),
});

export const listPatch = listInput.partial();

export const lineInput = z
  .object({
    partId: positiveId("the part").optional(),
    number: z.string().trim().min(1, "Type a factory number.").max(60, "A factory number is at most 60 characters.").optional(),
    quantity: quantity.default(1),
    notes: z.string().trim().max(500, "Notes are at most 500 characters.").optional(),
  })
  .refine((v) => v.partId !== undefined || v.number !== undefined, { message: "Give a part id or a factory number.", path: ["number"] });

export const linePatch = z.object({
  quantity: quantity.optional(),
  notes: z.string().trim().max(500, "Notes are at most 500 characters.").optional(),
  standardPartId: positiveId("the standard part").nullable().optional(),
});

export const shareInput = z.object({ enabled: z.boolean({ error: "enabled is true or false." }) });

export const tokenQuery = z.object({ token: z.string().min(10).max(64).optional() });
