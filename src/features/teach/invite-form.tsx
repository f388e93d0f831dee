import { useState } from "react";
import { z } from "zod";
import { displayNameSchema, inviteEmailSchema, type InviteOutcome, type InviteResponse } from "@shared/api/invitations";
import { useInvite } from "@/api/invitations";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { messageFor } from "@/api/errors";

const schema = z.object({ email: inviteEmailSchema, displayName: z.union([z.literal(""), displayNameSchema]) });

const OUTCOME_TONE: Record<InviteOutcome, "success" | "info" | "danger"> = {
  invited: "success",
  enrolled: "success",
  already_member: "info",
  already_invited: "info",
  rejected: "danger",
};

/** Invite one person by e-mail (with an optional name shown in the e-mail and pre-filled on the form they get). */
export function InviteForm({ cohortId }: { cohortId: number }) {
  const invite = useInvite(cohortId);
  const [email, setEmail] = useState("");
  const [displayName, setDisplayName] = useState("");
  const [errors, setErrors] = useState<{ email?: string; displayName?: string }>({});
  const [result, setResult] = useState<InviteResponse | null>(null);

  async function submit(event: React.FormEvent) {
    event.preventDefault();
    const parsed = schema.safeParse({ email: email.trim(), displayName: displayName.trim() });
    if (!parsed.success) {
      const flat = z.flattenError(parsed.error).fieldErrors;
      return setErrors({ email: flat.email?.[0], displayName: flat.displayName?.[0] });
    }
    setErrors({});
    const response = await invite.mutateAsync({ invitations: [{ email: parsed.data.email, ...(parsed.data.displayName ? { displayName: parsed.data.displayName } : {}) }] });
    setResult(response);
    if (response.results.every((r) => r.outcome === "invited" || r.outcome === "enrolled")) {
      setEmail("");
      setDisplayName("");
    }
  }

  return (
    <form onSubmit={(e) => void submit(e).catch(() => undefined)} noValidate className="space-y-4">
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="E-mail address" type="email" inputMode="email" autoComplete="off" spellCheck={false} value={email} onChange={(e) => setEmail(e.target.value)} error={errors.email} />
        <TextField label="Name (optional)" value={displayName} onChange={(e) => setDisplayName(e.target.value)} error={errors.displayName} maxLength={120} />
      </div>
      <Button type="submit" disabled={invite.isPending}>
        {invite.isPending ? "Inviting…" : "Send invitation"}
      </Button>
      <div aria-live="polite">
        {invite.isError ? <Alert tone="danger">{messageFor(invite.error)}</Alert> : null}
        {result && !invite.isError
          ? result.results.map((r) => (
              <Alert key={r.email} tone={OUTCOME_TONE[r.outcome]} className="mt-2">
                <span className="font-semibold">{r.email}</span>: {r.message}
              </Alert>
            ))
          : null}
      </div>
    </form>
  );
}
