import type { Trx } from "@/db/knex";
import { AppError, notFound } from "@/lib/app-error";
import { can, type Permission } from "@/lib/access/permissions";
import type { PackageStatus } from "@/lib/data/packages";
import { findPackageProjectId } from "@/lib/data/packages";
import { findProjectAccess, isUuid, type ProjectAccess } from "@/lib/data/projects";
import type { ActingUser } from "@/lib/data/users";

export type ReviewPackage = { id: string; projectId: string; title: string; status: PackageStatus; assignedChecker: string | null; document: unknown };

export type LoadReviewPackageOptions = {
  actor: ActingUser;
  packageId: string;
  /** The action the actor must be allowed on the package's project. */
  permission: Permission;
  /** What the refusal says when the permission is missing. */
  refusal: string;
  /** Lock the row for the transaction (default); reads pass false so they never wait on a writer. */
  lock?: boolean;
  trx: Trx;
};

/**
 * The package with its document, by default locked for the rest of the
 * transaction so that two state changes of one package run one after the other. Another
 * firm's package, or one on a project the actor cannot see, is not found.
 */
export async function loadReviewPackage({ actor, packageId, permission, refusal, lock = true, trx }: LoadReviewPackageOptions): Promise<{ access: ProjectAccess; pkg: ReviewPackage }> {
  if (!isUuid(packageId)) throw notFound("Package");
  const projectId = await findPackageProjectId(actor, packageId, trx);
  const access = projectId ? await findProjectAccess(actor, projectId, trx) : undefined;
  if (!projectId || !access) throw notFound("Package");
  const query = trx.from("packages").select("id", "projectId", "title", "status", "assignedChecker", "document").where({ id: packageId, projectId });
  const pkg: ReviewPackage | undefined = await (lock ? query.forUpdate() : query).first();
  if (!pkg) throw notFound("Package");
  if (!can(permission, access.grantees)) throw new AppError("FORBIDDEN", refusal);
  return { access, pkg };
}
