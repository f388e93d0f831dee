import { useMe } from "@/api/auth";
import { Card, CardHeading } from "@/components/ui/card";
import { PageBody, PageHeader } from "@/components/ui/page-header";
import { PasswordForm } from "@/features/account/password-form";

const ROLE_NAME = { student: "Student", instructor: "Instructor", admin: "Administrator" } as const;

export function Component() {
  const { data: user } = useMe();
  return (
    <>
      <title>Account — Grain &amp; Edge</title>
      <PageHeader eyebrow="Account" title="Your account" lede="Your sign-in details and password." />
      <PageBody className="grid grid-cols-1 gap-6 md:grid-cols-[1fr_1.4fr] md:items-start">
        <Card>
          <CardHeading title="Signed in as" />
          {user ? (
            <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-2 text-sm">
              <dt className="font-semibold text-soot-600">Name</dt>
              <dd>{user.displayName}</dd>
              <dt className="font-semibold text-soot-600">E-mail</dt>
              <dd className="break-all">{user.email}</dd>
              <dt className="font-semibold text-soot-600">Role</dt>
              <dd>{ROLE_NAME[user.role]}</dd>
            </dl>
          ) : null}
        </Card>
        <Card>
          <CardHeading title="Change password" />
          <PasswordForm />
        </Card>
      </PageBody>
    </>
  );
}
