import type { ReactNode } from "react";
import { cx } from "./cx";

/** A white panel with a heading, used for each section of a screen. */
export function Panel({ id, title, description, actions, children, className }: { id: string; title: ReactNode; description?: ReactNode; actions?: ReactNode; children: ReactNode; className?: string }) {
  return (
    <section aria-labelledby={id} className={cx("min-w-0 rounded-lg border border-bone-300 bg-white shadow-card", className)}>
      <div className="flex flex-wrap items-start justify-between gap-3 border-b border-bone-200 px-4 py-4 md:px-5">
        <div className="min-w-0">
          <h2 id={id} className="text-xl font-semibold text-soot-900">
            {title}
          </h2>
          {description ? <p className="mt-1 max-w-prose text-sm text-soot-600">{description}</p> : null}
        </div>
        {actions ? <div className="flex flex-wrap gap-2">{actions}</div> : null}
      </div>
      <div className="px-4 py-4 md:px-5">{children}</div>
    </section>
  );
}
