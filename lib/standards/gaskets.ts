import { StandardsInputError } from "@/lib/standards/errors";
import { fromMm, inchLabel, parseLength, round, type LengthUnit } from "@/lib/standards/units";

/**
 * Flat gaskets cut by hand from sheet: an outline (a circle, a rectangle with rounded corners, or a polygon of measured
 * points), cut-outs inside it, and bolt holes at measured positions or evenly on a bolt circle. Every length is in the
 * template's own unit; x runs to the right and y downwards, as a drawing is measured on the bench. A circle or a
 * rectangle is centred on 0,0; a polygon's points are measured from any corner one likes.
 */

export type Point = [number, number];
export type GasketUse = "water" | "oil" | "fuel" | "exhaust";
export const GASKET_USES: GasketUse[] = ["water", "oil", "fuel", "exhaust"];

export type Outline =
  | { shape: "circle"; diameter: number }
  | { shape: "rect"; width: number; height: number; radius: number }
  | { shape: "polygon"; points: Point[] };

export type Cutout =
  | { shape: "circle"; x: number; y: number; diameter: number }
  | { shape: "rect"; x: number; y: number; width: number; height: number; radius: number };

export interface BoltCircle {
  count: number;
  diameter: number;
  /** The first hole's angle in degrees, clockwise from twelve o'clock. */
  angle: number;
}

export interface GasketTemplate {
  unit: LengthUnit;
  outline: Outline;
  /** A round hole at the outline's centre, the commonest cut-out (a pump's shaft, a flange's bore). */
  bore: number | null;
  cutouts: Cutout[];
  /** Bolt holes at measured positions. */
  holes: Point[];
  boltCircle: BoltCircle | null;
  holeDiameter: number | null;
  use: GasketUse;
}

/** A template the engine cannot draw: the message says why, `field` which query parameter. */
export class GasketInputError extends StandardsInputError {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
  }
}

/** The query parameters a template is written in: the API's, the print page's and a job list line's. */
export type TemplateQuery = Partial<
  Record<
    | "unit"
    | "outline"
    | "od"
    | "width"
    | "height"
    | "radius"
    | "points"
    | "bore"
    | "cutouts"
    | "holes"
    | "pcd"
    | "angle"
    | "holeAt"
    | "hole"
    | "use",
    string
  >
>;

const MAX_SIZE_MM = 1200;

function size(field: string, text: string | undefined, unit: LengthUnit, required: string | null): number | null {
  if (text === undefined || text.trim() === "") {
    if (required) throw new GasketInputError(field, required);
    return null;
  }
  try {
    const parsed = parseLength(text, unit);
    if (parsed.mm > MAX_SIZE_MM) throw new GasketInputError(field, "A gasket template is at most 1200 mm across.");
    return round(fromMm(parsed.mm, unit), 6);
  } catch (error) {
    if (error instanceof GasketInputError) throw error;
    if (error instanceof StandardsInputError) throw new GasketInputError(field, error.message);
    throw error;
  }
}

const NUMBER = /^-?(\d+(\.\d*)?|\.\d+)$/;

/** `0,0; 150,0; 150,90` or one `x,y` a line: decimal numbers, in the template's unit. */
export function readPoints(field: string, text: string | undefined): Point[] {
  if (!text || text.trim() === "") return [];
  return text
    .split(/[;\n]+/)
    .map((p) => p.trim())
    .filter((p) => p !== "")
    .map((pair) => {
      const parts = pair.split(/\s*[,\s]\s*/);
      if (parts.length !== 2 || !parts.every((p) => NUMBER.test(p)))
        throw new GasketInputError(field, `"${pair}" is not a point: write x,y, like 12.5,40.`);
      return [Number(parts[0]), Number(parts[1])] as Point;
    });
}

/** `circle 0,0,60; rect 40,0,30,20,3`: round cut-outs by centre and diameter, rectangles by centre, size, radius. */
function readCutouts(text: string | undefined): Cutout[] {
  if (!text || text.trim() === "") return [];
  return text
    .split(/[;\n]+/)
    .map((c) => c.trim())
    .filter((c) => c !== "")
    .map((item) => {
      const m = /^(circle|rect)\s+(.+)$/i.exec(item);
      const numbers = m ? m[2].split(/\s*,\s*/) : [];
      if (!m || !numbers.every((n) => NUMBER.test(n)))
        throw new GasketInputError("cutouts", `"${item}" is not a cut-out: write circle x,y,d or rect x,y,w,h,r.`);
      const v = numbers.map(Number);
      if (m[1].toLowerCase() === "circle" && v.length === 3 && v[2] > 0)
        return { shape: "circle", x: v[0], y: v[1], diameter: v[2] } as Cutout;
      if (m[1].toLowerCase() === "rect" && (v.length === 4 || v.length === 5) && v[2] > 0 && v[3] > 0)
        return { shape: "rect", x: v[0], y: v[1], width: v[2], height: v[3], radius: v[4] ?? 0 } as Cutout;
      throw new GasketInputError("cutouts", `"${item}": a circle needs x,y,d and a rectangle x,y,w,h (and r).`);
    });
}

function readOutline(q: TemplateQuery, unit: LengthUnit): Outline {
  const shape = q.outline ?? "circle";
  if (shape === "circle")
    return { shape, diameter: size("od", q.od, unit, "Give the gasket's outside diameter.") as number };
  if (shape === "rect") {
    const width = size("width", q.width, unit, "Give the gasket's width.") as number;
    const height = size("height", q.height, unit, "Give the gasket's height.") as number;
    const radius = size("radius", q.radius, unit, null) ?? 0;
    if (radius * 2 > Math.min(width, height) + 1e-9)
      throw new GasketInputError("radius", "The corner radius is more than half the gasket's width or height.");
    return { shape, width, height, radius };
  }
  if (shape === "polygon") {
    const points = readPoints("points", q.points);
    checkPolygon(points);
    return { shape, points };
  }
  throw new GasketInputError("outline", "The outline is one of: circle, rect, polygon.");
}

function readBoltCircle(q: TemplateQuery, unit: LengthUnit): BoltCircle | null {
  if (!q.holes || q.holes.trim() === "") return null;
  const count = Number(q.holes);
  if (!Number.isInteger(count) || count < 1 || count > 48)
    throw new GasketInputError("holes", "The number of holes on the bolt circle is a whole number from 1 to 48.");
  const diameter = size("pcd", q.pcd, unit, "Give the bolt circle's diameter (centre to centre across).") as number;
  const angle = q.angle && q.angle.trim() !== "" ? Number(q.angle) : 0;
  if (!Number.isFinite(angle) || Math.abs(angle) > 360)
    throw new GasketInputError("angle", "The first hole's angle is in degrees, from −360 to 360.");
  return { count, diameter, angle };
}

/** A template from its query parameters, checked: everything inside the outline, no holes running into each other. */
export function readTemplate(q: TemplateQuery): GasketTemplate {
  if (q.unit !== undefined && q.unit !== "mm" && q.unit !== "in")
    throw new GasketInputError("unit", "Choose mm or in.");
  const unit: LengthUnit = q.unit === "in" ? "in" : "mm";
  if (q.use !== undefined && !GASKET_USES.includes(q.use as GasketUse))
    throw new GasketInputError("use", `The use is one of: ${GASKET_USES.join(", ")}.`);
  const outline = readOutline(q, unit);
  const boltCircle = readBoltCircle(q, unit);
  const holes = readPoints("holeAt", q.holeAt);
  const holeDiameter = size("hole", q.hole, unit, null);
  if ((boltCircle || holes.length > 0) && holeDiameter === null)
    throw new GasketInputError("hole", "Give the bolt holes' diameter.");
  const template: GasketTemplate = {
    unit,
    outline,
    bore: size("bore", q.bore, unit, null),
    cutouts: readCutouts(q.cutouts),
    holes,
    boltCircle,
    holeDiameter,
    use: (q.use as GasketUse | undefined) ?? "water",
  };
  checkInside(template);
  return template;
}

/** The template written back as its query: the one text form saved on job lists and standard parts. */
export function templateQuery(t: GasketTemplate): string {
  const q = new URLSearchParams({ unit: t.unit, outline: t.outline.shape });
  const n = (v: number) => String(round(v, 4));
  if (t.outline.shape === "circle") q.set("od", n(t.outline.diameter));
  if (t.outline.shape === "rect") {
    q.set("width", n(t.outline.width));
    q.set("height", n(t.outline.height));
    if (t.outline.radius > 0) q.set("radius", n(t.outline.radius));
  }
  if (t.outline.shape === "polygon") q.set("points", t.outline.points.map((p) => p.map(n).join(",")).join(";"));
  if (t.bore !== null) q.set("bore", n(t.bore));
  if (t.cutouts.length > 0)
    q.set(
      "cutouts",
      t.cutouts
        .map((c) =>
          c.shape === "circle"
            ? `circle ${[c.x, c.y, c.diameter].map(n).join(",")}`
            : `rect ${[c.x, c.y, c.width, c.height, c.radius].map(n).join(",")}`,
        )
        .join(";"),
    );
  if (t.boltCircle) {
    q.set("holes", String(t.boltCircle.count));
    q.set("pcd", n(t.boltCircle.diameter));
    if (t.boltCircle.angle !== 0) q.set("angle", n(t.boltCircle.angle));
  }
  if (t.holes.length > 0) q.set("holeAt", t.holes.map((p) => p.map(n).join(",")).join(";"));
  if (t.holeDiameter !== null) q.set("hole", n(t.holeDiameter));
  q.set("use", t.use);
  return q.toString();
}

/** The centre of the outline: where the bore and the bolt circle sit. */
export function outlineCentre(outline: Outline): Point {
  if (outline.shape !== "polygon") return [0, 0];
  const b = boundsOf(outline.points);
  return [(b.minX + b.maxX) / 2, (b.minY + b.maxY) / 2];
}

export function boundsOf(points: Point[]): { minX: number; minY: number; maxX: number; maxY: number } {
  const xs = points.map((p) => p[0]);
  const ys = points.map((p) => p[1]);
  return { minX: Math.min(...xs), minY: Math.min(...ys), maxX: Math.max(...xs), maxY: Math.max(...ys) };
}

/** The outline's extent: from the circle's or rectangle's size, or the polygon's points. */
export function outlineBounds(outline: Outline): { minX: number; minY: number; maxX: number; maxY: number } {
  if (outline.shape === "circle") {
    const r = outline.diameter / 2;
    return { minX: -r, minY: -r, maxX: r, maxY: r };
  }
  if (outline.shape === "rect")
    return { minX: -outline.width / 2, minY: -outline.height / 2, maxX: outline.width / 2, maxY: outline.height / 2 };
  return boundsOf(outline.points);
}

/** Every bolt hole's centre: the measured positions, then the bolt circle's, first at its angle, then clockwise. */
export function holeCentres(t: GasketTemplate): Point[] {
  const [cx, cy] = outlineCentre(t.outline);
  const onCircle: Point[] = [];
  if (t.boltCircle) {
    const { count, diameter, angle } = t.boltCircle;
    for (let i = 0; i < count; i += 1) {
      const theta = ((angle + (i * 360) / count) * Math.PI) / 180;
      onCircle.push([round(cx + (diameter / 2) * Math.sin(theta), 6), round(cy - (diameter / 2) * Math.cos(theta), 6)]);
    }
  }
  return [...t.holes, ...onCircle];
}

function checkPolygon(points: Point[]): void {
  if (points.length < 3)
    throw new GasketInputError("points", "An outline of measured points needs at least three points.");
  if (points.length > 200) throw new GasketInputError("points", "An outline has at most 200 points.");
  if (Math.abs(signedArea(points)) < 1e-6)
    throw new GasketInputError("points", "The points lie on one line: they enclose no gasket.");
  const n = points.length;
  for (let i = 0; i < n; i += 1)
    for (let j = i + 1; j < n; j += 1) {
      if (j === i + 1 || (i === 0 && j === n - 1)) continue;
      if (segmentsCross(points[i], points[(i + 1) % n], points[j], points[(j + 1) % n]))
        throw new GasketInputError(
          "points",
          `The outline crosses itself between points ${i + 1}–${i + 2} and ${j + 1}–${((j + 1) % n) + 1}: ` +
            "give the points in order round the edge.",
        );
    }
}

export function signedArea(points: Point[]): number {
  let a = 0;
  for (let i = 0; i < points.length; i += 1) {
    const [x1, y1] = points[i];
    const [x2, y2] = points[(i + 1) % points.length];
    a += x1 * y2 - x2 * y1;
  }
  return a / 2;
}

function segmentsCross(a: Point, b: Point, c: Point, d: Point): boolean {
  const orient = (p: Point, q: Point, r: Point) =>
    Math.sign((q[0] - p[0]) * (r[1] - p[1]) - (q[1] - p[1]) * (r[0] - p[0]));
  return orient(a, b, c) * orient(a, b, d) < 0 && orient(c, d, a) * orient(c, d, b) < 0;
}

function distanceToSegment(p: Point, a: Point, b: Point): number {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const t = Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / (dx * dx + dy * dy || 1)));
  return Math.hypot(p[0] - (a[0] + t * dx), p[1] - (a[1] + t * dy));
}

function insidePolygon(p: Point, points: Point[]): boolean {
  let inside = false;
  for (let i = 0, j = points.length - 1; i < points.length; j = i, i += 1) {
    const [xi, yi] = points[i];
    const [xj, yj] = points[j];
    if (yi > p[1] !== yj > p[1] && p[0] < ((xj - xi) * (p[1] - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

/** How much gasket is left between a point and the outline's edge (negative: the point is outside it). */
export function edgeClearance(outline: Outline, p: Point): number {
  if (outline.shape === "circle") return outline.diameter / 2 - Math.hypot(p[0], p[1]);
  if (outline.shape === "rect") {
    const { width, height, radius } = outline;
    const qx = Math.abs(p[0]) - (width / 2 - radius);
    const qy = Math.abs(p[1]) - (height / 2 - radius);
    if (qx > 0 && qy > 0) return radius - Math.hypot(qx, qy);
    return Math.min(width / 2 - Math.abs(p[0]), height / 2 - Math.abs(p[1]));
  }
  const pts = outline.points;
  const nearest = Math.min(...pts.map((a, i) => distanceToSegment(p, a, pts[(i + 1) % pts.length])));
  return insidePolygon(p, pts) ? nearest : -nearest;
}

/** Round things cut out of the gasket: the bore, the round cut-outs and every bolt hole, each by centre and radius. */
function roundCuts(t: GasketTemplate): Array<{ field: string; what: string; centre: Point; r: number }> {
  const cuts: Array<{ field: string; what: string; centre: Point; r: number }> = [];
  if (t.bore !== null) cuts.push({ field: "bore", what: "The bore", centre: outlineCentre(t.outline), r: t.bore / 2 });
  t.cutouts.forEach((c, i) => {
    if (c.shape === "circle")
      cuts.push({ field: "cutouts", what: `Cut-out ${i + 1}`, centre: [c.x, c.y], r: c.diameter / 2 });
  });
  const r = (t.holeDiameter ?? 0) / 2;
  const measured = t.holes.length;
  holeCentres(t).forEach((centre, i) =>
    cuts.push({
      field: i < measured ? "holeAt" : "pcd",
      what: i < measured ? `Hole ${i + 1}` : `Hole ${i + 1 - measured} on the bolt circle`,
      centre,
      r,
    }),
  );
  return cuts;
}

function checkInside(t: GasketTemplate): void {
  const cuts = roundCuts(t);
  for (const cut of cuts)
    if (edgeClearance(t.outline, cut.centre) < cut.r - 1e-9)
      throw new GasketInputError(cut.field, `${cut.what} runs past the gasket's outside edge.`);
  t.cutouts.forEach((c, i) => {
    if (c.shape !== "rect") return;
    const corners: Point[] = [
      [c.x - c.width / 2, c.y - c.height / 2],
      [c.x + c.width / 2, c.y - c.height / 2],
      [c.x + c.width / 2, c.y + c.height / 2],
      [c.x - c.width / 2, c.y + c.height / 2],
    ];
    if (corners.some((p) => edgeClearance(t.outline, p) < -1e-9))
      throw new GasketInputError("cutouts", `Cut-out ${i + 1} runs past the gasket's outside edge.`);
  });
  const holes = cuts.filter((c) => c.field === "holeAt" || c.field === "pcd");
  for (let i = 0; i < cuts.length; i += 1)
    for (const other of cuts.slice(i + 1)) {
      if (!holes.includes(other)) continue;
      if (Math.hypot(cuts[i].centre[0] - other.centre[0], cuts[i].centre[1] - other.centre[1]) < cuts[i].r + other.r)
        throw new GasketInputError(other.field, `${other.what} runs into ${cuts[i].what.toLowerCase()}.`);
    }
}

/** Where the gasket will be weak: a bolt hole with less than half its diameter of material to the outside edge. */
export function templateWarnings(t: GasketTemplate): string[] {
  const warnings: string[] = [];
  const r = (t.holeDiameter ?? 0) / 2;
  holeCentres(t).forEach((centre, i) => {
    if (edgeClearance(t.outline, centre) - r < r)
      warnings.push(
        `Hole ${i + 1} leaves less than half its diameter of gasket to the edge: cut it last, with a sharp punch, ` +
          "or the web may tear when the gasket is fitted.",
      );
  });
  return warnings.slice(0, 4);
}

export interface GasketMaterial {
  use: GasketUse;
  material: string;
  /** In the template's unit. */
  thickness: number;
  thicknessLabel: string;
  short: string;
  notes: string[];
}

// Sheet to cut each kind of gasket from, and its usual thickness. Common practice (no published source).
const MATERIALS: Record<GasketUse, { material: string; short: string; mm: number; inch: number; note: string }> = {
  water: {
    material: "compressed non-asbestos fibre sheet rated for water and antifreeze",
    short: "fibre",
    mm: 0.8,
    inch: 1 / 32,
    note: "On a pump body, a thinner sheet than the old gasket can let the impeller rub: keep the old thickness.",
  },
  oil: {
    material: "oil-resistant fibre sheet; cork-rubber sheet for pressed-steel covers",
    short: "oil-resistant fibre",
    mm: 0.8,
    inch: 1 / 32,
    note: "Pressed-steel covers (tappet, timing, sump) want a soft cork-rubber gasket about 3 mm (1/8 in) thick.",
  },
  fuel: {
    material: "nitrile-bound fibre sheet rated for petrol, paraffin and diesel",
    short: "fuel-resistant fibre",
    mm: 0.8,
    inch: 1 / 32,
    note: "Never natural rubber or plain paper against fuel: both swell or soften.",
  },
  exhaust: {
    material: "exhaust sheet: graphite faced on a perforated steel core",
    short: "graphite-faced sheet",
    mm: 1.5,
    inch: 1 / 16,
    note: "Fit exhaust gaskets dry, and tighten the nuts again once the manifold has been hot.",
  },
};

/** The sheet a gasket for this use is cut from, and its usual thickness in the template's unit. */
export function gasketMaterial(use: GasketUse, unit: LengthUnit): GasketMaterial {
  const m = MATERIALS[use];
  const thickness = unit === "in" ? m.inch : m.mm;
  return {
    use,
    material: m.material,
    thickness,
    thicknessLabel: unit === "in" ? inchLabel(thickness) : `${thickness} mm`,
    short: m.short,
    notes: [
      m.note,
      "Where the gasket's thickness sets a clearance or an end float, measure a clean part of the old gasket " +
        "and keep its thickness.",
    ],
  };
}

const len = (v: number, unit: LengthUnit) => (unit === "in" ? inchLabel(v).replace(/ in$/, "") : String(round(v, 2)));

/** `Gasket Ø120 mm, bore Ø60, 4 holes Ø10 on Ø100, 0.8 mm fibre`: the template in words, at most 80 characters. */
export function describeTemplate(t: GasketTemplate): string {
  const o = t.outline;
  const u = t.unit;
  const parts: string[] = [];
  if (o.shape === "circle") parts.push(`Gasket Ø${len(o.diameter, u)} ${u}`);
  else if (o.shape === "rect")
    parts.push(`Gasket ${len(o.width, u)} × ${len(o.height, u)} ${u}${o.radius > 0 ? ` R${len(o.radius, u)}` : ""}`);
  else {
    const b = boundsOf(o.points);
    parts.push(`Gasket ${o.points.length}-sided ${len(b.maxX - b.minX, u)} × ${len(b.maxY - b.minY, u)} ${u}`);
  }
  if (t.bore !== null) parts.push(`bore Ø${len(t.bore, u)}`);
  if (t.cutouts.length > 0) parts.push(`${t.cutouts.length} cut-out${t.cutouts.length > 1 ? "s" : ""}`);
  const count = holeCentres(t).length;
  if (count > 0 && t.holeDiameter !== null) {
    const circle = t.boltCircle && t.holes.length === 0 ? ` on Ø${len(t.boltCircle.diameter, u)}` : "";
    parts.push(`${count} hole${count > 1 ? "s" : ""} Ø${len(t.holeDiameter, u)}${circle}`);
  }
  const material = gasketMaterial(t.use, u);
  const text = parts.join(", ");
  const full = `${text}, ${material.thicknessLabel} ${material.short}`;
  return full.length <= 80 ? full : text.slice(0, 80);
}

/** The template's overall size in millimetres: what the catalogue keeps as the gasket's outside and width. */
export function templateSizeMm(t: GasketTemplate): { outerMm: number; widthMm: number } {
  const b = outlineBounds(t.outline);
  const mm = (v: number) => round(t.unit === "in" ? v * 25.4 : v, 3);
  return {
    outerMm: mm(Math.max(b.maxX - b.minX, b.maxY - b.minY)),
    widthMm: mm(Math.min(b.maxX - b.minX, b.maxY - b.minY)),
  };
}

/** A template's query read from a saved text (a job list line, a standard part), or null when it is not one. */
export function templateFromText(text: string | null | undefined): GasketTemplate | null {
  if (!text) return null;
  try {
    return readTemplate(Object.fromEntries(new URLSearchParams(text)) as TemplateQuery);
  } catch (error) {
    if (error instanceof StandardsInputError) return null;
    throw error;
  }
}
