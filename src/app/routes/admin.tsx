import type { AdminSummary } from "@shared/api/me";
import { useHealth } from "@/api/health";
import { useMeSummary } from "@/api/me";
import { PageBody, PageHeader } from "@/components/ui/page-header";
import { Stat, StatGrid } from "@/components/ui/stat";
import { LabShortcuts } from "@/features/home/lab-shortcuts";
import { QueryState } from "@/features/home/summary-state";

export function Component() {
  const summary = useMeSummary();

  return (
    <>
      <title>School admin — Grain &amp; Edge</title>
      <PageHeader
        eyebrow="School admin"
        title="The school at a glance"
        lede="Accounts by role, cohorts and the state of the server."
      />
      <PageBody className="grid grid-cols-1 gap-8 lg:grid-cols-[1fr_20rem] lg:items-start">
        <div className="space-y-10">
          <QueryState query={summary}>
            {(data) =>
              data.role === "admin" ? <AdminOverview summary={data} /> : <p className="text-soot-700">This overview is for administrators.</p>
            }
          </QueryState>
          <ServerStatus />
        </div>
        <LabShortcuts
          headingId="admin-lab"
          title="Simulation lab"
          intro="The simulations every account can open, including visitors who are not signed in."
        />
      </PageBody>
    </>
  );
}

function AdminOverview({ summary }: { summary: AdminSummary }) {
  const { counts } = summary;
  return (
    <>
      <section aria-labelledby="admin-accounts">
        <h2 id="admin-accounts" className="text-2xl font-semibold">
          Accounts
        </h2>
        <StatGrid className="mt-4 md:grid-cols-4">
          <Stat label="All accounts" value={counts.users} tone="quench" detail={`${counts.disabledUsers} disabled`} />
          <Stat label="Students" value={counts.students} />
          <Stat label="Instructors" value={counts.instructors} />
          <Stat label="Administrators" value={counts.admins} />
        </StatGrid>
        <RoleMix students={counts.students} instructors={counts.instructors} admins={counts.admins} />
      </section>
      <section aria-labelledby="admin-cohorts">
        <h2 id="admin-cohorts" className="text-2xl font-semibold">
          Cohorts
        </h2>
        <StatGrid className="mt-4 md:grid-cols-4">
          <Stat label="Active cohorts" value={counts.activeCohorts} tone="ember" />
          <Stat label="All cohorts" value={counts.cohorts} detail={`${counts.cohorts - counts.activeCohorts} archived`} />
        </StatGrid>
      </section>
    </>
  );
}

/** The share of each role among accounts, as one bar; the numbers above carry the same facts in text. */
function RoleMix({ students, instructors, admins }: { students: number; instructors: number; admins: number }) {
  const total = students + instructors + admins;
  if (total === 0) return null;
  const parts = [
    { label: "Students", count: students, color: "bg-temper-straw" },
    { label: "Instructors", count: instructors, color: "bg-temper-purple" },
    { label: "Administrators", count: admins, color: "bg-temper-blue" },
  ];
  return (
    <figure className="mt-5" aria-hidden="true">
      <div className="flex h-3 overflow-hidden rounded-full bg-bone-200">
        {parts.map((part) =>
          part.count > 0 ? (
            <div key={part.label} className={part.color} style={{ width: `${(100 * part.count) / total}%` }} />
          ) : null,
        )}
      </div>
      <figcaption className="mt-2 flex flex-wrap gap-x-5 gap-y-1 text-xs text-soot-600">
        {parts.map((part) => (
          <span key={part.label} className="inline-flex items-center gap-1.5">
            <span className={`size-2.5 rounded-full ${part.color}`} />
            {part.label} {Math.round((100 * part.count) / total)} %
          </span>
        ))}
      </figcaption>
    </figure>
  );
}

function ServerStatus() {
  const health = useHealth();
  const state = health.isPending ? "checking" : health.data?.ok ? "ok" : "down";
  const label = { checking: "Checking…", ok: "Server and database answering", down: "Not answering" }[state];
  const dot = { checking: "bg-ash-400", ok: "bg-success-700", down: "bg-danger-700" }[state];

  return (
    <section aria-labelledby="admin-health" className="rounded-lg border border-bone-300 bg-white p-5 shadow-card">
      <h2 id="admin-health" className="text-xl font-semibold">
        Server
      </h2>
      <p className="mt-2 flex items-center gap-2 text-sm" role="status">
        <span aria-hidden="true" className={`size-2.5 rounded-full ${dot}`} />
        {label}
      </p>
    </section>
  );
}
