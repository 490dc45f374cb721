import { z } from "zod";
import { FITS, PART_CATEGORIES, STANDARD_KINDS } from "@/lib/catalogue/kinds";
import { idFromText, positiveId } from "@/lib/validation/ids";
import {
  DECISIONS,
  MEASURED_DIMENSIONS,
  PHOTO_MAX_BYTES,
  PHOTO_TYPES,
  PHOTOS_PER_PROPOSAL,
} from "@/lib/proposals/kinds";

// One schema for the proposal form in the browser and for POST/PATCH /api/proposals on the server.

const mm = (what: string) =>
  z
    .number({ error: `${what} is a number in millimetres.` })
    .positive(`${what} is more than 0 mm.`)
    .max(5000, `${what} is at most 5000 mm.`)
    .nullable()
    .optional();

const original = z
  .object({
    mode: z.enum(["existing", "new"], { error: "Say whether the part is in the catalogue or new." }),
    partId: positiveId("the part").nullable().optional(),
    makerId: positiveId("the maker").nullable().optional(),
    number: z.string().trim().max(60, "A factory number is at most 60 characters.").optional(),
    description: z.string().trim().max(200, "A description is at most 200 characters.").optional(),
    category: z.enum(PART_CATEGORIES, { error: "Choose what kind of part it is." }).nullable().optional(),
    machineId: positiveId("the machine").nullable().optional(),
    assemblyId: positiveId("the assembly").nullable().optional(),
  })
  .superRefine((value, ctx) => {
    if (value.mode === "existing") {
      if (!value.partId)
        ctx.addIssue({ code: "custom", path: ["partId"], message: "Pick the part from the catalogue." });
      return;
    }
    if (!value.makerId) ctx.addIssue({ code: "custom", path: ["makerId"], message: "Choose the maker." });
    if (!value.number || value.number.length < 2)
      ctx.addIssue({ code: "custom", path: ["number"], message: "Type the factory number as stamped." });
    if (!value.description || value.description.length < 3)
      ctx.addIssue({
        code: "custom",
        path: ["description"],
        message: "Say what the part is, e.g. “fan shaft bearing, front”.",
      });
    if (!value.category)
      ctx.addIssue({ code: "custom", path: ["category"], message: "Choose what kind of part it is." });
    if (value.machineId && !value.assemblyId)
      ctx.addIssue({ code: "custom", path: ["assemblyId"], message: "Say where on the machine it sits." });
  });

const standard = z
  .object({
    mode: z.enum(["existing", "new"], { error: "Say whether the standard part is in the catalogue or new." }),
    standardPartId: positiveId("the standard part").nullable().optional(),
    kind: z.enum(STANDARD_KINDS, { error: "Choose the kind of standard part." }).nullable().optional(),
    designation: z.string().trim().max(80, "A designation is at most 80 characters.").optional(),
    innerMm: mm("The bore"),
    outerMm: mm("The outside diameter"),
    widthMm: mm("The width"),
    lengthMm: mm("The length"),
    /** A gasket's template: the link from the gasket designer, or its query. */
    template: z.string().trim().max(4000, "A template is at most 4000 characters.").nullable().optional(),
  })
  .superRefine((value, ctx) => {
    if (value.mode === "existing") {
      if (!value.standardPartId)
        ctx.addIssue({ code: "custom", path: ["standardPartId"], message: "Pick the standard part." });
      return;
    }
    if (!value.kind) ctx.addIssue({ code: "custom", path: ["kind"], message: "Choose the kind of standard part." });
    // A gasket drawn as a template is named by its template when no designation is typed.
    const named = value.kind === "gasket" && Boolean(value.template);
    if (!named && (!value.designation || value.designation.length < 2)) {
      ctx.addIssue({
        code: "custom",
        path: ["designation"],
        message: "Type the designation, e.g. 6205-2RS, 35 × 52 × 7 or B43.",
      });
    }
  });

export const measurementSchema = z.object({
  dimension: z.enum(MEASURED_DIMENSIONS, { error: "Say which size this is." }),
  label: z.string().trim().max(60, "A label is at most 60 characters.").optional(),
  value: z
    .number({ error: "A measurement is a number." })
    .positive("A measurement is more than 0.")
    .max(5000, "A measurement is at most 5000."),
  unit: z.enum(["mm", "in"], { error: "The unit is mm or in." }),
});

export const proposalInput = z.object({
  original,
  standard,
  fit: z.enum(FITS, { error: "Choose how it fitted." }),
  measurements: z.array(measurementSchema).max(12, "At most 12 measurements.").default([]),
  notes: z.string().trim().max(2000, "Notes are at most 2000 characters.").default(""),
  photoIds: z
    .array(positiveId("the photo"))
    .max(PHOTOS_PER_PROPOSAL, `At most ${PHOTOS_PER_PROPOSAL} photos.`)
    .default([]),
});
export type ProposalInput = z.output<typeof proposalInput>;
export type ProposalFormValues = z.input<typeof proposalInput>;

export const decisionInput = z
  .object({
    action: z.enum(DECISIONS, { error: "The action is approve, reject or request_changes." }),
    message: z.string().trim().max(2000, "The message is at most 2000 characters.").default(""),
    version: z.number().int().positive().optional(),
  })
  .superRefine((value, ctx) => {
    if (value.action !== "approve" && value.message.length < 3) {
      ctx.addIssue({
        code: "custom",
        path: ["message"],
        message: value.action === "reject" ? "Give the member a reason." : "Tell the member what to change.",
      });
    }
  });

export const confirmationInput = z.object({
  note: z.string().trim().max(500, "A note is at most 500 characters.").default(""),
});

export const presignInput = z.object({
  contentType: z.enum(PHOTO_TYPES, { error: "Photos are JPEG, PNG or WebP images." }),
  size: z
    .number({ error: "size is the file's size in bytes." })
    .int("size is a whole number of bytes.")
    .positive("The file is empty.")
    .max(PHOTO_MAX_BYTES, `A photo is at most ${PHOTO_MAX_BYTES / 1024 / 1024} MB.`),
  fileName: z.string().trim().max(200, "A file name is at most 200 characters.").optional(),
});

export const proposalsQuery = z.object({
  mine: z.enum(["1", "true"]).optional(),
  status: z.enum(["pending", "changes_requested", "approved", "rejected"]).optional(),
  category: z.enum(PART_CATEGORIES).optional(),
  maker: idFromText("maker").optional(),
  q: z.string().trim().max(80, "q is at most 80 characters.").optional(),
  limit: z.coerce
    .number({ error: "limit must be a number." })
    .int("limit must be a whole number.")
    .min(1, "limit is at least 1.")
    .max(200, "limit is at most 200.")
    .default(100),
  offset: z.coerce
    .number({ error: "offset must be a number." })
    .int("offset must be a whole number.")
    .min(0, "offset is at least 0.")
    .max(1_000_000, "offset is at most 1000000.")
    .default(0),
});

/** The review queue page's filters, from its address; a value that cannot be read is left out, not an error. */
export const queuePageQuery = z.object({
  category: z.enum(PART_CATEGORIES).optional().catch(undefined),
  maker: idFromText("maker").optional().catch(undefined),
  q: z
    .string()
    .trim()
    .max(80)
    .optional()
    .catch(undefined)
    .transform((v) => v || undefined),
  page: z.coerce.number().int().min(1).max(10_000).catch(1).default(1),
});

export const notificationsInput = z.object({
  notifyByEmail: z.boolean({ error: "notifyByEmail is true or false." }),
});

export const auditQuery = z.object({
  limit: z.coerce.number().int().min(1, "limit is at least 1.").max(200, "limit is at most 200.").default(50),
  // The id of the last entry seen: the next page starts below it.
  before: idFromText("audit entry").optional(),
});
