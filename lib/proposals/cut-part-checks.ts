import { readPackingSection } from "@/lib/standards/packing";
import { readPlugDesignation } from "@/lib/standards/plugs";
import {
  describeTemplate,
  readTemplate,
  templateQuery,
  templateSizeMm,
  type TemplateQuery,
} from "@/lib/standards/gaskets";
import { StandardsInputError } from "@/lib/standards/errors";
import { round } from "@/lib/standards/units";
import type { CheckedStandard, StandardDims } from "@/lib/proposals/checks";
import type { ProposalCheck } from "@/lib/proposals/kinds";

/**
 * Standard parts cut or driven in the workshop: felt rings, gland packing, cup and disc plugs and gaskets cut to a
 * template. Each is read from its designation (a gasket from its template) by the standards engine; nothing here
 * refuses a proposal, the checks are shown to the member and the moderator.
 */

type SizeReader = (designation: string) => { innerMm: number; outerMm: number; widthMm: number } | null;

const field = "standard.designation";

export function checkFelt(designation: string, entered: StandardDims, readSizes: SizeReader): CheckedStandard {
  const read = readSizes(designation);
  const checks: ProposalCheck[] = [];
  if (read)
    checks.push({
      level: "ok",
      field,
      message:
        `Felt ring ${round(read.innerMm, 2)} mm inside × ${round(read.outerMm, 2)} mm outside × ` +
        `${round(read.widthMm, 2)} mm thick.`,
    });
  else if (entered.innerMm == null || entered.outerMm == null)
    checks.push({
      level: "warning",
      field,
      message:
        "A felt ring is ordered by inside × outside × thickness: write them in the designation (25 × 37 × 6 mm).",
    });
  return { kind: "felt", designation, ...entered, ...(read ?? {}), attributes: {}, checks };
}

export function checkPacking(designation: string, entered: StandardDims): CheckedStandard {
  const read = readPackingSection(designation);
  const checks: ProposalCheck[] = read
    ? [{ level: "ok", field, message: `Square section ${round(read.sectionMm, 2)} mm a side.` }]
    : [
        {
          level: "warning",
          field,
          message: "Gland packing is ordered by its square section: write it in the designation (1/4 in square).",
        },
      ];
  const widthMm = read ? read.sectionMm : entered.widthMm;
  return { kind: "packing", designation, ...entered, widthMm, attributes: {}, checks };
}

export function checkPlug(designation: string, entered: StandardDims): CheckedStandard {
  const read = readPlugDesignation(designation);
  if (!read) return { kind: "plug", designation, ...entered, attributes: {}, checks: [] };
  const checks: ProposalCheck[] = [
    {
      level: "ok",
      field,
      message: `${read.kind === "cup" ? "Cup" : "Disc"} plug for a ${round(read.boreMm, 2)} mm bore.`,
    },
  ];
  return {
    kind: "plug",
    designation,
    ...entered,
    outerMm: read.boreMm,
    attributes: { plug: read.kind },
    checks,
  };
}

/** A gasket's template, read and checked; its designation is the template in words when none is given. */
export function checkGasket(
  designation: string,
  entered: StandardDims,
  template: string | null | undefined,
): CheckedStandard {
  if (!template) {
    const message = "A gasket is cut to a template: draw it under Measure → Gasket and propose it from there.";
    return {
      kind: "gasket",
      designation,
      ...entered,
      attributes: {},
      checks: [{ level: "warning", field: "standard.template", message }],
    };
  }
  try {
    const query = template.includes("?") ? template.slice(template.indexOf("?") + 1) : template;
    const t = readTemplate(Object.fromEntries(new URLSearchParams(query)) as TemplateQuery);
    const { outerMm, widthMm } = templateSizeMm(t);
    const words = describeTemplate(t);
    return {
      kind: "gasket",
      designation: designation || words,
      innerMm: null,
      outerMm,
      widthMm,
      lengthMm: null,
      attributes: { template: templateQuery(t) },
      checks: [{ level: "ok", field: "standard.template", message: `${words}.` }],
    };
  } catch (error) {
    if (!(error instanceof StandardsInputError)) throw error;
    const message = `The template cannot be drawn: ${error.message}`;
    return {
      kind: "gasket",
      designation,
      ...entered,
      attributes: {},
      checks: [{ level: "warning", field: "standard.template", message }],
    };
  }
}
