import { ArrowDefs, DimensionLine, DrawingLabel as Label } from "@/components/measure/dimension-line";

export type SealDimension = "shaft" | "bore" | "width" | "sealOd" | null;

/**
 * A lip seal in its housing on the shaft, cut through the axis: the shaft diameter, the housing bore and the seal's
 * width, each named where it is measured. Every label sits inside the picture.
 */
export function SealDrawing({ active }: { active: SealDimension }) {
  const ink = "#23262b";
  return (
    <svg viewBox="0 0 360 320" role="img" aria-labelledby="seal-drawing-title" className="h-auto w-full max-w-sm">
      <title id="seal-drawing-title">
        Cross-section of a lip seal in its housing on the shaft: shaft diameter, housing bore and seal width
      </title>
      <ArrowDefs />
      {/* housing, above and below the shaft */}
      <path d="M 80 40 H 280 V 80 H 80 Z" fill="url(#hatch)" stroke={ink} strokeWidth={2} />
      <path d="M 80 260 H 280 V 300 H 80 Z" fill="url(#hatch)" stroke={ink} strokeWidth={2} />
      {/* seal: case against the bore, lip on the shaft with its spring */}
      <path
        d="M 150 80 H 210 V 92 H 160 V 108 L 192 126 L 186 130 L 152 112 V 80 Z"
        fill="#d9d1c3"
        stroke={ink}
        strokeWidth={2}
      />
      <circle cx={174} cy={112} r={4.5} fill="none" stroke={ink} strokeWidth={1.8} />
      <path
        d="M 150 260 H 210 V 248 H 160 V 232 L 192 214 L 186 210 L 152 228 V 260 Z"
        fill="#d9d1c3"
        stroke={ink}
        strokeWidth={2}
      />
      <circle cx={174} cy={228} r={4.5} fill="none" stroke={ink} strokeWidth={1.8} />
      {/* shaft and axis */}
      <rect x={60} y={130} width={270} height={80} fill="#ece6da" stroke={ink} strokeWidth={2} />
      <line x1={50} y1={170} x2={340} y2={170} stroke="#6b7079" strokeDasharray="14 4 3 4" strokeWidth={1.2} />
      {/* extension lines */}
      <g stroke="#6b7079" strokeWidth={0.9} strokeDasharray="3 3">
        <line x1={150} y1={80} x2={150} y2={18} />
        <line x1={210} y1={80} x2={210} y2={18} />
        <line x1={80} y1={80} x2={22} y2={80} />
        <line x1={80} y1={260} x2={22} y2={260} />
      </g>
      <DimensionLine x1={150} y1={24} x2={210} y2={24} label="" active={active === "width"} />
      <Label x={218} y={30} text="width" active={active === "width"} />
      <DimensionLine x1={30} y1={80} x2={30} y2={260} label="" active={active === "bore" || active === "sealOd"} />
      <Label x={38} y={112} text="bore Ø" active={active === "bore" || active === "sealOd"} />
      <DimensionLine x1={300} y1={130} x2={300} y2={210} label="" active={active === "shaft"} />
      <Label x={292} y={162} text="shaft Ø" active={active === "shaft"} anchor="end" />
      <text x={222} y={116} fontSize={13} fill="#4a4f57">
        oil side
      </text>
    </svg>
  );
}
