import { useId, useState } from "react";
import { useNavigate } from "react-router";
import { cohortNameSchema } from "@shared/api/cohorts";
import { useAdminUsers } from "@/api/admin";
import { useMe } from "@/api/auth";
import { useCreateCohort } from "@/api/cohorts";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { messageFor } from "@/api/errors";
import { teachPaths } from "./paths";
import { selectClass } from "@/components/ui/form-classes";

/** "New cohort": a name (and, for admins, who teaches it); opens the new cohort's page. */
export function CreateCohortForm({ onDone }: { onDone: () => void }) {
  const me = useMe();
  const isAdmin = me.data?.role === "admin";
  const instructors = useAdminUsers({ role: "instructor", status: "active" }, isAdmin);
  const create = useCreateCohort();
  const navigate = useNavigate();
  const [name, setName] = useState("");
  const [instructorId, setInstructorId] = useState("");
  const [error, setError] = useState<string | undefined>();
  const selectId = useId();

  async function submit(event: React.FormEvent) {
    event.preventDefault();
    const parsed = cohortNameSchema.safeParse(name);
    if (!parsed.success) return setError(parsed.error.issues[0].message);
    setError(undefined);
    const { cohort } = await create.mutateAsync({ name: parsed.data, ...(isAdmin ? { instructorId: Number(instructorId) } : {}) });
    onDone();
    await navigate(teachPaths.cohort(cohort.id));
  }

  return (
    <form onSubmit={(e) => void submit(e).catch(() => undefined)} noValidate className="grid gap-4 md:grid-cols-[1fr_auto] md:items-end">
      <div className="grid gap-4 sm:grid-cols-2 md:col-span-1">
        <TextField label="Cohort name" value={name} onChange={(e) => setName(e.target.value)} error={error} maxLength={120} autoFocus placeholder="e.g. Spring Quench Cohort" />
        {isAdmin ? (
          <div>
            <label htmlFor={selectId} className="block text-sm font-semibold text-soot-800">
              Instructor
            </label>
            <select id={selectId} className={`${selectClass} mt-1.5 w-full`} value={instructorId} onChange={(e) => setInstructorId(e.target.value)} required>
              <option value="">Choose…</option>
              {instructors.data?.users.map((u) => (
                <option key={u.id} value={u.id}>
                  {u.displayName}
                </option>
              ))}
            </select>
          </div>
        ) : null}
      </div>
      <div className="flex gap-2">
        <Button type="submit" disabled={create.isPending || (isAdmin && !instructorId)}>
          {create.isPending ? "Creating…" : "Create cohort"}
        </Button>
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
      {create.isError ? (
        <Alert tone="danger" className="md:col-span-2">
          {messageFor(create.error)}
        </Alert>
      ) : null}
    </form>
  );
}
