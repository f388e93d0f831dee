import type { ReactNode } from "react";

interface ChartFigureProps {
  title: string;
  /** What the chart shows, in words: read by screen readers instead of the drawing. */
  description: ReactNode;
  /** Chart height class, e.g. "h-56". */
  heightClass?: string;
  children: ReactNode;
  /** Extra content under the chart (a key, a note). */
  footer?: ReactNode;
  className?: string;
}

/**
 * A chart in a captioned figure. The SVG is hidden from assistive technology; the caption and
 * description carry the meaning, and the numbers are also given in the page text.
 */
export function ChartFigure({ title, description, heightClass = "h-56", children, footer, className }: ChartFigureProps) {
  return (
    <figure className={`min-w-0 rounded-md border border-bone-300 bg-white p-3 ${className ?? ""}`}>
      <figcaption className="text-sm font-semibold text-soot-900">{title}</figcaption>
      <div className="text-xs leading-relaxed text-soot-600">{description}</div>
      <div className={`mt-2 ${heightClass}`} aria-hidden="true">
        {children}
      </div>
      {footer ? <div className="mt-2 text-xs text-soot-700">{footer}</div> : null}
    </figure>
  );
}

/** Common axis styling for recharts on white (soot-700 text: 11:1). */
export const AXIS_TICK = { fontSize: 11, fill: "#38322c" } as const;
export const GRID_STROKE = "#ebe3d5";

/** Ticks at powers of ten covering [min, max] for log axes. */
export function decadeTicks(min: number, max: number): number[] {
  const ticks: number[] = [];
  if (!(min > 0) || !(max > 0)) return ticks;
  for (let e = Math.floor(Math.log10(min)); e <= Math.ceil(Math.log10(max)); e++) ticks.push(10 ** e);
  return ticks;
}

export function decadeLabel(v: number): string {
  const e = Math.round(Math.log10(v));
  if (e >= -2 && e <= 3) return String(v);
  const sup: Record<string, string> = { "-": "⁻", "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹" };
  return `10${String(e).split("").map((c) => sup[c] ?? c).join("")}`;
}
