import { db, type DbOrTrx } from "@/db/knex";
import type { Grantee, ProjectRole } from "@/lib/access/roles";
import type { ActingUser } from "./users";

export type UnitSystem = "SI" | "US";

export type Project = {
  id: string;
  firmId: string;
  name: string;
  jobNumber: string;
  client: string;
  site: string;
  unitSystem: UnitSystem;
  designCodes: string[];
  paperSize: "A4" | "Letter";
  revisionScheme: "numeric" | "alpha";
  createdAt: Date;
  updatedAt: Date;
};

/** A project as the acting user sees it: with their own role on it (null for a firm admin who is not a member). */
export type ProjectAccess = { project: Project; role: ProjectRole | null; grantees: Grantee[] };

const columns = ["p.id", "p.firmId", "p.name", "p.jobNumber", "p.client", "p.site", "p.unitSystem", "p.designCodes", "p.paperSize", "p.revisionScheme", "p.createdAt", "p.updatedAt"];

/**
 * The projects a person may see: those they are a member of, and every project
 * of their firm when they are its admin. Always inside their own firm.
 */
function visibleProjects(actor: ActingUser, trx: DbOrTrx) {
  const q = trx
    .from("projects as p")
    .leftJoin("projectMemberships as pm", function () {
      this.on("pm.projectId", "p.id").andOnVal("pm.userId", actor.id);
    })
    .where("p.firmId", actor.firmId);
  return actor.firmRole === "admin" ? q : q.whereNotNull("pm.userId");
}

export type ProjectListItem = Project & { role: ProjectRole | null; packageCount: number };

export async function listProjects(actor: ActingUser, trx: DbOrTrx = db()): Promise<ProjectListItem[]> {
  const rows = await visibleProjects(actor, trx)
    .select(...columns, "pm.role")
    .select(trx.raw("(select count(*)::int from packages k where k.project_id = p.id) as package_count"))
    .orderBy("p.updatedAt", "desc");
  return rows as ProjectListItem[];
}

/** Undefined when the project does not exist or belongs to someone else: callers answer 404 either way. */
export async function findProjectAccess(actor: ActingUser, projectId: string, trx: DbOrTrx = db()): Promise<ProjectAccess | undefined> {
  if (!isUuid(projectId)) return undefined;
  const row = await visibleProjects(actor, trx).select(...columns, "pm.role").where("p.id", projectId).first();
  if (!row) return undefined;
  const { role, ...project } = row as Project & { role: ProjectRole | null };
  return { project, role, grantees: granteesOf(actor, role) };
}

export function granteesOf(actor: ActingUser, role: ProjectRole | null): Grantee[] {
  const g: Grantee[] = [actor.firmRole === "admin" ? "firm_admin" : "firm_member"];
  if (role) g.push(role);
  return g;
}

export type ProjectFields = {
  name: string;
  jobNumber: string;
  client?: string;
  site?: string;
  unitSystem?: UnitSystem;
  designCodes?: string[];
  paperSize?: "A4" | "Letter";
  revisionScheme?: "numeric" | "alpha";
};

/** Creates a project in the actor's firm; the creator becomes its project engineer. */
export async function createProject(actor: ActingUser, fields: ProjectFields, trx: DbOrTrx = db()): Promise<Project> {
  const [project] = await trx
    .insert({ ...fields, designCodes: JSON.stringify(fields.designCodes ?? []), firmId: actor.firmId })
    .into("projects")
    .returning(columns.map((c) => c.slice(2)));
  await trx.insert({ projectId: project.id, userId: actor.id, role: "project_engineer" }).into("projectMemberships");
  return project as Project;
}

export async function updateProject(projectId: string, fields: Partial<ProjectFields>, trx: DbOrTrx = db()): Promise<Project> {
  const patch: Record<string, unknown> = { ...fields, updatedAt: trx.fn.now() };
  if (fields.designCodes) patch.designCodes = JSON.stringify(fields.designCodes);
  const [project] = await trx.from("projects").where({ id: projectId }).update(patch).returning(columns.map((c) => c.slice(2)));
  return project as Project;
}

export async function jobNumberTaken(firmId: string, jobNumber: string, exceptProjectId: string | null, trx: DbOrTrx = db()): Promise<boolean> {
  const q = trx.from("projects").select("id").where({ firmId, jobNumber });
  if (exceptProjectId) q.whereNot({ id: exceptProjectId });
  return Boolean(await q.first());
}

export function isUuid(s: string): boolean {
  return /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(s);
}
