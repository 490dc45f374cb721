import { ArrowDefs, DimensionLine } from "@/components/measure/dimension-line";

export type BeltDimension = "top" | "height" | "large" | "small" | "center" | null;

/** A V-belt's section (top width, thickness, pitch line) and the drive it runs on (pulleys and centre distance). */
export function BeltDrawing({ active }: { active: BeltDimension }) {
  return (
    <svg viewBox="0 0 330 330" role="img" aria-labelledby="belt-drawing-title" className="h-auto w-full max-w-sm">
      <title id="belt-drawing-title">
        A V-belt section with its top width and thickness, and a two-pulley drive with its centre distance
      </title>
      <ArrowDefs />
      <path d="M 100 40 H 230 L 200 110 H 130 Z" fill="#d9d1c3" stroke="#23262b" strokeWidth={2} />
      <line x1={110} y1={62} x2={220} y2={62} stroke="#6b7079" strokeDasharray="6 4" />
      <text x={236} y={66} fontSize={12} fill="#4a4f57">
        pitch line
      </text>
      <DimensionLine x1={100} y1={24} x2={230} y2={24} label="top width" active={active === "top"} />
      <DimensionLine x1={80} y1={40} x2={80} y2={110} label="" active={active === "height"} />
      <text
        x={20}
        y={80}
        fontSize={active === "height" ? 16 : 14}
        fontWeight={active === "height" ? 700 : 400}
        fill={active === "height" ? "#8a5d12" : "#4a4f57"}
        fontFamily="JetBrains Mono, monospace"
      >
        thick
      </text>
      {/* drive */}
      <circle cx={95} cy={235} r={55} fill="none" stroke="#23262b" strokeWidth={2} />
      <circle cx={255} cy={235} r={30} fill="none" stroke="#23262b" strokeWidth={2} />
      <line x1={98} y1={180} x2={257} y2={205} stroke="#8a5d12" strokeWidth={3} opacity={0.5} />
      <line x1={98} y1={290} x2={257} y2={265} stroke="#8a5d12" strokeWidth={3} opacity={0.5} />
      <DimensionLine x1={95} y1={235} x2={255} y2={235} label="centre distance" active={active === "center"} />
      <DimensionLine x1={40} y1={180} x2={40} y2={290} label="" active={active === "large"} />
      <DimensionLine x1={300} y1={205} x2={300} y2={265} label="" active={active === "small"} />
      <text
        x={6}
        y={318}
        fontSize={13}
        fill={active === "large" ? "#8a5d12" : "#4a4f57"}
        fontWeight={active === "large" ? 700 : 400}
      >
        large pulley Ø
      </text>
      <text
        x={215}
        y={318}
        fontSize={13}
        fill={active === "small" ? "#8a5d12" : "#4a4f57"}
        fontWeight={active === "small" ? 700 : 400}
      >
        small pulley Ø
      </text>
    </svg>
  );
}
