/**
 * One notebook entry: the record, its photos and reports, the hardness chart beside the cohort,
 * the science core's estimates, and the review history. The instructor's review form is passed
 * in by the route (src/app/routes/notebook-entry.tsx), because it belongs to features/notebook-review.
 */
import type { ReactNode } from "react";
import { useNavigate } from "react-router";
import {
  COLD_TREATMENT_LABELS,
  QUENCH_MEDIUM_LABELS,
  type NotebookComment,
  type NotebookEntry,
  type NotebookEntryResponse,
  type NotebookFile,
} from "@shared/api/notebook";
import { useMe } from "@/api/auth";
import { useDeleteEntry, useDeleteFile, useNotebookEntry, useNotebookList } from "@/api/notebook";
import { Alert } from "@/components/ui/alert";
import { Button, ButtonLink } from "@/components/ui/button";
import { PageBody, PageHeader } from "@/components/ui/page-header";
import { paths } from "@/config/paths";
import { messageFor } from "@/api/errors";
import { ComputedPanel } from "./computed-panel";
import { FileUploader } from "./file-uploader";
import { formatBytes, formatDateTime, formatDay, formatHours, formatTempC } from "./format";
import { HardnessChart } from "./hardness-chart";
import { SafetyCautions } from "./safety-cautions";
import { formatComposition } from "./steel";
import { Loaded } from "@/components/ui/loaded";
import { Section, StatusBadge } from "./ui";

function Step({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="flex flex-col gap-0.5 border-b border-bone-200 py-2 sm:flex-row sm:items-baseline sm:justify-between sm:gap-4">
      <dt className="text-sm text-soot-600">{label}</dt>
      <dd className="text-sm font-medium text-soot-900 sm:text-right">{children}</dd>
    </div>
  );
}

function Record({ entry }: { entry: NotebookEntry }) {
  const p = entry.process;
  return (
    <Section id="record-heading" eyebrow="What was done" title="Heat-treatment record">
      <dl>
        <Step label="Steel">
          {entry.steel.label} <span className="block font-mono text-xs font-normal text-soot-600 sm:inline sm:pl-2">{formatComposition(entry.steel.composition)}</span>
        </Step>
        <Step label="Normalising">{p.normalizingCycles === 0 ? "None" : `${p.normalizingCycles} cycle${p.normalizingCycles === 1 ? "" : "s"}`}</Step>
        <Step label="Austenitising">
          {formatTempC(p.austenitizeC)} for {p.soakMinutes} min
        </Step>
        <Step label="Quench">{QUENCH_MEDIUM_LABELS[p.quenchMedium]}</Step>
        <Step label="Cold treatment">{COLD_TREATMENT_LABELS[p.coldTreatment]}</Step>
        <Step label="Tempering">
          {p.temperCycles === 0 || p.temperC === null || p.temperHours === null ? "Not tempered" : `${p.temperCycles} × ${formatHours(p.temperHours)} at ${formatTempC(p.temperC)}`}
        </Step>
      </dl>
      <h3 className="mt-5 font-sans text-sm font-semibold uppercase tracking-wide text-soot-600">Hardness readings</h3>
      {entry.hardness.length === 0 ? (
        <p className="mt-1 text-sm text-soot-700">No readings recorded.</p>
      ) : (
        <div className="mt-2 overflow-x-auto">
          <table className="w-full text-sm">
            <caption className="sr-only">Rockwell C readings of this piece</caption>
            <thead>
              <tr className="border-b border-bone-300 text-left text-soot-600">
                <th scope="col" className="py-1.5 pr-4 font-medium">
                  #
                </th>
                <th scope="col" className="py-1.5 pr-4 font-medium">
                  HRC
                </th>
                <th scope="col" className="py-1.5 font-medium">
                  Where
                </th>
              </tr>
            </thead>
            <tbody>
              {entry.hardness.map((r, i) => (
                <tr key={i} className="border-b border-bone-200 last:border-b-0">
                  <td className="py-1.5 pr-4 font-mono text-soot-600">{i + 1}</td>
                  <td className="py-1.5 pr-4 font-mono font-semibold tabular-nums text-soot-900">{r.hrc.toFixed(1)}</td>
                  <td className="py-1.5 text-soot-700">{r.spot || "—"}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      <h3 className="mt-5 font-sans text-sm font-semibold uppercase tracking-wide text-soot-600">Notes</h3>
      <p className="mt-1 whitespace-pre-wrap text-sm leading-relaxed text-soot-800">{entry.notes || "No notes."}</p>
    </Section>
  );
}

function FileTile({ file, canDelete, onDelete, deleting }: { file: NotebookFile; canDelete: boolean; onDelete: () => void; deleting: boolean }) {
  return (
    <li className="flex flex-col overflow-hidden rounded-md border border-bone-300 bg-bone-50">
      {file.kind === "image" && file.thumbUrl ? (
        <a href={file.url} target="_blank" rel="noopener" className="block aspect-[4/3] overflow-hidden bg-soot-800">
          <img src={file.thumbUrl} alt={`Photo: ${file.name}`} loading="lazy" className="h-full w-full object-cover transition-transform hover:scale-[1.03]" />
        </a>
      ) : (
        <a href={file.url} className="graticule flex aspect-[4/3] flex-col items-center justify-center gap-1 bg-soot-800 text-bone-50">
          <svg aria-hidden="true" viewBox="0 0 24 24" className="size-8 text-ember-300" fill="none" stroke="currentColor" strokeWidth="1.6">
            <path d="M6 2h8l4 4v16H6z" />
            <path d="M14 2v4h4" />
          </svg>
          <span className="font-mono text-xs">PDF · download</span>
        </a>
      )}
      <div className="flex items-start justify-between gap-2 p-2">
        <div className="min-w-0">
          <p className="truncate text-xs font-medium text-soot-900" title={file.name}>
            {file.name}
          </p>
          <p className="font-mono text-2xs text-soot-600">
            {formatBytes(file.sizeBytes)}
            {file.width && file.height ? ` · ${file.width}×${file.height}` : ""}
          </p>
        </div>
        {canDelete ? (
          <button
            type="button"
            onClick={onDelete}
            disabled={deleting}
            className="shrink-0 rounded-sm px-1.5 py-0.5 text-xs font-semibold text-danger-700 hover:bg-danger-100 disabled:opacity-50"
            aria-label={`Delete ${file.name}`}
          >
            Delete
          </button>
        ) : null}
      </div>
    </li>
  );
}

function Files({ entry, maxFileBytes }: { entry: NotebookEntry; maxFileBytes: number }) {
  const remove = useDeleteFile(entry.id);
  return (
    <Section id="files-heading" eyebrow="Fracture, etch, edge" title="Photos and reports">
      {entry.files.length === 0 ? (
        <p className="mb-4 text-sm text-soot-700">
          {entry.canEdit ? "Add photos of the fracture grain, the etched pattern or the edge under magnification, or a PDF report." : "No photos or reports yet."}
        </p>
      ) : (
        <ul className="mb-4 grid grid-cols-2 gap-3 sm:grid-cols-3" aria-label="Files of this entry">
          {entry.files.map((f) => (
            <FileTile
              key={f.id}
              file={f}
              canDelete={entry.canEdit}
              deleting={remove.isPending && remove.variables === f.id}
              onDelete={() => {
                if (window.confirm(`Delete ${f.name}? This cannot be undone.`)) remove.mutate(f.id);
              }}
            />
          ))}
        </ul>
      )}
      {remove.isError ? (
        <Alert tone="danger" className="mb-3">
          {messageFor(remove.error)}
        </Alert>
      ) : null}
      {entry.canEdit ? <FileUploader entryId={entry.id} maxFileBytes={maxFileBytes} /> : null}
    </Section>
  );
}

function Comment({ comment, ownerView }: { comment: NotebookComment; ownerView: boolean }) {
  return (
    <li className="rounded-md border border-bone-300 bg-bone-50 p-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="text-sm font-semibold text-soot-900">{comment.author}</p>
        {comment.status ? <StatusBadge status={comment.status} /> : null}
      </div>
      <p className="font-mono text-2xs text-soot-600">{formatDateTime(comment.createdAt)}</p>
      {comment.body ? <p className="mt-2 whitespace-pre-wrap text-sm leading-relaxed text-soot-800">{comment.body}</p> : null}
      {!ownerView && comment.notification !== "none" ? (
        <p className="mt-2 text-xs text-soot-600">
          {comment.notification === "sent" ? "The student was e-mailed." : comment.notification === "failed" ? "The e-mail to the student could not be sent." : "E-mail to the student queued."}
        </p>
      ) : null}
    </li>
  );
}

export function Review({ entry, children }: { entry: NotebookEntry; children?: ReactNode }) {
  return (
    <Section id="review-heading" eyebrow="Instructor review" title="Review" actions={<StatusBadge status={entry.review.status} />}>
      {entry.comments.length === 0 ? (
        <p className="text-sm text-soot-700">{entry.canEdit ? "No review yet. Your instructors see new entries in their review queue, and you get an e-mail when one of them reviews it." : "No review yet."}</p>
      ) : (
        <ol className="space-y-3">
          {entry.comments.map((c) => (
            <Comment key={c.id} comment={c} ownerView={entry.canEdit} />
          ))}
        </ol>
      )}
      {children ? <div className="mt-5 border-t border-bone-200 pt-5">{children}</div> : null}
    </Section>
  );
}

function EntryBody({ data, renderReview, maxFileBytes }: { data: NotebookEntryResponse; renderReview?: (entry: NotebookEntry) => ReactNode; maxFileBytes: number }) {
  const { entry, comparison } = data;
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_24rem] lg:items-start">
      <div className="space-y-6">
        <Record entry={entry} />
        <Files entry={entry} maxFileBytes={maxFileBytes} />
        <Section id="chart-heading" eyebrow="Readings against the model" title="Hardness and tempering">
          <HardnessChart comparison={comparison} entryId={entry.id} ownLabel={entry.canEdit ? "Your other entries" : "This student's other entries"} />
        </Section>
      </div>
      <div className="space-y-6">
        <ComputedPanel computation={entry.computation} coldTreatment={entry.process.coldTreatment} />
        <Review entry={entry}>{entry.canReview && renderReview ? renderReview(entry) : null}</Review>
        <SafetyCautions compact />
      </div>
    </div>
  );
}

export function EntryPage({ id, renderReview }: { id: number; renderReview?: (entry: NotebookEntry) => ReactNode }) {
  const query = useNotebookEntry(id);
  const { data: me } = useMe();
  // The list carries the storage limits; only the owner uploads, so only they need it.
  const own = query.data?.entry.canEdit ?? false;
  const list = useNotebookList(own);
  const maxFileBytes = own ? (list.data?.storage.maxFileBytes ?? 8 * 1024 * 1024) : 0;
  const remove = useDeleteEntry();
  const navigate = useNavigate();
  const entry = query.data?.entry;

  return (
    <>
      <title>{entry ? `${entry.title} — Forge notebook — Grain & Edge` : "Forge notebook — Grain & Edge"}</title>
      <PageHeader
        eyebrow={entry ? `Forge notebook · ${entry.steel.label}` : "Forge notebook"}
        title={entry?.title ?? "Notebook entry"}
        lede={
          entry ? (
            <>
              Worked on {formatDay(entry.workedOn)}
              {entry.owner.id !== me?.id ? ` by ${entry.owner.displayName}` : ""}. Last changed {formatDateTime(entry.updatedAt)}.
            </>
          ) : undefined
        }
      >
        {entry?.canEdit ? (
          <>
            <ButtonLink to={paths.notebookEdit(entry.id)} size="lg">
              Edit entry
            </ButtonLink>
            <Button
              variant="onDark"
              size="lg"
              disabled={remove.isPending}
              onClick={() => {
                if (window.confirm(`Delete “${entry.title}” with its photos and reports? This cannot be undone.`)) {
                  remove.mutate(entry.id, { onSuccess: () => navigate(paths.notebook) });
                }
              }}
            >
              Delete
            </Button>
          </>
        ) : null}
        <ButtonLink to={entry && !entry.canEdit ? paths.notebookReview : paths.notebook} variant="onDark" size="lg">
          {entry && !entry.canEdit ? "Back to reviews" : "All entries"}
        </ButtonLink>
      </PageHeader>
      <PageBody>
        {remove.isError ? (
          <Alert tone="danger" className="mb-6" title="The entry was not deleted">
            {messageFor(remove.error)}
          </Alert>
        ) : null}
        <Loaded query={query} label="notebook entry">
          {(data) => <EntryBody data={data} renderReview={renderReview} maxFileBytes={maxFileBytes} />}
        </Loaded>
      </PageBody>
    </>
  );
}
