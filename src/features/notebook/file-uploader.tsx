/**
 * Upload photos and PDF reports to an entry, one file per request, with a progress bar each
 * (XMLHttpRequest upload events; fetch reports none). The server decides what a file is from
 * its bytes; the size check here only saves a pointless upload.
 */
import { useId, useRef, useState } from "react";
import { useQueryClient } from "@tanstack/react-query";
import { UPLOAD_RULES } from "@shared/api/notebook";
import { isApiError } from "@/api/client";
import { notebookQueryKeys, uploadNotebookFile } from "@/api/notebook";
import { cx } from "@/components/ui/cx";
import { messageFor } from "@/api/errors";
import { formatBytes } from "./format";

interface UploadRow {
  key: string;
  name: string;
  progress: number;
  state: "queued" | "uploading" | "done" | "failed";
  message?: string;
}

export function FileUploader({ entryId, maxFileBytes }: { entryId: number; maxFileBytes: number }) {
  const inputId = useId();
  const inputRef = useRef<HTMLInputElement>(null);
  const queryClient = useQueryClient();
  const [rows, setRows] = useState<UploadRow[]>([]);
  const busy = rows.some((r) => r.state === "uploading" || r.state === "queued");

  const update = (key: string, patch: Partial<UploadRow>) => setRows((all) => all.map((r) => (r.key === key ? { ...r, ...patch } : r)));

  async function start(files: File[]) {
    const batch = files.map((f, i) => ({ file: f, row: { key: `${Date.now()}-${i}-${f.name}`, name: f.name, progress: 0, state: "queued" as const } }));
    setRows((all) => [...all.filter((r) => r.state !== "done"), ...batch.map((b) => b.row)]);
    for (const { file, row } of batch) {
      if (file.size > maxFileBytes) {
        update(row.key, { state: "failed", message: `Larger than the ${formatBytes(maxFileBytes)} limit. Scale the photo down or split the report.` });
        continue;
      }
      update(row.key, { state: "uploading" });
      try {
        await uploadNotebookFile(entryId, file, (fraction) => update(row.key, { progress: fraction })).promise;
        update(row.key, { state: "done", progress: 1 });
        await queryClient.invalidateQueries({ queryKey: notebookQueryKeys.entry(entryId) });
        void queryClient.invalidateQueries({ queryKey: notebookQueryKeys.list() });
      } catch (error) {
        update(row.key, { state: "failed", message: isApiError(error) ? messageFor(error) : "The upload failed. Try again." });
      }
    }
  }

  const current = rows.find((r) => r.state === "uploading");
  return (
    <div>
      <div className="flex flex-wrap items-center gap-3">
        <label
          htmlFor={inputId}
          className={cx(
            "inline-flex min-h-10 cursor-pointer items-center justify-center gap-2 rounded-md bg-ember-500 px-4 text-sm font-semibold text-soot-950 hover:bg-ember-400",
            "has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-quench-500",
            busy && "pointer-events-none opacity-60",
          )}
        >
          <svg aria-hidden="true" viewBox="0 0 20 20" className="size-4" fill="currentColor">
            <path d="M10 3l4 4h-3v6H9V7H6l4-4zM4 14h2v2h8v-2h2v4H4v-4z" />
          </svg>
          Add photos or a PDF
          <input
            ref={inputRef}
            id={inputId}
            type="file"
            name="file"
            multiple
            accept={UPLOAD_RULES.accept}
            className="sr-only"
            disabled={busy}
            onChange={(e) => {
              const files = Array.from(e.target.files ?? []);
              e.target.value = "";
              if (files.length) void start(files);
            }}
          />
        </label>
        <p className="text-xs text-soot-600">
          {UPLOAD_RULES.kinds}, up to {formatBytes(maxFileBytes)} each.
        </p>
      </div>
      <p className="sr-only" aria-live="polite">
        {current ? `Uploading ${current.name}: ${Math.round(current.progress * 100)} %` : ""}
      </p>
      {rows.length > 0 ? (
        <ul className="mt-3 space-y-2" aria-label="Uploads">
          {rows.map((r) => (
            <li key={r.key} className="rounded-md border border-bone-300 bg-bone-50 px-3 py-2 text-sm">
              <div className="flex items-baseline justify-between gap-3">
                <span className="min-w-0 truncate font-medium text-soot-900">{r.name}</span>
                <span className={cx("shrink-0 font-mono text-xs tabular-nums", r.state === "failed" ? "text-danger-700" : r.state === "done" ? "text-success-700" : "text-soot-600")}>
                  {r.state === "failed" ? "not uploaded" : r.state === "done" ? "uploaded" : r.state === "queued" ? "waiting" : `${Math.round(r.progress * 100)} %`}
                </span>
              </div>
              {r.state === "uploading" || r.state === "queued" ? (
                <div
                  role="progressbar"
                  aria-label={`Upload of ${r.name}`}
                  aria-valuemin={0}
                  aria-valuemax={100}
                  aria-valuenow={Math.round(r.progress * 100)}
                  className="mt-1.5 h-1.5 w-full overflow-hidden rounded-full bg-bone-200"
                >
                  <div className="h-full rounded-full bg-ember-500 transition-[width]" style={{ width: `${r.progress * 100}%` }} />
                </div>
              ) : null}
              {r.state === "failed" && r.message ? (
                <p role="alert" className="mt-1 text-sm text-danger-700">
                  {r.message}
                </p>
              ) : null}
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
