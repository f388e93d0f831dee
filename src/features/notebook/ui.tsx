/** Small building blocks of the notebook screens. */
import type { ReactNode } from "react";
import { REVIEW_STATUS_LABELS, type ReviewStatus } from "@shared/api/notebook";
import { cx } from "@/components/ui/cx";

const STATUS_STYLE: Record<ReviewStatus, string> = {
  unreviewed: "border-soot-500/30 bg-bone-100 text-soot-700",
  reviewed: "border-success-700/30 bg-success-100 text-success-700",
  "needs-rework": "border-ember-600/40 bg-ember-200/60 text-ember-800",
};

export function StatusBadge({ status, className }: { status: ReviewStatus; className?: string }) {
  return (
    <span className={cx("inline-flex items-center gap-1.5 whitespace-nowrap rounded-sm border px-2 py-0.5 text-xs font-semibold", STATUS_STYLE[status], className)}>
      <span aria-hidden="true" className={cx("size-1.5 rounded-full", status === "reviewed" ? "bg-success-700" : status === "needs-rework" ? "bg-ember-600" : "bg-soot-500")} />
      {REVIEW_STATUS_LABELS[status]}
    </span>
  );
}

/** A white section with a heading. */
export function Section({ id, title, eyebrow, actions, children, className }: { id: string; title: ReactNode; eyebrow?: string; actions?: ReactNode; children: ReactNode; className?: string }) {
  return (
    <section aria-labelledby={id} className={cx("rounded-lg border border-bone-300 bg-white p-5 shadow-card md:p-6", className)}>
      <div className="mb-4 flex flex-wrap items-start justify-between gap-3">
        <div>
          {eyebrow ? <p className="eyebrow text-ember-700">{eyebrow}</p> : null}
          <h2 id={id} className="mt-0.5 text-xl font-semibold text-soot-900">
            {title}
          </h2>
        </div>
        {actions ? <div className="flex flex-wrap gap-2">{actions}</div> : null}
      </div>
      {children}
    </section>
  );
}

