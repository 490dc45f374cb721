import { ArrowDefs, DimensionLine, DrawingLabel as Label } from "@/components/measure/dimension-line";

const ink = "#23262b";
const axis = "#6b7079";
const felt = "#cdbf9f";

function Extensions({ lines }: { lines: Array<[number, number, number, number]> }) {
  return (
    <g stroke={axis} strokeWidth={0.9} strokeDasharray="3 3">
      {lines.map(([x1, y1, x2, y2]) => (
        <line key={`${x1},${y1},${x2},${y2}`} x1={x1} y1={y1} x2={x2} y2={y2} />
      ))}
    </g>
  );
}

export type FeltDimension = "shaft" | "bore" | "width" | null;

/**
 * A felt seal in its groove, cut through the axis: the shaft, the groove's bore (the outside of the felt) and the
 * groove's width, each named where it is measured.
 */
export function FeltDrawing({ active }: { active: FeltDimension }) {
  return (
    <svg viewBox="0 0 360 320" role="img" aria-labelledby="felt-drawing-title" className="h-auto w-full max-w-sm">
      <title id="felt-drawing-title">
        Cross-section of a felt seal in its groove: shaft diameter, groove bore and groove width
      </title>
      <ArrowDefs />
      {/* housing with a rectangular groove above and below the shaft */}
      <path d="M 80 40 H 280 V 128 H 210 V 84 H 160 V 128 H 80 Z" fill="url(#hatch)" stroke={ink} strokeWidth={2} />
      <path d="M 80 300 H 280 V 212 H 210 V 256 H 160 V 212 H 80 Z" fill="url(#hatch)" stroke={ink} strokeWidth={2} />
      <rect x={160} y={84} width={50} height={46} fill={felt} stroke={ink} strokeWidth={1.5} />
      <rect x={160} y={210} width={50} height={46} fill={felt} stroke={ink} strokeWidth={1.5} />
      <rect x={60} y={130} width={270} height={80} fill="#ece6da" stroke={ink} strokeWidth={2} />
      <line x1={50} y1={170} x2={340} y2={170} stroke={axis} strokeDasharray="14 4 3 4" strokeWidth={1.2} />
      <Extensions
        lines={[
          [160, 84, 160, 18],
          [210, 84, 210, 18],
          [160, 84, 22, 84],
          [160, 256, 22, 256],
        ]}
      />
      <DimensionLine x1={160} y1={24} x2={210} y2={24} label="" active={active === "width"} />
      <Label x={218} y={30} text="groove width" active={active === "width"} />
      <DimensionLine x1={30} y1={84} x2={30} y2={256} label="" active={active === "bore"} />
      <Label x={38} y={112} text="groove Ø" active={active === "bore"} />
      <DimensionLine x1={300} y1={130} x2={300} y2={210} label="" active={active === "shaft"} />
      <Label x={292} y={162} text="shaft Ø" active={active === "shaft"} anchor="end" />
      <text x={166} y={112} fontSize={13} fill="#4a4f57">
        felt
      </text>
    </svg>
  );
}

export type PackingDimension = "shaft" | "bore" | "depth" | null;

/**
 * A stuffing box cut through the axis: packing rings between the shaft and the box's bore, the gland nut pressing
 * them from the open end. The shaft, the box's bore and its depth are named where they are measured.
 */
export function PackingDrawing({ active }: { active: PackingDimension }) {
  const rings = [0, 1, 2, 3].map((i) => 150 + i * 26);
  return (
    <svg viewBox="0 0 360 320" role="img" aria-labelledby="packing-drawing-title" className="h-auto w-full max-w-sm">
      <title id="packing-drawing-title">
        Cross-section of a stuffing box: shaft diameter, box bore and box depth, with the gland nut at the open end
      </title>
      <ArrowDefs />
      <path d="M 140 40 H 300 V 130 H 254 V 96 H 140 Z" fill="url(#hatch)" stroke={ink} strokeWidth={2} />
      <path d="M 140 300 H 300 V 210 H 254 V 244 H 140 Z" fill="url(#hatch)" stroke={ink} strokeWidth={2} />
      {rings.map((x) => (
        <g key={x}>
          <rect x={x} y={97} width={24} height={32} fill={felt} stroke={ink} strokeWidth={1.4} />
          <rect x={x} y={211} width={24} height={32} fill={felt} stroke={ink} strokeWidth={1.4} />
        </g>
      ))}
      {/* gland nut and follower entering the box */}
      <path d="M 84 60 H 140 V 96 H 150 V 128 H 120 V 104 H 84 Z" fill="#d9d1c3" stroke={ink} strokeWidth={2} />
      <path d="M 84 280 H 140 V 244 H 150 V 212 H 120 V 236 H 84 Z" fill="#d9d1c3" stroke={ink} strokeWidth={2} />
      <rect x={40} y={130} width={290} height={80} fill="#ece6da" stroke={ink} strokeWidth={2} />
      <line x1={30} y1={170} x2={340} y2={170} stroke={axis} strokeDasharray="14 4 3 4" strokeWidth={1.2} />
      <Extensions
        lines={[
          [150, 96, 150, 18],
          [254, 96, 254, 18],
          [300, 96, 336, 96],
          [300, 244, 336, 244],
        ]}
      />
      <DimensionLine x1={150} y1={24} x2={254} y2={24} label="" active={active === "depth"} />
      <Label x={202} y={16} text="depth" active={active === "depth"} anchor="middle" />
      <DimensionLine x1={326} y1={96} x2={326} y2={244} label="" active={active === "bore"} />
      <Label x={320} y={80} text="box Ø" active={active === "bore"} anchor="end" />
      <DimensionLine x1={60} y1={130} x2={60} y2={210} label="" active={active === "shaft"} />
      <Label x={68} y={162} text="shaft Ø" active={active === "shaft"} />
      <text x={86} y={54} fontSize={13} fill="#4a4f57">
        gland nut
      </text>
    </svg>
  );
}

/** A cup plug in its bore, cut through: the bore measured across the hole, where the plug's edge grips. */
export function PlugDrawing({ active, kind }: { active: boolean; kind: "cup" | "disc" }) {
  return (
    <svg viewBox="0 0 360 300" role="img" aria-labelledby="plug-drawing-title" className="h-auto w-full max-w-sm">
      <title id="plug-drawing-title">
        Cross-section of a {kind} plug in its bore, with the bore diameter measured across the hole
      </title>
      <ArrowDefs />
      {/* a wall with a hole through it; outside is to the right */}
      <rect x={150} y={40} width={90} height={60} fill="url(#hatch)" stroke={ink} strokeWidth={2} />
      <rect x={150} y={200} width={90} height={60} fill="url(#hatch)" stroke={ink} strokeWidth={2} />
      {kind === "cup" ? (
        <path d="M 236 101 H 198 V 199 H 236 V 193 H 204 V 107 H 236 Z" fill="#b9bec6" stroke={ink} strokeWidth={2} />
      ) : (
        <path
          d="M 214 101 Q 244 150 214 199 L 208 199 Q 238 150 208 101 Z"
          fill="#b9bec6"
          stroke={ink}
          strokeWidth={2}
        />
      )}
      <text x={246} y={30} fontSize={13} fill="#4a4f57">
        outside
      </text>
      <Extensions
        lines={[
          [150, 100, 100, 100],
          [150, 200, 100, 200],
        ]}
      />
      <DimensionLine x1={110} y1={100} x2={110} y2={200} label="" active={active} />
      <Label x={104} y={155} text="bore Ø" active={active} anchor="end" />
      <text x={250} y={154} fontSize={13} fill="#4a4f57">
        {kind === "cup" ? "open side out" : "dome out"}
      </text>
    </svg>
  );
}
