import { isPassActive } from "@shared/api/billing";
import type { StudentCohortSummary, StudentSummary } from "@shared/api/me";
import { Link } from "react-router";
import { useMe } from "@/api/auth";
import { useMeSummary } from "@/api/me";
import { buttonClasses } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { paths } from "@/config/paths";
import { PageBody, PageHeader } from "@/components/ui/page-header";
import { Stat, StatGrid } from "@/components/ui/stat";
import { firstName, formatDate, plural } from "@/features/home/format";
import { LabShortcuts } from "@/features/home/lab-shortcuts";
import { QueryState } from "@/features/home/summary-state";
import { DueAssignments } from "@/features/teach/due-assignments";

export function Component() {
  const { data: user } = useMe();
  const summary = useMeSummary();

  return (
    <>
      <title>My learning — Grain &amp; Edge</title>
      <PageHeader
        eyebrow="My learning"
        title={user ? `Welcome back, ${firstName(user.displayName)}` : "My learning"}
        lede="What is due next, how far you have come, and where to go on."
      />
      <PageBody className="grid grid-cols-1 gap-8 lg:grid-cols-[1fr_20rem] lg:items-start">
        <div className="space-y-10">
          <DueAssignments />
          <QueryState query={summary}>
            {(data) => (data.role === "student" ? <StudentOverview summary={data} /> : <WrongSummary />)}
          </QueryState>
        </div>
        <LabShortcuts
          headingId="learn-lab"
          title="Try it in the lab"
          intro="Every lesson idea has a simulation. Open one and change the alloy yourself."
        />
      </PageBody>
    </>
  );
}

function StudentOverview({ summary }: { summary: StudentSummary }) {
  const { lessonsStarted, lessonsCompleted } = summary.progress;
  const inProgress = Math.max(0, lessonsStarted - lessonsCompleted);
  const assignments = summary.cohorts.reduce((sum, c) => sum + c.assignmentCount, 0);
  const overdue = summary.cohorts.reduce((sum, c) => sum + c.overdueCount, 0);

  return (
    <>
      <section aria-labelledby="learn-progress">
        <h2 id="learn-progress" className="text-2xl font-semibold">
          Progress
        </h2>
        {/* Self-learners have no cohort, so no assignments or due dates to count. */}
        <StatGrid className={summary.selfStudy ? "mt-4 grid-cols-2" : "mt-4 md:grid-cols-4"}>
          <Stat label="Lessons completed" value={lessonsCompleted} tone="quench" />
          <Stat label="Lessons in progress" value={inProgress} />
          {summary.selfStudy ? null : (
            <>
              <Stat label="Assignments" value={assignments} detail={`across ${plural(summary.cohorts.length, "cohort")}`} />
              <Stat
                label="Overdue"
                value={overdue}
                tone={overdue > 0 ? "ember" : "default"}
                detail={overdue > 0 ? "Catch up with these first" : "Nothing overdue"}
              />
            </>
          )}
        </StatGrid>
      </section>

      {summary.selfStudy ? (
        <SelfStudyPass passValidUntil={summary.selfStudy.passValidUntil} />
      ) : (
        <section aria-labelledby="learn-cohorts">
          <h2 id="learn-cohorts" className="text-2xl font-semibold">
            Your cohorts
          </h2>
          {summary.cohorts.length === 0 ? (
            <p className="mt-3 max-w-prose leading-relaxed text-soot-700">
              You are not in a cohort yet. When your instructor adds you to one, its assignments and due dates appear
              here. Meanwhile, the simulation lab is open.
            </p>
          ) : (
            <ul className="mt-4 grid gap-4 md:grid-cols-2">
              {summary.cohorts.map((cohort) => (
                <li key={cohort.id}>
                  <CohortCard cohort={cohort} />
                </li>
              ))}
            </ul>
          )}
        </section>
      )}
    </>
  );
}

/** A self-learner's pass instead of cohorts: until when it runs, or how to renew it. */
function SelfStudyPass({ passValidUntil }: { passValidUntil: string | null }) {
  const active = isPassActive(passValidUntil);
  return (
    <section aria-labelledby="learn-pass">
      <h2 id="learn-pass" className="text-2xl font-semibold">
        Your self-study pass
      </h2>
      <Card className="mt-4 border-t-4 border-t-quench-500">
        {active ? (
          <>
            <p className="leading-relaxed text-soot-800">
              Every lesson and quiz is open to you until <strong className="font-mono">{formatDate(passValidUntil)}</strong>. Work through the
              modules in any order; your progress and quiz results are kept here.
            </p>
            <div className="mt-4 flex flex-wrap gap-2">
              <Link to={paths.modules} className={buttonClasses("primary")}>
                Go to the modules
              </Link>
              <Link to={paths.join} className={buttonClasses("ghost")}>
                Extend the pass
              </Link>
            </div>
          </>
        ) : (
          <>
            <p className="leading-relaxed text-soot-800">
              {passValidUntil
                ? `Your pass ended on ${formatDate(passValidUntil)}. Your progress is kept; renewing opens the lessons and quizzes again.`
                : "Your pass is not active yet. A pass opens the lessons and quizzes; the simulation lab is open to everyone."}
            </p>
            <Link to={paths.join} className={buttonClasses("primary", "md", "mt-4")}>
              {passValidUntil ? "Renew your self-study pass" : "Get a self-study pass"}
            </Link>
          </>
        )}
      </Card>
    </section>
  );
}

function CohortCard({ cohort }: { cohort: StudentCohortSummary }) {
  return (
    <Card className="h-full border-t-4 border-t-ember-500">
      <h3 className="text-lg font-semibold">{cohort.name}</h3>
      <p className="mt-0.5 text-sm text-soot-600">Instructor: {cohort.instructorName}</p>
      <dl className="mt-4 grid grid-cols-2 gap-x-4 gap-y-3 text-sm">
        <div>
          <dt className="text-soot-600">Next due</dt>
          <dd className="font-mono font-semibold">{formatDate(cohort.nextDueAt)}</dd>
        </div>
        <div>
          <dt className="text-soot-600">Assignments</dt>
          <dd className="font-mono font-semibold">{cohort.assignmentCount}</dd>
        </div>
        <div>
          <dt className="text-soot-600">Overdue</dt>
          <dd className={`font-mono font-semibold ${cohort.overdueCount > 0 ? "text-ember-700" : ""}`}>
            {cohort.overdueCount}
          </dd>
        </div>
        <div>
          <dt className="text-soot-600">Students</dt>
          <dd className="font-mono font-semibold">{cohort.studentCount}</dd>
        </div>
      </dl>
    </Card>
  );
}

function WrongSummary() {
  return <p className="text-soot-700">This overview is for students; your own home page is linked in the menu.</p>;
}
