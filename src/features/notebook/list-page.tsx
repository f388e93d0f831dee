/** /notebook: the signed-in user's forge notebook, newest first, with their storage use. */
import { Link } from "react-router";
import type { NotebookEntrySummary, StorageUsage } from "@shared/api/notebook";
import { useMe } from "@/api/auth";
import { useNotebookList } from "@/api/notebook";
import { ButtonLink } from "@/components/ui/button";
import { PageBody, PageHeader } from "@/components/ui/page-header";
import { paths } from "@/config/paths";
import { formatBytes, formatDay, formatHrc, formatParameter } from "./format";
import { Loaded } from "@/components/ui/loaded";
import { StatusBadge } from "./ui";

function StorageMeter({ storage }: { storage: StorageUsage }) {
  const share = Math.min(1, storage.usedBytes / storage.quotaBytes);
  return (
    <div className="rounded-lg border border-bone-300 bg-white p-4 shadow-card">
      <p className="text-sm font-semibold text-soot-800">Photo and report storage</p>
      <p className="mt-0.5 font-mono text-sm tabular-nums text-soot-700">
        {formatBytes(storage.usedBytes)} of {formatBytes(storage.quotaBytes)} used
      </p>
      <div
        role="meter"
        aria-label="Storage used"
        aria-valuemin={0}
        aria-valuemax={storage.quotaBytes}
        aria-valuenow={storage.usedBytes}
        aria-valuetext={`${formatBytes(storage.usedBytes)} of ${formatBytes(storage.quotaBytes)} used`}
        className="mt-2 h-2 overflow-hidden rounded-full bg-bone-200"
      >
        <div className={share > 0.9 ? "h-full bg-ember-600" : "h-full bg-quench-500"} style={{ width: `${share * 100}%` }} />
      </div>
      <p className="mt-2 text-xs text-soot-600">Photos are resized to 2400 px and stored without their camera metadata. Up to {formatBytes(storage.maxFileBytes)} per file.</p>
    </div>
  );
}

function EntryCard({ entry }: { entry: NotebookEntrySummary }) {
  return (
    <li className="group relative flex overflow-hidden rounded-lg border border-bone-300 bg-white shadow-card transition-shadow hover:shadow-forge">
      <div className="w-24 shrink-0 bg-soot-800 sm:w-32">
        {entry.coverThumbUrl ? (
          <img src={entry.coverThumbUrl} alt="" loading="lazy" className="h-full w-full object-cover" />
        ) : (
          <div aria-hidden="true" className="graticule flex h-full min-h-28 items-center justify-center font-mono text-xs text-ash-300">
            no photo
          </div>
        )}
      </div>
      <div className="min-w-0 flex-1 p-4">
        <div className="flex flex-wrap items-center gap-2">
          <p className="eyebrow text-ember-700">{entry.steel.label}</p>
          <StatusBadge status={entry.review.status} />
        </div>
        <h3 className="mt-1 text-lg font-semibold leading-snug text-soot-900">
          <Link to={paths.notebookEntry(entry.id)} className="after:absolute after:inset-0 focus-visible:outline-none group-focus-within:underline">
            {entry.title}
          </Link>
        </h3>
        <p className="mt-0.5 text-sm text-soot-600">{formatDay(entry.workedOn)}</p>
        <dl className="mt-3 flex flex-wrap gap-x-5 gap-y-1 text-sm">
          <div className="flex gap-1.5">
            <dt className="text-soot-600">Mean</dt>
            <dd className="font-mono tabular-nums text-soot-900">{entry.meanHrc !== null ? formatHrc(entry.meanHrc) : "—"}</dd>
          </div>
          <div className="flex gap-1.5">
            <dt className="text-soot-600">P</dt>
            <dd className="font-mono tabular-nums text-soot-900">{entry.temperingParameter !== null ? formatParameter(entry.temperingParameter) : "—"}</dd>
          </div>
          <div className="flex gap-1.5">
            <dt className="text-soot-600">Files</dt>
            <dd className="font-mono tabular-nums text-soot-900">{entry.fileCount}</dd>
          </div>
        </dl>
      </div>
    </li>
  );
}

export function Component() {
  const list = useNotebookList();
  const { data: user } = useMe();
  const staff = user?.role === "instructor" || user?.role === "admin";
  return (
    <>
      <title>Forge notebook — Grain &amp; Edge</title>
      <PageHeader
        eyebrow="Forge notebook"
        title="Your forge notebook"
        lede="Log each blade and test coupon: the steel, the heat treatment, your hardness readings and photos. The science core puts numbers beside what you measured."
      >
        <ButtonLink to={paths.notebookNew} size="lg">
          New entry
        </ButtonLink>
        {staff ? (
          <ButtonLink to={paths.notebookReview} variant="onDark" size="lg">
            Review students&rsquo; entries
          </ButtonLink>
        ) : null}
      </PageHeader>
      <PageBody>
        <Loaded query={list} label="notebook">
          {({ entries, storage }) => (
            <div className="grid gap-8 lg:grid-cols-[minmax(0,1fr)_20rem] lg:items-start">
              <section aria-labelledby="entries-heading">
                <h2 id="entries-heading" className="text-2xl font-semibold">
                  Entries <span className="font-mono text-base font-normal text-soot-600">({entries.length})</span>
                </h2>
                {entries.length === 0 ? (
                  <div className="mt-4 rounded-lg border border-dashed border-soot-500/40 bg-white p-6">
                    <p className="font-semibold text-soot-900">No entries yet.</p>
                    <p className="mt-1 text-sm text-soot-700">After your next forge session, record what you did while you still remember the temperatures and times.</p>
                    <ButtonLink to={paths.notebookNew} className="mt-4">
                      Write the first entry
                    </ButtonLink>
                  </div>
                ) : (
                  <ul className="mt-4 grid gap-4 xl:grid-cols-2">
                    {entries.map((e) => (
                      <EntryCard key={e.id} entry={e} />
                    ))}
                  </ul>
                )}
              </section>
              <div className="space-y-4">
                <StorageMeter storage={storage} />
                <div className="rounded-lg border border-bone-300 bg-bone-100 p-4 text-sm leading-relaxed text-soot-700">
                  <p className="font-semibold text-soot-900">How entries are used</p>
                  <p className="mt-1">Your instructors can read your entries and comment; you get an e-mail when they do. Cohort mates see your readings only as anonymous dots on the hardness chart.</p>
                </div>
              </div>
            </div>
          )}
        </Loaded>
      </PageBody>
    </>
  );
}
