/**
 * /invite/:token: the page an invitation e-mail links to. Shows which cohort it is for, lets the
 * student choose their name and a password, creates the account, joins the cohort and signs in.
 * The token goes to the API in a POST body only.
 */
import { useState } from "react";
import { useNavigate, useParams } from "react-router";
import { z } from "zod";
import { passwordSchema } from "@shared/api/auth";
import { displayNameSchema, invitationTokenSchema, type InvitationLookup } from "@shared/api/invitations";
import { isApiError } from "@/api/client";
import { useAcceptInvitation, useInvitationLookup } from "@/api/invitations";
import { Alert } from "@/components/ui/alert";
import { Button, ButtonLink } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { TextField } from "@/components/ui/field";
import { PageBody, PageHeader } from "@/components/ui/page-header";
import { Spinner } from "@/components/ui/spinner";
import { paths } from "@/config/paths";
import { messageFor } from "@/api/errors";

const formSchema = z.object({ displayName: displayNameSchema, password: passwordSchema });

export function Component() {
  const token = useParams().token ?? "";
  const wellFormed = invitationTokenSchema.safeParse(token).success;

  return (
    <>
      <title>Join your cohort — Grain &amp; Edge</title>
      <meta name="referrer" content="no-referrer" />
      <PageHeader eyebrow="Invitation" title="Join your cohort" lede="Choose the name your instructor will see and a password for your new account." />
      <PageBody className="max-w-xl">{wellFormed ? <Invitation token={token} /> : <BadLink message="This invitation link is incomplete or damaged. Copy the whole link from the e-mail, or ask your instructor for a new one." />}</PageBody>
    </>
  );
}

function BadLink({ message }: { message: string }) {
  return (
    <Alert tone="danger" title="This link cannot be used">
      <p>{message}</p>
      <p className="mt-2">
        Already joined? <a href={paths.signIn} className="font-semibold underline">Sign in</a>.
      </p>
    </Alert>
  );
}

function Invitation({ token }: { token: string }) {
  const lookup = useInvitationLookup(token);
  if (lookup.isPending) return <Spinner label="Checking your invitation" />;
  if (lookup.isError) return <BadLink message={isApiError(lookup.error) && lookup.error.status < 500 ? lookup.error.message : messageFor(lookup.error)} />;
  return <AcceptForm token={token} invitation={lookup.data} />;
}

function AcceptForm({ token, invitation }: { token: string; invitation: InvitationLookup }) {
  const accept = useAcceptInvitation();
  const navigate = useNavigate();
  const [displayName, setDisplayName] = useState(invitation.displayName ?? "");
  const [password, setPassword] = useState("");
  const [errors, setErrors] = useState<{ displayName?: string; password?: string }>({});

  async function submit(event: React.FormEvent) {
    event.preventDefault();
    const parsed = formSchema.safeParse({ displayName, password });
    if (!parsed.success) {
      const flat = z.flattenError(parsed.error).fieldErrors;
      return setErrors({ displayName: flat.displayName?.[0], password: flat.password?.[0] });
    }
    setErrors({});
    try {
      await accept.mutateAsync({ token, ...parsed.data });
      await navigate(paths.learn, { replace: true });
    } catch (error) {
      if (isApiError(error) && error.fields) setErrors({ displayName: error.fields.displayName?.[0], password: error.fields.password?.[0] });
    }
  }

  return (
    <Card>
      <dl className="grid gap-x-4 gap-y-2 text-sm sm:grid-cols-[8rem_1fr]">
        <dt className="text-soot-600">Cohort</dt>
        <dd className="font-semibold text-soot-900">{invitation.cohortName}</dd>
        <dt className="text-soot-600">Instructor</dt>
        <dd className="text-soot-900">{invitation.instructorName}</dd>
        <dt className="text-soot-600">Your e-mail</dt>
        <dd className="break-all font-mono text-soot-900">{invitation.email}</dd>
      </dl>
      <form onSubmit={(e) => void submit(e)} noValidate className="mt-6 space-y-5">
        {accept.isError && !(isApiError(accept.error) && accept.error.fields) ? (
          <Alert tone="danger" title="Could not join">
            {messageFor(accept.error)}
            {isApiError(accept.error) && accept.error.code === "account_exists" ? (
              <ButtonLink to={paths.signIn} variant="secondary" className="mt-3">
                Sign in
              </ButtonLink>
            ) : null}
          </Alert>
        ) : null}
        <TextField label="Your name" autoComplete="name" value={displayName} onChange={(e) => setDisplayName(e.target.value)} error={errors.displayName} maxLength={120} />
        <TextField
          label="Choose a password"
          type="password"
          autoComplete="new-password"
          hint="At least 8 characters. A short phrase is easier to remember than symbols."
          value={password}
          onChange={(e) => setPassword(e.target.value)}
          error={errors.password}
          maxLength={128}
        />
        <Button type="submit" size="lg" className="w-full" disabled={accept.isPending}>
          {accept.isPending ? "Joining…" : "Join the cohort"}
        </Button>
        <p className="text-xs text-soot-600">The link works once and expires on {new Date(invitation.expiresAt).toLocaleString()}.</p>
      </form>
    </Card>
  );
}
