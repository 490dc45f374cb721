import { z } from "zod";
import { MEASURED_KINDS } from "@/lib/lists/standard-item";
import { positiveId } from "@/lib/validation/ids";

const quantity = z
  .number({ error: "The quantity is a whole number." })
  .int("The quantity is a whole number.")
  .min(1, "The quantity is at least 1.")
  .max(9999, "The quantity is at most 9999.");

export const listInput = z.object({
  title: z
    .string({ error: "Give the list a title." })
    .trim()
    .min(2, "Give the list a title, e.g. water pump rebuild.")
    .max(120, "A title is at most 120 characters."),
  machineId: positiveId("the machine").nullable().optional(),
  /** As on the machine's plate ("22-4100"); checked against the machine's serials by lib/lists. Empty clears it. */
  machineSerial: z
    .string({ error: "The serial is text, as on the plate." })
    .trim()
    .max(20, "A serial is at most 20 characters.")
    .nullable()
    .optional(),
  notes: z.string().trim().max(2000, "Notes are at most 2000 characters.").optional(),
});

export const listPatch = listInput.partial();

/** A standard part worked out by a calculator: what to ask for, by kind and designation, with a note of the sizes. */
export const measuredItemInput = z.object({
  kind: z.enum(MEASURED_KINDS, { error: `The kind is one of: ${MEASURED_KINDS.join(", ")}.` }),
  designation: z
    .string({ error: "Give the designation." })
    .trim()
    .min(2, "Give the designation, e.g. 6205-2RS or 1-1/2 × 2.374 × 1/2 in.")
    .max(80, "A designation is at most 80 characters."),
  note: z.string().trim().max(300, "A note is at most 300 characters.").optional(),
  /** A gasket's template query, from the gasket designer. */
  template: z.string().trim().max(4000, "A template is at most 4000 characters.").optional(),
});

export const lineInput = z
  .object({
    partId: positiveId("the part").optional(),
    number: z
      .string()
      .trim()
      .min(1, "Type a factory number.")
      .max(60, "A factory number is at most 60 characters.")
      .optional(),
    standard: measuredItemInput.optional(),
    quantity: quantity.default(1),
    notes: z.string().trim().max(500, "Notes are at most 500 characters.").optional(),
  })
  .refine((v) => [v.partId, v.number, v.standard].filter((x) => x !== undefined).length === 1, {
    message: "Give one of: a part id, a factory number, or a standard part from a calculator.",
    path: ["number"],
  });

/** The job list's "Add a part by factory number" form. */
export const addByNumberForm = z.object({
  number: z.string().trim().min(1, "Type a factory number.").max(60, "A factory number is at most 60 characters."),
  quantity: z.coerce.number({ error: "The quantity is a whole number." }).pipe(quantity),
});

/** A new list, with the first part on it when it is started from a part or a calculator ("Add to a job list"). */
export const newListInput = listInput.extend({ firstLine: lineInput.optional() });

/** The "Add to a job list" form: an existing list by id, or "new" with a title; the quantity to add. */
export const addToListForm = z
  .object({
    list: z.string().min(1, "Choose a list."),
    title: z.string().trim().max(120, "A title is at most 120 characters.").default(""),
    quantity: z.coerce.number({ error: "The quantity is a whole number." }).pipe(quantity),
  })
  .refine((v) => v.list !== "new" || v.title.length >= 2, {
    message: "Give the new list a title, e.g. water pump rebuild.",
    path: ["title"],
  });

export const linePatch = z.object({
  quantity: quantity.optional(),
  notes: z.string().trim().max(500, "Notes are at most 500 characters.").optional(),
  standardPartId: positiveId("the standard part").nullable().optional(),
  supplier: z
    .string({ error: "The supplier is text." })
    .trim()
    .max(120, "A supplier's name is at most 120 characters.")
    .optional(),
  supplierNumber: z
    .string({ error: "The supplier's number is text." })
    .trim()
    .max(60, "A supplier's number is at most 60 characters.")
    .optional(),
  /** In the shop's own currency, to the cent: "12.50", or empty to clear. */
  unitPrice: z
    .union([
      z.number({ error: "The unit price is a number." }),
      z.string({ error: "The unit price is a number." }).trim(),
    ])
    .transform((v, ctx) => {
      if (v === "") return null;
      const n = typeof v === "number" ? v : Number(v.replace(",", "."));
      if (!Number.isFinite(n) || n < 0 || n >= 100_000_000) {
        ctx.addIssue({ code: "custom", message: "The unit price is a number from 0 up to 99,999,999.99." });
        return z.NEVER;
      }
      if (Math.round(n * 100) !== Number((n * 100).toFixed(6))) {
        ctx.addIssue({ code: "custom", message: "The unit price has at most two decimal places." });
        return z.NEVER;
      }
      return n.toFixed(2);
    })
    .nullable()
    .optional(),
  ordered: z.boolean({ error: "ordered is true or false." }).optional(),
});

/**
 * "Add the rest of the assembly" for one serial, when the list has none: the serial or a range's end, as on the plate.
 */
export const assemblyInput = z.object({
  serial: z
    .string({ error: "The serial is text, as on the plate." })
    .trim()
    .min(1, "Type the serial.")
    .max(20, "A serial is at most 20 characters.")
    .optional(),
});

export const shareInput = z.object({ enabled: z.boolean({ error: "enabled is true or false." }) });

export const tokenQuery = z.object({ token: z.string().min(10).max(64).optional() });
