/** Small building blocks of the teaching and admin screens. */
import type { ReactNode } from "react";
import type { UseQueryResult } from "@tanstack/react-query";
import { isApiError } from "@/api/client";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { cx } from "@/components/ui/cx";
import { Spinner } from "@/components/ui/spinner";
import { messageFor } from "@/features/forms/api-errors";

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

/** A thin bar like a temper gauge; the number is given in text next to it. */
export function ProgressBar({ share, label, tone = "quench" }: { share: number; label: string; tone?: "quench" | "ember" | "success" }) {
  const color = tone === "ember" ? "bg-ember-500" : tone === "success" ? "bg-success-700" : "bg-quench-500";
  return (
    <div
      role="progressbar"
      aria-label={label}
      aria-valuemin={0}
      aria-valuemax={100}
      aria-valuenow={Math.round(share * 100)}
      className="h-1.5 w-full min-w-16 overflow-hidden rounded-full bg-bone-200"
    >
      <div className={cx("h-full rounded-full", color)} style={{ width: `${Math.max(0, Math.min(1, share)) * 100}%` }} />
    </div>
  );
}

/** Loading and error states for a page's main query; 404 gets its own wording. */
export function Loaded<T>({ query, label, children }: { query: UseQueryResult<T>; label: string; children: (data: T) => ReactNode }) {
  if (query.isPending) return <Spinner label={`Loading ${label}`} />;
  if (query.isError) {
    const missing = isApiError(query.error) && query.error.status === 404;
    return (
      <Alert tone="danger" title={missing ? `This ${label} was not found` : `The ${label} could not be loaded`}>
        <p>{missing ? "It may have been removed, or it belongs to someone else." : messageFor(query.error)}</p>
        {missing ? null : (
          <Button variant="secondary" className="mt-3" onClick={() => query.refetch()}>
            Try again
          </Button>
        )}
      </Alert>
    );
  }
  return <>{children(query.data)}</>;
}

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

/** A native <select> styled like the text fields. */
export const selectClass =
  "block min-h-11 rounded-md border border-soot-500/60 bg-white px-3 text-base text-soot-900 focus:border-quench-500 focus:outline-3 focus:outline-offset-0 focus:outline-quench-300";

export const inputClass =
  "block min-h-11 w-full rounded-md border border-soot-500/60 bg-white px-3 text-base text-soot-900 placeholder:text-soot-500 focus:border-quench-500 focus:outline-3 focus:outline-offset-0 focus:outline-quench-300";
