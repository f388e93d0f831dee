/**
 * /teach/cohorts/:cohortId/gradebook: the table, the CSV export, per-question analytics and the
 * cohort's progress over time.
 */
import { useParams } from "react-router";
import { gradebookCsvUrl, useCohortAnalytics, useGradebook } from "@/api/gradebook";
import { buttonClasses, ButtonLink } from "@/components/ui/button";
import { PageBody, PageHeader } from "@/components/ui/page-header";
import { Stat, StatGrid } from "@/components/ui/stat";
import { formatDay, percent, plural } from "@/lib/format";
import { GradebookTable } from "./gradebook-table";
import { teachPaths } from "./paths";
import { ProgressChart } from "./progress-chart";
import { QuestionAnalytics } from "./question-analytics";
import { Loaded } from "@/components/ui/loaded";
import { Panel } from "@/components/ui/panel";

export function Component() {
  const cohortId = Number(useParams().cohortId);
  const book = useGradebook(cohortId);
  const analytics = useCohortAnalytics(cohortId);
  const name = book.data?.cohort.name;

  return (
    <>
      <title>{`Gradebook${name ? ` — ${name}` : ""} — Grain & Edge`}</title>
      <PageHeader eyebrow="Gradebook" title={name ?? "Gradebook"} lede="Every student against every quiz of the work you have set: best and latest score, what is done, what is overdue.">
        {/* A plain link: the browser downloads the file with the session cookie. */}
        <a href={gradebookCsvUrl(cohortId)} download className={buttonClasses("primary")}>
          Export CSV
        </a>
        <ButtonLink to={teachPaths.cohort(cohortId)} variant="onDark">
          Cohort page
        </ButtonLink>
      </PageHeader>
      <PageBody className="space-y-8">
        <Loaded query={book} label="gradebook">
          {(data) => {
            const students = data.students.length;
            const mean = students ? data.students.reduce((s, x) => s + x.completion, 0) / students : 0;
            const behind = data.students.filter((s) => s.overdueCount > 0).length;
            return (
              <>
                <section aria-labelledby="gb-summary">
                  <h2 id="gb-summary" className="sr-only">
                    Summary
                  </h2>
                  <StatGrid className="md:grid-cols-4">
                    <Stat label="Students" value={students} />
                    <Stat label="Work done" value={percent(mean)} tone="quench" detail="mean over students" />
                    <Stat label="With overdue work" value={behind} tone={behind ? "ember" : "default"} />
                    <Stat
                      label="Assignments"
                      value={data.assignments.length}
                      detail={data.assignments.length ? `next: ${formatDay(data.assignments.find((a) => !a.overdue)?.dueAt ?? null)}` : "none set"}
                    />
                  </StatGrid>
                </section>
                <section aria-labelledby="gb-table">
                  <h2 id="gb-table" className="mb-3 text-2xl font-semibold">
                    Students and quizzes
                  </h2>
                  {data.quizzes.length === 0 ? (
                    <p className="text-sm text-soot-700">No quizzes yet: assign a module on the cohort page and its quizzes appear here.</p>
                  ) : (
                    <GradebookTable book={data} />
                  )}
                </section>
              </>
            );
          }}
        </Loaded>
        <div className="grid gap-8 xl:grid-cols-2 xl:items-start">
          <Panel id="gb-questions" title="Question by question" description="Which questions the cohort gets wrong, and the wrong answers they give most.">
            <Loaded query={analytics} label="analytics">
              {(data) => <QuestionAnalytics quizzes={data.quizzes} />}
            </Loaded>
          </Panel>
          <Panel id="gb-progress" title="Progress over time" description={`Mean share of the assigned work done, day by day${analytics.data ? ` (${plural(analytics.data.dueDates.length, "due date")})` : ""}.`}>
            <Loaded query={analytics} label="progress chart">
              {(data) => <ProgressChart analytics={data} />}
            </Loaded>
          </Panel>
        </div>
      </PageBody>
    </>
  );
}
