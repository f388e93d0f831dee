/**
 * /admin/outbox: the e-mails the in-process SMTP fake received (demo and test setups), with their
 * links (e.g. the invitation link) and the plain-text body; the HTML part is shown as source,
 * never rendered. Also runs the reminder and retry jobs on demand.
 */
import { useState } from "react";
import type { OutboxSummary } from "@shared/api/admin";
import { useOutbox, useOutboxMessage, useRunJobs } from "@/api/admin";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { cx } from "@/components/ui/cx";
import { PageBody, PageHeader } from "@/components/ui/page-header";
import { messageFor } from "@/api/errors";
import { formatDateTime } from "@/lib/format";
import { Loaded } from "@/components/ui/loaded";

export function Component() {
  const outbox = useOutbox();
  const jobs = useRunJobs();
  const [openId, setOpenId] = useState<number | null>(null);

  return (
    <>
      <title>Outbox — School admin — Grain &amp; Edge</title>
      <PageHeader
        eyebrow="School admin"
        title="Outbox"
        lede="Without a mail server configured (SMTP_URL), every e-mail the school sends lands here: invitations and due-date reminders."
      >
        <Button variant="onDark" disabled={jobs.isPending} onClick={() => jobs.mutate()}>
          {jobs.isPending ? "Running…" : "Send due reminders now"}
        </Button>
      </PageHeader>
      <PageBody className="space-y-4">
        <div aria-live="polite">
          {jobs.isError ? <Alert tone="danger">{messageFor(jobs.error)}</Alert> : null}
          {jobs.data ? (
            <Alert tone="success" title="Jobs ran">
              {jobs.data.reminders.sent} reminder(s) sent, {jobs.data.reminders.skipped} already sent before
              {jobs.data.reminders.failed ? `, ${jobs.data.reminders.failed} failed (retried next run)` : ""}; {jobs.data.invitationsAttempted} pending invitation(s) retried.
            </Alert>
          ) : null}
        </div>
        <Loaded query={outbox} label="outbox">
          {(data) => (
            <>
              {data.fakeTransport ? null : (
                <Alert tone="info">Mail goes to the configured SMTP server; this list only holds messages from before it was configured.</Alert>
              )}
              {data.messages.length === 0 ? (
                <p className="text-soot-700">No messages yet. Invite a student from a cohort page and the e-mail appears here.</p>
              ) : (
                <ul className="space-y-3">
                  {data.messages.map((m) => (
                    <MessageItem key={m.id} message={m} open={openId === m.id} onToggle={() => setOpenId(openId === m.id ? null : m.id)} />
                  ))}
                </ul>
              )}
            </>
          )}
        </Loaded>
      </PageBody>
    </>
  );
}

function MessageItem({ message: m, open, onToggle }: { message: OutboxSummary; open: boolean; onToggle: () => void }) {
  const bodyId = `message-${m.id}`;
  return (
    <li className="rounded-lg border border-bone-300 bg-white shadow-card">
      <button type="button" onClick={onToggle} aria-expanded={open} aria-controls={bodyId} className="flex w-full flex-wrap items-baseline gap-x-4 gap-y-1 px-4 py-3 text-left">
        <span className="min-w-0 flex-1 basis-64 font-semibold text-soot-900">{m.subject}</span>
        <span className="break-all text-sm text-soot-700">to {m.to}</span>
        <span className="font-mono text-xs text-soot-600">{formatDateTime(m.receivedAt)}</span>
        <span aria-hidden="true" className={cx("text-soot-500 transition-transform", open && "rotate-90")}>
          ›
        </span>
      </button>
      {m.links.length ? (
        <ul className="flex flex-wrap gap-2 px-4 pb-3">
          {m.links.map((link) => (
            <li key={link} className="max-w-full">
              <a href={link} rel="noreferrer" className="block max-w-full truncate rounded-sm bg-quench-100 px-2 py-1 font-mono text-xs text-quench-800 underline-offset-2 hover:underline">
                {link.includes("/invite/") ? "Invitation link: " : ""}
                {link}
              </a>
            </li>
          ))}
        </ul>
      ) : null}
      {open ? <MessageBody id={bodyId} message={m} /> : null}
    </li>
  );
}

function MessageBody({ id, message }: { id: string; message: OutboxSummary }) {
  const detail = useOutboxMessage(message.id);
  const [showHtml, setShowHtml] = useState(false);
  return (
    <div id={id} className="border-t border-bone-200 px-4 py-3">
      <p className="text-xs text-soot-600">From {message.from}</p>
      <pre className="mt-2 max-h-96 relative overflow-auto whitespace-pre-wrap break-words rounded-md bg-bone-100 p-3 font-mono text-xs text-soot-900">{message.text}</pre>
      {detail.data?.html ? (
        <div className="mt-2">
          <Button variant="ghost" className="min-h-9 px-3" onClick={() => setShowHtml((v) => !v)} aria-expanded={showHtml}>
            {showHtml ? "Hide" : "Show"} the HTML part (source)
          </Button>
          {showHtml ? <pre className="mt-2 max-h-72 relative overflow-auto whitespace-pre-wrap break-all rounded-md bg-soot-900 p-3 font-mono text-2xs text-ash-200">{detail.data.html}</pre> : null}
        </div>
      ) : null}
    </div>
  );
}
