import type { ReactNode } from "react";
import { Swatch, type SwatchSpec } from "./swatch";

export interface LegendItem {
  key: string;
  label: ReactNode;
  /** Optional second line: what the mark means in the model. */
  detail?: ReactNode;
  swatch: SwatchSpec;
}

/** A key to the canvas: each entry pairs a mark (colour + pattern/shape) with words. */
export function Legend({ title = "Key", items, columns = 2 }: { title?: string; items: readonly LegendItem[]; columns?: 1 | 2 | 3 }) {
  const grid = columns === 1 ? "" : columns === 2 ? "@md:grid-cols-2" : "@md:grid-cols-2 @2xl:grid-cols-3";
  return (
    <div className="@container">
      <p className="eyebrow text-[0.65rem] text-soot-600">{title}</p>
      <ul className={`mt-1.5 grid gap-x-4 gap-y-1.5 ${grid}`}>
        {items.map((item) => (
          <li key={item.key} className="flex items-start gap-2 text-sm leading-snug text-soot-800">
            <span className="mt-0.5">
              <Swatch spec={item.swatch} />
            </span>
            <span>
              <span className="font-medium">{item.label}</span>
              {item.detail ? <span className="block text-xs text-soot-600">{item.detail}</span> : null}
            </span>
          </li>
        ))}
      </ul>
    </div>
  );
}
