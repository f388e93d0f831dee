/**
 * /join when signed in. A self-learner renews their pass with a card (the server starts the new
 * months at the later of today and the current end, so renewing early loses nothing). School
 * accounts get their access from the school: a short note and a link home instead of a form.
 */
import type { PublicUser } from "@shared/api/auth";
import { formatMoney, isPassActive, renewPassRequestSchema, type PassOffer, type RenewPassRequest } from "@shared/api/billing";
import { ROLE_HOME } from "@shared/api/roles";
import { usePassOffer, useRenewPass } from "@/api/billing";
import { isApiError } from "@/api/client";
import { messageFor } from "@/api/errors";
import { useMeSummary } from "@/api/me";
import { Alert } from "@/components/ui/alert";
import { Button, ButtonLink } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { PageBody, PageHeader } from "@/components/ui/page-header";
import { Spinner } from "@/components/ui/spinner";
import { formatDay } from "@/lib/format";
import { CardFields, EMPTY_CARD, TestCardNote } from "./card-fields";
import { usePaymentForm } from "./use-payment-form";


export function SignedInJoin({ user }: { user: PublicUser }) {
  const summary = useMeSummary();
  const offer = usePassOffer();
  if (summary.isPending || offer.isPending) {
    return (
      <Frame title="Self-study pass">
        <Spinner label="Loading your pass" />
      </Frame>
    );
  }
  if (summary.isError || offer.isError) {
    return (
      <Frame title="Self-study pass">
        <Alert tone="danger" title="Your pass could not be loaded">
          {messageFor(summary.error ?? offer.error)}
        </Alert>
      </Frame>
    );
  }
  const data = summary.data;
  if (data.role !== "student" || !data.selfStudy) return <SchoolAccess user={user} />;
  return (
    <Frame
      title="Renew your self-study pass"
      lede={`Another ${offer.data.months} months of every lesson and quiz. Your progress, quiz results and notebook stay as they are.`}
      grid
    >
      <PassStatus passValidUntil={data.selfStudy.passValidUntil} offer={offer.data} />
      <RenewForm offer={offer.data} />
    </Frame>
  );
}

function Frame({ title, lede, grid, children }: { title: string; lede?: string; grid?: boolean; children: React.ReactNode }) {
  return (
    <>
      <title>{`${title} — Grain & Edge`}</title>
      <PageHeader eyebrow="Self-study pass" title={title} lede={lede} />
      <PageBody className={grid ? "grid max-w-page gap-8 lg:grid-cols-[1fr_1.2fr]" : "max-w-page"}>{children}</PageBody>
    </>
  );
}

function SchoolAccess({ user }: { user: PublicUser }) {
  const home = ROLE_HOME[user.role];
  return (
    <Frame title="Your school provides your access">
      <Card className="max-w-prose border-t-4 border-t-quench-500">
        <p className="leading-relaxed text-soot-800">
          Your account belongs to your school, so there is no pass to buy or renew: lessons and quizzes are open through your school for as
          long as your account is. If something does not open, ask your instructor.
        </p>
        <ButtonLink to={home} className="mt-4">
          {user.role === "student" ? "Go to my learning" : "Go to your home page"}
        </ButtonLink>
      </Card>
    </Frame>
  );
}

/** The current end date, and what a renewal adds to it. */
function PassStatus({ passValidUntil, offer }: { passValidUntil: string | null; offer: PassOffer }) {
  const active = isPassActive(passValidUntil);
  return (
    <section aria-labelledby="pass-status-title">
      <Card className="border-t-4 border-t-temper-blue">
        <h2 id="pass-status-title" className="text-2xl font-semibold">
          {offer.name}
        </h2>
        <p className="mt-3 text-sm text-soot-600">{active ? "Valid until" : passValidUntil ? "Ended on" : "Not active yet"}</p>
        {passValidUntil ? <p className="font-mono text-2xl font-semibold text-soot-900">{formatDay(passValidUntil)}</p> : null}
        <p className="mt-4 leading-relaxed text-soot-700">
          {active
            ? `Renewing now adds ${offer.months} months after that date, so no paid time is lost.`
            : `Renewing opens the lessons and quizzes again for ${offer.months} months from today.`}
        </p>
      </Card>
      {offer.testMode ? (
        <Alert tone="info" title="Demo: test payments only" className="mt-5">
          <TestCardNote />
        </Alert>
      ) : null}
    </section>
  );
}

function RenewForm({ offer }: { offer: PassOffer }) {
  const renew = useRenewPass();
  const { field, submit } = usePaymentForm(renewPassRequestSchema, EMPTY_CARD as RenewPassRequest, async (values) => {
    await renew.mutateAsync(values);
  });

  if (renew.isSuccess) {
    return (
      <section aria-labelledby="renewed-title">
        <Card>
          <h2 id="renewed-title" className="text-xl font-semibold">
            Pass renewed
          </h2>
          <Alert tone="success" className="mt-4">
            Your self-study pass now runs until <strong className="font-mono whitespace-nowrap">{formatDay(renew.data.passValidUntil)}</strong>.
          </Alert>
          <ButtonLink to={ROLE_HOME.student} className="mt-5">
            Go to my learning
          </ButtonLink>
        </Card>
      </section>
    );
  }

  const failure = renew.error;
  const declined = isApiError(failure) && failure.code === "payment_declined";
  return (
    <section aria-labelledby="renew-title">
      <Card>
        <h2 id="renew-title" className="text-xl font-semibold">
          Payment
        </h2>
        <form onSubmit={(e) => void submit(e)} noValidate className="mt-5 space-y-5">
          {failure && (declined || !(isApiError(failure) && failure.fields)) ? (
            <Alert tone="danger" title={declined ? "Payment declined" : "The renewal did not go through"}>
              {/* The provider-side 502s say what happened to the money; keep that wording. */}
              {isApiError(failure) && failure.code === "payment_unavailable" ? failure.message : messageFor(failure)}
            </Alert>
          ) : null}
          <CardFields testMode={offer.testMode} field={field} />
          <Button type="submit" size="lg" className="w-full" disabled={renew.isPending}>
            {renew.isPending ? "Paying…" : `Renew for ${offer.months} months — ${formatMoney(offer.amountMinor, offer.currency)}`}
          </Button>
          <p className="text-xs text-soot-600">Card details go to the payment service only to make this payment; Grain &amp; Edge never stores them.</p>
        </form>
      </Card>
    </section>
  );
}
