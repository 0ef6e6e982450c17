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
  "export.create": ["engineer", "checker", "project_engineer"],
  "firm.members.list": ["firm_admin", "firm_member"],
  "firm.members.manage": ["firm_admin"],
  "account.read": ["firm_member", "firm_admin"],
  "account.update": ["firm_member", "firm_admin"],
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
