import { decodeBearing } from "@/lib/standards/bearings";
import { decodeBelt } from "@/lib/standards/belts";
import { StandardsInputError } from "@/lib/standards/errors";
import { INCH_SEALS, METRIC_SEALS } from "@/lib/standards/seal-sizes";
import { MM_PER_INCH, parseLength, round, toMm } from "@/lib/standards/units";
import type { StandardKind } from "@/lib/catalogue/kinds";
import { checkFelt, checkGasket, checkPacking, checkPlug } from "@/lib/proposals/cut-part-checks";
import { checkChain, checkKey, checkPin, checkThread } from "@/lib/proposals/small-part-checks";
import type { Measurement, NewStandardInput, ProposalCheck } from "@/lib/proposals/kinds";

export interface StandardDims {
  innerMm: number | null;
  outerMm: number | null;
  widthMm: number | null;
  lengthMm: number | null;
}

export interface CheckedStandard extends StandardDims {
  kind: StandardKind;
  designation: string;
  attributes: Record<string, unknown>;
  checks: ProposalCheck[];
}

// How far an entered size may sit from the engine's before the two are said to disagree.
const AGREE_MM = 0.05;

const DIM_WORDS: Record<keyof StandardDims, string> = {
  innerMm: "a bore",
  outerMm: "an outside diameter",
  widthMm: "a width",
  lengthMm: "a length",
};

function compareEntered(
  designation: string,
  engine: Partial<StandardDims>,
  entered: Partial<StandardDims>,
  checks: ProposalCheck[],
): void {
  for (const key of Object.keys(DIM_WORDS) as Array<keyof StandardDims>) {
    const e = engine[key];
    const given = entered[key];
    if (e == null || given == null) continue;
    if (Math.abs(e - given) > AGREE_MM) {
      checks.push({
        level: "warning",
        field: `standard.${key}`,
        message:
          `${designation} has ${DIM_WORDS[key]} of ${round(e, 2)} mm, but ` +
          `${round(given, 2)} mm was entered. One of them is wrong.`,
      });
    }
  }
}

/**
 * Shaft × bore × width from a seal's designation: `35 × 52 × 7`, `35x52x7 mm`, `1-1/2 × 2.374 × 1/2 in`. Without a
 * unit, three small numbers are inches. Null when it is not three sizes.
 */
export function readSealSize(
  designation: string,
): { innerMm: number; outerMm: number; widthMm: number; inch: boolean } | null {
  const unit = /\s*(mm|in\.?|inch(?:es)?|")\s*$/i.exec(designation);
  // Words before the sizes ("Felt ring 25 × 37 × 6 mm") name the part; the sizes start at the first digit.
  const body = (unit ? designation.slice(0, unit.index) : designation).replace(/^[^\d.]*/, "");
  const parts = body.trim().split(/\s*[x×*]\s*/i);
  if (parts.length !== 3) return null;
  try {
    const raw = parts.map((p) => parseLength(p, "mm").value);
    const inch = unit ? !/^mm$/i.test(unit[1]) : raw[0] < 10 && raw[1] < 10 && raw[2] < 2;
    const [innerMm, outerMm, widthMm] = raw.map((v) => round(toMm(v, inch ? "in" : "mm"), 4));
    return { innerMm, outerMm, widthMm, inch };
  } catch {
    return null;
  }
}

/**
 * Reads a proposed standard part through the standards engine: a bearing or belt designation gives its sizes, and
 * sizes entered that contradict it are flagged; a seal's shaft × bore × width is read from its designation.
 * Nothing here refuses a proposal: the checks are shown to the member and to the moderator who decides.
 */
export function checkStandard(input: NewStandardInput): CheckedStandard {
  const entered: StandardDims = {
    innerMm: input.innerMm ?? null,
    outerMm: input.outerMm ?? null,
    widthMm: input.widthMm ?? null,
    lengthMm: input.lengthMm ?? null,
  };
  const designation = input.designation.trim().replace(/\s+/g, " ");
  if (input.kind === "bearing") return checkBearing(designation, entered);
  if (input.kind === "v_belt") return checkBelt(designation, entered);
  if (input.kind === "lip_seal") return checkSeal(designation, entered);
  if (input.kind === "felt") return checkFelt(designation, entered, readSealSize);
  if (input.kind === "packing") return checkPacking(designation, entered);
  if (input.kind === "plug") return checkPlug(designation, entered);
  if (input.kind === "gasket") return checkGasket(designation, entered, input.template);
  if (input.kind === "key") return checkKey(designation, entered);
  if (input.kind === "pin") return checkPin(designation, entered);
  if (input.kind === "thread" || input.kind === "grease_fitting") return checkThread(input.kind, designation, entered);
  if (input.kind === "chain") return checkChain(designation, entered);
  return { kind: input.kind, designation, ...entered, attributes: {}, checks: [] };
}

/** A designation the engine cannot read keeps the sizes entered, with the engine's reason as a warning. */
function unread(
  kind: "bearing" | "v_belt",
  designation: string,
  entered: StandardDims,
  error: unknown,
): CheckedStandard {
  if (!(error instanceof StandardsInputError)) throw error;
  const message = `${error.message} The sizes entered are kept as given.`;
  return {
    kind,
    designation,
    ...entered,
    attributes: {},
    checks: [{ level: "warning", field: "standard.designation", message }],
  };
}

function checkBearing(designation: string, entered: StandardDims): CheckedStandard {
  try {
    const decoded = decodeBearing(designation);
    const engine = { innerMm: decoded.boreMm, outerMm: decoded.outsideDiameterMm, widthMm: decoded.widthMm };
    const sizes = `${engine.innerMm} × ${engine.outerMm} × ${engine.widthMm} mm`;
    const checks: ProposalCheck[] = [
      {
        level: "ok",
        field: "standard.designation",
        message: `${decoded.designation}: ${decoded.seriesName}, ${sizes}, ${decoded.closures.text}.`,
      },
    ];
    compareEntered(decoded.designation, engine, entered, checks);
    const attributes = { closures: decoded.closures.text };
    return { kind: "bearing", designation: decoded.designation, ...engine, lengthMm: null, attributes, checks };
  } catch (error) {
    return unread("bearing", designation, entered, error);
  }
}

function checkBelt(designation: string, entered: StandardDims): CheckedStandard {
  try {
    const belt = decodeBelt(designation);
    const toMmLen = (v: number) => (belt.unit === "in" ? round(v * MM_PER_INCH, 1) : v);
    const engine = {
      widthMm: belt.unit === "in" ? round(belt.topWidth * MM_PER_INCH, 2) : belt.topWidth,
      lengthMm: toMmLen(belt.pitchLength),
    };
    const checks: ProposalCheck[] = [
      {
        level: "ok",
        field: "standard.designation",
        message:
          `${belt.designation}: section ${belt.section}, ` +
          `pitch length ${engine.lengthMm} mm, top width ${engine.widthMm} mm.`,
      },
    ];
    // A belt's length may be given as inside, pitch or outside; only a length that matches none of them disagrees.
    const lengths = [belt.insideLength, belt.pitchLength, belt.outsideLength].map(toMmLen);
    if (entered.lengthMm != null && !lengths.some((l) => Math.abs(l - entered.lengthMm!) <= 2)) {
      const given = `${lengths[0]} mm inside, ${lengths[1]} mm pitch and ${lengths[2]} mm outside`;
      const message = `${belt.designation} is ${given}; ${entered.lengthMm} mm was entered. One of them is wrong.`;
      checks.push({ level: "warning", field: "standard.lengthMm", message });
    }
    compareEntered(belt.designation, { widthMm: engine.widthMm }, { widthMm: entered.widthMm }, checks);
    const attributes = { section: belt.section };
    return {
      kind: "v_belt",
      designation: belt.designation,
      innerMm: null,
      outerMm: null,
      ...engine,
      attributes,
      checks,
    };
  } catch (error) {
    return unread("v_belt", designation, entered, error);
  }
}

/** A seal's shaft × bore × width read from its designation, and whether it is a size one can buy. */
function checkSeal(designation: string, entered: StandardDims): CheckedStandard {
  const checks: ProposalCheck[] = [];
  const size = readSealSize(designation);
  const dims = { ...entered };
  if (size) {
    const { inch, ...read } = size;
    compareEntered(`${designation}`, read, entered, checks);
    Object.assign(dims, read);
    checks.push(sealSizeCheck(read, inch));
  } else if (entered.innerMm == null || entered.outerMm == null || entered.widthMm == null) {
    const message =
      "A lip seal is ordered by shaft × bore × width: " +
      "write them in the designation (35 × 52 × 7) or enter the three sizes.";
    checks.push({ level: "warning", field: "standard.designation", message });
  }
  return { kind: "lip_seal", designation, ...dims, attributes: {}, checks };
}

function sealSizeCheck(read: { innerMm: number; outerMm: number; widthMm: number }, inch: boolean): ProposalCheck {
  const table = inch
    ? INCH_SEALS.map(([a, b, c]) => [a * MM_PER_INCH, b * MM_PER_INCH, c * MM_PER_INCH])
    : METRIC_SEALS;
  const near = (a: number, b: number) => Math.abs(a - b) < 0.1;
  const listed = table.some(([a, b, c]) => near(a, read.innerMm) && near(b, read.outerMm) && near(c, read.widthMm));
  const sizes = `Shaft ${round(read.innerMm, 2)} × bore ${round(read.outerMm, 2)} × width ${round(read.widthMm, 2)} mm`;
  const field = "standard.designation";
  if (listed) return { level: "ok", field, message: `${sizes} is a listed standard seal size.` };
  if (inch) {
    const message =
      `${sizes}: an inch seal. Inch seals are made for far more bores than our table of common sizes holds; ` +
      "order by these three sizes.";
    return { level: "ok", field, message };
  }
  return {
    level: "warning",
    field,
    message: `${sizes} is not in our table of common seal sizes; check that it can be bought.`,
  };
}

export interface MeasurementDeviation {
  dimension: Measurement["dimension"];
  label: string;
  measuredMm: number;
  nominalMm: number;
  deviationMm: number;
}

const FOR_DIMENSION = { inner: "innerMm", outer: "outerMm", width: "widthMm", length: "lengthMm" } as const;

/** Each measured size beside the standard part's nominal one, in millimetres (measured minus nominal). */
export function measurementDeviations(measurements: Measurement[], standard: StandardDims): MeasurementDeviation[] {
  const out: MeasurementDeviation[] = [];
  for (const m of measurements) {
    if (m.dimension === "other") continue;
    const nominal = standard[FOR_DIMENSION[m.dimension]];
    if (nominal == null) continue;
    const measuredMm = round(toMm(m.value, m.unit), 3);
    out.push({
      dimension: m.dimension,
      label: m.label || m.dimension,
      measuredMm,
      nominalMm: nominal,
      deviationMm: round(measuredMm - nominal, 3),
    });
  }
  return out;
}

/** The field of the check that compares a proposal with the worn part's own documented sizes. */
export const PART_SIZES_FIELD = "original.sizes";

const DIM_NAMES: Record<keyof StandardDims, string> = {
  innerMm: "bore or shaft",
  outerMm: "outside diameter",
  widthMm: "width",
  lengthMm: "length",
};

/**
 * How far a standard part's size may sit from the worn part's documented one and still be the same size: wear and
 * inch/metric near misses stay inside (those are shown elsewhere); a different bearing series or seal size does not.
 * Common practice (no published source).
 */
function disagreementMm(key: keyof StandardDims, documentedMm: number, kind: StandardKind): number {
  if (key === "lengthMm") return documentedMm * 0.05; // a belt's length may be documented as inside, datum or outside
  if (key === "widthMm") return kind === "bearing" ? 0.3 : 1;
  return Math.max(0.25, documentedMm * 0.01);
}

const sizeText = (d: StandardDims) =>
  [d.innerMm, d.outerMm, d.widthMm]
    .filter((v): v is number => v != null)
    .map((v) => round(v, 2))
    .join(" × ") +
  (d.lengthMm != null ? `${(d.innerMm ?? d.outerMm ?? d.widthMm) ? ", " : ""}length ${round(d.lengthMm, 0)}` : "") +
  " mm";

/**
 * A proposed standard part whose sizes disagree with the worn part's documented ones (a 20 × 47 × 14 bearing for a
 * part documented as 15 × 35 × 11) is flagged before it is sent and at the top of its review. Null when they agree or
 * either side has no sizes to compare.
 */
export function checkAgainstPart(
  part: StandardDims & { number: string },
  standard: StandardDims & { designation: string; kind: StandardKind },
): ProposalCheck | null {
  const differences: string[] = [];
  for (const key of Object.keys(DIM_NAMES) as Array<keyof StandardDims>) {
    const documented = part[key];
    const proposed = standard[key];
    if (documented == null || proposed == null) continue;
    const diff = proposed - documented;
    if (Math.abs(diff) > disagreementMm(key, documented, standard.kind)) {
      differences.push(`${DIM_NAMES[key]} ${round(Math.abs(diff), 2)} mm ${diff > 0 ? "larger" : "smaller"}`);
    }
  }
  if (differences.length === 0) return null;
  return {
    level: "warning",
    field: PART_SIZES_FIELD,
    message:
      `${part.number} is documented as ${sizeText(part)}, but ` +
      `${standard.designation} is ${sizeText(standard)}: ` +
      `${differences.join(", ")}. Check the part and the designation: this is ` +
      `not the same size.`,
  };
}
