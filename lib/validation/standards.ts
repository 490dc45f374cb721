import { z } from "zod";
import { AppError } from "@/lib/errors";
import { GasketInputError, readTemplate, type GasketTemplate } from "@/lib/standards/gaskets";
import { SURFACES } from "@/lib/standards/nominal";
import { parseWith } from "@/lib/validation/parse";
import { StandardsInputError } from "@/lib/standards/errors";
import { parseLength, type LengthUnit } from "@/lib/standards/units";

// Query strings of the calculator routes. Sizes stay strings here so that 1-1/2, 1 1/2" and 38.1 mm all arrive
// intact; readSize() turns each into millimetres with the reason when it cannot.
const unit = z.enum(["mm", "in"], { error: "Choose mm or in." }).default("mm");
const size = (what: string) =>
  z
    .string({ error: `Enter the ${what}.` })
    .trim()
    .min(1, `Enter the ${what}.`)
    .max(40, `The ${what} is too long.`);
const optionalSize = (what: string) =>
  size(what)
    .optional()
    .or(z.literal("").transform(() => undefined));
const flag = z
  .enum(["1", "0", "true", "false", "yes", "no"])
  .transform((v) => ["1", "true", "yes"].includes(v))
  .optional();
const designation = z
  .string({ error: "Enter a designation." })
  .trim()
  .min(1, "Enter a designation.")
  .max(40, "A designation is at most 40 characters.");

export const bearingDecodeQuery = z.object({ designation });
export const beltDecodeQuery = z.object({ designation });

export const bearingMatchQuery = z.object({
  bore: size("bore"),
  od: size("outside diameter"),
  width: optionalSize("width"),
  unit,
  tolerance: optionalSize("tolerance"),
});

export const sealMatchQuery = z.object({
  shaft: size("shaft diameter"),
  bore: size("housing bore"),
  width: optionalSize("width"),
  unit,
  tolerance: optionalSize("tolerance"),
  grooved: flag,
  lips: z.enum(["single", "double"]).optional(),
  spring: flag,
  dustLip: flag,
  outside: z.enum(["metal", "rubber"]).optional(),
});

export const pressFitQuery = z.object({
  bore: size("housing bore"),
  sealOd: size("seal outside diameter"),
  unit,
  outside: z.enum(["metal", "rubber"], { error: "Choose metal or rubber." }).default("metal"),
});

export const shaftCheckQuery = z.object({ shaft: size("shaft diameter"), unit, grooved: flag });

export const driveQuery = z
  .object({
    large: size("large pulley's pitch diameter"),
    small: size("small pulley's pitch diameter"),
    center: optionalSize("centre distance"),
    length: optionalSize("belt pitch length"),
    /** An adjustable (split-flange) small pulley: its largest pitch diameter, with `small` as its smallest. */
    smallMax: optionalSize("adjustable pulley's largest pitch diameter"),
    unit,
    section: z.string().trim().max(12).optional(),
  })
  .refine((q) => (q.center === undefined) !== (q.length === undefined), {
    message: "Give either the centre distance or the belt length, not both.",
    path: ["center"],
  });

export const beltIdentifyQuery = z.object({ top: size("top width"), height: optionalSize("thickness"), unit });

export const nominalQuery = z.object({
  value: size("measured value"),
  unit,
  surface: z
    .enum(SURFACES as [string, ...string[]], { error: `Choose one of: ${SURFACES.join(", ")}.` })
    .default("none"),
});

/** Runs engine code on a field's input; the engine's refusal becomes a 400 naming that field. */
export function forField<T>(field: string, run: () => T): T {
  try {
    return run();
  } catch (error) {
    if (error instanceof StandardsInputError)
      throw new AppError("validation_failed", error.message, { field, fields: { [field]: error.message } });
    throw error;
  }
}

/** A size from the query, in millimetres. */
export function readSize(field: string, value: string, defaultUnit: LengthUnit): number {
  return forField(field, () => parseLength(value, defaultUnit).mm);
}

export function readOptionalSize(
  field: string,
  value: string | undefined,
  defaultUnit: LengthUnit,
): number | undefined {
  return value === undefined ? undefined : readSize(field, value, defaultUnit);
}

/** The default matching tolerance: 0.1 mm, or 0.004 in for inch input. */
export function readTolerance(value: string | undefined, unit: LengthUnit): number {
  if (value === undefined) return unit === "in" ? 0.1016 : 0.1;
  const mm = readSize("tolerance", value, unit);
  if (mm > 5)
    throw new AppError("validation_failed", "A tolerance over 5 mm would match almost anything.", {
      field: "tolerance",
    });
  return mm;
}

export const feltQuery = z.object({
  shaft: size("shaft diameter"),
  bore: size("seat's bore"),
  width: size("seat's width"),
  unit,
});

export const packingQuery = z.object({
  shaft: size("shaft diameter"),
  bore: size("stuffing box's bore"),
  depth: optionalSize("stuffing box's depth"),
  unit,
});

export const plugQuery = z.object({
  bore: size("bore"),
  unit,
  kind: z.enum(["cup", "disc"], { error: "The kind is cup or disc." }).default("cup"),
});

const templateText = (what: string, max = 400) =>
  z
    .string()
    .trim()
    .max(max, `The ${what} is at most ${max} characters.`)
    .optional()
    .or(z.literal("").transform(() => undefined));

/** A gasket template's query: lengths and lists as text, read and checked by the gasket engine. */
export const gasketQuery = z.object({
  unit: z.enum(["mm", "in"], { error: "Choose mm or in." }).default("mm"),
  outline: z.enum(["circle", "rect", "polygon"], { error: "The outline is one of: circle, rect, polygon." }),
  od: templateText("outside diameter", 40),
  width: templateText("width", 40),
  height: templateText("height", 40),
  radius: templateText("corner radius", 40),
  points: templateText("list of points", 4000),
  bore: templateText("bore", 40),
  cutouts: templateText("list of cut-outs", 2000),
  holes: templateText("number of holes", 4),
  pcd: templateText("bolt circle", 40),
  angle: templateText("angle", 12),
  holeAt: templateText("list of hole positions", 4000),
  hole: templateText("hole diameter", 40),
  use: z
    .enum(["water", "oil", "fuel", "exhaust"], { error: "The use is one of: water, oil, fuel, exhaust." })
    .default("water"),
});

/** A gasket template from its query; the engine's refusal becomes a 400 naming the parameter it is about. */
export function readGasketQuery(query: unknown): GasketTemplate {
  const q = parseWith(gasketQuery, query);
  try {
    return readTemplate(q);
  } catch (error) {
    if (error instanceof GasketInputError)
      throw new AppError("validation_failed", error.message, {
        field: error.field,
        fields: { [error.field]: error.message },
      });
    throw error;
  }
}

const count = (what: string) =>
  z
    .string({ error: `Enter the ${what}.` })
    .trim()
    .regex(/^\d{1,3}$/, `The ${what} is a whole number.`)
    .transform(Number);

export const woodruffQuery = z.object({ number: designation });
export const woodruffMatchQuery = z.object({
  width: size("key's width"),
  diameter: size("key's diameter"),
  height: optionalSize("key's height"),
  unit,
});
export const parallelKeyQuery = z.object({ shaft: size("shaft diameter"), unit });
export const taperPinQuery = z.object({ number: designation, length: optionalSize("pin's length"), unit });
export const taperPinMatchQuery = z.object({
  largeEnd: size("large end's diameter"),
  length: optionalSize("pin's length"),
  unit,
});
export const threadQuery = z
  .object({
    diameter: size("thread's outside diameter"),
    tpi: z
      .string()
      .trim()
      .regex(/^\d+(\.\d+)?$/, "Threads per inch is a number, like 20 or 11.5.")
      .transform(Number)
      .optional()
      .or(z.literal("").transform(() => undefined)),
    pitch: optionalSize("pitch"),
    unit,
  })
  .refine((q) => (q.tpi === undefined) !== (q.pitch === undefined), {
    message: "Give the threads per inch or the pitch, not both.",
    path: ["tpi"],
  });
export const chainDecodeQuery = z.object({ number: designation });
export const chainIdentifyQuery = z.object({
  pitch: size("pitch"),
  roller: size("roller diameter"),
  width: optionalSize("width between the inner plates"),
  unit,
});
export const chainLinksQuery = z
  .object({
    number: z.string().trim().max(40).optional(),
    pitch: optionalSize("pitch"),
    teeth1: count("small sprocket's teeth"),
    teeth2: count("large sprocket's teeth"),
    center: size("centre distance"),
    unit,
  })
  .refine((q) => Boolean(q.number) !== (q.pitch !== undefined), {
    message: "Give the chain's number or its pitch.",
    path: ["number"],
  });
