/** /notebook/review: the notebook entries of an instructor's students (all students for an admin), to review. */
import { useState } from "react";
import { Link } from "react-router";
import { REVIEW_STATUS_LABELS, type ReviewListItem, type ReviewListQuery, type ReviewStatus } from "@shared/api/notebook";
import { isApiError } from "@/api/client";
import { useReviewQueue } from "@/api/notebook";
import { Alert } from "@/components/ui/alert";
import { ButtonLink } from "@/components/ui/button";
import { cx } from "@/components/ui/cx";
import { PageBody, PageHeader } from "@/components/ui/page-header";
import { Spinner } from "@/components/ui/spinner";
import { paths } from "@/config/paths";
import { messageFor } from "@/api/errors";

const FILTERS: { value: ReviewListQuery["status"]; label: string }[] = [
  { value: "unreviewed", label: "Awaiting review" },
  { value: "needs-rework", label: "Needs rework" },
  { value: "reviewed", label: "Reviewed" },
  { value: "all", label: "All" },
];

const STATUS_STYLE: Record<ReviewStatus, string> = {
  unreviewed: "border-soot-500/30 bg-bone-100 text-soot-700",
  reviewed: "border-success-700/30 bg-success-100 text-success-700",
  "needs-rework": "border-ember-600/40 bg-ember-200/60 text-ember-800",
};

const day = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });
const formatDay = (iso: string) => day.format(new Date(`${iso}T00:00:00Z`));

function Status({ status }: { status: ReviewStatus }) {
  return <span className={cx("inline-flex whitespace-nowrap rounded-sm border px-2 py-0.5 text-xs font-semibold", STATUS_STYLE[status])}>{REVIEW_STATUS_LABELS[status]}</span>;
}

function QueueTable({ entries }: { entries: ReviewListItem[] }) {
  return (
    <>
      {/* Phone: cards */}
      <ul className="space-y-3 md:hidden">
        {entries.map((e) => (
          <li key={e.id} className="rounded-lg border border-bone-300 bg-white p-4 shadow-card">
            <div className="flex items-start justify-between gap-3">
              <Link to={paths.notebookEntry(e.id)} className="font-semibold text-quench-700 underline underline-offset-2">
                {e.title}
              </Link>
              <Status status={e.review.status} />
            </div>
            <p className="mt-1 text-sm text-soot-700">
              {e.owner.displayName} · {e.steel.label}
            </p>
            <p className="text-xs text-soot-600">
              {formatDay(e.workedOn)}
              {e.cohorts.length ? ` · ${e.cohorts.join(", ")}` : ""}
            </p>
          </li>
        ))}
      </ul>
      {/* Desktop: table */}
      <div className="hidden overflow-x-auto rounded-lg border border-bone-300 bg-white shadow-card md:block">
        <table className="w-full text-sm">
          <caption className="sr-only">Notebook entries to review</caption>
          <thead className="bg-bone-100 text-left text-soot-700">
            <tr>
              <th scope="col" className="px-4 py-2.5 font-semibold">Entry</th>
              <th scope="col" className="px-4 py-2.5 font-semibold">Student</th>
              <th scope="col" className="px-4 py-2.5 font-semibold">Steel</th>
              <th scope="col" className="px-4 py-2.5 font-semibold">Worked on</th>
              <th scope="col" className="px-4 py-2.5 text-right font-semibold">Readings</th>
              <th scope="col" className="px-4 py-2.5 text-right font-semibold">Files</th>
              <th scope="col" className="px-4 py-2.5 font-semibold">Status</th>
            </tr>
          </thead>
          <tbody>
            {entries.map((e) => (
              <tr key={e.id} className="border-t border-bone-200 hover:bg-bone-50">
                <th scope="row" className="px-4 py-2.5 text-left font-semibold">
                  <Link to={paths.notebookEntry(e.id)} className="text-quench-700 underline underline-offset-2">
                    {e.title}
                  </Link>
                </th>
                <td className="px-4 py-2.5">
                  <span className="block text-soot-900">{e.owner.displayName}</span>
                  <span className="block text-xs text-soot-600">{e.cohorts.join(", ")}</span>
                </td>
                <td className="px-4 py-2.5 text-soot-800">{e.steel.label}</td>
                <td className="px-4 py-2.5 font-mono text-xs text-soot-700">{formatDay(e.workedOn)}</td>
                <td className="px-4 py-2.5 text-right font-mono tabular-nums">{e.readingsCount}</td>
                <td className="px-4 py-2.5 text-right font-mono tabular-nums">{e.fileCount}</td>
                <td className="px-4 py-2.5">
                  <Status status={e.review.status} />
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </>
  );
}

export function Component() {
  const [status, setStatus] = useState<ReviewListQuery["status"]>("unreviewed");
  const queue = useReviewQueue(status);
  return (
    <>
      <title>Notebook reviews — Grain &amp; Edge</title>
      <PageHeader
        eyebrow="Teaching"
        title="Notebook reviews"
        lede="Your students' forge notebook entries. Open one to see its photos and the models' estimates, then mark it reviewed or send it back with a comment; the student is e-mailed."
      >
        <ButtonLink to={paths.notebook} variant="onDark">
          Your own notebook
        </ButtonLink>
      </PageHeader>
      <PageBody>
        <div role="group" aria-label="Show entries" className="mb-5 flex flex-wrap gap-2">
          {FILTERS.map((f) => (
            <button
              key={f.value}
              type="button"
              aria-pressed={status === f.value}
              onClick={() => setStatus(f.value)}
              className={cx(
                "min-h-10 rounded-md border px-3 text-sm font-semibold transition-colors",
                status === f.value ? "border-soot-900 bg-soot-900 text-bone-50" : "border-soot-700/25 bg-white text-soot-800 hover:bg-bone-100",
              )}
            >
              {f.label}
            </button>
          ))}
        </div>
        {queue.isPending ? (
          <Spinner label="Loading entries" />
        ) : queue.isError ? (
          <Alert tone="danger" title="The entries could not be loaded">
            {isApiError(queue.error) ? messageFor(queue.error) : "Please try again."}
          </Alert>
        ) : queue.data.entries.length === 0 ? (
          <p className="rounded-lg border border-dashed border-soot-500/40 bg-white p-6 text-sm text-soot-700">
            {status === "unreviewed" ? "Nothing waiting: every entry from your cohorts has been reviewed." : "No entries here."}
          </p>
        ) : (
          <QueueTable entries={queue.data.entries} />
        )}
      </PageBody>
    </>
  );
}
