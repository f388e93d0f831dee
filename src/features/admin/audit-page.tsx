/** /admin/audit: who did what, when, from where — sign-ins, role changes, invitations, grade exports… */
import { Fragment } from "react";
import type { AuditLogEntry } from "@shared/api/audit";
import { useAuditLog } from "@/api/admin";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { PageBody, PageHeader } from "@/components/ui/page-header";
import { Spinner } from "@/components/ui/spinner";
import { messageFor } from "@/api/errors";
import { formatDateTime } from "@/lib/format";
import { Badge, type BadgeTone } from "@/components/ui/badge";

function toneOf(action: string): BadgeTone {
  if (action.includes("failed") || action.includes("disabled")) return "danger";
  if (action.startsWith("admin.")) return "ember";
  if (action.startsWith("auth.")) return "neutral";
  if (action.startsWith("grades.")) return "straw";
  return "quench";
}

function details(entry: AuditLogEntry): string {
  const parts = Object.entries(entry.details ?? {}).map(([k, v]) => `${k}: ${typeof v === "object" ? JSON.stringify(v) : String(v)}`);
  return parts.join(" · ");
}

export function Component() {
  const log = useAuditLog();
  const entries = log.data?.pages.flatMap((p) => p.entries) ?? [];

  return (
    <>
      <title>Audit log — School admin — Grain &amp; Edge</title>
      <PageHeader eyebrow="School admin" title="Audit log" lede="Sign-ins, role changes, invitations, roster imports and grade exports, newest first." />
      <PageBody className="space-y-4">
        {log.isPending ? <Spinner label="Loading the audit log" /> : null}
        {log.isError ? <Alert tone="danger">{messageFor(log.error)}</Alert> : null}
        {entries.length ? (
          <div className="relative overflow-x-auto rounded-lg border border-bone-300 bg-white shadow-card" tabIndex={0} role="region" aria-label="Audit log entries, scrolls sideways">
            <table className="w-full min-w-[44rem] text-left text-sm">
              <caption className="sr-only">Audit log entries, newest first</caption>
              <thead className="bg-bone-100 text-soot-700">
                <tr>
                  <th scope="col" className="px-4 py-3 font-semibold">
                    When
                  </th>
                  <th scope="col" className="px-3 py-3 font-semibold">
                    What
                  </th>
                  <th scope="col" className="px-3 py-3 font-semibold">
                    Who
                  </th>
                  <th scope="col" className="px-3 py-3 font-semibold">
                    Target and details
                  </th>
                  <th scope="col" className="px-4 py-3 font-semibold">
                    From
                  </th>
                </tr>
              </thead>
              <tbody className="divide-y divide-bone-200">
                {entries.map((e) => (
                  <Fragment key={e.id}>
                    <tr className="align-top">
                      <td className="px-4 py-2.5 whitespace-nowrap font-mono text-xs text-soot-700">{formatDateTime(e.at)}</td>
                      <td className="px-3 py-2.5">
                        <Badge tone={toneOf(e.action)}>{e.action}</Badge>
                      </td>
                      <td className="px-3 py-2.5 break-all text-soot-800">{e.actorEmail ?? <span className="text-soot-500">anonymous</span>}</td>
                      <td className="max-w-md px-3 py-2.5 text-xs text-soot-700">
                        {e.targetType ? (
                          <span className="font-medium text-soot-800">
                            {e.targetType} #{e.targetId}
                          </span>
                        ) : null}
                        {e.targetType && details(e) ? " — " : null}
                        <span className="break-words">{details(e)}</span>
                      </td>
                      <td className="px-4 py-2.5 font-mono text-xs text-soot-600">{e.ip ?? "—"}</td>
                    </tr>
                  </Fragment>
                ))}
              </tbody>
            </table>
          </div>
        ) : log.isSuccess ? (
          <p className="text-soot-700">Nothing has been logged yet.</p>
        ) : null}
        {log.hasNextPage ? (
          <Button variant="secondary" onClick={() => void log.fetchNextPage()} disabled={log.isFetchingNextPage}>
            {log.isFetchingNextPage ? "Loading…" : "Show older entries"}
          </Button>
        ) : null}
      </PageBody>
    </>
  );
}
