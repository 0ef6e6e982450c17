import type { Grantee } from "./roles";

/**
 * Who may do what. The one place roles meet actions: handlers and actions name
 * an action, never a role. Firm-wide actions are granted to firm roles,
 * project actions to project roles (firm admins manage people on every project).
 */
export const permissions = {
  "project.list": ["firm_member", "firm_admin"],
  "project.create": ["firm_member", "firm_admin"],
  "project.read": ["engineer", "checker", "project_engineer", "viewer", "firm_admin"],
  "project.update": ["project_engineer", "firm_admin"],
  "member.list": ["engineer", "checker", "project_engineer", "viewer", "firm_admin"],
  "member.invite": ["project_engineer", "firm_admin"],
  "member.update": ["project_engineer", "firm_admin"],
  "member.remove": ["project_engineer", "firm_admin"],
  "package.list": ["engineer", "checker", "project_engineer", "viewer", "firm_admin"],
  "package.read": ["engineer", "checker", "project_engineer", "viewer", "firm_admin"],
  "package.create": ["engineer", "project_engineer"],
  "package.edit": ["engineer", "project_engineer"],
  "package.delete": ["engineer", "project_engineer"],
  "package.submit": ["engineer", "project_engineer"],
  "remark.create": ["engineer", "checker", "project_engineer"],
  "remark.reply": ["engineer", "checker", "project_engineer"],
  "remark.close": ["checker", "project_engineer"],
  "check.read": ["engineer", "checker", "project_engineer", "viewer", "firm_admin"],
  "revision.read": ["engineer", "checker", "project_engineer", "viewer", "firm_admin"],
  "calc.check": ["checker"],
  "checker.assign": ["project_engineer"],
  "revision.issue": ["project_engineer"],
  // Plan-review comments: the engineer of record records and answers them; every project member reads them.
  "planReview.read": ["engineer", "checker", "project_engineer", "viewer", "firm_admin"],
  "planReview.manage": ["project_engineer"],
  // Every project member may export and download, viewers included (the permit set goes to whoever needs it).
  "export.create": ["engineer", "checker", "project_engineer", "viewer", "firm_admin"],
  "export.read": ["engineer", "checker", "project_engineer", "viewer", "firm_admin"],
  // A signed link names no project: route() only requires sign-in, and lib/exports/download-export.ts checks export.read on the export's project.
  "export.download": ["firm_member", "firm_admin"],
  "firm.members.list": ["firm_admin", "firm_member"],
  "firm.members.manage": ["firm_admin"],
  "account.read": ["firm_member", "firm_admin"],
  "account.update": ["firm_member", "firm_admin"],
  // One's own seal profile: anyone may keep one; issuing asks the project engineer for a valid one.
  "seal.read": ["firm_member", "firm_admin"],
  "seal.manage": ["firm_member", "firm_admin"],
} as const satisfies Record<string, readonly Grantee[]>;

export type Permission = keyof typeof permissions;

/** Whether any of the grantees the acting user holds may take this action. */
export function can(permission: Permission, held: readonly Grantee[]): boolean {
  const allowed: readonly Grantee[] = permissions[permission];
  return held.some((g) => allowed.includes(g));
}

/** Whether the action is taken on a project (and so needs a project to be resolved first). */
export function isProjectPermission(permission: Permission): boolean {
  const allowed: readonly Grantee[] = permissions[permission];
  return allowed.some((g) => g !== "firm_admin" && g !== "firm_member");
}
