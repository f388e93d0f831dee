import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import { passwordChangeRequestSchema } from "@shared/api/auth";
import { useChangePassword } from "@/api/auth";
import { isApiError } from "@/api/client";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { applyFieldErrors, messageFor } from "@/api/errors";

// The shared request schema plus a confirmation field that never leaves the browser.
const formSchema = passwordChangeRequestSchema
  .extend({ confirmPassword: z.string() })
  .refine((values) => values.newPassword === values.confirmPassword, {
    path: ["confirmPassword"],
    message: "The two new passwords do not match.",
  });
type FormValues = z.infer<typeof formSchema>;

export function PasswordForm() {
  const change = useChangePassword();
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<FormValues>({
    resolver: zodResolver(formSchema),
    defaultValues: { currentPassword: "", newPassword: "", confirmPassword: "" },
  });

  const onSubmit = handleSubmit(async ({ currentPassword, newPassword }) => {
    try {
      await change.mutateAsync({ currentPassword, newPassword });
      reset();
    } catch (error) {
      if (isApiError(error)) applyFieldErrors(error, setError, ["currentPassword", "newPassword"]);
    }
  });

  const failure = change.error;
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5">
      {change.isSuccess ? (
        <Alert tone="success" title="Password changed">
          Use the new password the next time you sign in.
        </Alert>
      ) : null}
      {failure ? (
        <Alert tone="danger" title="The password was not changed">
          {isApiError(failure) && (failure.code === "invalid_credentials" || failure.status === 401)
            ? "The current password is not right."
            : messageFor(failure)}
        </Alert>
      ) : null}
      <TextField
        label="Current password"
        type="password"
        autoComplete="current-password"
        error={errors.currentPassword?.message}
        {...register("currentPassword")}
      />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="8 to 128 characters. A few unrelated words make a strong, memorable password."
        error={errors.newPassword?.message}
        {...register("newPassword")}
      />
      <TextField
        label="New password, again"
        type="password"
        autoComplete="new-password"
        error={errors.confirmPassword?.message}
        {...register("confirmPassword")}
      />
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? "Changing…" : "Change password"}
      </Button>
    </form>
  );
}
