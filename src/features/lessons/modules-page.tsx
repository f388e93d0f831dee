/** The course: modules in order, each with its lessons, time, progress and quiz score. */
import { Link } from "react-router";
import type { LessonOutline, ModuleOutline } from "@shared/api/lessons";
import { useModules } from "@/api/lessons";
import { Alert } from "@/components/ui/alert";
import { cx } from "@/components/ui/cx";
import { PageBody, PageHeader } from "@/components/ui/page-header";
import { Spinner } from "@/components/ui/spinner";
import { lessonState, type LessonState } from "./course-outline";
import { paths } from "@/config/paths";

const STATE_LABEL: Record<LessonState, string> = {
  "not-started": "Not started",
  "in-progress": "In progress",
  completed: "Read",
};

export function Component() {
  const modules = useModules();
  const all = modules.data?.modules ?? [];
  const lessons = all.flatMap((m) => m.lessons);
  const resume = lessons.find((l) => lessonState(l) === "in-progress") ?? lessons.find((l) => lessonState(l) === "not-started");

  return (
    <>
      <title>Modules — Grain &amp; Edge</title>
      <PageHeader
        eyebrow="The course"
        title="Blade-steel metallurgy, module by module"
        lede="Each lesson mixes reading with a simulation to try, ends with a quiz graded on the server, and keeps your place."
      >
        {resume ? (
          <Link
            to={paths.lesson(resume.moduleSlug, resume.slug)}
            className="inline-flex min-h-11 items-center rounded-md bg-ember-500 px-5 font-semibold text-soot-950 hover:bg-ember-400"
          >
            {lessonState(resume) === "in-progress" ? "Continue" : "Start"}: {resume.title}
          </Link>
        ) : null}
      </PageHeader>
      <PageBody>
        {modules.isPending ? <Spinner label="Loading the course" /> : null}
        {modules.isError ? <Alert tone="danger" title="The course could not be loaded">Check your connection and reload the page.</Alert> : null}
        <ol className="space-y-10">
          {all.map((module) => (
            <li key={module.slug}>
              <ModuleCard module={module} />
            </li>
          ))}
        </ol>
      </PageBody>
    </>
  );
}

function ModuleCard({ module }: { module: ModuleOutline }) {
  const read = module.lessons.filter((l) => lessonState(l) === "completed").length;
  return (
    <section id={`module-${module.slug}`} aria-labelledby={`module-${module.slug}-title`} className="scroll-mt-24">
      <div className="grid gap-5 md:grid-cols-[12rem_minmax(0,1fr)]">
        <div>
          <p className="font-display text-5xl font-semibold leading-none text-ember-600" aria-hidden="true">
            {String(module.order).padStart(2, "0")}
          </p>
          <p className="eyebrow mt-3 text-soot-600">
            {read} of {module.lessons.length} read
          </p>
        </div>
        <div>
          <h2 id={`module-${module.slug}-title`} className="text-2xl font-semibold text-soot-950">
            <span className="sr-only">Module {module.order}: </span>
            {module.title}
          </h2>
          <p className="mt-2 max-w-prose leading-relaxed text-soot-700">{module.summary}</p>
          <ol className="mt-5 divide-y divide-bone-300 overflow-hidden rounded-lg border border-bone-300 bg-white shadow-card">
            {module.lessons.map((lesson, i) => (
              <li key={lesson.slug}>
                <LessonRow lesson={lesson} number={i + 1} />
              </li>
            ))}
          </ol>
        </div>
      </div>
    </section>
  );
}

function LessonRow({ lesson, number }: { lesson: LessonOutline; number: number }) {
  const state = lessonState(lesson);
  const quiz = lesson.quiz;
  return (
    <Link to={paths.lesson(lesson.moduleSlug, lesson.slug)} className="group flex flex-wrap items-start gap-x-4 gap-y-2 p-4 hover:bg-bone-50 sm:flex-nowrap">
      <span
        aria-hidden="true"
        className={cx(
          "mt-0.5 grid size-8 shrink-0 place-items-center rounded-full border font-mono text-sm font-semibold",
          state === "completed" ? "border-quench-600 bg-quench-600 text-white" : state === "in-progress" ? "border-ember-500 text-ember-700" : "border-soot-500 text-soot-600",
        )}
      >
        {state === "completed" ? "✓" : number}
      </span>
      <span className="min-w-0 flex-1">
        <span className="block font-semibold text-soot-950 group-hover:text-quench-700">{lesson.title}</span>
        {lesson.summary ? <span className="mt-1 block text-sm leading-relaxed text-soot-700">{lesson.summary}</span> : null}
        <span className="mt-2 flex flex-wrap gap-x-4 gap-y-1 font-mono text-xs uppercase tracking-[0.08em] text-soot-600">
          <span>{lesson.minutes} min</span>
          <span>{STATE_LABEL[state]}</span>
          {quiz ? <span>{quiz.bestScore === null ? "Quiz not taken" : `Quiz best ${quiz.bestScore}/${quiz.maxScore}${quiz.passed ? " · passed" : ""}`}</span> : null}
        </span>
      </span>
    </Link>
  );
}
