import { useEffect, useRef, useState } from "react";
import type { AttemptResult, QuizView } from "@shared/api/quizzes";
import { isApiError } from "@/api/client";
import { newIdempotencyKey, useStartNextAttempt, useSubmitAttempt } from "@/api/quizzes";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { buildAnswers, emptyDraft, isAnswered, type Draft, type DraftAnswer } from "./draft";
import { MultipleField, NumericField, SimTaskField, SingleField } from "./question-fields";

interface QuizFormProps {
  view: QuizView;
  onSubmitted: (attempt: AttemptResult) => void;
}

function draftKey(view: QuizView) {
  return `quiz-draft:${view.quiz.id}:${view.drawId}`;
}

function loadDraft(view: QuizView): Draft {
  const fresh = emptyDraft(view.questions);
  try {
    const saved = JSON.parse(sessionStorage.getItem(draftKey(view)) ?? "null") as Draft | null;
    if (saved) for (const id of Object.keys(fresh)) if (saved[id]?.kind === fresh[id].kind) fresh[id] = saved[id];
  } catch {
    // A broken saved draft is simply ignored.
  }
  return fresh;
}

/** Answering one attempt. The idempotency key lives until the server has answered, so a retry after a lost response re-sends it. */
export function QuizForm({ view, onSubmitted }: QuizFormProps) {
  const [draft, setDraft] = useState<Draft>(() => loadDraft(view));
  const [invalid, setInvalid] = useState<string[]>([]);
  const key = useRef<string | null>(null);
  const submit = useSubmitAttempt(view.quiz.id);
  const startNext = useStartNextAttempt(view.quiz.id);

  useEffect(() => {
    try {
      sessionStorage.setItem(draftKey(view), JSON.stringify(draft));
    } catch {
      // Private mode or full storage: the draft just is not kept across reloads.
    }
  }, [draft, view]);

  const set = (id: string) => (answer: DraftAnswer) => setDraft((old) => ({ ...old, [id]: answer }));
  const unanswered = view.questions.filter((q) => !isAnswered(draft[q.id])).length;
  const noAttemptsLeft = view.attempts.remaining === 0;

  const onSubmit = (event: React.FormEvent) => {
    event.preventDefault();
    const built = buildAnswers(view.questions, draft);
    setInvalid(built.invalid);
    if (built.invalid.length) return;
    key.current ??= newIdempotencyKey();
    submit.mutate(
      { idempotencyKey: key.current, drawId: view.drawId, answers: built.answers },
      {
        onSuccess: (attempt) => {
          key.current = null;
          try {
            sessionStorage.removeItem(draftKey(view));
          } catch {
            /* ignore */
          }
          onSubmitted(attempt);
        },
        onError: (error) => {
          // The server answered (4xx): that submission is settled; a new one gets a new key.
          if (isApiError(error) && error.status >= 400 && error.status < 500) key.current = null;
        },
      },
    );
  };

  const error = submit.error;
  return (
    <form onSubmit={onSubmit} noValidate aria-describedby={`${view.quiz.id}-allowance`}>
      <ol className="space-y-8">
        {view.questions.map((q, i) => (
          <li key={q.id} className="rounded-lg border border-bone-300 bg-white p-4 shadow-card sm:p-5">
            {q.kind === "single" ? <SingleField question={q} number={i + 1} answer={draft[q.id] as Extract<DraftAnswer, { kind: "single" }>} onChange={set(q.id)} /> : null}
            {q.kind === "multiple" ? <MultipleField question={q} number={i + 1} answer={draft[q.id] as Extract<DraftAnswer, { kind: "multiple" }>} onChange={set(q.id)} /> : null}
            {q.kind === "numeric" ? (
              <NumericField
                question={q}
                number={i + 1}
                answer={draft[q.id] as Extract<DraftAnswer, { kind: "numeric" }>}
                onChange={set(q.id)}
                error={invalid.includes(q.id) ? "Write a number, e.g. 0.128 or 1.2e3." : undefined}
              />
            ) : null}
            {q.kind === "sim-task" ? <SimTaskField question={q} number={i + 1} answer={draft[q.id] as Extract<DraftAnswer, { kind: "sim-task" }>} onChange={set(q.id)} /> : null}
          </li>
        ))}
      </ol>

      <div className="mt-6 space-y-3">
        {error ? <SubmitError error={error} onReload={() => void startNext()} /> : null}
        <div className="flex flex-wrap items-center gap-4">
          <Button type="submit" size="lg" disabled={submit.isPending || noAttemptsLeft}>
            {submit.isPending ? "Grading…" : "Submit answers"}
          </Button>
          <p className="text-sm text-soot-700" aria-live="polite">
            {unanswered > 0 ? `${unanswered} of ${view.questions.length} questions unanswered.` : "All questions answered."}
          </p>
        </div>
      </div>
    </form>
  );
}

function SubmitError({ error, onReload }: { error: Error; onReload: () => void }) {
  if (isApiError(error) && error.code === "stale_attempt") {
    return (
      <Alert tone="danger" title="These questions were already answered">
        {error.message}{" "}
        <button type="button" className="font-semibold underline" onClick={onReload}>
          Load new questions
        </button>
      </Alert>
    );
  }
  if (isApiError(error) && error.status === 0) {
    return (
      <Alert tone="danger" title="Your answers were not sent">
        The server could not be reached. Press “Submit answers” again: it is safe, the quiz will not count twice.
      </Alert>
    );
  }
  return <Alert tone="danger" title="The quiz could not be submitted">{error.message}</Alert>;
}
