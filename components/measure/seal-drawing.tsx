import { ArrowDefs, DimensionLine } from "@/components/measure/dimension-line";

export type SealDimension = "shaft" | "bore" | "width" | "sealOd" | null;

/** A lip seal in its housing on the shaft, cut through the axis (upper half): what to measure, and where. */
export function SealDrawing({ active }: { active: SealDimension }) {
  return (
    <svg viewBox="0 0 380 270" role="img" aria-labelledby="seal-drawing-title" className="h-auto w-full max-w-sm">
      <title id="seal-drawing-title">Cross-section of a lip seal: shaft diameter, housing bore and width</title>
      <ArrowDefs />
      {/* housing */}
      <path d="M 60 30 H 260 V 70 H 210 V 80 H 60 Z" fill="url(#hatch)" stroke="#23262b" strokeWidth={2} />
      {/* seal: case and lip with its spring */}
      <path d="M 130 80 H 200 V 90 H 140 V 112 L 176 136 L 170 142 L 132 120 V 80 Z" fill="#d9d1c3" stroke="#23262b" strokeWidth={2} />
      <circle cx={158} cy={122} r={5} fill="none" stroke="#23262b" strokeWidth={2} />
      {/* shaft */}
      <rect x={40} y={142} width={250} height={40} fill="#ece6da" stroke="#23262b" strokeWidth={2} />
      <line x1={30} y1={240} x2={300} y2={240} stroke="#6b7079" strokeDasharray="14 4 3 4" strokeWidth={1.2} />
      <DimensionLine x1={290} y1={142} x2={290} y2={240} label="shaft Ø ÷ 2" active={active === "shaft"} />
      <DimensionLine x1={40} y1={80} x2={40} y2={240} label="bore Ø ÷ 2" active={active === "bore" || active === "sealOd"} />
      <DimensionLine x1={130} y1={16} x2={200} y2={16} label="width" active={active === "width"} />
      <text x={214} y={112} fontSize={13} fill="#4a4f57">
        oil side
      </text>
    </svg>
  );
}
