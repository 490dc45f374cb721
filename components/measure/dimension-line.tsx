/** A dimension line with arrowheads and a label; the dimension being entered is drawn in brass and heavier. */
export function DimensionLine({
  x1,
  y1,
  x2,
  y2,
  label,
  active,
  labelAt = "middle",
}: {
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  label: string;
  active: boolean;
  labelAt?: "middle" | "start";
}) {
  const colour = active ? "#8a5d12" : "#4a4f57";
  const vertical = x1 === x2;
  const mx = (x1 + x2) / 2;
  const my = (y1 + y2) / 2;
  return (
    <g stroke={colour} fill={colour} strokeWidth={active ? 2.6 : 1.3} data-active={active || undefined}>
      <line x1={x1} y1={y1} x2={x2} y2={y2} markerStart="url(#arrow)" markerEnd="url(#arrow)" />
      <text
        x={vertical ? x1 + 8 : labelAt === "start" ? x1 : mx}
        y={vertical ? my + 5 : y1 - 8}
        stroke="none"
        fontSize={active ? 17 : 15}
        fontWeight={active ? 700 : 400}
        textAnchor={vertical || labelAt === "start" ? "start" : "middle"}
        fontFamily="JetBrains Mono, monospace"
      >
        {label}
      </text>
    </g>
  );
}

export function ArrowDefs() {
  return (
    <defs>
      <marker
        id="arrow"
        viewBox="0 0 10 10"
        refX="5"
        refY="5"
        markerWidth="7"
        markerHeight="7"
        orient="auto-start-reverse"
      >
        <path d="M 0 1 L 9 5 L 0 9 z" fill="context-stroke" />
      </marker>
      <pattern id="hatch" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
        <line x1="0" y1="0" x2="0" y2="6" stroke="#9a9184" strokeWidth="1.4" />
      </pattern>
    </defs>
  );
}

/** A name on a drawing, set in brass and bold while its field is being entered. */
export function DrawingLabel({
  x,
  y,
  text,
  active,
  anchor = "start",
}: {
  x: number;
  y: number;
  text: string;
  active: boolean;
  anchor?: "start" | "end" | "middle";
}) {
  return (
    <text
      x={x}
      y={y}
      textAnchor={anchor}
      fontSize={active ? 17 : 15}
      fontWeight={active ? 700 : 400}
      fill={active ? "#8a5d12" : "#2f333a"}
      fontFamily="JetBrains Mono, monospace"
    >
      {text}
    </text>
  );
}
