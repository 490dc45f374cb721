import {
  planPrint,
  PAPER,
  SHEET_FOOT,
  SHEET_MARGIN,
  type GasketDrawing,
  type Paper,
} from "@/lib/standards/gasket-drawing";
import { round } from "@/lib/standards/units";

const mm = (v: number) => `${round(v, 3)}mm`;

/** A registration mark: a circle with a cross, laid over the same mark on the neighbouring page. */
function AlignmentMark({ x, y }: { x: number; y: number }) {
  return (
    <g stroke="#000" strokeWidth={0.2} fill="none">
      <circle cx={x} cy={y} r={3} />
      <path d={`M${x - 5} ${y}h10M${x} ${y - 5}v10`} />
    </g>
  );
}

/** The bar that proves the printer kept the scale: 100 mm (or 4 in) with ticks, to measure with a rule. */
function CheckBar({ length, label, ticks }: { length: number; label: string; ticks: number[] }) {
  return (
    <svg
      width={mm(length + 2)}
      height="8mm"
      viewBox={`-1 0 ${length + 2} 8`}
      aria-label={`Check bar, ${label}`}
      data-testid="check-bar"
    >
      <path d={`M0 6H${length}`} stroke="#000" strokeWidth={0.4} />
      {ticks.map((t) => (
        <path key={t} d={`M${t} ${t === 0 || Math.abs(t - length) < 0.01 ? 0 : 3}V6`} stroke="#000" strokeWidth={0.3} />
      ))}
    </svg>
  );
}

/**
 * The template on as many sheets as it needs, each the paper's own size: a page names its place in the grid, carries
 * the alignment marks of its overlaps and a check bar. Printed at 100 % the outline is the gasket's own size.
 */
export function GasketSheets({ drawing, paper }: { drawing: GasketDrawing; paper: Paper }) {
  const plan = planPrint(drawing, paper);
  const sheet = PAPER[paper];
  const scale = drawing.unit === "in" ? 25.4 : 1;
  const stroke = 0.3 / scale;
  return (
    <div className="gasket-sheets space-y-6">
      <style>{`@page { size: ${sheet.width}mm ${sheet.height}mm; margin: 0; }`}</style>
      {plan.pages.map((page) => (
        <section
          key={page.name}
          className="gasket-sheet bg-white text-black"
          style={{ width: mm(sheet.width), height: mm(sheet.height), padding: mm(SHEET_MARGIN) }}
          aria-label={`Page ${page.name}`}
        >
          <svg
            width={mm(plan.area.width)}
            height={mm(plan.area.height)}
            viewBox={`${page.window.x} ${page.window.y} ${page.window.width} ${page.window.height}`}
            className="block"
          >
            <rect
              {...{ x: page.window.x, y: page.window.y, width: page.window.width, height: page.window.height }}
              fill="none"
              stroke="#999"
              strokeWidth={0.2}
              strokeDasharray="2 2"
            />
            <g transform={`scale(${scale})`}>
              <path
                d={drawing.body}
                fill="none"
                fillRule="evenodd"
                stroke="#000"
                strokeWidth={stroke}
                data-testid="gasket-outline"
              />
              <path d={drawing.marks} fill="none" stroke="#000" strokeWidth={stroke / 2} />
            </g>
            {plan.marks.map(([x, y]) => (
              <AlignmentMark key={`${x},${y}`} x={x} y={y} />
            ))}
          </svg>
          <footer
            className="flex items-end justify-between gap-4 text-[9pt] leading-tight"
            style={{ height: mm(SHEET_FOOT), paddingTop: "2mm" }}
          >
            <div>
              <CheckBar {...plan.checkBar} />
              <p>
                This bar must measure {plan.checkBar.label}. If it does not, print again at 100 % (actual size), not
                &quot;fit to page&quot;.
              </p>
            </div>
            <p className="text-right">
              <strong>
                Page {page.name} of {plan.columns * plan.rows}
              </strong>
              <br />
              {drawing.title}
              {plan.pages.length > 1 && (
                <>
                  <br />
                  Lay the ⊕ marks of neighbouring pages over each other and tape.
                </>
              )}
            </p>
          </footer>
        </section>
      ))}
    </div>
  );
}
