/** A small coloured label for a status or a count. */
import type { ReactNode } from "react";
import { cx } from "./cx";

export type BadgeTone = "neutral" | "ember" | "quench" | "success" | "danger" | "straw";

const BADGE: Record<BadgeTone, string> = {
  neutral: "bg-bone-200 text-soot-700",
  ember: "bg-ember-200/70 text-ember-800",
  quench: "bg-quench-100 text-quench-800",
  success: "bg-success-100 text-success-700",
  danger: "bg-danger-100 text-danger-700",
  straw: "bg-[#f5e7bd] text-[#5c4510]",
};

export function Badge({ tone = "neutral", children, className }: { tone?: BadgeTone; children: ReactNode; className?: string }) {
  return <span className={cx("inline-flex items-center whitespace-nowrap rounded-xs px-2 py-0.5 text-xs font-semibold", BADGE[tone], className)}>{children}</span>;
}
