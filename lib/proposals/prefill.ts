import { z } from "zod";
import { STANDARD_KINDS } from "@/lib/catalogue/kinds";
import { checkStandard } from "@/lib/proposals/checks";
import { MEASURED_DIMENSIONS, type Measurement } from "@/lib/proposals/kinds";
import type { ProposalFormValues } from "@/lib/validation/proposals";

const measurementText = z
  .string()
  .regex(/^(inner|outer|width|length|other):\d+(\.\d+)?:(mm|in)$/)
  .transform((text) => {
    const [dimension, value, unit] = text.split(":");
    return { dimension: dimension as Measurement["dimension"], value: Number(value), unit: unit as "mm" | "in" };
  });

// Query parameters are read leniently: a link with something odd in it still opens the form, without that part.
const prefillQuery = z.object({
  kind: z.enum(STANDARD_KINDS).optional().catch(undefined),
  designation: z.string().trim().min(2).max(80).optional().catch(undefined),
  m: z.string().max(400).optional().catch(undefined),
  template: z.string().max(4000).optional().catch(undefined),
});

/**
 * The proposal form's standard part and measurements from a calculator's link: the standard part entered by its
 * designation, its sizes read by the standards engine, the measurements as typed. Null when the link carries none.
 */
export function readProposalPrefill(
  params: Record<string, string | string[] | undefined>,
): Pick<ProposalFormValues, "standard" | "measurements"> | null {
  const q = prefillQuery.parse({
    kind: one(params.kind),
    designation: one(params.designation),
    m: one(params.m),
    template: one(params.template),
  });
  if (!q.kind || !q.designation) return null;
  const checked = checkStandard({ kind: q.kind, designation: q.designation, template: q.template });
  const measurements = (q.m ?? "")
    .split(",")
    .map((text) => measurementText.safeParse(text))
    .flatMap((r) => (r.success && MEASURED_DIMENSIONS.includes(r.data.dimension) ? [r.data] : []))
    .slice(0, 12);
  const size = (v: number | null) => (v === null ? null : Math.round(v * 1000) / 1000);
  return {
    standard: {
      mode: "new",
      kind: q.kind,
      designation: checked.designation,
      innerMm: size(checked.innerMm),
      outerMm: size(checked.outerMm),
      widthMm: size(checked.widthMm),
      lengthMm: size(checked.lengthMm),
      template: typeof checked.attributes.template === "string" ? checked.attributes.template : null,
    },
    measurements,
  };
}

function one(value: string | string[] | undefined): string | undefined {
  return Array.isArray(value) ? value[0] : value;
}
