import { useId } from "react";

export type SwatchPattern = "none" | "stipple" | "hatch" | "cross" | "dots" | "dashed-ring";
export type SwatchShape = "square" | "circle" | "diamond" | "triangle" | "hexagon" | "line";

export interface SwatchSpec {
  fill: string;
  /** Outline colour (drawn 1.5 px). */
  stroke?: string;
  pattern?: SwatchPattern;
  patternColor?: string;
  shape?: SwatchShape;
  /** Dashed line (for `shape: "line"`). */
  dashed?: boolean;
}

/** A small SVG key mark: colour plus a pattern or shape, so meaning never rests on colour alone. */
export function Swatch({ spec, size = 18 }: { spec: SwatchSpec; size?: number }) {
  const id = useId().replace(/:/g, "");
  const { fill, stroke, pattern = "none", patternColor = "#000", shape = "square", dashed } = spec;
  const patternFill = pattern !== "none" && pattern !== "dashed-ring" ? `url(#${id})` : undefined;
  const shapeEl = (paint: string | undefined, withStroke: boolean) => {
    const common = { fill: paint ?? "none", stroke: withStroke ? stroke : undefined, strokeWidth: withStroke && stroke ? 1.5 : 0 };
    switch (shape) {
      case "circle":
        return <circle cx={9} cy={9} r={7} {...common} />;
      case "diamond":
        return <polygon points="9,1.5 16.5,9 9,16.5 1.5,9" {...common} />;
      case "triangle":
        return <polygon points="9,2 16.5,16 1.5,16" {...common} />;
      case "hexagon":
        return <polygon points="9,1.5 15.5,5.2 15.5,12.8 9,16.5 2.5,12.8 2.5,5.2" {...common} />;
      case "line":
        return <line x1={1} y1={9} x2={17} y2={9} stroke={fill} strokeWidth={3} strokeDasharray={dashed ? "4 3" : undefined} />;
      default:
        return <rect x={1} y={1} width={16} height={16} rx={2} {...common} />;
    }
  };
  return (
    <svg width={size} height={size} viewBox="0 0 18 18" aria-hidden="true" focusable="false" className="shrink-0">
      {patternFill ? (
        <defs>
          <pattern id={id} width={4} height={4} patternUnits="userSpaceOnUse">
            <rect width={4} height={4} fill={fill} />
            {pattern === "stipple" ? (
              <>
                <rect x={0} y={0} width={1.6} height={1.6} fill={patternColor} />
                <rect x={2} y={2} width={1.6} height={1.6} fill={patternColor} />
              </>
            ) : null}
            {pattern === "dots" ? <circle cx={2} cy={2} r={0.9} fill={patternColor} /> : null}
            {pattern === "hatch" ? <path d="M-1,1 l2,-2 M0,4 l4,-4 M3,5 l2,-2" stroke={patternColor} strokeWidth={0.9} /> : null}
            {pattern === "cross" ? <path d="M0,2 h4 M2,0 v4" stroke={patternColor} strokeWidth={0.8} /> : null}
          </pattern>
        </defs>
      ) : null}
      {shape === "line" ? shapeEl(undefined, false) : shapeEl(patternFill ?? fill, true)}
      {pattern === "dashed-ring" ? <circle cx={9} cy={9} r={7.5} fill="none" stroke={patternColor} strokeWidth={1.2} strokeDasharray="2 1.6" /> : null}
    </svg>
  );
}
