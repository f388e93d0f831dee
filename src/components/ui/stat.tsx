import type { ReactNode } from "react";
import { cx } from "./cx";

interface StatProps {
  label: string;
  value: ReactNode;
  detail?: ReactNode;
  tone?: "default" | "ember" | "quench";
  className?: string;
}

/** One key number, set in the mono face like a gauge reading. */
export function Stat({ label, value, detail, tone = "default", className }: StatProps) {
  return (
    <div className={cx("rounded-lg border border-bone-300 bg-white p-4 shadow-card md:p-5", className)}>
      <dt className="text-sm font-medium text-soot-600">{label}</dt>
      <dd
        className={cx(
          "mt-1 font-mono text-3xl font-semibold tabular-nums tracking-tight md:text-4xl",
          tone === "ember" ? "text-ember-700" : tone === "quench" ? "text-quench-700" : "text-soot-900",
        )}
      >
        {value}
      </dd>
      {detail ? <dd className="mt-1 text-xs text-soot-600">{detail}</dd> : null}
    </div>
  );
}

export function StatGrid({ children, className }: { children: ReactNode; className?: string }) {
  return (
    <dl className={cx("grid grid-cols-2 gap-3 md:gap-4", className)}>
      {children}
    </dl>
  );
}
