import { useId, useRef, useState } from "react";
import type { InviteResponse, RosterPreview, RosterRowStatus } from "@shared/api/invitations";
import { useRosterImport, useRosterPreview } from "@/api/invitations";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { cx } from "@/components/ui/cx";
import { messageFor } from "@/api/errors";
import { plural } from "@/lib/format";
import { Badge, type BadgeTone } from "@/components/ui/badge";
import { Panel } from "@/components/ui/panel";

const STATUS: Record<RosterRowStatus, { label: string; tone: BadgeTone }> = {
  new: { label: "Will be invited", tone: "success" },
  existing_student: { label: "Will be added", tone: "quench" },
  already_member: { label: "Already a member", tone: "neutral" },
  already_invited: { label: "Already invited", tone: "neutral" },
  duplicate: { label: "Duplicate", tone: "straw" },
  invalid: { label: "Problem", tone: "danger" },
};

const MAX_FILE_BYTES = 90_000;

/**
 * Roster import in two steps: the server checks every row of the CSV (name, e-mail) and shows
 * the problems; nothing is stored until "Import" is pressed, and then only the good rows.
 */
export function RosterImport({ cohortId }: { cohortId: number }) {
  const preview = useRosterPreview(cohortId);
  const importer = useRosterImport(cohortId);
  const [csv, setCsv] = useState("");
  const [fileError, setFileError] = useState<string | null>(null);
  const [done, setDone] = useState<InviteResponse | null>(null);
  const fileRef = useRef<HTMLInputElement>(null);
  const fileId = useId();
  const textId = useId();
  const hintId = useId();

  async function onFile(file: File | undefined) {
    setFileError(null);
    setDone(null);
    preview.reset();
    if (!file) return;
    if (file.size > MAX_FILE_BYTES) return setFileError("The file is larger than 90 kB; split the roster into smaller files.");
    const text = await file.text();
    setCsv(text);
    preview.mutate(text);
  }

  async function onImport() {
    const result = await importer.mutateAsync(csv);
    setDone(result);
    setCsv("");
    preview.reset();
    if (fileRef.current) fileRef.current.value = "";
  }

  const data = preview.data;
  const importable = data ? data.counts.new + data.counts.existing_student : 0;

  return (
    <Panel
      id="roster"
      title="Import a roster"
      description="A CSV file with a name and an e-mail address per line (a header row “name,email” is optional; commas, semicolons or tabs). You see every row checked before anything is stored."
    >
      <div className="grid gap-4 md:grid-cols-2">
        <div>
          <label htmlFor={fileId} className="block text-sm font-semibold text-soot-800">
            CSV file
          </label>
          <input
            ref={fileRef}
            id={fileId}
            type="file"
            accept=".csv,text/csv,text/plain"
            aria-describedby={hintId}
            className="mt-1.5 block w-full text-sm file:mr-3 file:min-h-10 file:rounded-md file:border file:border-soot-700/25 file:bg-white file:px-4 file:font-semibold file:text-soot-900 hover:file:bg-bone-100"
            onChange={(e) => void onFile(e.target.files?.[0])}
          />
          <p id={hintId} className="mt-1 text-xs text-soot-600">
            Up to 500 rows. Exported from a spreadsheet as “CSV UTF-8”.
          </p>
        </div>
        <div>
          <label htmlFor={textId} className="block text-sm font-semibold text-soot-800">
            …or paste the rows
          </label>
          <textarea
            id={textId}
            rows={4}
            value={csv}
            onChange={(e) => {
              setCsv(e.target.value);
              setDone(null);
              preview.reset();
            }}
            placeholder={"name,email\nMara Quillon,mara@example.org"}
            spellCheck={false}
            className="mt-1.5 block w-full rounded-md border border-soot-500/60 bg-white px-3 py-2 font-mono text-sm text-soot-900 placeholder:text-soot-500 focus:border-quench-500 focus:outline-3 focus:outline-offset-0 focus:outline-quench-300"
          />
        </div>
      </div>
      <div className="mt-4 flex flex-wrap gap-2">
        <Button variant="secondary" disabled={!csv.trim() || preview.isPending} onClick={() => preview.mutate(csv)}>
          {preview.isPending ? "Checking…" : "Check the rows"}
        </Button>
        {data ? (
          <Button disabled={importable === 0 || data.fileErrors.length > 0 || importer.isPending} onClick={() => void onImport().catch(() => undefined)}>
            {importer.isPending ? "Importing…" : `Import ${plural(importable, "person", "people")}`}
          </Button>
        ) : null}
      </div>

      <div aria-live="polite" className="mt-4 space-y-3">
        {fileError ? <Alert tone="danger">{fileError}</Alert> : null}
        {preview.isError ? <Alert tone="danger">{messageFor(preview.error)}</Alert> : null}
        {importer.isError ? <Alert tone="danger">{messageFor(importer.error)}</Alert> : null}
        {done ? (
          <Alert tone="success" title="Roster imported">
            {plural(done.counts.invited, "invitation")} queued, {plural(done.counts.enrolled, "existing student")} added
            {done.counts.already_member + done.counts.already_invited + done.counts.rejected > 0
              ? `, ${done.counts.already_member + done.counts.already_invited + done.counts.rejected} skipped`
              : ""}
            .
          </Alert>
        ) : null}
        {data ? <PreviewTable data={data} /> : null}
      </div>
    </Panel>
  );
}

function PreviewTable({ data }: { data: RosterPreview }) {
  const problems = data.counts.invalid + data.counts.duplicate;
  return (
    <div>
      {data.fileErrors.map((e) => (
        <Alert key={e} tone="danger" className="mb-2">
          {e}
        </Alert>
      ))}
      <p className="text-sm text-soot-700">
        <strong>{data.rows.length}</strong> rows{data.headerDetected ? " after the header" : ""}:{" "}
        {(Object.keys(STATUS) as RosterRowStatus[])
          .filter((s) => data.counts[s] > 0)
          .map((s) => `${data.counts[s]} ${STATUS[s].label.toLowerCase()}`)
          .join(", ")}
        .{problems ? " Rows with problems are skipped; fix them in the file and check again to include them." : ""}
      </p>
      <div className="mt-3 max-h-96 relative overflow-auto rounded-md border border-bone-300" tabIndex={0} role="region" aria-label="Roster rows, scrollable">
        <table className="w-full min-w-[36rem] text-left text-sm">
          <caption className="sr-only">Every row of the roster and what the import will do with it</caption>
          <thead className="sticky top-0 z-10 bg-bone-100 text-soot-700 shadow-[0_1px_0_var(--color-bone-300)]">
            <tr>
              <th scope="col" className="px-3 py-2 text-right font-semibold">
                Line
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                Name
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                E-mail
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                Result
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-bone-200">
            {data.rows.map((r) => {
              const bad = r.status === "invalid" || r.status === "duplicate";
              return (
                <tr key={r.line} className={cx(bad && "bg-danger-100/50")}>
                  <td className="px-3 py-2 text-right font-mono text-xs tabular-nums text-soot-600">{r.line}</td>
                  <td className="max-w-48 truncate px-3 py-2">{r.name || <span className="text-soot-500">—</span>}</td>
                  <td className="max-w-56 truncate px-3 py-2 font-mono text-xs">{r.email || <span className="text-soot-500">—</span>}</td>
                  <td className="px-3 py-2">
                    <Badge tone={STATUS[r.status].tone}>{STATUS[r.status].label}</Badge>
                    {r.messages.length ? <span className="mt-0.5 block text-xs text-soot-700">{r.messages.join(" ")}</span> : null}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </div>
  );
}
