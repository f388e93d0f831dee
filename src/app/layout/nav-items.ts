import { ROLE_HOME, type Role } from "@shared/api/roles";
import type { PublicUser } from "@shared/api/auth";
import { paths } from "@/config/paths";

export interface NavItem {
  to: string;
  label: string;
}

const HOME_LABEL: Record<Role, string> = {
  student: "My learning",
  instructor: "Teaching",
  admin: "School admin",
};

/** The main navigation for whoever is (or is not) signed in. */
export function navItemsFor(user: PublicUser | null | undefined): NavItem[] {
  const lab: NavItem = { to: paths.lab, label: "Lab" };
  // Visitors: the free lab, and the way in for people learning on their own.
  if (!user) return [lab, { to: paths.join, label: "Self-study pass" }];
  const notebook: NavItem = user.role === "student" ? { to: paths.notebook, label: "Notebook" } : { to: paths.notebookReview, label: "Notebooks" };
  return [{ to: ROLE_HOME[user.role], label: HOME_LABEL[user.role] }, { to: paths.modules, label: "Course" }, notebook, lab, { to: paths.account, label: "Account" }];
}
