import { readChainDesignation } from "@/lib/standards/chain";
import { StandardsInputError } from "@/lib/standards/errors";
import { readKeyDesignation } from "@/lib/standards/keys";
import { decodeTaperPin } from "@/lib/standards/pins";
import { readThreadDesignation } from "@/lib/standards/threads";
import { MM_PER_INCH, round } from "@/lib/standards/units";
import type { CheckedStandard, StandardDims } from "@/lib/proposals/checks";
import type { StandardKind } from "@/lib/catalogue/kinds";

/**
 * Keys, pins, threads, grease fittings and chain read from their designations by the standards engine. A designation
 * the engine cannot read is kept with a warning; nothing here refuses a proposal.
 */

const field = "standard.designation";

function unread(kind: StandardKind, designation: string, entered: StandardDims, message: string): CheckedStandard {
  return { kind, designation, ...entered, attributes: {}, checks: [{ level: "warning", field, message }] };
}

export function checkKey(designation: string, entered: StandardDims): CheckedStandard {
  const key = readKeyDesignation(designation);
  if (!key)
    return unread(
      "key",
      designation,
      entered,
      "Write a key as its Woodruff number (No. 606), DIN 6888 6 × 9, or b × h.",
    );
  const sizes = `${round(key.widthMm, 2)} mm wide, ${round(key.heightMm, 2)} mm high`;
  const message = key.diameterMm ? `Woodruff key ${sizes}, ${round(key.diameterMm, 2)} mm across.` : `Key ${sizes}.`;
  return {
    kind: "key",
    designation,
    ...entered,
    widthMm: key.widthMm,
    innerMm: key.heightMm,
    outerMm: key.diameterMm ?? entered.outerMm,
    attributes: {},
    checks: [{ level: "ok", field, message }],
  };
}

export function checkPin(designation: string, entered: StandardDims): CheckedStandard {
  try {
    const pin = decodeTaperPin(designation.replace(/^taper\s+pin\s*/i, ""));
    const mm = (v: number | null) => (v === null ? null : round(pin.unit === "in" ? v * MM_PER_INCH : v, 4));
    return {
      kind: "pin",
      designation,
      ...entered,
      innerMm: mm(pin.smallEnd),
      outerMm: mm(pin.largeEnd),
      lengthMm: mm(pin.length),
      attributes: { taper: pin.taper },
      checks: [{ level: "ok", field, message: `${pin.label}: taper ${pin.taper}.` }],
    };
  } catch (error) {
    if (!(error instanceof StandardsInputError)) throw error;
    return entered.outerMm != null
      ? { kind: "pin", designation, ...entered, attributes: {}, checks: [] }
      : unread("pin", designation, entered, `${error.message} Or enter the pin's diameter.`);
  }
}

/** A bolt, stud or grease fitting by its thread: `1/4-20 UNC`, `M8 × 1.25`, `Grease fitting 1/4-28 UNF, 90°`. */
export function checkThread(
  kind: "thread" | "grease_fitting",
  designation: string,
  entered: StandardDims,
): CheckedStandard {
  const text = designation
    .replace(/^(grease\s+fitting|stud|bolt|nut|screw|cap\s+screw)\s*/i, "")
    .replace(/,.*$/, "")
    .replace(/\s*taper\b/i, " UNF");
  const thread = readThreadDesignation(text) ?? readThreadDesignation(designation);
  if (!thread)
    return unread(
      kind,
      designation,
      entered,
      "Write the thread as the trade does: 1/4-20 UNC, M8 × 1.25, 1/2 BSW, 1/8-27 NPT.",
    );
  const pitch = thread.tpi ? `${thread.tpi} threads per inch` : `${thread.pitchMm} mm pitch`;
  return {
    kind,
    designation,
    ...entered,
    outerMm: round(thread.majorMm, 4),
    attributes: { thread: thread.designation, pitchMm: thread.pitchMm },
    checks: [{ level: "ok", field, message: `${thread.designation}: ${round(thread.majorMm, 3)} mm, ${pitch}.` }],
  };
}

export function checkChain(designation: string, entered: StandardDims): CheckedStandard {
  const chain = readChainDesignation(designation);
  if (!chain)
    return unread("chain", designation, entered, "Write a chain by its number: ANSI 40-1, 60-2 or ISO 08B-1.");
  const mm = (v: number) => round(chain.unit === "in" ? v * MM_PER_INCH : v, 3);
  return {
    kind: "chain",
    designation,
    ...entered,
    outerMm: mm(chain.rollerDiameter),
    widthMm: mm(chain.innerWidth),
    attributes: { pitchMm: mm(chain.pitch), strands: chain.strands },
    checks: [
      {
        level: "ok",
        field,
        message:
          `${chain.label}: roller ${mm(chain.rollerDiameter)} mm, ` + `${mm(chain.innerWidth)} mm between the plates.`,
      },
    ],
  };
}
