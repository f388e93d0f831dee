import { Link, useNavigate, useSearchParams } from "react-router";
import { ROLE_HOME } from "@shared/api/roles";
import { isSafeNext, paths } from "@/config/paths";
import { LogoMark } from "@/components/ui/logo-mark";
import { SignInForm } from "@/features/auth/sign-in-form";

export function Component() {
  const navigate = useNavigate();
  const [searchParams] = useSearchParams();
  const next = searchParams.get("next");

  return (
    <>
      <title>Sign in — Grain &amp; Edge</title>
      <div className="graticule flex min-h-full justify-center bg-soot-800 px-gutter py-12 md:py-20">
        <div className="w-full max-w-md">
          <div className="rounded-xl bg-bone-50 p-6 shadow-forge md:p-9">
            <LogoMark className="size-11" />
            <h1 className="mt-4 text-3xl font-semibold tracking-tight">Sign in</h1>
            <p className="mt-2 text-soot-600">
              {isSafeNext(next)
                ? "Sign in to continue to the page you asked for."
                : "Use the account your school gave you, or the one you made with a self-study pass. You will land on your own home page."}
            </p>
            <div className="mt-7">
              <SignInForm
                onSignedIn={(user) => navigate(isSafeNext(next) ? next : ROLE_HOME[user.role], { replace: true })}
              />
            </div>
          </div>
          <p className="mt-6 text-center text-sm text-ash-200">
            No account? The{" "}
            <Link to={paths.lab} className="font-semibold text-ember-300 underline underline-offset-4">
              simulation lab
            </Link>{" "}
            is open to everyone, and a{" "}
            <Link to={paths.join} className="font-semibold text-ember-300 underline underline-offset-4">
              self-study pass
            </Link>{" "}
            opens the lessons and quizzes.
          </p>
        </div>
      </div>
    </>
  );
}
