import Link from "next/link";
import { RoleTag } from "@/components/members/role-tag";
import type { ProjectRole } from "@/lib/access/roles";

export type ProjectBarProps = { id: string; name: string; jobNumber: string; client: string; site: string; role: ProjectRole | null };

export function ProjectBar({ id, name, jobNumber, client, site, role }: ProjectBarProps) {
  return (
    <section className="border-b border-rule pb-4" aria-label="Project">
      <div className="flex flex-wrap items-baseline gap-x-4 gap-y-1">
        <span className="pp-num text-sm text-ink-soft">{jobNumber}</span>
        <h1>
          <Link href={`/projects/${id}`} className="text-ink">
            {name}
          </Link>
        </h1>
        <span className="ml-auto text-sm" data-testid="project-role">
          Your role on this project: <RoleTag role={role} />
        </span>
      </div>
      <p className="text-sm text-ink-soft">{[client, site].filter(Boolean).join(" · ")}</p>
      <nav className="mt-3 flex gap-4 text-sm" aria-label="Project">
        <Link href={`/projects/${id}`}>Packages</Link>
        <Link href={`/projects/${id}/members`}>Members</Link>
        <Link href={`/projects/${id}/settings`}>Settings</Link>
      </nav>
    </section>
  );
}
