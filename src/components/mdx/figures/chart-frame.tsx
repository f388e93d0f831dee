import type { ReactNode } from "react";

/** Figure colours: the theme's tokens, as literal values because SVG attributes cannot read CSS variables everywhere. */
export const FIGURE_COLORS = {
  ink: "#1a1714",
  grid: "#ebe3d5",
  axis: "#524a43",
  ember: "#c2500b",
  emberLight: "#f26d1d",
  quench: "#2d6488",
  quenchLight: "#68a0c6",
  bronze: "#c08a45",
  purple: "#7d4f8f",
  blue: "#3e5fa6",
  muted: "#6b625a",
} as const;

export const AXIS_TICK = { fill: FIGURE_COLORS.axis, fontSize: 12, fontFamily: "Inter Variable, ui-sans-serif, sans-serif" };
export const AXIS_LABEL_STYLE = { fill: FIGURE_COLORS.axis, fontSize: 12, fontWeight: 600 } as const;

interface ChartFrameProps {
  /** What the chart shows, in a sentence or two, for people who cannot see it. */
  description: string;
  height?: number;
  children: ReactNode;
  /** A small legend or note under the chart. */
  note?: ReactNode;
}

/** A chart exposed to assistive technology as one image with a text description. */
export function ChartFrame({ description, height = 320, children, note }: ChartFrameProps) {
  return (
    <div>
      <div role="img" aria-label={description} style={{ width: "100%", height }}>
        {children}
      </div>
      {note ? <div className="mt-2 px-2 text-xs leading-relaxed text-soot-600">{note}</div> : null}
    </div>
  );
}

/** Evenly spaced values from `from` to `to` inclusive. */
export function range(from: number, to: number, count: number): number[] {
  return Array.from({ length: count }, (_, i) => from + ((to - from) * i) / (count - 1));
}
