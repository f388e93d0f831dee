import type { InvitationState, InvitationView } from "@shared/api/invitations";
import { useInvitations, useResendInvitation, useRevokeInvitation } from "@/api/invitations";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { messageFor } from "@/api/errors";
import { formatDateTime } from "@/lib/format";
import { Badge, type BadgeTone } from "@/components/ui/badge";
import { Loaded } from "@/components/ui/loaded";
import { Panel } from "@/components/ui/panel";

const STATE: Record<InvitationState, { label: string; tone: BadgeTone }> = {
  pending: { label: "Sending", tone: "straw" },
  sent: { label: "Sent", tone: "quench" },
  accepted: { label: "Joined", tone: "success" },
  revoked: { label: "Revoked", tone: "neutral" },
  expired: { label: "Expired", tone: "danger" },
};

function detail(i: InvitationView): string {
  switch (i.state) {
    case "pending":
      return i.lastSendError ? `${i.lastSendError} Next try ${formatDateTime(i.nextSendAt)}.` : "Queued for sending.";
    case "sent":
      return `Sent ${formatDateTime(i.sentAt)}; link valid until ${formatDateTime(i.expiresAt)}.`;
    case "accepted":
      return `Joined ${formatDateTime(i.acceptedAt)}.`;
    case "expired":
      return `The link expired ${formatDateTime(i.expiresAt)}. Resend to make a new one.`;
    case "revoked":
      return "The link no longer works.";
  }
}

/** Invitations of the cohort with their delivery state; resend (new link) or revoke the open ones. */
export function InvitationsList({ cohortId, archived }: { cohortId: number; archived: boolean }) {
  const invitations = useInvitations(cohortId);
  const resend = useResendInvitation(cohortId);
  const revoke = useRevokeInvitation(cohortId);
  const failure = resend.error ?? revoke.error;

  return (
    <Panel id="invitations" title="Invitations" description="Delivery is retried automatically if the mail server is down.">
      {failure ? <Alert tone="danger" className="mb-3">{messageFor(failure)}</Alert> : null}
      <Loaded query={invitations} label="invitations">
        {({ invitations: list }) => {
          const shown = list.filter((i) => i.state !== "revoked").slice(0, 30);
          return shown.length === 0 ? (
            <p className="text-sm text-soot-700">No invitations yet.</p>
          ) : (
            <ul className="divide-y divide-bone-200" aria-live="polite">
              {shown.map((i) => (
                <li key={i.id} className="flex flex-wrap items-start gap-x-3 gap-y-2 py-3 first:pt-0 last:pb-0">
                  <div className="min-w-0 flex-1 basis-52">
                    <p className="flex flex-wrap items-center gap-2">
                      <span className="truncate font-medium text-soot-900">{i.displayName ?? i.email}</span>
                      <Badge tone={STATE[i.state].tone}>{STATE[i.state].label}</Badge>
                    </p>
                    {i.displayName ? <p className="truncate text-xs text-soot-600">{i.email}</p> : null}
                    <p className="mt-0.5 text-xs text-soot-600">{detail(i)}</p>
                  </div>
                  {archived || i.state === "accepted" ? null : (
                    <div className="flex gap-1">
                      <Button variant="ghost" className="min-h-9 px-3" disabled={resend.isPending} onClick={() => resend.mutate(i.id)}>
                        Resend<span className="sr-only"> to {i.email}</span>
                      </Button>
                      <Button
                        variant="ghost"
                        className="min-h-9 px-3"
                        disabled={revoke.isPending}
                        onClick={() => {
                          if (window.confirm(`Revoke the invitation to ${i.email}? The link stops working.`)) revoke.mutate(i.id);
                        }}
                      >
                        Revoke<span className="sr-only"> the invitation to {i.email}</span>
                      </Button>
                    </div>
                  )}
                </li>
              ))}
            </ul>
          );
        }}
      </Loaded>
    </Panel>
  );
}
