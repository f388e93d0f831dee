/**
 * /teach: the instructor's dashboard. Cohorts at a glance, who is behind (overdue and unfinished),
 * and what is due in the coming week. Admins see every cohort.
 */
import { useState } from "react";
import { Link } from "react-router";
import type { OverviewCohort, TeachingOverview } from "@shared/api/cohorts";
import { useMe } from "@/api/auth";
import { useTeachingOverview } from "@/api/cohorts";
import { Button } from "@/components/ui/button";
import { PageBody, PageHeader } from "@/components/ui/page-header";
import { Stat, StatGrid } from "@/components/ui/stat";
import { firstName } from "@/features/home/format";
import { LabShortcuts } from "@/features/home/lab-shortcuts";
import { CreateCohortForm } from "./create-cohort-form";
import { formatDay, percent, plural, relativeDue } from "@/lib/format";
import { teachPaths } from "./paths";
import { Badge } from "@/components/ui/badge";
import { Loaded } from "@/components/ui/loaded";
import { Panel } from "@/components/ui/panel";
import { ProgressBar } from "@/components/ui/progress-bar";

export function Component() {
  const { data: user } = useMe();
  const overview = useTeachingOverview();
  const [creating, setCreating] = useState(false);
  const isAdmin = user?.role === "admin";

  return (
    <>
      <title>Teaching — Grain &amp; Edge</title>
      <PageHeader
        eyebrow={isAdmin ? "All cohorts" : "Teaching"}
        title={user && !isAdmin ? `Your cohorts, ${firstName(user.displayName)}` : "Cohorts of the school"}
        lede="Who is keeping up between forge sessions, what falls due this week, and the work you have set."
      >
        {creating ? null : (
          <Button onClick={() => setCreating(true)} aria-expanded={creating}>
            New cohort
          </Button>
        )}
      </PageHeader>
      <PageBody className="grid gap-8 lg:grid-cols-[1fr_20rem] lg:items-start">
        <div className="min-w-0 space-y-8">
          {creating ? (
            <Panel id="new-cohort" title="New cohort" description="Give it a name; you can invite students and set work on the next page.">
              <CreateCohortForm onDone={() => setCreating(false)} />
            </Panel>
          ) : null}
          <Loaded query={overview} label="dashboard">
            {(data) => <Overview data={data} />}
          </Loaded>
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

function Overview({ data }: { data: TeachingOverview }) {
  const active = data.cohorts.filter((c) => !c.archived);
  const students = active.reduce((sum, c) => sum + c.studentCount, 0);
  return (
    <>
      <section aria-labelledby="teach-totals">
        <h2 id="teach-totals" className="sr-only">
          At a glance
        </h2>
        <StatGrid className="md:grid-cols-4">
          <Stat label="Active cohorts" value={active.length} tone="quench" />
          <Stat label="Students" value={students} detail="in active cohorts" />
          <Stat label="Behind" value={data.behind.length} tone={data.behind.length ? "ember" : "default"} detail="with overdue work" />
          <Stat label="Due this week" value={data.dueSoon.length} detail={plural(data.dueSoon.length, "assignment")} />
        </StatGrid>
      </section>

      <CohortTable cohorts={data.cohorts} />

      <div className="grid gap-8 xl:grid-cols-2">
        <Panel id="teach-behind" title="Who is behind" description="Students with overdue, unfinished work, and how much of it they have done.">
          {data.behind.length === 0 ? (
            <p className="text-sm text-soot-700">Nobody has overdue work. Good forging.</p>
          ) : (
            <BehindList behind={data.behind} />
          )}
        </Panel>

        <Panel id="teach-due" title="Due in the next 7 days" description="How many students have finished each piece of work.">
          {data.dueSoon.length === 0 ? (
            <p className="text-sm text-soot-700">Nothing falls due this week.</p>
          ) : (
            <ul className="space-y-4">
              {data.dueSoon.map((d) => (
                <li key={d.assignmentId}>
                  <div className="flex flex-wrap items-baseline justify-between gap-x-3">
                    <span className="font-semibold text-soot-900">{d.moduleTitle}</span>
                    <span className="font-mono text-xs text-soot-700">{formatDay(d.dueAt)}</span>
                  </div>
                  <p className="text-xs text-soot-600">
                    <Link to={teachPaths.cohort(d.cohort.id)} className="text-quench-700 underline decoration-quench-300 underline-offset-2 hover:decoration-quench-700">
                      {d.cohort.name}
                    </Link>{" "}
                    · due {relativeDue(d.dueAt)} · {d.finishedCount} of {d.studentCount} finished
                  </p>
                  <div className="mt-1.5">
                    <ProgressBar share={d.studentCount ? d.finishedCount / d.studentCount : 0} label={`${d.moduleTitle}: ${d.finishedCount} of ${d.studentCount} finished`} tone="success" />
                  </div>
                </li>
              ))}
            </ul>
          )}
        </Panel>
      </div>
    </>
  );
}

const BEHIND_SHOWN = 8;

function BehindList({ behind }: { behind: TeachingOverview["behind"] }) {
  const [all, setAll] = useState(false);
  const shown = all ? behind : behind.slice(0, BEHIND_SHOWN);
  return (
    <>
      <ul className="divide-y divide-bone-200">
        {shown.map((b) => (
          <li key={`${b.cohort.id}-${b.student.id}`} className="flex flex-wrap items-start justify-between gap-x-3 gap-y-1 py-2.5 first:pt-0 last:pb-0">
            <div className="min-w-0">
              <Link to={teachPaths.student(b.cohort.id, b.student.id)} className="font-semibold text-quench-700 underline-offset-2 hover:underline">
                {b.student.displayName}
              </Link>
              <span className="block text-xs text-soot-600">{b.cohort.name}</span>
            </div>
            <ul className="flex flex-wrap justify-end gap-1.5">
              {b.overdue.map((o) => (
                <li key={o.assignmentId}>
                  <Badge tone="danger" className="whitespace-normal text-left font-medium">
                    {o.moduleTitle} · {percent(o.completion)}
                    <span className="sr-only">
                      {" "}
                      done, due {relativeDue(o.dueAt)}
                    </span>
                  </Badge>
                </li>
              ))}
            </ul>
          </li>
        ))}
      </ul>
      {behind.length > BEHIND_SHOWN ? (
        <Button variant="ghost" className="mt-2 px-0" onClick={() => setAll((v) => !v)} aria-expanded={all}>
          {all ? "Show fewer" : `Show all ${behind.length}`}
        </Button>
      ) : null}
    </>
  );
}

function CohortTable({ cohorts }: { cohorts: OverviewCohort[] }) {
  return (
    <section aria-labelledby="teach-cohorts">
      <h2 id="teach-cohorts" className="text-2xl font-semibold">
        Cohorts
      </h2>
      {cohorts.length === 0 ? (
        <p className="mt-3 max-w-prose leading-relaxed text-soot-700">
          No cohorts yet. Create one with <strong>New cohort</strong>, then invite students by e-mail or import a roster.
        </p>
      ) : (
        <div className="mt-4 relative overflow-x-auto rounded-lg border border-bone-300 bg-white shadow-card">
          <table className="w-full min-w-[34rem] text-left text-sm">
            <caption className="sr-only">Your cohorts: students, how many are behind, completion of the work set, next due date</caption>
            <thead className="bg-bone-100 text-soot-700">
              <tr>
                <th scope="col" className="px-4 py-3 font-semibold">
                  Cohort
                </th>
                <th scope="col" className="px-3 py-3 text-right font-semibold">
                  Students
                </th>
                <th scope="col" className="px-3 py-3 text-right font-semibold">
                  Behind
                </th>
                <th scope="col" className="px-3 py-3 font-semibold">
                  Completion
                </th>
                <th scope="col" className="px-3 py-3 font-semibold">
                  Next due
                </th>
                <th scope="col" className="px-4 py-3 font-semibold">
                  <span className="sr-only">Gradebook</span>
                </th>
              </tr>
            </thead>
            <tbody className="divide-y divide-bone-200">
              {cohorts.map((c) => (
                <tr key={c.id} className={c.archived ? "text-soot-600" : undefined}>
                  <th scope="row" className="px-4 py-3 font-semibold">
                    <Link to={teachPaths.cohort(c.id)} className="text-soot-900 underline decoration-bone-300 underline-offset-4 hover:decoration-ember-500">
                      {c.name}
                    </Link>
                    <span className="mt-0.5 block text-xs font-normal text-soot-600">
                      {c.archived ? <Badge>Archived</Badge> : c.openInvitations ? `${plural(c.openInvitations, "open invitation")}` : `Taught by ${c.instructor.displayName}`}
                    </span>
                  </th>
                  <td className="px-3 py-3 text-right font-mono tabular-nums">{c.studentCount}</td>
                  <td className={`px-3 py-3 text-right font-mono tabular-nums ${c.behindCount ? "font-semibold text-ember-700" : ""}`}>{c.behindCount}</td>
                  <td className="px-3 py-3">
                    <div className="flex items-center gap-2">
                      <span className="w-11 shrink-0 text-right font-mono text-xs tabular-nums">{percent(c.completion)}</span>
                      <ProgressBar share={c.completion} label={`${c.name}: ${percent(c.completion)} of the work done`} />
                    </div>
                  </td>
                  <td className="px-3 py-3 whitespace-nowrap text-soot-700">{c.nextDueAt ? formatDay(c.nextDueAt) : "—"}</td>
                  <td className="px-4 py-3 text-right">
                    <Link to={teachPaths.gradebook(c.id)} className="whitespace-nowrap font-medium text-quench-700 hover:underline">
                      Gradebook<span className="sr-only"> of {c.name}</span>
                    </Link>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
