/**
 * /join: buy a self-study pass. One form creates the account (name, e-mail, password) and pays
 * through the server; on success the person is signed in and lands on /learn. A declined card
 * shows the provider's message and leaves no account, so the same e-mail can try again.
 * Signed in, the page renews a self-learner's pass instead (renew-pass.tsx).
 */
import { useNavigate } from "react-router";
import { formatMoney, purchasePassRequestSchema, type PassOffer, type PurchasePassRequest } from "@shared/api/billing";
import { isApiError } from "@/api/client";
import { useMe } from "@/api/auth";
import { usePassOffer, usePurchasePass } from "@/api/billing";
import { messageFor } from "@/api/errors";
import { Alert } from "@/components/ui/alert";
import { Button, ButtonLink } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { TextField } from "@/components/ui/field";
import { PageBody, PageHeader } from "@/components/ui/page-header";
import { Spinner } from "@/components/ui/spinner";
import { paths } from "@/config/paths";
import { CardFields, EMPTY_CARD, TestCardNote } from "./card-fields";
import { SignedInJoin } from "./renew-pass";
import { usePaymentForm } from "./use-payment-form";

const EMPTY: PurchasePassRequest = { displayName: "", email: "", password: "", ...EMPTY_CARD };

export function Component() {
  const { data: user } = useMe();
  // Signed in: renew a self-study pass, or learn that the school provides access (renew-pass.tsx).
  return user ? <SignedInJoin user={user} /> : <BuyPass />;
}

function BuyPass() {
  const offer = usePassOffer();
  return (
    <>
      <title>Self-study pass — Grain &amp; Edge</title>
      <PageHeader
        eyebrow="Learning on your own"
        title="Get a self-study pass"
        lede="Every lesson, quiz and saved alloy, on your own schedule. The simulation lab stays free for everyone."
      />
      <PageBody className="grid max-w-page gap-8 lg:grid-cols-[1fr_1.2fr]">
        {offer.isPending ? (
          <Spinner label="Loading the offer" />
        ) : offer.isError ? (
          <Alert tone="danger" title="The offer could not be loaded">
            {messageFor(offer.error)}
          </Alert>
        ) : (
          <>
            <OfferCard offer={offer.data} />
            <PurchaseForm offer={offer.data} />
          </>
        )}
      </PageBody>
    </>
  );
}

function OfferCard({ offer }: { offer: PassOffer }) {
  return (
    <section aria-labelledby="offer-title">
      <Card className="border-t-4 border-t-temper-blue">
        <h2 id="offer-title" className="text-2xl font-semibold">
          {offer.name}
        </h2>
        <p className="mt-2 font-display text-4xl font-semibold text-soot-900">
          {formatMoney(offer.amountMinor, offer.currency)}
          <span className="ml-2 text-base font-normal text-soot-600">once, for {offer.months} months</span>
        </p>
        <ul className="mt-5 list-disc space-y-1.5 pl-5 text-soot-700">
          <li>All lessons, with your progress kept</li>
          <li>All quizzes, graded with feedback</li>
          <li>Saved alloys and your own forge notebook</li>
          <li>No automatic renewal: the pass ends after {offer.months} months unless you renew it here</li>
        </ul>
      </Card>
      {offer.testMode ? (
        <Alert tone="info" title="Demo: test payments only" className="mt-5">
          <TestCardNote />
        </Alert>
      ) : null}
      <p className="mt-5 text-sm text-soot-600">
        Learning with a school? Your instructor sends you an invitation instead. Already have an account?{" "}
        <a href={paths.signIn} className="font-semibold text-quench-700 underline underline-offset-4">
          Sign in
        </a>
        .
      </p>
    </section>
  );
}

function PurchaseForm({ offer }: { offer: PassOffer }) {
  const purchase = usePurchasePass();
  const navigate = useNavigate();
  const { field, submit } = usePaymentForm(purchasePassRequestSchema, EMPTY, async (values) => {
    await purchase.mutateAsync(values);
    await navigate(paths.learn, { replace: true });
  });

  const failure = purchase.error;
  const declined = isApiError(failure) && failure.code === "payment_declined";
  return (
    <section aria-labelledby="buy-title">
      <Card>
        <h2 id="buy-title" className="text-xl font-semibold">
          Your account and payment
        </h2>
        <form onSubmit={(e) => void submit(e)} noValidate className="mt-5 space-y-5">
          {failure && (declined || !(isApiError(failure) && failure.fields)) ? (
            <Alert tone="danger" title={declined ? "Payment declined" : "The purchase did not go through"}>
              {messageFor(failure)}
              {isApiError(failure) && failure.code === "account_exists" ? (
                <ButtonLink to={paths.signIn} variant="secondary" className="mt-3">
                  Sign in
                </ButtonLink>
              ) : null}
            </Alert>
          ) : null}
          <fieldset className="space-y-4">
            <legend className="eyebrow text-ember-700">Account</legend>
            <TextField label="Your name" autoComplete="name" maxLength={120} {...field("displayName")} />
            <TextField label="E-mail address" type="email" autoComplete="email" inputMode="email" spellCheck={false} maxLength={254} {...field("email")} />
            <TextField
              label="Choose a password"
              type="password"
              autoComplete="new-password"
              hint="At least 8 characters. A short phrase is easier to remember than symbols."
              maxLength={128}
              {...field("password")}
            />
          </fieldset>
          <CardFields testMode={offer.testMode} field={field} />
          <Button type="submit" size="lg" className="w-full" disabled={purchase.isPending}>
            {purchase.isPending ? "Paying…" : `Pay ${formatMoney(offer.amountMinor, offer.currency)} and start learning`}
          </Button>
          <p className="text-xs text-soot-600">Card details go to the payment service only to make this payment; Grain &amp; Edge never stores them.</p>
        </form>
      </Card>
    </section>
  );
}
