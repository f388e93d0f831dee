import { ROLE_HOME, type Role } from "@shared/api/roles";
import { ButtonLink } from "@/components/ui/button";
import { PageBody } from "@/components/ui/page-header";

const ROLE_PLURAL: Record<Role, string> = { student: "students", instructor: "instructors", admin: "administrators" };

export function NotAllowedPage({ role, allowed }: { role: Role; allowed: readonly Role[] }) {
  return (
    <>
      <title>Not allowed — Grain &amp; Edge</title>
      <PageBody className="max-w-2xl py-16 md:py-24">
        <p className="eyebrow text-ember-700">Error 403</p>
        <h1 className="mt-2 text-4xl font-semibold">Not allowed</h1>
        <p className="mt-4 text-lg leading-relaxed text-soot-700">
          This page is for {allowed.map((r) => ROLE_PLURAL[r]).join(" and ")}. You are signed in as{" "}
          {role === "admin" ? "an" : "a"} {role}, so it is not open to you. If you think you should have access, ask
          your school&rsquo;s administrator.
        </p>
        <div className="mt-8">
          <ButtonLink to={ROLE_HOME[role]}>Go to your home page</ButtonLink>
        </div>
      </PageBody>
    </>
  );
}
