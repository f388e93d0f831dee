/**
 * The instructor's review of one entry: a comment and a verdict (reviewed / needs rework).
 * Validated with the shared schema; the server e-mails the student after saving.
 */
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { NOTEBOOK_LIMITS, reviewRequestSchema, type NotebookEntry, type ReviewRequest } from "@shared/api/notebook";
import { isApiError } from "@/api/client";
import { useReviewEntry } from "@/api/notebook";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { cx } from "@/components/ui/cx";
import { messageFor } from "@/api/errors";

const VERDICTS: { value: ReviewRequest["status"]; label: string; hint: string }[] = [
  { value: "reviewed", label: "Reviewed", hint: "The record is complete and the readings make sense." },
  { value: "needs-rework", label: "Needs rework", hint: "Something is missing or should be tested again; the entry returns to you when the student edits it." },
];

export function ReviewPanel({ entry }: { entry: NotebookEntry }) {
  const review = useReviewEntry(entry.id);
  const {
    register,
    handleSubmit,
    reset,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<ReviewRequest>({ resolver: zodResolver(reviewRequestSchema), defaultValues: { comment: "" } });

  const onSubmit = handleSubmit(async (values) => {
    try {
      await review.mutateAsync(values);
      reset({ comment: "" });
    } catch (error) {
      if (isApiError(error) && error.fields) {
        for (const name of ["status", "comment"] as const) if (error.fields[name]?.[0]) setError(name, { type: "server", message: error.fields[name][0] });
      }
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-labelledby="review-form-heading">
      <h3 id="review-form-heading" className="font-sans text-base font-semibold text-soot-900">
        Add your review
      </h3>
      <fieldset aria-describedby={errors.status ? "review-status-error" : undefined}>
        <legend className="text-sm font-semibold text-soot-800">Verdict</legend>
        <div className="mt-2 grid gap-2">
          {VERDICTS.map((v) => (
            <label
              key={v.value}
              className={cx(
                "flex cursor-pointer gap-3 rounded-md border bg-white p-3 text-sm has-[:checked]:border-quench-500 has-[:checked]:bg-quench-100/60",
                errors.status ? "border-danger-700" : "border-bone-300",
              )}
            >
              <input type="radio" value={v.value} className="mt-1 size-4 accent-quench-600" {...register("status")} />
              <span>
                <span className="block font-semibold text-soot-900">{v.label}</span>
                <span className="block text-xs text-soot-600">{v.hint}</span>
              </span>
            </label>
          ))}
        </div>
        {errors.status ? (
          <p id="review-status-error" className="mt-1.5 text-sm font-medium text-danger-700">
            {errors.status.message}
          </p>
        ) : null}
      </fieldset>
      <div>
        <label htmlFor="review-comment" className="block text-sm font-semibold text-soot-800">
          Comment for the student
        </label>
        <p id="review-comment-hint" className="mt-0.5 text-xs text-soot-600">
          Optional. It is sent to them by e-mail with a link to the entry.
        </p>
        <textarea
          id="review-comment"
          rows={4}
          maxLength={NOTEBOOK_LIMITS.commentMax}
          aria-invalid={errors.comment ? true : undefined}
          aria-describedby={errors.comment ? "review-comment-hint review-comment-error" : "review-comment-hint"}
          className={cx(
            "mt-1.5 block w-full rounded-md border bg-white px-3 py-2 text-base leading-relaxed text-soot-900 focus:border-quench-500 focus:outline-3 focus:outline-offset-0 focus:outline-quench-300",
            errors.comment ? "border-danger-700" : "border-soot-500/60",
          )}
          {...register("comment")}
        />
        {errors.comment ? (
          <p id="review-comment-error" className="mt-1.5 text-sm font-medium text-danger-700">
            {errors.comment.message}
          </p>
        ) : null}
      </div>
      {review.isError && !(isApiError(review.error) && review.error.fields) ? <Alert tone="danger">{messageFor(review.error)}</Alert> : null}
      {review.isSuccess ? <Alert tone="success">Review saved. The student is being e-mailed.</Alert> : null}
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? "Saving…" : "Save review"}
      </Button>
    </form>
  );
}
