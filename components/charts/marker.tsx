import type { MarkerShape } from "./palette";

/** A marker centred on (x, y); `size` is roughly its diameter in px. */
export function Marker({
  shape,
  x,
  y,
  size = 8,
  color,
  filled = true,
}: {
  shape: MarkerShape;
  x: number;
  y: number;
  size?: number;
  color: string;
  filled?: boolean;
}) {
  const r = size / 2;
  const common = { fill: filled ? color : "none", stroke: color, strokeWidth: 1.5 };
  switch (shape) {
    case "square":
      return <rect x={x - r * 0.85} y={y - r * 0.85} width={r * 1.7} height={r * 1.7} {...common} />;
    case "triangle":
      return <path d={`M${x},${y - r * 1.1} L${x + r},${y + r * 0.75} L${x - r},${y + r * 0.75} Z`} {...common} />;
    case "triangle-down":
      return <path d={`M${x},${y + r * 1.1} L${x + r},${y - r * 0.75} L${x - r},${y - r * 0.75} Z`} {...common} />;
    case "diamond":
      return <path d={`M${x},${y - r * 1.15} L${x + r},${y} L${x},${y + r * 1.15} L${x - r},${y} Z`} {...common} />;
    case "cross":
      return (
        <path
          d={`M${x - r},${y - r} L${x + r},${y + r} M${x + r},${y - r} L${x - r},${y + r}`}
          fill="none"
          stroke={color}
          strokeWidth={2}
        />
      );
    default:
      return <circle cx={x} cy={y} r={r} {...common} />;
  }
}
