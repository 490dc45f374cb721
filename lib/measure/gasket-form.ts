import type { GasketUse, TemplateQuery } from "@/lib/standards/gaskets";
import type { LengthUnit } from "@/lib/standards/units";

/** The gasket designer's fields as typed, and the template query they make: lists are one item a line. */
type Outline = "circle" | "rect" | "polygon";
type HoleMode = "none" | "circle" | "points";

export interface DesignerValues {
  outline: Outline;
  od: string;
  width: string;
  height: string;
  radius: string;
  points: string;
  bore: string;
  cutouts: string;
  holeMode: HoleMode;
  holes: string;
  pcd: string;
  angle: string;
  holeAt: string;
  hole: string;
  use: GasketUse;
}

const EMPTY: DesignerValues = {
  outline: "circle",
  od: "",
  width: "",
  height: "",
  radius: "",
  points: "",
  bore: "",
  cutouts: "",
  holeMode: "circle",
  holes: "4",
  pcd: "",
  angle: "",
  holeAt: "",
  hole: "",
  use: "water",
};

/** The designer's fields from a template link (the "change" link of a job list line), lists one item a line. */
export function designerValues(q: Record<string, string | undefined>): DesignerValues {
  const lines = (v: string | undefined) => (v ?? "").split(";").join("\n");
  const outline = (["circle", "rect", "polygon"] as const).find((o) => o === q.outline) ?? "circle";
  const use = (["water", "oil", "fuel", "exhaust"] as const).find((u) => u === q.use) ?? "water";
  return {
    ...EMPTY,
    outline,
    use,
    od: q.od ?? "",
    width: q.width ?? "",
    height: q.height ?? "",
    radius: q.radius ?? "",
    points: lines(q.points),
    bore: q.bore ?? "",
    cutouts: lines(q.cutouts),
    holeMode: q.holeAt ? "points" : q.holes || !q.outline ? "circle" : "none",
    holes: q.holes ?? "4",
    pcd: q.pcd ?? "",
    angle: q.angle ?? "",
    holeAt: lines(q.holeAt),
    hole: q.hole ?? "",
  };
}

export function toQuery(v: DesignerValues, unit: LengthUnit): TemplateQuery {
  const list = (text: string) => text.split("\n").join(";");
  return {
    unit,
    outline: v.outline,
    use: v.use,
    ...(v.outline === "circle" ? { od: v.od } : {}),
    ...(v.outline === "rect" ? { width: v.width, height: v.height, radius: v.radius } : {}),
    ...(v.outline === "polygon" ? { points: list(v.points) } : {}),
    bore: v.bore,
    cutouts: list(v.cutouts),
    ...(v.holeMode === "circle" ? { holes: v.holes, pcd: v.pcd, angle: v.angle } : {}),
    ...(v.holeMode === "points" ? { holeAt: list(v.holeAt) } : {}),
    ...(v.holeMode !== "none" ? { hole: v.hole } : {}),
  };
}
