/**
 * /admin/users: every account. Change a role (applies on the user's next request), disable an
 * account (ends all its sessions) or enable it again, or sign a user out everywhere.
 */
import { useDeferredValue, useId, useState } from "react";
import { ROLES, type Role } from "@shared/api/auth";
import type { AdminUser, AdminUsersQuery } from "@shared/api/admin";
import { useAdminUsers, useEndSessions, useUpdateUser } from "@/api/admin";
import { useMe } from "@/api/auth";
import { Button } from "@/components/ui/button";
import { cx } from "@/components/ui/cx";
import { PageBody, PageHeader } from "@/components/ui/page-header";
import { messageFor } from "@/api/errors";
import { formatDateTime, formatDay } from "@/lib/format";
import { Badge } from "@/components/ui/badge";
import { Loaded } from "@/components/ui/loaded";
import { inputClass, selectClass } from "@/components/ui/form-classes";

const ROLE_LABEL: Record<Role, string> = { student: "Student", instructor: "Instructor", admin: "Admin" };

export function Component() {
  const [q, setQ] = useState("");
  const [role, setRole] = useState<Role | "">("");
  const [status, setStatus] = useState<"" | "active" | "disabled">("");
  const [page, setPage] = useState(1);
  const deferredQ = useDeferredValue(q.trim());
  const query: Partial<AdminUsersQuery> = { q: deferredQ || undefined, role: role || undefined, status: status || undefined, page };
  const users = useAdminUsers(query);
  const ids = { q: useId(), role: useId(), status: useId() };
  const [notice, setNotice] = useState("");

  return (
    <>
      <title>Users — School admin — Grain &amp; Edge</title>
      <PageHeader eyebrow="School admin" title="Users" lede="Change roles, disable accounts and end sessions. Changes apply on the user's next request." />
      <PageBody className="space-y-5">
        <div className="flex flex-wrap items-end gap-4">
          <div className="w-full sm:w-72">
            <label htmlFor={ids.q} className="block text-sm font-semibold text-soot-800">
              Search
            </label>
            <input
              id={ids.q}
              type="search"
              className={`${inputClass} mt-1.5`}
              placeholder="Name or e-mail"
              value={q}
              onChange={(e) => {
                setQ(e.target.value);
                setPage(1);
              }}
            />
          </div>
          <div>
            <label htmlFor={ids.role} className="block text-sm font-semibold text-soot-800">
              Role
            </label>
            <select
              id={ids.role}
              className={`${selectClass} mt-1.5`}
              value={role}
              onChange={(e) => {
                setRole(e.target.value as Role | "");
                setPage(1);
              }}
            >
              <option value="">All roles</option>
              {ROLES.map((r) => (
                <option key={r} value={r}>
                  {ROLE_LABEL[r]}
                </option>
              ))}
            </select>
          </div>
          <div>
            <label htmlFor={ids.status} className="block text-sm font-semibold text-soot-800">
              Status
            </label>
            <select
              id={ids.status}
              className={`${selectClass} mt-1.5`}
              value={status}
              onChange={(e) => {
                setStatus(e.target.value as typeof status);
                setPage(1);
              }}
            >
              <option value="">Any</option>
              <option value="active">Active</option>
              <option value="disabled">Disabled</option>
            </select>
          </div>
        </div>
        <p role="status" className="min-h-5 text-sm text-success-700">
          {notice}
        </p>
        <Loaded query={users} label="users">
          {(data) => (
            <>
              <div className="relative overflow-x-auto rounded-lg border border-bone-300 bg-white shadow-card">
                <table className="w-full min-w-[46rem] text-left text-sm">
                  <caption className="sr-only">Accounts, {data.total} in all</caption>
                  <thead className="bg-bone-100 text-soot-700">
                    <tr>
                      <th scope="col" className="px-4 py-3 font-semibold">
                        Person
                      </th>
                      <th scope="col" className="px-3 py-3 font-semibold">
                        Role
                      </th>
                      <th scope="col" className="px-3 py-3 font-semibold">
                        Status
                      </th>
                      <th scope="col" className="px-3 py-3 font-semibold">
                        Last sign-in
                      </th>
                      <th scope="col" className="px-3 py-3 font-semibold">
                        Cohorts
                      </th>
                      <th scope="col" className="px-4 py-3 font-semibold">
                        <span className="sr-only">Actions</span>
                      </th>
                    </tr>
                  </thead>
                  <tbody className="divide-y divide-bone-200">
                    {data.users.map((u) => (
                      <UserRow key={u.id} user={u} onNotice={setNotice} />
                    ))}
                  </tbody>
                </table>
              </div>
              <div className="flex flex-wrap items-center justify-between gap-3 text-sm text-soot-700">
                <span>
                  {data.total === 0 ? "No accounts match." : `Showing ${(data.page - 1) * data.pageSize + 1}–${Math.min(data.total, data.page * data.pageSize)} of ${data.total}`}
                </span>
                <div className="flex gap-2">
                  <Button variant="secondary" disabled={page <= 1} onClick={() => setPage((p) => p - 1)}>
                    Previous
                  </Button>
                  <Button variant="secondary" disabled={data.page * data.pageSize >= data.total} onClick={() => setPage((p) => p + 1)}>
                    Next
                  </Button>
                </div>
              </div>
            </>
          )}
        </Loaded>
      </PageBody>
    </>
  );
}

function UserRow({ user, onNotice }: { user: AdminUser; onNotice: (text: string) => void }) {
  const me = useMe();
  const update = useUpdateUser();
  const endSessions = useEndSessions();
  const selectId = useId();
  const self = me.data?.id === user.id;
  const failure = update.error ?? endSessions.error;

  async function changeRole(role: Role) {
    if (role === user.role) return;
    if (!window.confirm(`Make ${user.displayName} ${ROLE_LABEL[role].toLowerCase()}? It applies on their next request.`)) return;
    await update.mutateAsync({ id: user.id, role });
    onNotice(`${user.displayName} is now ${ROLE_LABEL[role].toLowerCase()}.`);
  }

  async function toggleDisabled() {
    if (!user.disabled && !window.confirm(`Disable ${user.displayName}? They are signed out everywhere and cannot sign in until enabled.`)) return;
    const res = await update.mutateAsync({ id: user.id, disabled: !user.disabled });
    onNotice(user.disabled ? `${user.displayName} can sign in again.` : `${user.displayName} is disabled; ${res.sessionsEnded} session(s) ended.`);
  }

  async function signOutEverywhere() {
    const res = await endSessions.mutateAsync(user.id);
    onNotice(`${res.sessionsEnded} session(s) of ${user.displayName} ended.`);
  }

  return (
    <tr className={cx(user.disabled && "bg-bone-50 text-soot-600")}>
      <th scope="row" className="min-w-48 px-4 py-3 font-normal">
        <span className="block font-semibold text-soot-900">
          {user.displayName}
          {self ? <span className="ml-2 text-xs font-normal text-soot-600">(you)</span> : null}
        </span>
        <span className="block break-all text-xs text-soot-600">{user.email}</span>
        {failure ? <span className="mt-1 block text-xs font-medium text-danger-700">{messageFor(failure)}</span> : null}
      </th>
      <td className="px-3 py-3">
        <label htmlFor={selectId} className="sr-only">
          Role of {user.displayName}
        </label>
        <select
          id={selectId}
          className={`${selectClass} min-h-10 text-sm`}
          value={user.role}
          disabled={self || update.isPending}
          onChange={(e) => void changeRole(e.target.value as Role).catch(() => undefined)}
        >
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABEL[r]}
            </option>
          ))}
        </select>
      </td>
      <td className="px-3 py-3">{user.disabled ? <Badge tone="danger">Disabled</Badge> : <Badge tone="success">Active</Badge>}</td>
      <td className="px-3 py-3 whitespace-nowrap text-soot-700">{user.lastSignInAt ? formatDateTime(user.lastSignInAt) : "Never"}</td>
      <td className="px-3 py-3 text-xs text-soot-700">
        {user.cohortsTaught ? `teaches ${user.cohortsTaught}` : user.cohortsEnrolled ? `in ${user.cohortsEnrolled}` : "—"}
        <span className="block text-2xs text-soot-500">since {formatDay(user.createdAt)}</span>
      </td>
      <td className="px-4 py-3">
        {self ? null : (
          <div className="flex flex-wrap justify-end gap-1">
            <Button variant="ghost" className="min-h-9 px-3" disabled={update.isPending} onClick={() => void toggleDisabled().catch(() => undefined)}>
              {user.disabled ? "Enable" : "Disable"}
              <span className="sr-only"> {user.displayName}</span>
            </Button>
            {user.disabled ? null : (
              <Button variant="ghost" className="min-h-9 px-3" disabled={endSessions.isPending} onClick={() => void signOutEverywhere().catch(() => undefined)}>
                <span>
                  Sign out everywhere<span className="sr-only">: {user.displayName}</span>
                </span>
              </Button>
            )}
          </div>
        )}
      </td>
    </tr>
  );
}
