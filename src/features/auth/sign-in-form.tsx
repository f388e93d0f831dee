import { useEffect, useRef } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { loginRequestSchema, type LoginRequest, type PublicUser } from "@shared/api/auth";
import { useLogin } from "@/api/auth";
import { isApiError } from "@/api/client";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { applyFieldErrors, messageFor } from "@/api/errors";

export function SignInForm({ onSignedIn }: { onSignedIn: (user: PublicUser) => void }) {
  const login = useLogin();
  const alertRef = useRef<HTMLDivElement>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<LoginRequest>({ resolver: zodResolver(loginRequestSchema), defaultValues: { email: "", password: "" } });

  useEffect(() => {
    if (login.isError) alertRef.current?.focus();
  }, [login.isError, login.submittedAt]);

  const onSubmit = handleSubmit(async (values) => {
    try {
      const { user } = await login.mutateAsync(values);
      onSignedIn(user);
    } catch (error) {
      if (isApiError(error)) applyFieldErrors(error, setError, ["email", "password"]);
    }
  });

  const failure = login.error;
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5" aria-describedby={failure ? "sign-in-error" : undefined}>
      {failure ? (
        <div ref={alertRef} tabIndex={-1} id="sign-in-error" className="outline-none">
          <Alert tone="danger" title="Sign-in failed">
            {isApiError(failure) && failure.code === "invalid_credentials"
              ? "That e-mail address and password do not match an account. Check both and try again."
              : messageFor(failure)}
          </Alert>
        </div>
      ) : null}
      <TextField
        label="E-mail address"
        type="email"
        autoComplete="username"
        inputMode="email"
        spellCheck={false}
        error={errors.email?.message}
        {...register("email")}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        error={errors.password?.message}
        {...register("password")}
      />
      <Button type="submit" size="lg" className="w-full" disabled={isSubmitting}>
        {isSubmitting ? "Signing in…" : "Sign in"}
      </Button>
    </form>
  );
}
