import {
  describeTemplate,
  holeCentres,
  outlineBounds,
  outlineCentre,
  type Cutout,
  type GasketTemplate,
  type Outline,
  type Point,
} from "@/lib/standards/gaskets";
import { round, type LengthUnit } from "@/lib/standards/units";

/**
 * A gasket template drawn at full size: the outline, cut-outs and holes as one SVG path in the template's own unit,
 * crosses at the hole centres to punch by, and the pages it prints on when it is larger than a sheet.
 */

const f = (v: number) => String(round(v, 4));

function circlePath([cx, cy]: Point, r: number): string {
  return `M${f(cx - r)} ${f(cy)}a${f(r)} ${f(r)} 0 1 0 ${f(2 * r)} 0a${f(r)} ${f(r)} 0 1 0 ${f(-2 * r)} 0Z`;
}

function roundedRectPath(cx: number, cy: number, w: number, h: number, r: number): string {
  const x = cx - w / 2;
  const y = cy - h / 2;
  if (r <= 0) return `M${f(x)} ${f(y)}h${f(w)}v${f(h)}h${f(-w)}Z`;
  return (
    `M${f(x + r)} ${f(y)}h${f(w - 2 * r)}a${f(r)} ${f(r)} 0 0 1 ${f(r)} ${f(r)}v${f(h - 2 * r)}` +
    `a${f(r)} ${f(r)} 0 0 1 ${f(-r)} ${f(r)}h${f(-(w - 2 * r))}a${f(r)} ${f(r)} 0 0 1 ${f(-r)} ${f(-r)}` +
    `v${f(-(h - 2 * r))}a${f(r)} ${f(r)} 0 0 1 ${f(r)} ${f(-r)}Z`
  );
}

function outlinePath(o: Outline): string {
  if (o.shape === "circle") return circlePath([0, 0], o.diameter / 2);
  if (o.shape === "rect") return roundedRectPath(0, 0, o.width, o.height, o.radius);
  return `M${o.points.map((p) => `${f(p[0])} ${f(p[1])}`).join("L")}Z`;
}

function cutoutPath(c: Cutout): string {
  return c.shape === "circle"
    ? circlePath([c.x, c.y], c.diameter / 2)
    : roundedRectPath(c.x, c.y, c.width, c.height, c.radius);
}

export interface GasketDrawing {
  /** The gasket in words, for the title and the designation. */
  title: string;
  unit: LengthUnit;
  /** The gasket's extent in the template's unit: the SVG file is exactly this size. */
  box: { x: number; y: number; width: number; height: number };
  /** The gasket's material: outline less every cut-out and hole (even-odd fill). */
  body: string;
  /** Crosses at every hole's and the bore's centre, to punch by. */
  marks: string;
  /** Stroke widths in the template's unit: about 0.3 mm for the cut line, 0.15 mm for the marks. */
  stroke: number;
}

export function drawGasket(t: GasketTemplate): GasketDrawing {
  const r = (t.holeDiameter ?? 0) / 2;
  const holes = holeCentres(t);
  const centre = outlineCentre(t.outline);
  const body = [
    outlinePath(t.outline),
    ...(t.bore !== null ? [circlePath(centre, t.bore / 2)] : []),
    ...t.cutouts.map(cutoutPath),
    ...holes.map((h) => circlePath(h, r)),
  ].join("");
  const cross = ([x, y]: Point, arm: number) =>
    `M${f(x - arm)} ${f(y)}h${f(2 * arm)}M${f(x)} ${f(y - arm)}v${f(2 * arm)}`;
  const marks = [
    ...holes.map((h) => cross(h, r * 0.6)),
    ...(t.bore !== null ? [cross(centre, Math.min(t.bore / 4, t.unit === "in" ? 0.25 : 6))] : []),
  ].join("");
  const b = outlineBounds(t.outline);
  return {
    title: describeTemplate(t),
    unit: t.unit,
    box: { x: b.minX, y: b.minY, width: b.maxX - b.minX, height: b.maxY - b.minY },
    body,
    marks,
    stroke: t.unit === "in" ? 0.3 / 25.4 : 0.3,
  };
}

const escape = (text: string) =>
  text.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");

/**
 * The template as a standalone SVG file whose width and height are the gasket's own size in physical units (`120mm`,
 * `4.75in`): printed at 100 % it is the gasket. The cut line is centred on the edge, so half of it lies outside.
 */
export function gasketSvg(t: GasketTemplate): string {
  const d = drawGasket(t);
  const { x, y, width, height } = d.box;
  return (
    `<?xml version="1.0" encoding="UTF-8"?>\n` +
    `<svg xmlns="http://www.w3.org/2000/svg" width="${f(width)}${d.unit}" height="${f(height)}${d.unit}" ` +
    `viewBox="${f(x)} ${f(y)} ${f(width)} ${f(height)}" overflow="visible">` +
    `<title>${escape(d.title)}</title>` +
    `<path d="${d.body}" fill="#efe9dc" fill-rule="evenodd" stroke="#000" stroke-width="${f(d.stroke)}"/>` +
    `<path d="${d.marks}" fill="none" stroke="#000" stroke-width="${f(d.stroke / 2)}"/>` +
    `</svg>\n`
  );
}

export type Paper = "a4" | "letter";

/** Sheet sizes in millimetres: A4 (ISO 216) and US Letter (8.5 × 11 in). */
export const PAPER: Record<Paper, { width: number; height: number; name: string }> = {
  a4: { width: 210, height: 297, name: "A4" },
  letter: { width: 215.9, height: 279.4, name: "Letter" },
};

/** Printers cannot print to the edge: 10 mm round the sheet, and 24 mm at the foot for the check bar and page name. */
export const SHEET_MARGIN = 10;
export const SHEET_FOOT = 24;
/** Neighbouring pages share this much of the drawing, so that their alignment marks can be laid over each other. */
export const OVERLAP = 12;
/** Paper left round the gasket on the printed sheet, so that its cut line is never at the sheet's edge. */
export const INSET = 3;

export interface PrintPage {
  /** `A1`: column letter, row number. */
  name: string;
  column: number;
  row: number;
  /** The part of the drawing on this page, in millimetres of the drawing. */
  window: { x: number; y: number; width: number; height: number };
}

export interface PrintPlan {
  paper: Paper;
  columns: number;
  rows: number;
  /** The drawn area of a sheet, in millimetres. */
  area: { width: number; height: number };
  pages: PrintPage[];
  /** Alignment marks where pages overlap, in millimetres of the drawing; one set serves every page. */
  marks: Point[];
  /** The check bar: 100 mm for a metric template, 4 in for an inch one. */
  checkBar: { length: number; label: string; ticks: number[] };
}

/**
 * The pages a drawing prints on at full size: one when it fits the sheet, else a grid of pages that overlap by
 * OVERLAP mm, with alignment marks in every overlap.
 */
export function planPrint(drawing: GasketDrawing, paper: Paper): PrintPlan {
  const scale = drawing.unit === "in" ? 25.4 : 1;
  const box = {
    x: drawing.box.x * scale - INSET,
    y: drawing.box.y * scale - INSET,
    w: drawing.box.width * scale + 2 * INSET,
    h: drawing.box.height * scale + 2 * INSET,
  };
  const sheet = PAPER[paper];
  const area = { width: sheet.width - 2 * SHEET_MARGIN, height: sheet.height - 2 * SHEET_MARGIN - SHEET_FOOT };
  const count = (extent: number, room: number) =>
    extent <= room ? 1 : Math.ceil((extent - OVERLAP) / (room - OVERLAP));
  const columns = count(box.w, area.width);
  const rows = count(box.h, area.height);
  const pages: PrintPage[] = [];
  for (let row = 0; row < rows; row += 1)
    for (let column = 0; column < columns; column += 1)
      pages.push({
        name: `${String.fromCharCode(65 + column)}${row + 1}`,
        column,
        row,
        window: {
          x: box.x + column * (area.width - OVERLAP),
          y: box.y + row * (area.height - OVERLAP),
          width: area.width,
          height: area.height,
        },
      });
  const marks: Point[] = [];
  const along = (from: number, extent: number) => {
    const steps = Math.max(1, Math.round(extent / 60));
    return Array.from({ length: steps + 1 }, (_, i) => from + (i * extent) / steps);
  };
  for (let c = 1; c < columns; c += 1) {
    const x = box.x + c * (area.width - OVERLAP) + OVERLAP / 2;
    for (const y of along(box.y, box.h)) marks.push([round(x, 3), round(y, 3)]);
  }
  for (let r = 1; r < rows; r += 1) {
    const y = box.y + r * (area.height - OVERLAP) + OVERLAP / 2;
    for (const x of along(box.x, box.w)) marks.push([round(x, 3), round(y, 3)]);
  }
  const inch = drawing.unit === "in";
  return {
    paper,
    columns,
    rows,
    area,
    pages,
    marks,
    checkBar: inch
      ? { length: 101.6, label: "4 in", ticks: Array.from({ length: 9 }, (_, i) => round(i * 12.7, 3)) }
      : { length: 100, label: "100 mm", ticks: Array.from({ length: 11 }, (_, i) => i * 10) },
  };
}
