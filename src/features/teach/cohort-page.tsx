/**
 * /teach/cohorts/:cohortId: one cohort. Rename or archive it; its students (remove, move);
 * invitations by e-mail and roster import; the assignments with due dates and attempt limits.
 */
import { useState } from "react";
import { useParams } from "react-router";
import { cohortNameSchema, type CohortDetail } from "@shared/api/cohorts";
import { useCohort, useUpdateCohort } from "@/api/cohorts";
import { Alert } from "@/components/ui/alert";
import { Button, ButtonLink } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { PageBody, PageHeader } from "@/components/ui/page-header";
import { messageFor } from "@/api/errors";
import { AssignmentsEditor } from "./assignments-editor";
import { CohortStudents } from "./cohort-students";
import { plural } from "@/lib/format";
import { InvitationsList } from "./invitations-list";
import { InviteForm } from "./invite-form";
import { teachPaths } from "./paths";
import { RosterImport } from "./roster-import";
import { Badge } from "@/components/ui/badge";
import { Loaded } from "@/components/ui/loaded";
import { Panel } from "@/components/ui/panel";

export function Component() {
  const cohortId = Number(useParams().cohortId);
  const cohort = useCohort(cohortId);
  const update = useUpdateCohort(cohortId);
  const [renaming, setRenaming] = useState(false);
  const name = cohort.data?.cohort.name;
  const archived = cohort.data?.cohort.archived ?? false;

  function toggleArchived() {
    if (!cohort.data) return;
    if (archived || window.confirm(`Archive “${cohort.data.cohort.name}”? Students keep their accounts and grades; the cohort leaves your active list.`)) {
      update.mutate({ archived: !archived });
    }
  }

  return (
    <>
      <title>{`${name ?? "Cohort"} — Grain & Edge`}</title>
      <PageHeader
        eyebrow="Cohort"
        title={
          <span className="inline-flex flex-wrap items-center gap-3">
            {name ?? "Cohort"}
            {cohort.data?.cohort.archived ? <Badge className="align-middle text-sm">Archived</Badge> : null}
          </span>
        }
        lede={
          cohort.data
            ? `Taught by ${cohort.data.cohort.instructor.displayName} · ${plural(cohort.data.cohort.studentCount, "student")} · ${plural(cohort.data.cohort.assignmentCount, "assignment")}`
            : undefined
        }
      >
        <ButtonLink to={teachPaths.gradebook(cohortId)}>Open the gradebook</ButtonLink>
        {cohort.data ? (
          <>
            <Button variant="onDark" onClick={() => setRenaming(true)} disabled={archived || renaming} aria-expanded={renaming}>
              Rename
            </Button>
            <Button variant="onDark" onClick={toggleArchived} disabled={update.isPending}>
              {archived ? "Restore cohort" : "Archive cohort"}
            </Button>
          </>
        ) : null}
      </PageHeader>
      <PageBody>
        <Loaded query={cohort} label="cohort">
          {(data) => (
            <div className="space-y-8">
              {update.isError ? <Alert tone="danger">{messageFor(update.error)}</Alert> : null}
              {renaming ? <RenameForm data={data} onDone={() => setRenaming(false)} /> : null}
              <CohortSections data={data} />
            </div>
          )}
        </Loaded>
      </PageBody>
    </>
  );
}

function CohortSections({ data }: { data: CohortDetail }) {
  const id = data.cohort.id;
  const archived = data.cohort.archived;
  return (
    <div className="space-y-8">
      {archived ? (
        <Alert tone="info" title="This cohort is archived">
          Its students and grades stay readable. Restore it (button at the top) to invite students or change assignments.
        </Alert>
      ) : null}
      <div className="grid gap-8 xl:grid-cols-[1.4fr_1fr] xl:items-start">
        <CohortStudents data={data} />
        <div className="min-w-0 space-y-8">
          {archived ? null : (
            <Panel id="invite" title="Invite by e-mail" description="Each person gets a link that works once and expires after a week. Existing students are added at once.">
              <InviteForm cohortId={id} />
            </Panel>
          )}
          <InvitationsList cohortId={id} archived={archived} />
        </div>
      </div>
      {archived ? null : <RosterImport cohortId={id} />}
      <AssignmentsEditor cohortId={id} archived={archived} />
    </div>
  );
}

function RenameForm({ data, onDone }: { data: CohortDetail; onDone: () => void }) {
  const update = useUpdateCohort(data.cohort.id);
  const [name, setName] = useState(data.cohort.name);
  const [error, setError] = useState<string | undefined>();

  async function rename(event: React.FormEvent) {
    event.preventDefault();
    const parsed = cohortNameSchema.safeParse(name);
    if (!parsed.success) return setError(parsed.error.issues[0].message);
    setError(undefined);
    await update.mutateAsync({ name: parsed.data });
    onDone();
  }

  return (
    <Panel id="rename" title="Rename the cohort">
      <form onSubmit={(e) => void rename(e).catch(() => undefined)} noValidate className="flex flex-wrap items-end gap-3">
        <TextField label="Cohort name" value={name} onChange={(e) => setName(e.target.value)} error={error} maxLength={120} autoFocus className="min-w-64 flex-1" />
        <Button type="submit" disabled={update.isPending}>
          Save name
        </Button>
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </form>
      {update.isError ? (
        <Alert tone="danger" className="mt-3">
          {messageFor(update.error)}
        </Alert>
      ) : null}
    </Panel>
  );
}
