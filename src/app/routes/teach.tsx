import type { InstructorSummary } from "@shared/api/me";
import { useMe } from "@/api/auth";
import { useMeSummary } from "@/api/me";
import { PageBody, PageHeader } from "@/components/ui/page-header";
import { Stat, StatGrid } from "@/components/ui/stat";
import { firstName } from "@/features/home/format";
import { LabShortcuts } from "@/features/home/lab-shortcuts";
import { QueryState } from "@/features/home/summary-state";

export function Component() {
  const { data: user } = useMe();
  const summary = useMeSummary();

  return (
    <>
      <title>Teaching — Grain &amp; Edge</title>
      <PageHeader
        eyebrow="Teaching"
        title={user ? `Your cohorts, ${firstName(user.displayName)}` : "Your cohorts"}
        lede="The classes you teach, how many students each has and the work you have set them."
      />
      <PageBody className="grid gap-8 lg:grid-cols-[1fr_20rem] lg:items-start">
        <div className="space-y-10">
          <QueryState query={summary}>
            {(data) =>
              data.role === "instructor" ? (
                <InstructorOverview summary={data} />
              ) : (
                <p className="text-soot-700">This overview is for instructors.</p>
              )
            }
          </QueryState>
        </div>
        <LabShortcuts
          headingId="teach-lab"
          title="Demonstrate in class"
          intro="Open a simulation on the projector and change one input at a time while the class predicts the result."
        />
      </PageBody>
    </>
  );
}

function InstructorOverview({ summary }: { summary: InstructorSummary }) {
  const active = summary.cohorts.filter((c) => !c.archived);
  const students = active.reduce((sum, c) => sum + c.studentCount, 0);
  const assignments = active.reduce((sum, c) => sum + c.assignmentCount, 0);

  return (
    <>
      <section aria-labelledby="teach-totals">
        <h2 id="teach-totals" className="text-2xl font-semibold">
          This term
        </h2>
        <StatGrid className="mt-4 md:grid-cols-3">
          <Stat label="Active cohorts" value={active.length} tone="quench" className="col-span-2 md:col-span-1" />
          <Stat label="Students" value={students} detail="in active cohorts" />
          <Stat label="Assignments set" value={assignments} detail="in active cohorts" />
        </StatGrid>
      </section>

      <section aria-labelledby="teach-cohorts">
        <h2 id="teach-cohorts" className="text-2xl font-semibold">
          Cohorts
        </h2>
        {summary.cohorts.length === 0 ? (
          <p className="mt-3 max-w-prose leading-relaxed text-soot-700">
            You do not teach a cohort yet. An administrator can create one and make you its instructor.
          </p>
        ) : (
          <div className="mt-4 overflow-hidden rounded-lg border border-bone-300 bg-white shadow-card">
            <table className="w-full text-left text-sm">
              <caption className="sr-only">Your cohorts with their student and assignment counts</caption>
              <thead className="bg-bone-100 text-soot-700">
                <tr>
                  <th scope="col" className="px-4 py-3 font-semibold">
                    Cohort
                  </th>
                  <th scope="col" className="px-3 py-3 text-right font-semibold">
                    Students
                  </th>
                  <th scope="col" className="px-3 py-3 text-right font-semibold">
                    <span className="hidden sm:inline">Assignments</span>
                    <span className="sm:hidden" aria-hidden="true">Tasks</span>
                    <span className="sr-only sm:hidden">Assignments</span>
                  </th>
                  <th scope="col" className="px-4 py-3 font-semibold">
                    Status
                  </th>
                </tr>
              </thead>
              <tbody className="divide-y divide-bone-200">
                {summary.cohorts.map((cohort) => (
                  <tr key={cohort.id}>
                    <th scope="row" className="px-4 py-3 font-semibold text-soot-900">
                      {cohort.name}
                    </th>
                    <td className="px-3 py-3 text-right font-mono tabular-nums">{cohort.studentCount}</td>
                    <td className="px-3 py-3 text-right font-mono tabular-nums">{cohort.assignmentCount}</td>
                    <td className="px-4 py-3">
                      <span
                        className={
                          cohort.archived
                            ? "rounded-xs bg-bone-200 px-2 py-0.5 text-xs font-medium text-soot-700"
                            : "rounded-xs bg-quench-100 px-2 py-0.5 text-xs font-medium text-quench-800"
                        }
                      >
                        {cohort.archived ? "Archived" : "Active"}
                      </span>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>
    </>
  );
}
