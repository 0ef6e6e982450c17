import { projectRoleLabel, type ProjectRole } from "@/lib/access/roles";

export function RoleTag({ role }: { role: ProjectRole | null }) {
  return <span className="pp-tag">{role ? projectRoleLabel[role] : "Firm admin (not a member)"}</span>;
}
