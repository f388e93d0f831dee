/**
 * A lesson: header, objectives, the MDX body with the registered tags, a table of
 * contents, previous/next, and progress saved as the learner reads (opened, sections
 * reached, check answers) with a "continue where you left off" prompt.
 */
import { lazy, Suspense, useCallback, useEffect, useMemo, useRef, useState } from "react";
import { Link, useParams } from "react-router";
import type { CheckAnswer, LessonOutline } from "@shared/api/lessons";
import { useLessonProgress, useModules } from "@/api/lessons";
import { Alert } from "@/components/ui/alert";
import { buttonClasses } from "@/components/ui/button";
import { Spinner } from "@/components/ui/spinner";
import { mdxComponents } from "@/components/mdx/components";
import { LessonContextProvider, type LessonContextValue } from "@/components/mdx/lesson-context";
import { useFocusableOverflow } from "@/components/mdx/use-focusable-overflow";
import { AttachedAlloys } from "./attached-alloys";
import { findLesson } from "./course-outline";
import { useLessonModule, type LessonModule } from "./lesson-modules";
import { TableOfContents } from "./table-of-contents";
import { useLessonProgressSaver } from "./use-lesson-progress-saver";
import { useSectionTracking } from "./use-section-tracking";
import { paths } from "@/config/paths";

const QuizPanel = lazy(() => import("@/features/quiz/quiz-panel"));

export function Component() {
  const { moduleSlug = "", lessonSlug = "" } = useParams();
  const modules = useModules();
  const progress = useLessonProgress(lessonSlug);
  const lessonModule = useLessonModule(moduleSlug, lessonSlug);
  const position = modules.data ? findLesson(modules.data.modules, moduleSlug, lessonSlug) : null;

  if (modules.isError || lessonModule.isError || (modules.data && !position)) {
    return (
      <div className="mx-auto max-w-page px-gutter py-12">
        <Alert tone="danger" title="This lesson could not be opened">
          {modules.data && !position ? "There is no such lesson in the course." : "Check your connection and reload the page."}{" "}
          <Link to={paths.modules} className="underline">
            All modules
          </Link>
        </Alert>
      </div>
    );
  }
  if (!position || !lessonModule.data || !progress.data) {
    return (
      <div className="mx-auto max-w-page px-gutter py-16">
        <Spinner label="Opening the lesson" />
      </div>
    );
  }
  return <LessonView key={lessonSlug} position={position} Content={lessonModule.data.default} savedChecks={progress.data.checks} savedSections={progress.data.sectionsReached} lastSection={progress.data.lastSection} />;
}

interface LessonViewProps {
  position: NonNullable<ReturnType<typeof findLesson>>;
  Content: LessonModule["default"];
  savedChecks: Record<string, CheckAnswer>;
  savedSections: string[];
  lastSection: string | null;
}

function LessonView({ position, Content, savedChecks, savedSections, lastSection }: LessonViewProps) {
  const { module, lesson, index, previous, next } = position;
  const article = useRef<HTMLElement>(null);
  const sectionIds = useMemo(() => lesson.sections.map((s) => s.id), [lesson.sections]);
  const saver = useLessonProgressSaver(lesson.slug, sectionIds);
  const [reached, setReached] = useState(() => new Set(savedSections));
  const [checks, setChecks] = useState(savedChecks);
  const [mounted, setMounted] = useState(false);
  const [resumeOffered, setResumeOffered] = useState(() => lastSection !== null && !window.location.hash && lastSection !== sectionIds[0]);

  useEffect(() => setMounted(true), []);

  const onReached = useCallback(
    (id: string) => {
      setReached((old) => (old.has(id) ? old : new Set(old).add(id)));
      saver.sectionReached(id);
    },
    [saver],
  );
  const current = useSectionTracking(article, mounted, onReached);
  useFocusableOverflow(article, mounted);

  // Opening a lesson at #section (from a link or the TOC) scrolls there once the content exists.
  useEffect(() => {
    if (!mounted || !window.location.hash) return;
    document.getElementById(decodeURIComponent(window.location.hash.slice(1)))?.scrollIntoView();
  }, [mounted]);

  const context: LessonContextValue = useMemo(
    () => ({
      lessonSlug: lesson.slug,
      quizId: lesson.quizId,
      checks,
      saveCheck: (id, answer) => {
        setChecks((old) => ({ ...old, [id]: answer }));
        saver.saveCheck(id, answer);
      },
      renderQuiz: (quizId) => (
        <Suspense fallback={<Spinner label="Loading the quiz" />}>
          <QuizPanel quizId={quizId} />
        </Suspense>
      ),
    }),
    [lesson.slug, lesson.quizId, checks, saver],
  );

  const resumeTitle = lesson.sections.find((s) => s.id === lastSection)?.title;
  const resume = () => {
    setResumeOffered(false);
    if (lastSection) document.getElementById(lastSection)?.scrollIntoView({ behavior: "smooth", block: "start" });
  };
  const readCount = sectionIds.filter((id) => reached.has(id)).length;

  return (
    <>
      <title>{`${lesson.title} — ${module.title} — Grain & Edge`}</title>
      <header className="lesson-header graticule bg-soot-800 text-bone-50">
        <div className="mx-auto max-w-page px-gutter pb-9 pt-8 md:pb-12 md:pt-12">
          <nav aria-label="Breadcrumb" className="print-hide text-sm">
            <ol className="flex flex-wrap items-center gap-x-2 gap-y-1 text-ash-300">
              <li>
                <Link to={paths.modules} className="underline-offset-4 hover:text-ember-200 hover:underline">
                  Modules
                </Link>
              </li>
              <li aria-hidden="true">/</li>
              <li>
                <Link to={`${paths.modules}#module-${module.slug}`} className="underline-offset-4 hover:text-ember-200 hover:underline">
                  {module.title}
                </Link>
              </li>
            </ol>
          </nav>
          <p className="eyebrow mt-5 text-ember-300">
            Module {module.order} · Lesson {index} of {module.lessons.length}
          </p>
          <h1 className="mt-2 max-w-3xl text-3xl font-semibold tracking-tight md:text-5xl">{lesson.title}</h1>
          {lesson.summary ? <p className="mt-3 max-w-2xl text-base leading-relaxed text-ash-200 md:text-lg">{lesson.summary}</p> : null}
          <dl className="mt-6 flex flex-wrap gap-x-8 gap-y-2 font-mono text-xs uppercase tracking-[0.12em] text-ash-300">
            <div className="flex gap-2">
              <dt>Time</dt>
              <dd className="text-bone-50">about {lesson.minutes} min</dd>
            </div>
            <div className="flex gap-2">
              <dt>Read</dt>
              <dd className="text-bone-50">
                {readCount} of {sectionIds.length} sections
              </dd>
            </div>
            {lesson.quiz ? (
              <div className="flex gap-2">
                <dt>Quiz</dt>
                <dd className="text-bone-50">{lesson.quiz.bestScore === null ? "not taken" : `best ${lesson.quiz.bestScore} / ${lesson.quiz.maxScore}`}</dd>
              </div>
            ) : null}
          </dl>
          <div className="print-hide mt-4 h-1 max-w-md overflow-hidden rounded-full bg-soot-700" aria-hidden="true">
            <div className="temper-ribbon h-full" style={{ width: `${sectionIds.length ? (100 * readCount) / sectionIds.length : 0}%` }} />
          </div>
        </div>
      </header>

      <div className="mx-auto max-w-page px-gutter py-8 md:py-12">
        <div className="lesson-layout grid gap-10 lg:grid-cols-[minmax(0,1fr)_15rem] xl:grid-cols-[minmax(0,1fr)_17rem]">
          <div className="min-w-0">
            <div className="lesson-column mx-auto max-w-[42rem]">
              {resumeOffered && resumeTitle ? (
                <div className="print-hide mb-8 flex flex-wrap items-center justify-between gap-3 rounded-md border border-quench-500/40 bg-quench-100 px-4 py-3 text-sm text-quench-800">
                  <p>
                    Welcome back. You stopped at <strong>{resumeTitle}</strong>.
                  </p>
                  <div className="flex flex-wrap gap-2">
                    <button type="button" onClick={resume} className={buttonClasses("primary")}>
                      Continue reading
                    </button>
                    <button type="button" onClick={() => setResumeOffered(false)} className={buttonClasses("ghost")}>
                      Start at the top
                    </button>
                  </div>
                </div>
              ) : null}

              <details className="print-hide mb-8 rounded-md border border-bone-300 bg-white px-4 py-3 lg:hidden">
                <summary className="cursor-pointer font-semibold text-soot-900">Contents ({sectionIds.length} sections)</summary>
                <TableOfContents sections={lesson.sections} current={current} reached={reached} className="mt-3" />
              </details>

              <Objectives lesson={lesson} />
              <AttachedAlloys lessonSlug={lesson.slug} />

              <LessonContextProvider value={context}>
                <article ref={article} className="lesson-prose prose">
                  <Content components={mdxComponents} />
                </article>
              </LessonContextProvider>

              <PreviousNext previous={previous} next={next} />
            </div>
          </div>
          <aside className="print-hide hidden lg:block">
            <div className="sticky top-24 max-h-[calc(100dvh-7rem)] overflow-y-auto pb-6">
              <TableOfContents sections={lesson.sections} current={current} reached={reached} />
              <button type="button" onClick={() => window.print()} className="mt-6 text-sm font-semibold text-quench-700 underline underline-offset-4 hover:text-quench-800">
                Print this lesson
              </button>
            </div>
          </aside>
        </div>
      </div>
    </>
  );
}

function Objectives({ lesson }: { lesson: LessonOutline }) {
  if (lesson.objectives.length === 0) return null;
  return (
    <section aria-labelledby="lesson-objectives" className="mb-10 rounded-lg border border-bone-300 bg-white p-5 shadow-card">
      <h2 id="lesson-objectives" className="eyebrow text-ember-700">
        By the end of this lesson you can
      </h2>
      <ul className="mt-3 space-y-2 text-[0.98rem] leading-relaxed text-soot-800">
        {lesson.objectives.map((objective) => (
          <li key={objective} className="flex gap-3">
            <span aria-hidden="true" className="mt-2.5 h-0.5 w-3 shrink-0 bg-ember-500" />
            <span>{objective}</span>
          </li>
        ))}
      </ul>
    </section>
  );
}

function PreviousNext({ previous, next }: { previous: LessonOutline | null; next: LessonOutline | null }) {
  return (
    <nav aria-label="Previous and next lesson" className="print-hide mt-14 grid gap-4 border-t border-bone-300 pt-8 sm:grid-cols-2">
      {previous ? (
        <Link to={paths.lesson(previous.moduleSlug, previous.slug)} className="group rounded-lg border border-bone-300 bg-white p-4 hover:border-quench-500">
          <span className="eyebrow text-soot-600">← Previous</span>
          <span className="mt-1 block font-display text-lg font-semibold text-soot-900 group-hover:text-quench-700">{previous.title}</span>
        </Link>
      ) : (
        <span />
      )}
      {next ? (
        <Link to={paths.lesson(next.moduleSlug, next.slug)} className="group rounded-lg border border-bone-300 bg-white p-4 text-right hover:border-quench-500">
          <span className="eyebrow text-soot-600">Next →</span>
          <span className="mt-1 block font-display text-lg font-semibold text-soot-900 group-hover:text-quench-700">{next.title}</span>
        </Link>
      ) : (
        <Link to={paths.modules} className="group rounded-lg border border-bone-300 bg-white p-4 text-right hover:border-quench-500">
          <span className="eyebrow text-soot-600">Course complete</span>
          <span className="mt-1 block font-display text-lg font-semibold text-soot-900">Back to all modules</span>
        </Link>
      )}
    </nav>
  );
}
