import { describe, expect, it } from "vitest";
import { drawGasket, gasketSvg, PAPER, planPrint } from "@/lib/standards/gasket-drawing";
import {
  describeTemplate,
  edgeClearance,
  gasketMaterial,
  GasketInputError,
  holeCentres,
  readTemplate,
  signedArea,
  templateFromText,
  templateQuery,
  templateWarnings,
  type TemplateQuery,
} from "@/lib/standards/gaskets";

const round = { unit: "mm", outline: "circle", od: "120", bore: "60", holes: "4", pcd: "100", hole: "10" } as const;
const fails = (q: TemplateQuery) => {
  try {
    readTemplate(q);
  } catch (error) {
    if (error instanceof GasketInputError) return { field: error.field, message: error.message };
    throw error;
  }
  return null;
};

describe("gasket templates", () => {
  it("places holes evenly on the bolt circle, the first at twelve o'clock, then clockwise", () => {
    // Geometry (y downwards): 4 holes on Ø100 from 0° are at (0, −50), (50, 0), (0, 50), (−50, 0).
    const holes = holeCentres(readTemplate(round)).map(([x, y]) => [Math.round(x * 1e6) / 1e6 || 0, y]);
    expect(holes).toEqual([
      [0, -50],
      [50, 0],
      [0, 50],
      [-50, 0],
    ]);
  });

  it("spaces neighbouring holes by the chord D × sin(180°/n)", () => {
    // Geometry of the circle; the same factor as Machinery's Handbook's hole-circle coordinate tables (from memory):
    // 5 holes on Ø100 are 100 × sin 36° = 58.779 mm apart; 6 holes, 100 × sin 30° = 50 mm.
    for (const [count, chord] of [
      [5, 58.779],
      [6, 50],
      [8, 38.268],
    ] as const) {
      const h = holeCentres(readTemplate({ ...round, holes: String(count), angle: "22.5" }));
      for (let i = 0; i < count; i += 1) {
        const [a, b] = [h[i], h[(i + 1) % count]];
        expect(Math.hypot(a[0] - b[0], a[1] - b[1])).toBeCloseTo(chord, 3);
      }
    }
  });

  it("keeps every hole on the bolt circle whatever the count and angle (property)", () => {
    for (let count = 1; count <= 24; count += 1)
      for (const angle of [0, 15, 45, 90, 137.5]) {
        const t = readTemplate({
          ...round,
          od: "300",
          bore: "",
          pcd: "250",
          hole: "6",
          holes: String(count),
          angle: String(angle),
        });
        for (const [x, y] of holeCentres(t)) expect(Math.hypot(x, y)).toBeCloseTo(125, 5);
      }
  });

  it("draws an SVG whose width and height are the gasket's physical size", () => {
    const svg = gasketSvg(readTemplate(round));
    expect(svg).toMatch(/<svg [^>]*width="120mm" height="120mm" viewBox="-60 -60 120 120"/);
    const inch = gasketSvg(readTemplate({ ...round, unit: "in", od: "4-3/4", bore: "", pcd: "4", hole: "3/8" }));
    expect(inch).toMatch(/width="4.75in" height="4.75in"/);
    expect(gasketSvg(readTemplate({ unit: "mm", outline: "rect", width: "150", height: "90", radius: "8" }))).toMatch(
      /width="150mm" height="90mm"/,
    );
  });

  it("reads a polygon of measured points and finds where a hole would break out", () => {
    const points = "0,0; 150,0; 150,90; 60,90; 0,40";
    const t = readTemplate({ unit: "mm", outline: "polygon", points, holeAt: "10,10; 140,10; 140,80", hole: "9" });
    // Shoelace formula: the pentagon's area is 150 × 90 − (60 × 50) / 2 = 12000 mm².
    expect(Math.abs(signedArea(t.outline.shape === "polygon" ? t.outline.points : []))).toBe(12000);
    expect(edgeClearance(t.outline, [10, 10])).toBeCloseTo(10, 6);
    expect(fails({ unit: "mm", outline: "polygon", points, holeAt: "10,60", hole: "9" })).toMatchObject({
      field: "holeAt",
    });
  });

  it("says which field is wrong and why", () => {
    expect(fails({ ...round, pcd: "118" })).toMatchObject({ field: "pcd", message: /outside edge/ });
    expect(fails({ ...round, bore: "95" })).toMatchObject({ field: "pcd", message: /runs into the bore/ });
    expect(fails({ ...round, hole: "" })).toMatchObject({ field: "hole" });
    expect(fails({ ...round, od: "" })).toMatchObject({ field: "od" });
    expect(fails({ unit: "mm", outline: "rect", width: "50", height: "30", radius: "20" })).toMatchObject({
      field: "radius",
    });
    expect(fails({ unit: "mm", outline: "polygon", points: "0,0; 10,10; 10,0; 0,10" })).toMatchObject({
      field: "points",
      message: /crosses itself/,
    });
    expect(fails({ unit: "mm", outline: "polygon", points: "0,0; 10 10" })).toMatchObject({ field: "points" });
    expect(fails({ ...round, cutouts: "square 1,2,3" })).toMatchObject({ field: "cutouts" });
    expect(fails({ ...round, holes: "0" })).toMatchObject({ field: "holes" });
  });

  it("warns about a thin web between a hole and the edge", () => {
    // common practice (no published source): less than half a hole's diameter of material tears on fitting.
    expect(templateWarnings(readTemplate({ ...round, pcd: "104" })).length).toBe(4);
    expect(templateWarnings(readTemplate(round))).toEqual([]);
  });

  it("writes the template back as one query that reads the same", () => {
    const t = readTemplate({ ...round, cutouts: "circle 30,0,8; rect -30,0,10,6,1", angle: "45", use: "exhaust" });
    const again = templateFromText(templateQuery(t));
    expect(again).toEqual(t);
    expect(templateFromText("outline=circle&od=")).toBeNull();
  });

  it("describes the template in words for a designation, within 80 characters", () => {
    expect(describeTemplate(readTemplate(round))).toBe("Gasket Ø120 mm, bore Ø60, 4 holes Ø10 on Ø100, 0.8 mm fibre");
    const inch = readTemplate({ ...round, unit: "in", od: "4-3/4", bore: "2-3/8", pcd: "4", hole: "3/8" });
    expect(describeTemplate(inch)).toBe("Gasket Ø4-3/4 in, bore Ø2-3/8, 4 holes Ø3/8 on Ø4, 1/32 in fibre");
  });

  it("suggests a sheet by use, thicker and graphite-faced for an exhaust", () => {
    // common practice (no published source)
    expect(gasketMaterial("water", "mm")).toMatchObject({ thickness: 0.8 });
    expect(gasketMaterial("exhaust", "in")).toMatchObject({ thicknessLabel: "1/16 in", short: "graphite-faced sheet" });
    expect(gasketMaterial("fuel", "mm").notes.join(" ")).toMatch(/Never natural rubber/);
  });
});

describe("printing a template at full size", () => {
  it("fits a small gasket on one A4 page, with a 100 mm check bar", () => {
    const plan = planPrint(drawGasket(readTemplate(round)), "a4");
    // ISO 216: A4 is 210 × 297 mm.
    expect(PAPER.a4).toMatchObject({ width: 210, height: 297 });
    expect(plan.pages.map((p) => p.name)).toEqual(["A1"]);
    expect(plan.checkBar).toMatchObject({ length: 100, label: "100 mm" });
    expect(plan.marks).toEqual([]);
  });

  it("tiles a large gasket with overlapping pages and alignment marks in each overlap", () => {
    const big = readTemplate({ unit: "mm", outline: "rect", width: "400", height: "300", radius: "10" });
    const plan = planPrint(drawGasket(big), "letter");
    // US Letter is 8.5 × 11 in = 215.9 × 279.4 mm (NIST SP 811 conversion).
    expect(PAPER.letter).toMatchObject({ width: 215.9, height: 279.4 });
    expect(plan.columns).toBe(3);
    expect(plan.rows).toBe(2);
    expect(plan.pages.map((p) => p.name)).toEqual(["A1", "B1", "C1", "A2", "B2", "C2"]);
    // Every mark lies inside the overlap shared by two neighbouring pages, so it prints on both.
    for (const [x, y] of plan.marks) {
      const on = plan.pages.filter(
        (p) =>
          x >= p.window.x && x <= p.window.x + p.window.width && y >= p.window.y && y <= p.window.y + p.window.height,
      );
      expect(on.length).toBeGreaterThanOrEqual(2);
    }
    // The pages together cover the whole gasket.
    const last = plan.pages.at(-1)!.window;
    expect(last.x + last.width).toBeGreaterThanOrEqual(200);
    expect(last.y + last.height).toBeGreaterThanOrEqual(150);
  });

  it("gives an inch template a 4 in check bar with half-inch ticks", () => {
    const plan = planPrint(
      drawGasket(readTemplate({ ...round, unit: "in", od: "4", bore: "", pcd: "3", hole: "3/8" })),
      "letter",
    );
    expect(plan.checkBar).toMatchObject({ length: 101.6, label: "4 in" });
    expect(plan.checkBar.ticks.at(-1)).toBe(101.6);
  });
});
