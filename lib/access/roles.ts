/** A person's role on one project. */
export const projectRoles = ["engineer", "checker", "project_engineer", "viewer"] as const;
export type ProjectRole = (typeof projectRoles)[number];

/** A person's role in their firm. */
export const firmRoles = ["admin", "member"] as const;
export type FirmRole = (typeof firmRoles)[number];

/** What the permission table grants to: a project role, or the firm's admin. */
export type Grantee = ProjectRole | "firm_admin" | "firm_member";

export const projectRoleLabel: Record<ProjectRole, string> = {
  engineer: "Engineer",
  checker: "Checker",
  project_engineer: "Project engineer",
  viewer: "Viewer",
};
