import { ArrowDefs, DimensionLine, DrawingLabel as Label } from "@/components/measure/dimension-line";

const ink = "#23262b";
const steel = "#c9ccd1";

export type KeyDimension = "width" | "diameter" | "height" | null;

/** A Woodruff key seen from the side and from its end: its diameter, its height and its width. */
export function WoodruffDrawing({ active }: { active: KeyDimension }) {
  return (
    <svg viewBox="0 0 360 240" role="img" aria-labelledby="woodruff-title" className="h-auto w-full max-w-sm">
      <title id="woodruff-title">A Woodruff key: the diameter of its round side, its height and its width</title>
      <ArrowDefs />
      {/* side view: a half disc a little less than half */}
      <path d="M 40 150 A 90 90 0 0 0 220 150 Z" fill={steel} stroke={ink} strokeWidth={2} />
      {/* end view */}
      <rect x={270} y={150} width={30} height={70} fill={steel} stroke={ink} strokeWidth={2} />
      <DimensionLine x1={40} y1={130} x2={220} y2={130} label="" active={active === "diameter"} />
      <Label x={130} y={122} text="diameter" active={active === "diameter"} anchor="middle" />
      <DimensionLine x1={240} y1={150} x2={240} y2={220} label="" active={active === "height"} />
      <Label x={236} y={110} text="height" active={active === "height"} anchor="end" />
      <DimensionLine x1={270} y1={135} x2={300} y2={135} label="" active={active === "width"} />
      <Label x={285} y={120} text="width" active={active === "width"} anchor="middle" />
    </svg>
  );
}

export type PinDimension = "largeEnd" | "length" | null;

/** A taper pin from the side: the large end measured across, and its length. */
export function TaperPinDrawing({ active }: { active: PinDimension }) {
  return (
    <svg viewBox="0 0 360 200" role="img" aria-labelledby="pin-title" className="h-auto w-full max-w-sm">
      <title id="pin-title">A taper pin: the diameter at its large end, and its length</title>
      <ArrowDefs />
      <path d="M 50 70 L 300 84 L 300 116 L 50 130 Z" fill={steel} stroke={ink} strokeWidth={2} />
      <DimensionLine x1={30} y1={70} x2={30} y2={130} label="" active={active === "largeEnd"} />
      <Label x={38} y={60} text="large end Ø" active={active === "largeEnd"} />
      <DimensionLine x1={50} y1={165} x2={300} y2={165} label="" active={active === "length"} />
      <Label x={175} y={190} text="length" active={active === "length"} anchor="middle" />
      <text x={310} y={104} fontSize={13} fill="#4a4f57">
        small end
      </text>
    </svg>
  );
}

export type ThreadDimension = "diameter" | "pitch" | null;

/** A bolt's thread: the diameter across the crests, and the pitch from one crest to the next. */
export function ThreadDrawing({ active }: { active: ThreadDimension }) {
  const crests = Array.from({ length: 9 }, (_, i) => 80 + i * 24);
  return (
    <svg viewBox="0 0 360 220" role="img" aria-labelledby="thread-title" className="h-auto w-full max-w-sm">
      <title id="thread-title">A threaded bolt: the diameter over the crests, and the pitch between crests</title>
      <ArrowDefs />
      <rect x={20} y={80} width={60} height={60} fill={steel} stroke={ink} strokeWidth={2} />
      <path
        d={`M 80 80 ${crests.map((x) => `L ${x + 12} 90 L ${x + 24} 80`).join(" ")} L 296 140 ${[...crests]
          .reverse()
          .map((x) => `L ${x + 12} 130 L ${x} 140`)
          .join(" ")} Z`}
        fill={steel}
        stroke={ink}
        strokeWidth={1.6}
      />
      <DimensionLine x1={320} y1={80} x2={320} y2={140} label="" active={active === "diameter"} />
      <Label x={312} y={70} text="Ø over crests" active={active === "diameter"} anchor="end" />
      <DimensionLine x1={104} y1={60} x2={128} y2={60} label="" active={active === "pitch"} />
      <Label x={116} y={50} text="pitch" active={active === "pitch"} anchor="middle" />
      <text x={80} y={180} fontSize={13} fill="#4a4f57">
        gauge: pitch, or threads per inch
      </text>
    </svg>
  );
}

export type ChainDimension = "pitch" | "roller" | "width" | null;

/** Three rollers of a chain: the pitch from pin to pin, the roller's diameter, the width between the inner plates. */
export function ChainDrawing({ active }: { active: ChainDimension }) {
  const xs = [80, 180, 280];
  return (
    <svg viewBox="0 0 360 220" role="img" aria-labelledby="chain-title" className="h-auto w-full max-w-sm">
      <title id="chain-title">
        Roller chain: the pitch between pins, the roller diameter, the width between plates
      </title>
      <ArrowDefs />
      <rect x={60} y={90} width={240} height={60} rx={30} fill="#e4e1d9" stroke={ink} strokeWidth={2} />
      {xs.map((x) => (
        <g key={x}>
          <circle cx={x} cy={120} r={24} fill={steel} stroke={ink} strokeWidth={2} />
          <circle cx={x} cy={120} r={8} fill="#8b9097" stroke={ink} strokeWidth={1.4} />
        </g>
      ))}
      <DimensionLine x1={80} y1={60} x2={180} y2={60} label="" active={active === "pitch"} />
      <Label x={130} y={50} text="pitch" active={active === "pitch"} anchor="middle" />
      <DimensionLine x1={256} y1={185} x2={304} y2={185} label="" active={active === "roller"} />
      <Label x={280} y={210} text="roller Ø" active={active === "roller"} anchor="middle" />
      <text x={40} y={205} fontSize={13} fill={active === "width" ? "#8a5d12" : "#4a4f57"}>
        width: between the inner plates
      </text>
    </svg>
  );
}
