import { nearMiss, nominalCandidates, type NearMiss } from "@/lib/standards/nominal";
import { StandardsInputError } from "@/lib/standards/errors";
import { fromMm, parseLength, round, tradeRound, type LengthUnit } from "@/lib/standards/units";

/**
 * Cup plugs (a pressed cup, driven in open side out) and disc plugs (a shallow dome, set by flattening it) that close
 * a core hole or a felt's bore. Both are sold by the bore they fit: a 1-1/2 in plug fits a 1-1/2 in bore, a 38 mm plug
 * a 38 mm bore; the plug itself is made a little over that size so that it grips.
 */

export type PlugKind = "cup" | "disc";

export const PLUG_KIND_NAMES: Record<PlugKind, string> = { cup: "Cup plug", disc: "Disc plug" };

// Sizes sold: inch plugs by sixteenths from 1/4 in to 4 in; metric plugs by whole millimetres from 6 to 100 mm (DIN 443
// lists metric cup plugs by the bore they fit). Common practice (no published source) for the inch range.
const RANGE_MM = { min: 6, max: 101.6 };

export interface PlugCandidate {
  /** `Cup plug 1-1/2 in`: what to ask for, and the standard part's designation. */
  label: string;
  /** The bore the plug fits, in its own system's unit. */
  nominal: number;
  nominalMm: number;
  system: "inch" | "metric";
  /** measured − nominal, in the unit measured in. */
  deviation: number;
  reason: string;
}

export interface PlugMatch {
  unit: LengthUnit;
  kind: PlugKind;
  candidates: PlugCandidate[];
  nearMiss: NearMiss | null;
  notes: string[];
  warnings: string[];
  source: string;
}

/** A size on the grid plugs are sold on: sixteenths of an inch, whole millimetres. */
function sold(c: { system: "inch" | "metric"; nominal: number }): boolean {
  if (c.system === "metric") return Number.isInteger(round(c.nominal, 6));
  return Number.isInteger(round(c.nominal * 16, 6));
}

/**
 * The plug for a measured bore. A worn or corroded bore reads large, so wear is expected that way; the system the
 * bore was measured in comes first when one of its sizes fits; an inch and a metric size close enough to be mistaken
 * for each other are named.
 */
export function matchPlug(input: { boreMm: number; unit: LengthUnit; kind: PlugKind }): PlugMatch {
  const { boreMm, unit, kind } = input;
  if (boreMm < RANGE_MM.min - 0.5 || boreMm > RANGE_MM.max + 1)
    throw new StandardsInputError(
      `Plugs are sold for bores from 6 mm (1/4 in) to 100 mm (4 in); ` +
        `${tradeRound(fromMm(boreMm, unit), unit)} ${unit} is outside that.`,
    );
  const candidates = nominalCandidates(boreMm, unit, "housing", 12)
    .filter(sold)
    .slice(0, 4)
    .map((c) => ({
      label: `${PLUG_KIND_NAMES[kind]} ${c.system === "inch" ? c.label : `${round(c.nominal, 0)} mm`}`,
      nominal: c.nominal,
      nominalMm: c.nominalMm,
      system: c.system,
      deviation: c.deviation,
      reason: c.reason,
    }));
  const warnings: string[] = [];
  const best = candidates[0];
  if (best && best.nominalMm - boreMm > 0.1)
    warnings.push(
      "The bore reads smaller than the plug: a bore does not wear small. Clean the scale and paint out of it and " +
        "measure across two diameters at right angles.",
    );
  if (best && boreMm - best.nominalMm > 0.25)
    warnings.push(
      "The bore reads well over the plug's size: a plug may not grip. Measure across two diameters; if it is " +
        "oval or pitted, ask for an oversize plug or have the bore sleeved.",
    );
  return {
    unit,
    kind,
    candidates,
    nearMiss: plugNearMiss(candidates),
    notes: PLUG_NOTES[kind],
    warnings,
    source: "Metric plugs: DIN 443, sized by the bore they fit; inch plugs by the bore in sixteenths of an inch",
  };
}

function plugNearMiss(candidates: PlugCandidate[]): NearMiss | null {
  const inch = candidates.find((c) => c.system === "inch");
  const metric = candidates.find((c) => c.system === "metric");
  return inch && metric ? nearMiss(inch.nominal, metric.nominal) : null;
}

export const PLUG_NOTES: Record<PlugKind, string[]> = {
  cup: [
    "Clean the bore to bright metal and put a thin ring of non-hardening sealer on its edge, or on the plug's outside.",
    "Drive the cup plug on its inside face, with a driver that clears the lip: a driver on the lip collapses it. " +
      "Drive it in square, to the depth the old one sat, usually just below the chamfer.",
    "Never drive a plug with a hammer alone; a cocked plug leaks and is hard to get out.",
  ],
  disc: [
    "Clean the bore and its shoulder to bright metal and put a thin ring of non-hardening sealer on the shoulder.",
    "Sit the disc on its shoulder, dome outwards, and strike the middle of the dome once with a flat punch a " +
      "little smaller than the plug: flattening the dome spreads the edge into the bore.",
    "Do not hit it twice or drive it further: a dome struck flat and then dished inward no longer grips.",
  ],
};

/**
 * A cup or disc plug's bore from its designation: `Cup plug 1-1/2 in`, `Disc plug 38 mm`, `core plug 1 3/4"`. A bare
 * number under 5 is inches. Null for anything else (a screw plug is sold by its thread, not read here).
 */
export function readPlugDesignation(designation: string): { kind: PlugKind; boreMm: number; unit: LengthUnit } | null {
  const m = /^(cup|disc|core|expansion|welch)?\s*plug\s+(.+?)\s*$/i.exec(designation.trim());
  if (!m) return null;
  const kind: PlugKind = /^(disc|welch)$/i.test(m[1] ?? "") ? "disc" : "cup";
  try {
    const bare = parseLength(m[2], "mm");
    const explicit = /(mm|in\.?|inch(?:es)?|")$/i.test(m[2]);
    const unit: LengthUnit = explicit ? bare.unit : bare.value < 5 ? "in" : "mm";
    return { kind, boreMm: round(parseLength(m[2], unit).mm, 4), unit };
  } catch {
    return null;
  }
}
