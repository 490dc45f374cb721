import { ArrowDefs, DimensionLine } from "@/components/measure/dimension-line";

export type BearingDimension = "bore" | "od" | "width" | null;

/** A deep groove ball bearing cut through its axis: rings hatched, balls round, the three boundary dimensions. */
export function BearingDrawing({ active }: { active: BearingDimension }) {
  const ring = (y: number, h: number) => (
    <rect x={110} y={y} width={90} height={h} fill="url(#hatch)" stroke="#23262b" strokeWidth={2} rx={4} />
  );
  return (
    <svg viewBox="0 0 330 300" role="img" aria-labelledby="bearing-drawing-title" className="h-auto w-full max-w-sm">
      <title id="bearing-drawing-title">Cross-section of a ball bearing: bore d, outside diameter D, width B</title>
      <ArrowDefs />
      {/* outer ring, balls, inner ring: upper and lower halves */}
      {ring(40, 34)}
      {ring(106, 26)}
      <circle cx={155} cy={90} r={17} fill="#ece6da" stroke="#23262b" strokeWidth={2} />
      {ring(226, 34)}
      {ring(168, 26)}
      <circle cx={155} cy={210} r={17} fill="#ece6da" stroke="#23262b" strokeWidth={2} />
      <line x1={80} y1={150} x2={230} y2={150} stroke="#6b7079" strokeDasharray="14 4 3 4" strokeWidth={1.2} />
      <DimensionLine x1={250} y1={40} x2={250} y2={260} label="D  OD" active={active === "od"} />
      <DimensionLine x1={70} y1={132} x2={70} y2={168} label="" active={active === "bore"} />
      <text
        x={8}
        y={128}
        fontSize={active === "bore" ? 17 : 15}
        fontWeight={active === "bore" ? 700 : 400}
        fill={active === "bore" ? "#8a5d12" : "#4a4f57"}
        fontFamily="JetBrains Mono, monospace"
      >
        d bore
      </text>
      <DimensionLine x1={110} y1={22} x2={200} y2={22} label="B  width" active={active === "width"} />
      <line x1={200} y1={40} x2={256} y2={40} stroke="#b9ae9b" />
      <line x1={200} y1={260} x2={256} y2={260} stroke="#b9ae9b" />
      <line x1={64} y1={132} x2={110} y2={132} stroke="#b9ae9b" />
      <line x1={64} y1={168} x2={110} y2={168} stroke="#b9ae9b" />
    </svg>
  );
}
